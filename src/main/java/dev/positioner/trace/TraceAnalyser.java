package dev.positioner.trace;

import java.io.Reader;

/**
 * Runs every analyser over one pass of a trace. Each keeps fixed-size state (see their javadoc),
 * so the whole analysis needs the same memory for a thousand samples or two million.
 *
 * <pre>{@code
 * TraceAnalyser analyser = new TraceAnalyser(TraceAnalysisOptions.defaults());
 * PlotDecimator plot = new PlotDecimator();
 * new TraceCsvReader().read(reader, analyser.andThen(plot));
 * TraceAnalysis result = analyser.finish();
 * String svg = TraceSvg.render(plot.finish(), result);
 * }</pre>
 */
public final class TraceAnalyser implements SampleConsumer {

    private final TraceSummary.Accumulator summary = new TraceSummary.Accumulator();
    private final StepResponseAnalyser steps;
    private final DeadBandAnalyser deadBand;
    private final OscillationAnalyser oscillation;
    private final HorchStictionAnalyser stiction;

    public TraceAnalyser(TraceAnalysisOptions options) {
        steps = new StepResponseAnalyser(options);
        deadBand = new DeadBandAnalyser(options);
        oscillation = new OscillationAnalyser(options);
        stiction = new HorchStictionAnalyser(options);
    }

    @Override
    public void accept(Sample s) {
        summary.accept(s);
        steps.accept(s);
        deadBand.accept(s);
        oscillation.accept(s);
        stiction.accept(s);
    }

    /** Call once, after the last sample. */
    public TraceAnalysis finish() {
        return new TraceAnalysis(summary.summary(), steps.finish(), steps.stepCount(),
                deadBand.finish(), oscillation.finish(), stiction.finish());
    }

    /** Reads a CSV trace and analyses it in one pass. */
    public static TraceAnalysis analyseCsv(Reader csv, TraceCsvReader reader,
                                           TraceAnalysisOptions options) {
        TraceAnalyser a = new TraceAnalyser(options);
        reader.read(csv, a);
        return a.finish();
    }
}
