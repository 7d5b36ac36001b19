package dev.positioner.diagnosis;

import java.util.List;

/**
 * The one-shot request (see the contract in openapi/openapi.yaml). Symptoms listed are present;
 * {@code absentSymptoms} are those the client has looked for and not found. A symptom in neither
 * list is unknown and does not count either way. {@code traces} are ids of uploaded traces whose
 * metrics count as measurements (a measurement sent by hand wins over the same one from a trace).
 * {@code repairs} are the repairs tried so far; {@code findCauseFirst} asks for no repair until one
 * cause reaches the stopping threshold (the site's setting when absent).
 */
public record DiagnosisRequest(List<String> symptoms, List<String> absentSymptoms, List<MeasurementInput> measurements,
        List<CheckInput> checks, List<String> unavailableChecks, AssetInput asset, List<String> traces,
        List<RepairInput> repairs, Boolean findCauseFirst) {

    public DiagnosisRequest(List<String> symptoms, List<String> absentSymptoms, List<MeasurementInput> measurements,
            List<CheckInput> checks, List<String> unavailableChecks, AssetInput asset, List<String> traces) {
        this(symptoms, absentSymptoms, measurements, checks, unavailableChecks, asset, traces, null, null);
    }

    public DiagnosisRequest(List<String> symptoms, List<String> absentSymptoms, List<MeasurementInput> measurements,
            List<CheckInput> checks, List<String> unavailableChecks, AssetInput asset) {
        this(symptoms, absentSymptoms, measurements, checks, unavailableChecks, asset, null);
    }

    public record MeasurementInput(String quantity, Double value, String unit) {
    }

    public record CheckInput(String check, String outcome) {
    }

    /** A repair tried, in order: the fault it was for, and whether the valve then worked (fixed / not_fixed). */
    public record RepairInput(String fault, String outcome) {
    }

    /**
     * {@code action}: increase_opens or increase_closes; {@code failPosition}: open, closed or
     * in_place; {@code returnSpring}: whether a spring returns the piston. All optional.
     */
    public record AssetInput(String tag, String oilGrade, String cleanlinessTarget, List<MeasurementInput> design,
            String action, String failPosition, Boolean returnSpring) {

        public AssetInput(String tag, String oilGrade, String cleanlinessTarget, List<MeasurementInput> design) {
            this(tag, oilGrade, cleanlinessTarget, design, null, null, null);
        }
    }
}
