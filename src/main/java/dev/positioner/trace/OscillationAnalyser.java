package dev.positioner.trace;

/**
 * Detects hunting of the valve position while the input is steady, by Hägglund's
 * load-disturbance counting ({@link HagglundDetector}; T. Hägglund, Control Engineering
 * Practice 3(11), 1995).
 *
 * <p>The control error is input minus position with its slow mean removed (exponential mean of
 * time constant five reference periods), so a calibration offset between input and position
 * does not hide the zero crossings. Whenever the input leaves a band of
 * {@code steadyInputBandPercent} around its value at the last reset, the detector restarts:
 * this analysis is only about oscillation the input did not ask for. O(1) memory.
 */
public final class OscillationAnalyser implements SampleConsumer {

    private final TraceAnalysisOptions o;
    private final HagglundDetector detector;
    private final double meanTau;
    private double inputRef = Double.NaN;
    private double bias;
    private double lastT;

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
            bias = raw;
            lastT = s.time();
            detector.reset();
            detector.update(s.time(), 0);
            return;
        }
        bias += (raw - bias) * Math.min(1, (s.time() - lastT) / meanTau);
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
