package dev.positioner.diagnosis.facts;

/** One design value of the valve in canonical units, with whether it was assumed rather than given. */
public record Design(String quantity, double value, boolean assumed) {
}
