package dev.positioner.trace;

import java.util.List;

/**
 * Everything one pass over a trace found.
 *
 * @param summary     samples, duration and rate
 * @param steps       step responses, at most {@link StepResponseAnalyser#MAX_STORED_STEPS}
 * @param stepCount   steps detected, including any not kept
 * @param deadBand    dead band, hysteresis and linearity from ramps
 * @param oscillation hunting with a steady input
 * @param stiction    Horch's test on controller output and process output
 */
public record TraceAnalysis(TraceSummary summary, List<StepResponse> steps, int stepCount,
                            DeadBandResult deadBand, OscillationResult oscillation,
                            StictionResult stiction) {
}
