package dev.positioner.session;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;

/** What an event records. Only evidence and remarks can be retracted; opening and closing cannot. */
public enum EventType {
    OPENED, SYMPTOM, READING, CHECK, UNAVAILABLE, TRACE, NOTE, RETRACTION, CLOSED, REOPENED;

    @JsonValue
    public String code() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static EventType of(String code) {
        return valueOf(code.toUpperCase(Locale.ROOT));
    }

    public boolean retractable() {
        return this != OPENED && this != CLOSED && this != REOPENED;
    }
}
