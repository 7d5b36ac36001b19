package dev.positioner.session;

import dev.positioner.diagnosis.DiagnosisRequest.CheckInput;
import dev.positioner.diagnosis.DiagnosisRequest.MeasurementInput;
import java.util.List;

/** Request bodies of the session endpoints (see openapi/openapi.yaml for which fields each needs). */
public final class SessionRequests {

    private SessionRequests() {
    }

    /** Opens a job. {@code clientRequestId} is an alternative to the Idempotency-Key header. */
    public record Open(String tag, String workOrder, String author, List<String> symptoms, List<String> absentSymptoms,
            List<MeasurementInput> measurements, List<CheckInput> checks, List<String> unavailableChecks,
            String clientRequestId) {
    }

    /** One addition; the endpoint decides which fields it reads. */
    public record Add(String symptom, Boolean present, String quantity, Double value, String unit, String check,
            String outcome, String traceId, String text, Integer retracts, String author, String clientEventId) {
    }

    public record Close(String confirmedFault, String action, List<String> parts, Double minutes, String remarks,
            String author, String clientEventId) {
    }

    public record Reopen(String reason, String author, String clientEventId) {
    }
}
