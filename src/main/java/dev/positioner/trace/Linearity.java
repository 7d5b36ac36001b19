package dev.positioner.trace;

/**
 * Straight-line deviations of a calibration curve, per the ISA-51.1 definitions of independent
 * and terminal-based linearity.
 */
final class Linearity {

    private Linearity() {
    }

    /** Largest deviation from the line through the first and last points. */
    static double terminal(double[] x, double[] y, int n) {
        double slope = (y[n - 1] - y[0]) / (x[n - 1] - x[0]);
        double worst = 0;
        for (int i = 0; i < n; i++) {
            worst = Math.max(worst, Math.abs(y[i] - (y[0] + slope * (x[i] - x[0]))));
        }
        return worst;
    }

    /**
     * Smallest achievable largest deviation over all straight lines (minimax, Chebyshev). For a
     * fixed slope the best intercept halves the spread of the residuals, and that spread is a
     * convex function of the slope, so a golden-section search on the slope finds the optimum.
     */
    static double independent(double[] x, double[] y, int n) {
        double mx = 0;
        double my = 0;
        for (int i = 0; i < n; i++) {
            mx += x[i];
            my += y[i];
        }
        mx /= n;
        my /= n;
        double sxy = 0;
        double sxx = 0;
        for (int i = 0; i < n; i++) {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
        }
        double ls = sxy / sxx;
        double w = Math.max(1, Math.abs(ls));
        double a = ls - w;
        double b = ls + w;
        double g = (Math.sqrt(5) - 1) / 2;
        double c = b - g * (b - a);
        double d = a + g * (b - a);
        double fc = halfSpread(x, y, n, c);
        double fd = halfSpread(x, y, n, d);
        for (int it = 0; it < 100; it++) {
            if (fc < fd) {
                b = d;
                d = c;
                fd = fc;
                c = b - g * (b - a);
                fc = halfSpread(x, y, n, c);
            } else {
                a = c;
                c = d;
                fc = fd;
                d = a + g * (b - a);
                fd = halfSpread(x, y, n, d);
            }
        }
        return Math.min(fc, fd);
    }

    private static double halfSpread(double[] x, double[] y, int n, double slope) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            double r = y[i] - slope * x[i];
            lo = Math.min(lo, r);
            hi = Math.max(hi, r);
        }
        return (hi - lo) / 2;
    }
}
