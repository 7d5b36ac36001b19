package dev.positioner.session;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.List;

/**
 * What one event says; which fields are set depends on its type. Kept flat (not one class per type)
 * because it is stored as one JSON column and read back by the same code.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record EventData(String workOrder, String symptom, Boolean present, String quantity, Double value, String unit,
        String check, String outcome, String traceId, String text, Integer retracts, String fault, String action,
        List<String> parts, Double minutes) {

    static EventData opened(String workOrder) {
        return new EventData(workOrder, null, null, null, null, null, null, null, null, null, null, null, null, null, null);
    }

    static EventData symptom(String symptom, boolean present) {
        return new EventData(null, symptom, present, null, null, null, null, null, null, null, null, null, null, null, null);
    }

    static EventData reading(String quantity, Double value, String unit) {
        return new EventData(null, null, null, quantity, value, unit, null, null, null, null, null, null, null, null, null);
    }

    static EventData check(String check, String outcome) {
        return new EventData(null, null, null, null, null, null, check, outcome, null, null, null, null, null, null, null);
    }

    static EventData unavailable(String check) {
        return check(check, null);
    }

    static EventData trace(String traceId, String text) {
        return new EventData(null, null, null, null, null, null, null, null, traceId, text, null, null, null, null, null);
    }

    static EventData note(String text) {
        return trace(null, text);
    }

    static EventData retraction(int seq, String reason) {
        return new EventData(null, null, null, null, null, null, null, null, null, reason, seq, null, null, null, null);
    }

    static EventData closed(String fault, String action, List<String> parts, Double minutes, String remarks) {
        return new EventData(null, null, null, null, null, null, null, null, null, remarks, null, fault, action, parts, minutes);
    }

    static EventData reopened(String reason) {
        return note(reason);
    }
}
