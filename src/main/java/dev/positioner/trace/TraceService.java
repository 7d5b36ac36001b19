package dev.positioner.trace;

import jakarta.enterprise.context.ApplicationScoped;
import java.io.IOException;
import java.io.InputStream;
import java.time.Instant;
import java.util.UUID;

/** Parses an upload while analysing it in the same pass, draws the picture and keeps the result. */
@ApplicationScoped
public class TraceService {

    private final TraceStore store;

    public TraceService(TraceStore store) {
        this.store = store;
    }

    public TraceRecord analyseCsv(InputStream body, String name, SignalUnit signal, SignalUnit position) {
        return analyse(name, (sink) -> new TraceCsvReader(TraceCsvReader.DEFAULT_MAX_BYTES, TraceCsvReader.DEFAULT_MAX_SAMPLES,
                signal, position).read(body, sink));
    }

    public TraceRecord analyseJson(InputStream body, String name, SignalUnit signal, SignalUnit position) {
        return analyse(name, (sink) -> new TraceJsonReader(TraceCsvReader.DEFAULT_MAX_SAMPLES, signal, position).read(body, sink));
    }

    /**
     * Positioner hunting usually cycles in a few seconds, faster than the process loops the
     * library's 10 s default has in mind; with 5 s (from memory) a 3 % peak-to-peak hunt at 4 s is
     * above Hagglund's IAE limit 2a/omega_u with a = 1 %.
     */
    static final double HUNTING_REFERENCE_PERIOD_S = 5;

    private TraceRecord analyse(String name, Parse parse) {
        TraceAnalyser analyser = new TraceAnalyser(TraceAnalysisOptions.defaults().withReferencePeriodSeconds(HUNTING_REFERENCE_PERIOD_S));
        PlotDecimator plot = new PlotDecimator();
        try {
            parse.into(analyser.andThen(plot));
        } catch (IOException e) {
            throw new TraceFormatException(0, null, "cannot read the upload: " + e.getMessage());
        }
        TraceAnalysis analysis = analyser.finish();
        TraceRecord trace = new TraceRecord(UUID.randomUUID().toString(), Instant.now(), name, analysis,
                TraceSvg.render(plot.finish(), analysis));
        store.save(trace);
        return trace;
    }

    public java.util.Optional<TraceRecord> find(String id) {
        return store.find(id);
    }

    @FunctionalInterface
    private interface Parse {
        TraceSummary into(SampleConsumer sink) throws IOException;
    }
}
