package dev.positioner.trace;

import java.util.List;

/**
 * Dead band, hysteresis and linearity from slow input ramps, in the terms of ISA-75.13.01 /
 * IEC 61514 and the ISA-51.1 definitions they lean on. All values are % of span; {@code null}
 * means the trace had no ramps that could show it (see note).
 *
 * @param reversals                      input reversals confirmed on ramps
 * @param deadBandPercent                mean over measured reversals of the input travel after a
 *                                       reversal before the position moved
 * @param deadBandMaxPercent             largest single measurement
 * @param hysteresisPlusDeadBandPercent  largest difference between the upscale and downscale
 *                                       position curves at equal input (ISA-51.1 measures
 *                                       hysteresis this way and it includes dead band)
 * @param hysteresisPercent              that difference less the dead band, as ISA-51.1 separates
 *                                       them (0 for pure backlash)
 * @param independentLinearityPercent    largest deviation of the mean up/down curve from the
 *                                       straight line that minimises that largest deviation
 *                                       (ISA-51.1 independent linearity)
 * @param terminalLinearityPercent       largest deviation from the line through the curve's end
 *                                       points (ISA-51.1 terminal-based linearity)
 * @param rangeLowPercent                low end of input covered by both up and down ramps
 * @param rangeHighPercent               high end of it
 * @param measured                       the first reversals measured, for marking a plot
 * @param note                           why figures are missing or what limits them
 */
public record DeadBandResult(int reversals, Double deadBandPercent, Double deadBandMaxPercent,
                             Double hysteresisPlusDeadBandPercent, Double hysteresisPercent,
                             Double independentLinearityPercent, Double terminalLinearityPercent,
                             Double rangeLowPercent, Double rangeHighPercent,
                             List<Reversal> measured, String note) {

    /** One measured reversal: when and at what input it happened and the dead band seen. */
    public record Reversal(double time, double input, double deadBandPercent) {
    }
}
