package dev.positioner.trace;

/**
 * Measures one recorded step response (bounded buffer) in the terms of ISA-75.25.01. Crossing
 * times are interpolated linearly between samples, which for a first-order response sampled at
 * a fifth of its time constant is exact to a few milliseconds.
 */
final class StepMetrics {

    static final double T63_LEVEL = 1 - Math.exp(-1);
    static final double T86_LEVEL = 1 - Math.exp(-2);

    private StepMetrics() {
    }

    static StepResponse measure(int index, double[] t, double[] y, int n, double inputBefore,
                                double inputAfter, double y0, double sigma0,
                                TraceAnalysisOptions o) {
        double t0 = t[0];
        int tail = Math.max(3, n / 5);
        double yF = 0;
        for (int i = n - tail; i < n; i++) {
            yF += y[i];
        }
        yF /= tail;
        double dy = yF - y0;
        double mag = Math.abs(dy);
        double sign = Math.signum(dy);
        double recorded = t[n - 1] - t0;
        double noise = 3 * sigma0;
        double band = Math.max(o.settlingBandFraction() * mag, noise);
        if (mag < Math.max(o.observableChangePercent(), noise)) {
            return new StepResponse(index, t0, inputBefore, inputAfter, y0, yF, null, null, null,
                    null, null, band, recorded, "no observable position change for this step");
        }
        Double dead = null;
        double thr = Math.max(o.deadTimeFraction() * mag, noise);
        for (int i = 0; i < n; i++) {
            // two samples in a row past the threshold, so one noise spike cannot end dead time
            if (d(y, i, y0, sign) >= thr && (i + 1 >= n || d(y, i + 1, y0, sign) >= thr)) {
                dead = crossing(t, y, i, y0, sign, thr) - t0;
                break;
            }
        }
        Double t63 = firstCrossing(t, y, n, y0, sign, T63_LEVEL * mag);
        Double t86 = firstCrossing(t, y, n, y0, sign, T86_LEVEL * mag);
        double peak = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            peak = Math.max(peak, d(y, i, y0, sign));
        }
        double overshoot = Math.max(0, peak - mag) / mag * 100;
        int last = -1;
        for (int i = n - 1; i >= 0; i--) {
            if (Math.abs(y[i] - yF) > band) {
                last = i;
                break;
            }
        }
        Double settle;
        if (last < 0) {
            settle = 0.0;
        } else if (last == n - 1) {
            settle = null;
        } else {
            double a = Math.abs(y[last] - yF);
            double b = Math.abs(y[last + 1] - yF);
            settle = t[last] + (a - band) / (a - b) * (t[last + 1] - t[last]) - t0;
        }
        String note = null;
        if (t86 == null || settle == null) {
            note = "the input moved again (or the trace or response buffer ended) before the "
                    + "position settled";
        }
        return new StepResponse(index, t0, inputBefore, inputAfter, y0, yF,
                dead, t63 == null ? null : t63 - t0, t86 == null ? null : t86 - t0, overshoot,
                settle, band, recorded, note);
    }

    private static double d(double[] y, int i, double y0, double sign) {
        return sign * (y[i] - y0);
    }

    private static Double firstCrossing(double[] t, double[] y, int n, double y0, double sign,
                                        double level) {
        for (int i = 0; i < n; i++) {
            if (d(y, i, y0, sign) >= level) {
                return crossing(t, y, i, y0, sign, level);
            }
        }
        return null;
    }

    /** Time at which the response passed {@code level} between samples i-1 and i. */
    private static double crossing(double[] t, double[] y, int i, double y0, double sign,
                                   double level) {
        if (i == 0) {
            return t[0];
        }
        double a = d(y, i - 1, y0, sign);
        double b = d(y, i, y0, sign);
        return t[i - 1] + (level - a) / (b - a) * (t[i] - t[i - 1]);
    }
}
