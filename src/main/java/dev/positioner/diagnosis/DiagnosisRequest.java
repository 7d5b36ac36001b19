package dev.positioner.diagnosis;

import java.util.List;

/**
 * The one-shot request (see the contract in openapi/openapi.yaml). Symptoms listed are present;
 * {@code absentSymptoms} are those the client has looked for and not found. A symptom in neither
 * list is unknown and does not count either way.
 */
public record DiagnosisRequest(List<String> symptoms, List<String> absentSymptoms, List<MeasurementInput> measurements,
        List<CheckInput> checks, List<String> unavailableChecks, AssetInput asset) {

    public record MeasurementInput(String quantity, Double value, String unit) {
    }

    public record CheckInput(String check, String outcome) {
    }

    public record AssetInput(String tag, String oilGrade, String cleanlinessTarget, List<MeasurementInput> design) {
    }
}
