package dev.positioner.api;

/** One thing wrong with a request: the JSON path of the field and what is wrong with it. */
public record FieldError(String field, String message) {
}
