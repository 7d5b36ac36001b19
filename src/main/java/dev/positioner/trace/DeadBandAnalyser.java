package dev.positioner.trace;

import java.util.ArrayList;
import java.util.List;

/**
 * Dead band, hysteresis and linearity from slow input ramps up and down (ISA-75.13.01 /
 * IEC 61514 test terms; definitions from ISA-51.1). See {@link DeadBandResult}.
 *
 * <p>Dead band: at each reversal the input travel from its extreme until the position has
 * moved observably the other way. "Observably" is {@code observableChangePercent}; to keep that
 * threshold out of the figure, the onset is extrapolated back linearly from the inputs at which
 * the position had come back one and two thresholds (exact for backlash followed by steady
 * motion). The position's own extreme is tracked after the input's, so a lagging positioner
 * still coasting on is not mistaken for one that has not yet reversed; the lag itself still adds
 * about ramp rate x time constant, which is why the standard asks for slow ramps.
 *
 * <p>Reversals and the position's return are tracked on 4-sample moving means of input and
 * position: a noisy position drifts by several sigma over the seconds it sits in the dead band,
 * and a raw sample could pass for movement. Both signals are averaged over the same window, so
 * on a ramp the averaging shifts them together and adds no bias to the travel measured.
 *
 * <p>Up and down curves are kept as per-bin sums over 0.5 % input bins from -25 to 125 %, so
 * memory is fixed whatever the trace length. A sample joins a curve only while the input is
 * advancing past its previous extreme in that direction. Jumps larger than the step threshold
 * are steps, not ramps, and restart the tracking.
 */
public final class DeadBandAnalyser implements SampleConsumer {

    static final double BIN = 0.5;
    static final double LOW = -25;
    static final int BINS = 300;
    static final int MIN_OVERLAP_BINS = 10;
    static final int MAX_KEPT = 50;

    static final int SMOOTH = 4;

    private final TraceAnalysisOptions o;
    private final double[] ringU = new double[SMOOTH];
    private final double[] ringY = new double[SMOOTH];
    private int ringN;
    private int ringPos;
    private double ringSumU;
    private double ringSumY;
    private final double[][] sumU = new double[2][BINS];
    private final double[][] sumY = new double[2][BINS];
    private final int[][] count = new int[2][BINS];
    private boolean started;
    private double prevU;
    private int dir;
    private double extU;
    private double extT;
    private final Watch cand = new Watch();
    private final Watch open = new Watch();
    private int reversals;
    private int measuredCount;
    private double dbSum;
    private double dbMax;
    private final List<DeadBandResult.Reversal> kept = new ArrayList<>();

    /** Follows the position after one input extreme until it has come back two thresholds. */
    private static final class Watch {
        boolean active;
        int dir;
        double extU;
        double time;
        double ref;
        double u1 = Double.NaN;
        double u2 = Double.NaN;

        void start(int d, double u, double t, double y) {
            active = true;
            dir = d;
            extU = u;
            time = t;
            ref = y;
            u1 = Double.NaN;
            u2 = Double.NaN;
        }

        void copy(Watch w) {
            start(w.dir, w.extU, w.time, w.ref);
            u1 = w.u1;
            u2 = w.u2;
        }

        /** True once the position has moved two thresholds back from its extreme. */
        boolean track(double u, double y, double obs) {
            if (Double.isNaN(u1)) {
                ref = dir > 0 ? Math.max(ref, y) : Math.min(ref, y);
            }
            double moved = dir * (ref - y);
            if (Double.isNaN(u1) && moved >= obs) {
                u1 = u;
            }
            if (!Double.isNaN(u1) && Double.isNaN(u2) && moved >= 2 * obs) {
                u2 = u;
            }
            return !Double.isNaN(u2);
        }
    }

    public DeadBandAnalyser(TraceAnalysisOptions options) {
        this.o = options;
    }

    @Override
    public void accept(Sample s) {
        double rawU = s.input();
        double rawY = s.position();
        double t = s.time();
        if (!started || Math.abs(rawU - prevU) > o.stepThresholdPercent()) {
            started = true;
            prevU = rawU;
            dir = 0;
            ringN = 0;
            ringSumU = ringSumY = 0;
            cand.active = false;
            open.active = false;
        }
        prevU = rawU;
        if (ringN == SMOOTH) {
            ringSumU -= ringU[ringPos];
            ringSumY -= ringY[ringPos];
        } else {
            ringN++;
        }
        ringU[ringPos] = rawU;
        ringY[ringPos] = rawY;
        ringSumU += rawU;
        ringSumY += rawY;
        ringPos = (ringPos + 1) % SMOOTH;
        if (ringN < SMOOTH) {
            extU = ringSumU / ringN;
            return;
        }
        double u = ringSumU / SMOOTH;
        double y = ringSumY / SMOOTH;
        double obs = o.observableChangePercent();
        if (open.active && open.track(u, y, obs)) {
            commit(open);
            open.active = false;
        }
        if (dir == 0) {
            if (Math.abs(u - extU) > o.reversalThresholdPercent()) {
                dir = u > extU ? 1 : -1;
                newExtreme(u, t, y);
            }
            return;
        }
        if (dir * (u - extU) >= 0) {
            newExtreme(u, t, y);
            add(dir, rawU, rawY);
            return;
        }
        cand.track(u, y, obs);
        if (dir * (extU - u) > o.reversalThresholdPercent()) {
            reversals++;
            // an earlier reversal whose position never moved back is dropped, not guessed at
            if (!Double.isNaN(cand.u2)) {
                commit(cand);
                open.active = false;
            } else {
                open.copy(cand);
            }
            dir = -dir;
            newExtreme(u, t, y);
        }
    }

    private void newExtreme(double u, double t, double y) {
        extU = u;
        extT = t;
        cand.start(dir, u, t, y);
    }

    private void commit(Watch w) {
        double db = Math.max(0, Math.abs(w.extU - w.u1) - Math.abs(w.u2 - w.u1));
        measuredCount++;
        dbSum += db;
        dbMax = Math.max(dbMax, db);
        if (kept.size() < MAX_KEPT) {
            kept.add(new DeadBandResult.Reversal(w.time, w.extU, db));
        }
    }

    private void add(int d, double u, double y) {
        int i = (int) Math.floor((u - LOW) / BIN);
        if (i >= 0 && i < BINS) {
            int side = d > 0 ? 0 : 1;
            sumU[side][i] += u;
            sumY[side][i] += y;
            count[side][i]++;
        }
    }

    public DeadBandResult finish() {
        Double db = measuredCount > 0 ? dbSum / measuredCount : null;
        Double dbMaxOut = measuredCount > 0 ? dbMax : null;
        // slope of all binned points, to compare up and down at the same input within a bin
        double sx = 0, sy = 0, sxx = 0, sxy = 0;
        int np = 0;
        for (int side = 0; side < 2; side++) {
            for (int i = 0; i < BINS; i++) {
                if (count[side][i] > 0) {
                    double x = sumU[side][i] / count[side][i];
                    double v = sumY[side][i] / count[side][i];
                    sx += x; sy += v; sxx += x * x; sxy += x * v;
                    np++;
                }
            }
        }
        double slope = np > 1 && np * sxx - sx * sx > 0 ? (np * sxy - sx * sy) / (np * sxx - sx * sx) : 1;
        double[] xs = new double[BINS];
        double[] mean = new double[BINS];
        double[] diff = new double[BINS];
        int n = 0;
        for (int i = 0; i < BINS; i++) {
            if (count[0][i] > 0 && count[1][i] > 0) {
                double c = LOW + (i + 0.5) * BIN;
                double up = sumY[0][i] / count[0][i] - slope * (sumU[0][i] / count[0][i] - c);
                double dn = sumY[1][i] / count[1][i] - slope * (sumU[1][i] / count[1][i] - c);
                xs[n] = c;
                mean[n] = (up + dn) / 2;
                diff[n] = Math.abs(up - dn);
                n++;
            }
        }
        String note = measuredCount == 0
                ? "no ramp reversal with position movement found; dead band needs slow ramps up "
                        + "and down of more than " + o.reversalThresholdPercent() + " %"
                : "dead band onset extrapolated from " + o.observableChangePercent() + " % and "
                        + 2 * o.observableChangePercent() + " % of position movement; positioner "
                        + "lag on the ramp adds to both dead band and hysteresis";
        if (n < MIN_OVERLAP_BINS) {
            return new DeadBandResult(reversals, db, dbMaxOut, null, null, null, null, null, null,
                    List.copyOf(kept), note + "; up and down ramps overlap over less than "
                    + MIN_OVERLAP_BINS * BIN + " % of input, too little for hysteresis or linearity");
        }
        double hdb = 0;
        for (int i = 0; i < n; i++) {
            hdb = Math.max(hdb, diff[i]);
        }
        Double hyst = db == null ? null : Math.max(0, hdb - db);
        // near the turning points the down curve still sits in the dead band; leave those bins
        // out of linearity, which is about the shape of the curve, not the reversal
        double trim = dbMaxOut == null ? 0 : dbMaxOut + BIN;
        int a = 0;
        int b = n - 1;
        while (a < n && xs[a] < xs[0] + trim) {
            a++;
        }
        while (b >= 0 && xs[b] > xs[n - 1] - trim) {
            b--;
        }
        Double indep = null;
        Double term = null;
        if (b - a + 1 >= MIN_OVERLAP_BINS) {
            double[] lx = java.util.Arrays.copyOfRange(xs, a, b + 1);
            double[] ly = java.util.Arrays.copyOfRange(mean, a, b + 1);
            indep = Linearity.independent(lx, ly, lx.length);
            term = Linearity.terminal(lx, ly, lx.length);
        }
        return new DeadBandResult(reversals, db, dbMaxOut, hdb, hyst, indep, term,
                xs[0] - BIN / 2, xs[n - 1] + BIN / 2, List.copyOf(kept), note);
    }
}
