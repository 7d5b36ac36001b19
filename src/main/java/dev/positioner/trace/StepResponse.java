package dev.positioner.trace;

/**
 * Response of the valve position to one input step, in the terms of ISA-75.25.01 (control valve
 * response measurement from step inputs). Times are seconds from step initiation, the first
 * sample showing the new input; a {@code null} time means the trace did not show it (see note).
 *
 * @param index               1-based order of the step in the trace
 * @param startTime           trace time of step initiation, s
 * @param inputBefore         steady input before the step, %
 * @param inputAfter          steady input after the step, %
 * @param positionBefore      mean position over the steady stretch before the step, %
 * @param positionAfter       final position: mean of the last fifth of the recorded response, %
 * @param deadTimeSeconds     time until the position has moved observably (the larger of
 *                            {@code deadTimeFraction} of its change and 3 sigma of pre-step noise)
 * @param t63Seconds          time to reach 63.2 % (1 - 1/e) of the position change
 * @param t86Seconds          time to reach 86.5 % (1 - 1/e^2) of the position change
 * @param overshootPercent    peak excursion beyond the final position, % of the position change
 * @param settlingTimeSeconds time after which the position stays within the settling band
 * @param settlingBandPercent half-width of that band, % of span (the larger of
 *                            {@code settlingBandFraction} of the change and 3 sigma of noise)
 * @param recordedSeconds     length of response seen before the input moved again
 * @param note                why a figure is missing or doubtful, else {@code null}
 */
public record StepResponse(int index, double startTime, double inputBefore, double inputAfter,
                           double positionBefore, double positionAfter, Double deadTimeSeconds,
                           Double t63Seconds, Double t86Seconds, Double overshootPercent,
                           Double settlingTimeSeconds, double settlingBandPercent,
                           double recordedSeconds, String note) {

    public double inputStepPercent() {
        return inputAfter - inputBefore;
    }
}
