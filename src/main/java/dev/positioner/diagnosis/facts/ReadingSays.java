package dev.positioner.diagnosis.facts;

/**
 * What a measurement implies about a check's outcome, before it is decided whether it becomes an
 * {@link Observation}: a check the technician reported wins over a reading of the same thing.
 */
public record ReadingSays(String check, String outcome, String quantity) {
}
