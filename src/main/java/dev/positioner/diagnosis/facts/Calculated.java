package dev.positioner.diagnosis.facts;

/**
 * A number computed from readings and design data by a published method (see
 * {@code dev.positioner.hydraulics}), for rules to compare against: e.g. the drain-line pressure
 * drop that thick oil alone would cause, or the hydraulic natural frequency of the actuator.
 */
public record Calculated(String code, double value, String unit) {
}
