package dev.positioner.diagnosis;

/**
 * Prior probabilities of the hypotheses (catalogue order, unlisted last), a sentence saying what
 * they are based on (repeated in the response's assumptions so nobody mistakes a learnt prior for
 * a fact), and per hypothesis an optional note for its reasons, e.g. "confirmed twice on this valve".
 */
public record Priors(double[] values, String basis, String[] notes) {

    public Priors(double[] values, String basis) {
        this(values, basis, new String[values.length]);
    }
}
