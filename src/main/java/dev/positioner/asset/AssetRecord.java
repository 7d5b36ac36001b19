package dev.positioner.asset;

import dev.positioner.diagnosis.DiagnosisRequest.MeasurementInput;
import java.util.List;

/** A registered valve: tag, where it is, and its design data in the units it was recorded in. */
public record AssetRecord(String tag, String description, String area, String oilGrade, String cleanlinessTarget,
        List<MeasurementInput> design) {
}
