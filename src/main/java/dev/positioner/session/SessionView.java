package dev.positioner.session;

import com.fasterxml.jackson.annotation.JsonInclude;
import dev.positioner.diagnosis.DiagnosisResponse;
import java.time.Instant;
import java.util.List;

/**
 * A session as the client sees it: its row, the event just stored (after an addition) or all events
 * (when opened or read), the diagnosis of what is known after that event, and the closure if closed.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record SessionView(String id, String tag, String workOrder, String status, String openedBy, Instant openedAt,
        int lastSeq, SessionEvent event, List<SessionEvent> events, DiagnosisResponse diagnosis, ClosureRecord closure) {

    /** One line of a list: no events, no diagnosis. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record Summary(String id, String tag, String workOrder, String status, String openedBy, Instant openedAt,
            int lastSeq, String confirmedFault) {
    }
}
