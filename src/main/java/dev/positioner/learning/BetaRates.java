package dev.positioner.learning;

/**
 * Posterior mean of a Beta prior on P(symptom present | cause) updated with closed jobs:
 * {@code p = (w * p0 + x) / (w + n)}, where {@code p0} is the catalogue's value worth {@code w} jobs,
 * {@code n} the closed jobs of that cause in which the symptom was reported either way (present or
 * absent) and {@code x} those in which it was present. Jobs that never mentioned the symptom say
 * nothing about it and do not count, as in the diagnosis itself. With {@code w > 0} and
 * {@code 0 < p0 < 1} the result stays strictly between 0 and 1: no run of jobs rules a symptom out.
 */
public final class BetaRates {

    private BetaRates() {
    }

    public static double update(double p0, int present, int reported, double weight) {
        if (!(weight > 0) || !(p0 > 0 && p0 < 1) || present < 0 || reported < present) {
            throw new IllegalArgumentException("need weight > 0, 0 < p0 < 1 and 0 <= present <= reported");
        }
        return (weight * p0 + present) / (weight + reported);
    }
}
