package dev.positioner.diagnosis.facts;

/**
 * A measurement in the canonical unit of its kind ({@code value}, {@code unit}), keeping what the
 * client sent ({@code givenValue}, {@code givenUnit}) so that findings can speak the technician's units.
 */
public record Reading(String quantity, double value, String unit, double givenValue, String givenUnit) {
}
