package dev.positioner.trace;

/**
 * A trace thinned for drawing: per series, points in time order.
 *
 * @param input            input signal, %
 * @param position         valve position, %
 * @param controllerOutput controller output, %, or null when not logged
 * @param startTime        first sample time, s
 * @param endTime          last sample time, s
 */
public record PlotData(Series input, Series position, Series controllerOutput, double startTime,
                       double endTime) {

    /** Parallel arrays of times (s) and values (%). */
    public record Series(double[] t, double[] v) {
        public int size() {
            return t.length;
        }
    }
}
