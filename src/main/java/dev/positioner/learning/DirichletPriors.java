package dev.positioner.learning;

/**
 * Posterior mean of a Dirichlet prior updated with counts: {@code p_h = (n0 * base_h + t_h + w * s_h)
 * / (n0 + T + w * S)}, where {@code base} are the catalogue priors worth {@code n0} closures, {@code t}
 * the confirmed closures on this valve and {@code s} those on other valves of the same site, each of
 * which counts {@code w} of a closure on this valve (other valves see other duty). The result sums to
 * one, and no cause falls to zero, so one closure cannot rule a cause out.
 */
public final class DirichletPriors {

    private DirichletPriors() {
    }

    public static double[] update(double[] base, int[] tag, int[] site, double n0, double siteWeight) {
        if (!(n0 > 0) || siteWeight < 0 || tag.length != base.length || site.length != base.length) {
            throw new IllegalArgumentException("need n0 > 0, siteWeight >= 0 and one count per hypothesis");
        }
        double baseSum = 0;
        for (double b : base) {
            baseSum += b;
        }
        double[] alpha = new double[base.length];
        double total = 0;
        for (int h = 0; h < base.length; h++) {
            alpha[h] = n0 * base[h] / baseSum + tag[h] + siteWeight * site[h];
            total += alpha[h];
        }
        for (int h = 0; h < base.length; h++) {
            alpha[h] /= total;
        }
        return alpha;
    }
}
