package dev.positioner.trace;

/**
 * Oscillation of the position while the input was steady (see {@link OscillationAnalyser}).
 *
 * @param detected          Hägglund's count exceeded n_lim within the supervision time
 * @param periodSeconds     mean period of the counted half-cycles, s, or null
 * @param peakToPeakPercent mean positive plus mean negative peak of the control error, % of
 *                          span (the position's peak-to-peak swing), or null
 * @param halfCycles        half-cycles counted as load disturbances in that episode
 * @param windowStart       trace time the episode began, s, or null
 * @param windowEnd         trace time of its last counted half-cycle, s, or null
 * @param iaeLimit          the IAE limit used, %*s
 * @param note              method, and why nothing was found if so
 */
public record OscillationResult(boolean detected, Double periodSeconds, Double peakToPeakPercent,
                                int halfCycles, Double windowStart, Double windowEnd,
                                double iaeLimit, String note) {
}
