package dev.positioner.diagnosis;

/**
 * One piece of evidence as the ranking uses it: a sentence for the reasons and P(evidence | h) for
 * every hypothesis, in the order of {@link dev.positioner.knowledge.Catalogue#hypotheses()}.
 */
public record EvidenceItem(String label, double[] likelihood) {
}
