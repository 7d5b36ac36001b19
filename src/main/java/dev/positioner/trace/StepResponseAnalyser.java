package dev.positioner.trace;

import java.util.ArrayList;
import java.util.List;

/**
 * Finds input steps in a stream and measures the position's response to each
 * (ISA-75.25.01 terms; see {@link StepResponse}).
 *
 * <p>A step is an input change of at least {@code stepThresholdPercent} that completes within
 * {@code stepMaxRiseSamples} samples and is followed by {@code stepMinHoldSamples} samples
 * steady to within 5 % of the step (or 0.1 %, if larger); anything slower is a ramp and left to
 * the dead-band analysis. Memory is bounded: one response buffer of
 * {@code stepMaxResponseSamples} samples (a longer hold is measured on its first part), a
 * 16-sample baseline ring, and at most {@link #MAX_STORED_STEPS} results (later steps are
 * counted, not kept).
 */
public final class StepResponseAnalyser implements SampleConsumer {

    public static final int MAX_STORED_STEPS = 200;
    private static final int BASELINE = 16;

    private enum Mode { IDLE, CANDIDATE, RECORDING }

    private final TraceAnalysisOptions o;
    private final double[] ringY = new double[BASELINE];
    private int ringPos;
    private int steadyCount;
    private double level;
    private boolean started;
    private Mode mode = Mode.IDLE;
    private final double[] bt;
    private final double[] bu;
    private final double[] by;
    private int bn;
    private double candLevel;
    private double candY0;
    private double candSigma0;
    private double stepTo;
    private int stepCount;
    private final List<StepResponse> steps = new ArrayList<>();

    public StepResponseAnalyser(TraceAnalysisOptions options) {
        this.o = options;
        int cap = Math.max(options.stepMaxResponseSamples(),
                options.stepMinHoldSamples() + options.stepMaxRiseSamples());
        bt = new double[cap];
        bu = new double[cap];
        by = new double[cap];
    }

    @Override
    public void accept(Sample s) {
        double u = s.input();
        if (!started) {
            started = true;
            level = u;
            push(s.position());
            return;
        }
        double departBand = 0.5 * o.stepThresholdPercent();
        if (mode == Mode.CANDIDATE) {
            record(s);
            confirmOrReject(u);
        } else if (Math.abs(u - level) > departBand) {
            if (mode == Mode.RECORDING) {
                finishStep();
            }
            startCandidate(s);
        } else {
            if (mode == Mode.RECORDING) {
                record(s);
                if (bn == bt.length) {
                    finishStep();
                }
            }
            // a slow mean keeps the reference level out of the input noise
            level += (u - level) / BASELINE;
        }
        push(s.position());
    }

    /** Closes any step still being recorded; call once after the last sample. */
    public List<StepResponse> finish() {
        if (mode == Mode.RECORDING) {
            finishStep();
        }
        mode = Mode.IDLE;
        return List.copyOf(steps);
    }

    /** Steps detected, including those beyond {@link #MAX_STORED_STEPS}. */
    public int stepCount() {
        return stepCount;
    }

    private void startCandidate(Sample s) {
        candLevel = level;
        int k = Math.max(1, Math.min(steadyCount, BASELINE));
        double sum = 0;
        double sq = 0;
        for (int j = 1; j <= k; j++) {
            double v = ringY[(ringPos - j + BASELINE) % BASELINE];
            sum += v;
            sq += v * v;
        }
        candY0 = sum / k;
        // fewer than 4 baseline samples give no useful noise estimate
        candSigma0 = k >= 4 ? Math.sqrt(Math.max(0, sq / k - candY0 * candY0)) : 0;
        bn = 0;
        record(s);
        mode = Mode.CANDIDATE;
        steadyCount = 0;
    }

    private void confirmOrReject(double u) {
        int hold = o.stepMinHoldSamples();
        int lastStart = o.stepMaxRiseSamples() - 1;
        if (bn < hold) {
            return;
        }
        int f = bn - hold;
        if (f > lastStart) {
            mode = Mode.IDLE;        // a ramp or a wander, not a step
            level = u;
            steadyCount = 0;
            return;
        }
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        double sum = 0;
        for (int i = f; i < bn; i++) {
            min = Math.min(min, bu[i]);
            max = Math.max(max, bu[i]);
            sum += bu[i];
        }
        double mean = sum / hold;
        double step = Math.abs(mean - candLevel);
        double holdBand = Math.max(0.1, 0.05 * step);
        if (step >= o.stepThresholdPercent() && max - min <= 2 * holdBand) {
            mode = Mode.RECORDING;
            stepTo = mean;
            level = mean;
            steadyCount = 0;
        }
    }

    private void finishStep() {
        stepCount++;
        if (steps.size() < MAX_STORED_STEPS) {
            steps.add(StepMetrics.measure(stepCount, bt, by, bn, candLevel, stepTo, candY0,
                    candSigma0, o));
        }
        mode = Mode.IDLE;
    }

    private void record(Sample s) {
        if (bn < bt.length) {
            bt[bn] = s.time();
            bu[bn] = s.input();
            by[bn] = s.position();
            bn++;
        }
    }

    private void push(double y) {
        ringY[ringPos] = y;
        ringPos = (ringPos + 1) % BASELINE;
        if (mode != Mode.CANDIDATE) {
            steadyCount++;
        }
    }
}
