package dev.positioner.diagnosis.facts;

/** A reported symptom whose information an observation already carries: it is counted once, through the observation. */
public record Subsumed(String symptom, String byCheck, String reason) {
}
