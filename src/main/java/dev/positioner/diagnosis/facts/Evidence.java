package dev.positioner.diagnosis.facts;

/**
 * A likelihood ratio for one fault from a combination of facts that the independent tables of the
 * catalogue cannot express (for example two symptoms that together form one known pattern).
 */
public record Evidence(String fault, double factor, String reason) {
}
