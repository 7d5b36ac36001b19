package dev.positioner.diagnosis.facts;

/** A caution code of {@code rules/catalogue/cautions.yaml} that the situation calls for. */
public record Caution(String code) {
}
