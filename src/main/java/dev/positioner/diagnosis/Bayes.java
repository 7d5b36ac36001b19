package dev.positioner.diagnosis;

import java.util.List;

/**
 * Single-fault Bayes over a fixed set of hypotheses: P(h | e1..en) is proportional to
 * P(h) * prod P(ei | h), the pieces of evidence taken as independent given the cause (the naive
 * Bayes assumption; the context rules remove the worst dependencies before evidence gets here).
 * Computed in log space so that thirty pieces of evidence cannot underflow.
 */
public final class Bayes {

    private Bayes() {
    }

    public static double[] posterior(double[] prior, List<double[]> likelihoods) {
        int n = prior.length;
        double[] log = new double[n];
        for (int h = 0; h < n; h++) {
            log[h] = Math.log(prior[h]);
            for (double[] l : likelihoods) {
                log[h] += Math.log(l[h]);
            }
        }
        return normaliseLog(log);
    }

    /** Posterior after one more piece of evidence, for the look-ahead of the check planner. */
    public static double[] update(double[] p, double[] likelihood) {
        double[] out = new double[p.length];
        double sum = 0;
        for (int h = 0; h < p.length; h++) {
            out[h] = p[h] * likelihood[h];
            sum += out[h];
        }
        for (int h = 0; h < p.length; h++) {
            out[h] = sum > 0 ? out[h] / sum : p[h];
        }
        return out;
    }

    /** P(evidence) = sum over h of P(h) P(evidence | h): the predictive probability of an outcome. */
    public static double predictive(double[] p, double[] likelihood) {
        double sum = 0;
        for (int h = 0; h < p.length; h++) {
            sum += p[h] * likelihood[h];
        }
        return sum;
    }

    static double[] normaliseLog(double[] log) {
        double max = Double.NEGATIVE_INFINITY;
        for (double v : log) {
            max = Math.max(max, v);
        }
        double sum = 0;
        double[] out = new double[log.length];
        for (int h = 0; h < log.length; h++) {
            out[h] = Math.exp(log[h] - max);
            sum += out[h];
        }
        for (int h = 0; h < log.length; h++) {
            out[h] /= sum;
        }
        return out;
    }

    public static int argmax(double[] p) {
        int best = 0;
        for (int h = 1; h < p.length; h++) {
            if (p[h] > p[best]) {
                best = h;
            }
        }
        return best;
    }
}
