package dev.positioner.session;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.time.Instant;

/**
 * One stored event. {@code retractedBy} is not stored with the event (events are never updated):
 * it is worked out when the session is read, from the retraction events that follow.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record SessionEvent(int seq, EventType type, String author, Instant recordedAt, EventData data, Integer retractedBy) {

    SessionEvent withRetractedBy(Integer by) {
        return new SessionEvent(seq, type, author, recordedAt, data, by);
    }
}
