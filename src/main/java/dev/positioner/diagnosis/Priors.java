package dev.positioner.diagnosis;

/**
 * Prior probabilities of the hypotheses (catalogue order, unlisted last) and a sentence saying
 * what they are based on, which the response repeats so nobody mistakes a learnt prior for a fact.
 */
public record Priors(double[] values, String basis) {
}
