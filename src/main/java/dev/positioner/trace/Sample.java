package dev.positioner.trace;

/**
 * One logged instant of a trace. Signals are in percent of span (input and controller output of
 * the signal range, position of rated travel); the process value is in whatever units the log
 * used, because only its shape is ever used (cross-correlation is scale-free).
 *
 * @param time             seconds, strictly increasing within a trace
 * @param input            positioner input signal, % of span
 * @param position         valve position, % of rated travel
 * @param controllerOutput controller output, % of span, or {@code NaN} when not logged
 * @param processValue     process value (flow, level ...), any unit, or {@code NaN} when not logged
 */
public record Sample(double time, double input, double position, double controllerOutput,
                     double processValue) {

    /** A sample with only the two signals every trace must have. */
    public static Sample of(double time, double input, double position) {
        return new Sample(time, input, position, Double.NaN, Double.NaN);
    }

    public boolean hasControllerOutput() {
        return !Double.isNaN(controllerOutput);
    }

    public boolean hasProcessValue() {
        return !Double.isNaN(processValue);
    }
}
