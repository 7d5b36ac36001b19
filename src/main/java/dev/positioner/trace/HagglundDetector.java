package dev.positioner.trace;

/**
 * Oscillation detection by counting load disturbances, after T. Hägglund, "A control-loop
 * performance monitor", Control Engineering Practice 3(11), 1995, pp. 1543-1551.
 *
 * <p>The control error is integrated in absolute value between zero crossings. A half-cycle
 * whose integral exceeds IAE_lim = 2a/omega_u is a "load disturbance": for a sine at the
 * ultimate frequency that is an amplitude above a. Disturbances are counted with exponential
 * forgetting over the supervision time T_sup (x := gamma x + event, gamma = 1 - h/T_sup), and
 * the loop is called oscillating when the count exceeds n_lim. O(1) memory.
 *
 * <p>One change from the paper's plain zero crossings: a crossing counts only once the error
 * has passed a small band of the new sign, so measurement noise near zero cannot split one
 * half-period into many short ones. Period and amplitude are not part of Hägglund's detector;
 * they are read here from the same half-cycles (mean duration x 2, mean positive plus mean
 * negative peak), counting only half-cycles from the moment the episode was called
 * oscillating when there are at least four of those, so a lone disturbance that opened the
 * episode does not skew them.
 */
final class HagglundDetector {

    /** A run of load disturbances, kept while the count x stays above one half. */
    record Episode(double start, double end, int events, double periodSeconds,
                   double peakToPeak, boolean oscillating) {
    }

    private final double iaeLimit;
    private final double tSup;
    private final double nLim;
    private final double band;

    private int sign;
    private double halfStart;
    private double iae;
    private double peak;
    private double x;
    private double lastT = Double.NaN;

    private boolean open;
    private boolean oscillating;
    private double epStart;
    private double epEnd;
    private final Stats all = new Stats();
    private final Stats sinceDetection = new Stats();
    private Episode best;

    /** Running sums of half-cycle durations and peaks. */
    private static final class Stats {
        int events;
        double sumHalf;
        double sumPos;
        int nPos;
        double sumNeg;
        int nNeg;

        void clear() {
            events = 0;
            sumHalf = sumPos = sumNeg = 0;
            nPos = nNeg = 0;
        }

        void add(double half, int sign, double peak) {
            events++;
            sumHalf += half;
            if (sign > 0) {
                sumPos += peak;
                nPos++;
            } else {
                sumNeg += peak;
                nNeg++;
            }
        }

        double period() {
            return 2 * sumHalf / events;
        }

        double peakToPeak() {
            return (nPos > 0 ? sumPos / nPos : 0) + (nNeg > 0 ? sumNeg / nNeg : 0);
        }
    }

    HagglundDetector(double amplitude, double ultimatePeriod, double supervisionTime,
                     int limitCount, double band) {
        this.iaeLimit = 2 * amplitude / (2 * Math.PI / ultimatePeriod);
        this.tSup = supervisionTime;
        this.nLim = limitCount;
        this.band = band;
    }

    double iaeLimit() {
        return iaeLimit;
    }

    void update(double t, double e) {
        if (Double.isNaN(lastT)) {
            lastT = t;
            halfStart = t;
            return;
        }
        double dt = t - lastT;
        lastT = t;
        x *= Math.max(0, 1 - dt / tSup);
        iae += Math.abs(e) * dt;
        peak = Math.max(peak, sign >= 0 ? e : -e);
        int s = e > band ? 1 : e < -band ? -1 : 0;
        if (s != 0 && s != sign) {
            if (sign != 0) {
                closeHalf(t);
            }
            sign = s;
            halfStart = t;
            iae = 0;
            peak = Math.abs(e);
        }
        if (open && x < 0.5) {
            closeEpisode();
        }
    }

    private void closeHalf(double t) {
        if (iae <= iaeLimit) {
            return;
        }
        x += 1;
        if (!open) {
            open = true;
            oscillating = false;
            epStart = halfStart;
            all.clear();
            sinceDetection.clear();
        }
        epEnd = t;
        all.add(t - halfStart, sign, peak);
        if (oscillating) {
            sinceDetection.add(t - halfStart, sign, peak);
        }
        if (x > nLim) {
            oscillating = true;
        }
    }

    private void closeEpisode() {
        Episode ep = current();
        if (ep != null && (best == null || rank(ep) > rank(best))) {
            best = ep;
        }
        open = false;
    }

    private static double rank(Episode e) {
        return (e.oscillating() ? 1e9 : 0) + e.events();
    }

    private Episode current() {
        if (!open) {
            return null;
        }
        Stats st = sinceDetection.events >= 4 ? sinceDetection : all;
        return new Episode(epStart, epEnd, all.events, st.period(), st.peakToPeak(), oscillating);
    }

    /** Forgets the current half-cycle and count, as after an input change; keeps the best. */
    void reset() {
        if (open) {
            closeEpisode();
        }
        sign = 0;
        iae = 0;
        peak = 0;
        x = 0;
        lastT = Double.NaN;
    }

    /** The strongest episode so far, the open one included; null if there was none. */
    Episode best() {
        Episode cur = current();
        if (cur != null && (best == null || rank(cur) > rank(best))) {
            return cur;
        }
        return best;
    }

    /** Whether the current, still open episode has been called oscillating. */
    boolean oscillatingNow() {
        return open && oscillating;
    }
}
