package dev.positioner.session;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.time.Instant;
import java.util.List;

/**
 * What a maintenance system takes away when a job closes: the confirmed cause with its ISO 14224
 * failure mode, failure mechanism and cause wording from the fault catalogue, the action taken,
 * parts and time. {@code reopenedAt} is set when the job was reopened after this closure.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record ClosureRecord(String sessionId, int seq, String tag, String site, String workOrder, String confirmedFault,
        String faultTitle, String failureMode, String failureMechanism, String failureCause, String action,
        List<String> parts, double minutes, String remarks, String closedBy, Instant closedAt, Instant reopenedAt) {
}
