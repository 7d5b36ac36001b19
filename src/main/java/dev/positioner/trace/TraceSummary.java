package dev.positioner.trace;

/**
 * What was logged: how many samples over how long and how fast.
 *
 * @param sampleCount          number of samples
 * @param startTime            time of the first sample, s (0 for ISO-8601 traces, which are
 *                             counted from their first row)
 * @param durationSeconds      last minus first sample time, s
 * @param sampleRateHz         mean rate, (count - 1) / duration
 * @param minIntervalSeconds   shortest gap between samples, s
 * @param maxIntervalSeconds   longest gap, s (a long gap in a historian export is worth seeing)
 * @param hasControllerOutput  whether every sample carried a controller output
 * @param hasProcessValue      whether every sample carried a process value
 */
public record TraceSummary(long sampleCount, double startTime, double durationSeconds,
                           double sampleRateHz, double minIntervalSeconds,
                           double maxIntervalSeconds, boolean hasControllerOutput,
                           boolean hasProcessValue) {

    /** Builds a summary in O(1) memory while the samples stream past. */
    public static final class Accumulator implements SampleConsumer {
        private long count;
        private double first;
        private double last;
        private double minDt = Double.POSITIVE_INFINITY;
        private double maxDt;
        private boolean allCo = true;
        private boolean allPv = true;

        @Override
        public void accept(Sample s) {
            if (count == 0) {
                first = s.time();
            } else {
                double dt = s.time() - last;
                minDt = Math.min(minDt, dt);
                maxDt = Math.max(maxDt, dt);
            }
            last = s.time();
            allCo &= s.hasControllerOutput();
            allPv &= s.hasProcessValue();
            count++;
        }

        public long count() {
            return count;
        }

        public TraceSummary summary() {
            double duration = count > 0 ? last - first : 0;
            double rate = duration > 0 ? (count - 1) / duration : 0;
            return new TraceSummary(count, count > 0 ? first : 0, duration, rate,
                    count > 1 ? minDt : 0, maxDt, count > 0 && allCo, count > 0 && allPv);
        }
    }
}
