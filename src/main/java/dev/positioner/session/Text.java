package dev.positioner.session;

import dev.positioner.api.FieldError;
import java.util.List;

/** Presence and length checks for the free-text fields of session requests. */
final class Text {

    private Text() {
    }

    static void required(List<FieldError> errors, String field, String value, int max) {
        if (value == null || value.isBlank()) {
            errors.add(new FieldError(field, "is required"));
        } else {
            optional(errors, field, value, max);
        }
    }

    static void optional(List<FieldError> errors, String field, String value, int max) {
        if (value != null && value.length() > max) {
            errors.add(new FieldError(field, "is longer than " + max + " characters"));
        }
    }
}
