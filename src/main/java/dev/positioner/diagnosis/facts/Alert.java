package dev.positioner.diagnosis.facts;

/**
 * A condition that puts the process at risk now: the technician tells the control room before any
 * further diagnosis. Code of {@code rules/catalogue/alerts.yaml}.
 */
public record Alert(String code) {
}
