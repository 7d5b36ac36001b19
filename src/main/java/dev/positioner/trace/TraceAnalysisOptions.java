package dev.positioner.trace;

/**
 * Tuning of the trace analysers, all in percent of span or seconds. The defaults suit positioner
 * traces logged at 1-20 samples/s; each is a choice of this service unless its javadoc names a
 * source.
 *
 * @param stepThresholdPercent       smallest input change counted as a step. 0.5 % lets the
 *                                   small steps of an ISA-75.25.01 test through while staying
 *                                   well above typical signal noise
 * @param stepMaxRiseSamples         the input must cover the step within this many samples
 * @param stepMinHoldSamples         and then stay steady for this many, or it is a ramp
 * @param stepMaxResponseSamples     bounded buffer per step response; a longer hold is cut
 * @param settlingBandFraction       settling band half-width as a fraction of the position
 *                                   change (0.02 = the common +/-2 % band)
 * @param deadTimeFraction           output movement, as a fraction of the position change,
 *                                   that marks the end of the dead time
 * @param reversalThresholdPercent   input travel back from an extreme that confirms a reversal
 * @param observableChangePercent    position change counted as "observable" for dead band
 * @param oscillationAmplitudePercent Hägglund's acceptable amplitude a (1 % of span in the paper)
 * @param referencePeriodSeconds     stands in for the ultimate period, giving the IAE limit
 *                                   2a/omega_u with omega_u = 2 pi / period (Hägglund uses the
 *                                   controller integral time when the ultimate period is unknown)
 * @param oscillationLimitCount      load disturbances within the supervision time that mean
 *                                   "oscillating" (Hägglund: n_lim = 10)
 * @param supervisionPeriods         supervision time as a multiple of the reference period
 *                                   (Hägglund: T_sup = 50 T_i)
 * @param zeroCrossingBandPercent    hysteresis on zero crossings so noise does not split
 *                                   half-periods
 * @param steadyInputBandPercent     input drift that ends a "steady input" stretch
 * @param correlationWindowSamples   ring buffer length for Horch's test (after decimation)
 * @param correlationBlockSeconds    samples are block-averaged to about this interval first
 */
public record TraceAnalysisOptions(
        double stepThresholdPercent, int stepMaxRiseSamples, int stepMinHoldSamples,
        int stepMaxResponseSamples, double settlingBandFraction, double deadTimeFraction,
        double reversalThresholdPercent, double observableChangePercent,
        double oscillationAmplitudePercent, double referencePeriodSeconds,
        int oscillationLimitCount, double supervisionPeriods, double zeroCrossingBandPercent,
        double steadyInputBandPercent, int correlationWindowSamples,
        double correlationBlockSeconds) {

    public TraceAnalysisOptions {
        positive("stepThresholdPercent", stepThresholdPercent);
        positive("stepMaxRiseSamples", stepMaxRiseSamples);
        positive("stepMinHoldSamples", stepMinHoldSamples);
        positive("stepMaxResponseSamples", stepMaxResponseSamples);
        positive("settlingBandFraction", settlingBandFraction);
        positive("deadTimeFraction", deadTimeFraction);
        positive("reversalThresholdPercent", reversalThresholdPercent);
        positive("observableChangePercent", observableChangePercent);
        positive("oscillationAmplitudePercent", oscillationAmplitudePercent);
        positive("referencePeriodSeconds", referencePeriodSeconds);
        positive("oscillationLimitCount", oscillationLimitCount);
        positive("supervisionPeriods", supervisionPeriods);
        positive("zeroCrossingBandPercent", zeroCrossingBandPercent);
        positive("steadyInputBandPercent", steadyInputBandPercent);
        positive("correlationWindowSamples", correlationWindowSamples);
        positive("correlationBlockSeconds", correlationBlockSeconds);
        if (settlingBandFraction >= 1 || deadTimeFraction >= 1) {
            throw new IllegalArgumentException("settlingBandFraction and deadTimeFraction are "
                    + "fractions of the position change and must be below 1");
        }
    }

    private static void positive(String name, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(name + " must be a positive number, not " + v);
        }
    }

    public static TraceAnalysisOptions defaults() {
        return new TraceAnalysisOptions(0.5, 3, 10, 4096, 0.02, 0.01, 0.5, 0.2,
                1.0, 10.0, 10, 50.0, 0.2, 0.5, 4096, 0.2);
    }

    public TraceAnalysisOptions withReferencePeriodSeconds(double seconds) {
        return new TraceAnalysisOptions(stepThresholdPercent, stepMaxRiseSamples,
                stepMinHoldSamples, stepMaxResponseSamples, settlingBandFraction,
                deadTimeFraction, reversalThresholdPercent, observableChangePercent,
                oscillationAmplitudePercent, seconds, oscillationLimitCount, supervisionPeriods,
                zeroCrossingBandPercent, steadyInputBandPercent, correlationWindowSamples,
                correlationBlockSeconds);
    }

    public TraceAnalysisOptions withObservableChangePercent(double percent) {
        return new TraceAnalysisOptions(stepThresholdPercent, stepMaxRiseSamples,
                stepMinHoldSamples, stepMaxResponseSamples, settlingBandFraction,
                deadTimeFraction, reversalThresholdPercent, percent,
                oscillationAmplitudePercent, referencePeriodSeconds, oscillationLimitCount,
                supervisionPeriods, zeroCrossingBandPercent, steadyInputBandPercent,
                correlationWindowSamples, correlationBlockSeconds);
    }
}
