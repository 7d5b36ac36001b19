package dev.positioner.asset;

import com.fasterxml.jackson.annotation.JsonInclude;
import dev.positioner.diagnosis.DiagnosisRequest.MeasurementInput;
import java.util.List;

/**
 * A registered valve: tag, where it is, and its design data in the units it was recorded in.
 * {@code site} groups valves whose closures are pooled for learning (empty: the installation).
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record AssetRecord(String tag, String description, String area, String site, String oilGrade,
        String cleanlinessTarget, List<MeasurementInput> design, String action, String failPosition,
        Boolean returnSpring) {

    public AssetRecord {
        design = design == null ? List.of() : List.copyOf(design);
    }

    public AssetRecord(String tag, String description, String area, String site, String oilGrade,
            String cleanlinessTarget, List<MeasurementInput> design) {
        this(tag, description, area, site, oilGrade, cleanlinessTarget, design, null, null, null);
    }
}
