package dev.positioner.trace;

/**
 * Result of Horch's stiction test (see {@link HorchStictionAnalyser}).
 *
 * @param verdict             the call
 * @param reason              plain words on why, including why it cannot tell
 * @param outputSignal        which logged signal stood for the process output:
 *                            "process_value" when logged, else "position"
 * @param zeroLagCorrelation  normalised cross-correlation at lag 0, or null
 * @param asymmetry           |tau_r + tau_l| / (tau_r - tau_l) of the zero crossings nearest lag
 *                            0 on each side: 0 for an even function, 1 for an odd one; or null
 * @param periodSeconds       oscillation period of the controller output in the window, or null
 * @param samplesUsed         (block-averaged) samples in the analysed window
 * @param windowSeconds       time span of that window, s
 */
public record StictionResult(StictionVerdict verdict, String reason, String outputSignal,
                             Double zeroLagCorrelation, Double asymmetry, Double periodSeconds,
                             int samplesUsed, double windowSeconds) {
}
