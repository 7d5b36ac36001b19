package dev.positioner.trace;

/**
 * Stiction indication from the cross-correlation of controller output and process output, after
 * A. Horch, "A simple method for detection of stiction in control valves", Control Engineering
 * Practice 7(10), 1999. In an oscillating loop on a self-regulating process,
 * stick-slip makes the output a near square wave while the integrating controller output ramps,
 * so the two are a quarter period apart and their cross-correlation is odd (near zero at lag 0,
 * extremes shifted either side). An oscillation from tuning or an outside disturbance keeps
 * them in or against phase: an even correlation with its extreme at lag 0. Horch notes the
 * test is not meant for integrating processes (level), where this reasoning changes.
 *
 * <p>Horch states the rule as odd versus even. This class makes it a number: with tau_l &lt;= 0
 * &lt; tau_r the zero crossings of the correlation nearest lag 0, the asymmetry
 * |tau_r + tau_l| / (tau_r - tau_l) is 0 for an even function and 1 for an odd one. At least
 * 2/3 reads as stiction and at most 1/3 as not; between is "cannot tell". Those thirds are this
 * service's choice, not Horch's.
 *
 * <p>Bounded memory: samples are block-averaged to about {@code correlationBlockSeconds} and
 * the last {@code correlationWindowSamples} blocks are kept in a ring, so the test looks at the
 * end of the trace (at 5 samples/s, the last 13.6 minutes). Oscillation in the controller
 * output within that window is required and checked with Hägglund's detector on the controller
 * output about its slow mean. The process output is the logged process value if there is one,
 * otherwise the valve position, which for a fast (flow-like) loop carries the same shape.
 */
public final class HorchStictionAnalyser implements SampleConsumer {

    private static final int MIN_WINDOW = 64;
    private static final double ODD = 2.0 / 3;
    private static final double EVEN = 1.0 / 3;
    /** Below this peak correlation the two signals hardly share the oscillation. */
    private static final double MIN_PEAK_CORRELATION = 0.3;

    private final TraceAnalysisOptions o;
    private final double[] rt;
    private final double[] ru;
    private final double[] ry;
    private int head;
    private int size;
    private int decimation;
    private double prevT = Double.NaN;
    private double bt;
    private double bu;
    private double by;
    private int bn;
    private boolean missingCo;
    private boolean usePv = true;
    private boolean firstSample = true;
    private final HagglundDetector detector;
    private final double meanTau;
    private double uMean;
    private double lastOscillating = Double.NEGATIVE_INFINITY;

    public HorchStictionAnalyser(TraceAnalysisOptions options) {
        this.o = options;
        int cap = Math.max(MIN_WINDOW, options.correlationWindowSamples());
        rt = new double[cap];
        ru = new double[cap];
        ry = new double[cap];
        double pu = options.referencePeriodSeconds();
        detector = new HagglundDetector(options.oscillationAmplitudePercent(), pu,
                options.supervisionPeriods() * pu, options.oscillationLimitCount(),
                options.zeroCrossingBandPercent());
        meanTau = 5 * pu;
    }

    @Override
    public void accept(Sample s) {
        if (!s.hasControllerOutput()) {
            missingCo = true;
            return;
        }
        if (firstSample) {
            firstSample = false;
            usePv = s.hasProcessValue();
            uMean = s.controllerOutput();
        } else if (decimation == 0) {
            double dt = s.time() - prevT;
            decimation = Math.max(1, (int) Math.round(o.correlationBlockSeconds() / dt));
        }
        double u = s.controllerOutput();
        double y = usePv ? s.processValue() : s.position();
        if (Double.isNaN(y)) {
            usePv = false; // a process value that comes and goes cannot be used
            y = s.position();
        }
        if (!Double.isNaN(prevT)) {
            uMean += (u - uMean) * Math.min(1, (s.time() - prevT) / meanTau);
        }
        prevT = s.time();
        detector.update(s.time(), u - uMean);
        if (detector.oscillatingNow()) {
            lastOscillating = s.time();
        }
        if (bn == 0) {
            bt = s.time();
        }
        bu += u;
        by += y;
        bn++;
        if (bn >= Math.max(1, decimation)) {
            rt[head] = bt;
            ru[head] = bu / bn;
            ry[head] = by / bn;
            head = (head + 1) % rt.length;
            size = Math.min(size + 1, rt.length);
            bu = by = 0;
            bn = 0;
        }
    }

    public StictionResult finish() {
        String signal = usePv ? "process_value" : "position";
        if (missingCo || firstSample) {
            return cannot("no controller output logged; Horch's test needs the controller output "
                    + "and the process output of the loop", signal, null, 0, 0);
        }
        int n = size;
        int start = (head - n + rt.length) % rt.length;
        double window = n > 0 ? rt[(head - 1 + rt.length) % rt.length] - rt[start] : 0;
        if (n < MIN_WINDOW) {
            return cannot("only " + n + " samples after block averaging; at least " + MIN_WINDOW
                    + " are needed", signal, null, n, window);
        }
        if (lastOscillating < rt[start]) {
            return cannot("no sustained oscillation of the controller output in the last "
                    + Math.round(window) + " s, and the test applies to oscillating loops only",
                    signal, null, n, window);
        }
        double[] u = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            u[i] = ru[(start + i) % rt.length];
            y[i] = ry[(start + i) % rt.length];
        }
        double blockDt = window / (n - 1);
        double periodBlocks = CrossCorrelation.period(u, o.zeroCrossingBandPercent());
        if (Double.isNaN(periodBlocks) || n < 3 * periodBlocks) {
            return cannot("fewer than three oscillation periods in the analysed window", signal,
                    null, n, window);
        }
        Double period = periodBlocks * blockDt;
        int maxLag = (int) Math.min(n / 3, Math.ceil(periodBlocks));
        double[] r = CrossCorrelation.normalised(u, y, maxLag);
        if (r == null) {
            return cannot("the process output does not vary", signal, period, n, window);
        }
        double peak = 0;
        for (double v : r) {
            peak = Math.max(peak, Math.abs(v));
        }
        Double r0 = r[maxLag];
        if (peak < MIN_PEAK_CORRELATION) {
            return new StictionResult(StictionVerdict.CANNOT_TELL, "controller output and "
                    + signal + " are hardly correlated (peak " + round(peak) + ")", signal, r0,
                    null, period, n, window);
        }
        double[] z = CrossCorrelation.zerosAroundZeroLag(r, maxLag);
        if (z == null) {
            return new StictionResult(StictionVerdict.CANNOT_TELL, "the cross-correlation has no "
                    + "zero crossing within one period on both sides of lag 0", signal, r0, null,
                    period, n, window);
        }
        double asym = Math.abs(z[1] + z[0]) / (z[1] - z[0]);
        String figures = " (asymmetry " + round(asym) + ", correlation at lag 0 " + round(r0)
                + ", period " + round(period) + " s)";
        if (asym >= ODD) {
            return new StictionResult(StictionVerdict.STICTION_LIKELY, "cross-correlation of "
                    + "controller output and " + signal + " is odd: near zero at lag 0 with its "
                    + "extremes shifted, as stick-slip gives" + figures, signal, r0, asym,
                    period, n, window);
        }
        if (asym <= EVEN) {
            return new StictionResult(StictionVerdict.NOT_STICTION, "cross-correlation of "
                    + "controller output and " + signal + " is even, extreme at lag 0: the "
                    + "oscillation more likely comes from tuning or a disturbance" + figures,
                    signal, r0, asym, period, n, window);
        }
        return new StictionResult(StictionVerdict.CANNOT_TELL, "cross-correlation is neither "
                + "clearly odd nor clearly even" + figures, signal, r0, asym, period, n, window);
    }

    private static StictionResult cannot(String reason, String signal, Double period, int n,
                                         double window) {
        return new StictionResult(StictionVerdict.CANNOT_TELL, reason, signal, null, null, period,
                n, window);
    }

    private static double round(double v) {
        return Math.round(v * 100) / 100.0;
    }
}
