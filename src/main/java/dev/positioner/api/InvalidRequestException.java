package dev.positioner.api;

import java.util.List;

/** A request that cannot be served as sent; carries every field error found, not just the first. */
public class InvalidRequestException extends RuntimeException {

    private final transient List<FieldError> errors;

    public InvalidRequestException(List<FieldError> errors) {
        super(errors.isEmpty() ? "invalid request" : errors.get(0).field() + ": " + errors.get(0).message());
        this.errors = List.copyOf(errors);
    }

    public InvalidRequestException(String field, String message) {
        this(List.of(new FieldError(field, message)));
    }

    public List<FieldError> errors() {
        return errors;
    }
}
