package dev.positioner.trace;

/**
 * The checks every trace passes before analysis, whatever format it came in: finite values,
 * strictly increasing time, a sample-count ceiling and floor. The CSV reader uses it with line
 * numbers as rows; a JSON caller uses it with 1-based sample numbers.
 */
public final class SampleGate {

    /**
     * Fewest samples worth analysing. Below this no analysis here can say anything: a step needs
     * a steady baseline, the rise and a settled tail (the detector alone asks for a 10-sample
     * hold), a reversal needs travel both ways, and an oscillation verdict needs several
     * half-periods. Twenty is a floor chosen for this service, not a figure from a standard.
     */
    public static final int MIN_SAMPLES = 20;

    private final long maxSamples;
    private final SampleConsumer downstream;
    private final TraceSummary.Accumulator summary = new TraceSummary.Accumulator();
    private double lastTime = Double.NEGATIVE_INFINITY;
    private long lastRow;

    private final String timeColumn;

    public SampleGate(long maxSamples, SampleConsumer downstream) {
        this(maxSamples, downstream, "time");
    }

    /** {@code timeColumn} names the time field in errors as the caller's input spells it. */
    public SampleGate(long maxSamples, SampleConsumer downstream, String timeColumn) {
        this.timeColumn = timeColumn;
        if (maxSamples < MIN_SAMPLES) {
            throw new IllegalArgumentException("maxSamples must be at least " + MIN_SAMPLES);
        }
        this.maxSamples = maxSamples;
        this.downstream = downstream;
    }

    /** Checks one sample and passes it on; {@code row} is only used in error messages. */
    public void offer(long row, Sample s) {
        finite(row, timeColumn, s.time());
        finite(row, "input", s.input());
        finite(row, "position", s.position());
        if (Double.isInfinite(s.controllerOutput())) {
            finite(row, "controller_output", s.controllerOutput());
        }
        if (Double.isInfinite(s.processValue())) {
            finite(row, "process_value", s.processValue());
        }
        if (s.time() <= lastTime) {
            throw new TraceFormatException(row, timeColumn, "time " + s.time()
                    + " s does not increase (previous row " + lastRow + " has " + lastTime
                    + " s); samples must be in strictly increasing time order");
        }
        if (summary.count() >= maxSamples) {
            throw new TraceFormatException(row, null, "more than " + maxSamples
                    + " samples; split the trace or decimate it before upload");
        }
        lastTime = s.time();
        lastRow = row;
        summary.accept(s);
        downstream.accept(s);
    }

    /** Ends the trace: refuses one too short to analyse and returns what was read. */
    public TraceSummary finish(long lastRowSeen) {
        long n = summary.count();
        if (n < MIN_SAMPLES) {
            throw new TraceFormatException(lastRowSeen, null, "only " + n + " samples; at least "
                    + MIN_SAMPLES + " are needed because a step, a reversal or an oscillation "
                    + "cannot be told from noise in fewer");
        }
        return summary.summary();
    }

    private static void finite(long row, String column, double v) {
        if (!Double.isFinite(v)) {
            throw new TraceFormatException(row, column, "value is " + v
                    + "; NaN and infinite values are not allowed");
        }
    }
}
