package dev.positioner.trace;

/**
 * Detects hunting of the valve position while the input is steady, by Hägglund's
 * load-disturbance counting ({@link HagglundDetector}; T. Hägglund, Control Engineering
 * Practice 3(11), 1995).
 *
 * <p>The control error is input minus position with its slow mean removed, so a calibration
 * offset between input and position does not hide the zero crossings. The mean starts as a
 * running average and becomes an exponential mean of time constant five reference periods once
 * that many samples are in. Whenever the input leaves a band of {@code steadyInputBandPercent}
 * around its value at the last restart, the detector restarts and then waits one reference
 * period, so the position's response to the input change is not counted as hunting: this
 * analysis is only about oscillation the input did not ask for. O(1) memory.
 */
public final class OscillationAnalyser implements SampleConsumer {

    private final TraceAnalysisOptions o;
    private final HagglundDetector detector;
    private final double meanTau;
    private double inputRef = Double.NaN;
    private double bias;
    private double lastT;
    private double holdUntil;
    private boolean started;
    private long meanCount;

    public OscillationAnalyser(TraceAnalysisOptions options) {
        this.o = options;
        double pu = options.referencePeriodSeconds();
        this.detector = new HagglundDetector(options.oscillationAmplitudePercent(), pu,
                options.supervisionPeriods() * pu, options.oscillationLimitCount(),
                options.zeroCrossingBandPercent());
        this.meanTau = 5 * pu;
    }

    @Override
    public void accept(Sample s) {
        double raw = s.input() - s.position();
        if (Double.isNaN(inputRef) || Math.abs(s.input() - inputRef) > o.steadyInputBandPercent()) {
            inputRef = s.input();
            holdUntil = s.time() + o.referencePeriodSeconds();
            detector.reset();
            started = false;
            return;
        }
        if (s.time() < holdUntil) {
            return;
        }
        if (!started) {
            started = true;
            bias = raw;
            meanCount = 1;
            lastT = s.time();
            detector.update(s.time(), 0);
            return;
        }
        meanCount++;
        double alpha = Math.max(1.0 / meanCount, Math.min(1, (s.time() - lastT) / meanTau));
        bias += (raw - bias) * alpha;
        lastT = s.time();
        detector.update(s.time(), raw - bias);
    }

    public OscillationResult finish() {
        HagglundDetector.Episode ep = detector.best();
        String method = "Hägglund (1995) load-disturbance count: IAE between zero crossings above "
                + String.format(java.util.Locale.ROOT, "%.2f", detector.iaeLimit())
                + " %*s, more than " + o.oscillationLimitCount() + " within "
                + o.supervisionPeriods() * o.referencePeriodSeconds() + " s";
        if (ep == null || !ep.oscillating()) {
            return new OscillationResult(false, null, null, ep == null ? 0 : ep.events(), null,
                    null, detector.iaeLimit(), method + "; not reached while the input was steady");
        }
        return new OscillationResult(true, ep.periodSeconds(), ep.peakToPeak(), ep.events(),
                ep.start(), ep.end(), detector.iaeLimit(), method);
    }
}
