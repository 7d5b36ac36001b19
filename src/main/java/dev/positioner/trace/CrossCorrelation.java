package dev.positioner.trace;

/** Small signal helpers for Horch's test, on one bounded window. */
final class CrossCorrelation {

    private CrossCorrelation() {
    }

    /**
     * r(k) = sum_i u'(i) y'(i+k) / (n sd_u sd_y) for k = -maxLag..maxLag (index k + maxLag),
     * with u', y' deviations from the window means: the usual biased estimate, which keeps
     * |r| <= 1. O(n maxLag). Null when either signal is constant.
     */
    static double[] normalised(double[] u, double[] y, int maxLag) {
        int n = u.length;
        double mu = 0;
        double my = 0;
        for (int i = 0; i < n; i++) {
            mu += u[i];
            my += y[i];
        }
        mu /= n;
        my /= n;
        double[] du = new double[n];
        double[] dy = new double[n];
        double su = 0;
        double sy = 0;
        for (int i = 0; i < n; i++) {
            du[i] = u[i] - mu;
            dy[i] = y[i] - my;
            su += du[i] * du[i];
            sy += dy[i] * dy[i];
        }
        if (su <= 0 || sy <= 0) {
            return null;
        }
        double norm = Math.sqrt(su * sy);
        double[] r = new double[2 * maxLag + 1];
        for (int k = -maxLag; k <= maxLag; k++) {
            double acc = 0;
            int from = Math.max(0, -k);
            int to = Math.min(n, n - k);
            for (int i = from; i < to; i++) {
                acc += du[i] * dy[i + k];
            }
            r[k + maxLag] = acc / norm;
        }
        return r;
    }

    /**
     * Zero crossings of r nearest lag 0: {tau_l, tau_r} with tau_l &lt;= 0 &lt; tau_r, in
     * (fractional, interpolated) lags, or null if either side has none.
     */
    static double[] zerosAroundZeroLag(double[] r, int maxLag) {
        double left = Double.NaN;
        double right = Double.NaN;
        for (int i = 0; i + 1 < r.length; i++) {
            double z;
            if (r[i] == 0) {
                z = i - maxLag;
            } else if (r[i] * r[i + 1] < 0) {
                z = i - maxLag + r[i] / (r[i] - r[i + 1]);
            } else {
                continue;
            }
            if (z <= 0) {
                left = z;
            } else if (Double.isNaN(right)) {
                right = z;
            }
        }
        return Double.isNaN(left) || Double.isNaN(right) ? null : new double[] {left, right};
    }

    /**
     * Mean period, in samples, from crossings of the window mean with a hysteresis band; NaN
     * with fewer than three crossings.
     */
    static double period(double[] u, double band) {
        double m = 0;
        for (double v : u) {
            m += v;
        }
        m /= u.length;
        int sign = 0;
        int crossings = 0;
        int first = -1;
        int last = -1;
        for (int i = 0; i < u.length; i++) {
            double e = u[i] - m;
            int s = e > band ? 1 : e < -band ? -1 : 0;
            if (s != 0 && s != sign) {
                if (sign != 0) {
                    crossings++;
                    if (first < 0) {
                        first = i;
                    }
                    last = i;
                }
                sign = s;
            }
        }
        return crossings < 3 ? Double.NaN : 2.0 * (last - first) / (crossings - 1);
    }
}
