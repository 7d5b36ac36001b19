package dev.positioner.trace;

import java.time.Instant;
import java.util.List;

/** What the trace endpoints return: the id to refer to, the analysis, what it means, and where the picture is. */
public record TraceView(String id, Instant uploaded, String name, TraceAnalysis analysis, List<String> findings,
        String picture) {

    static TraceView of(TraceRecord r) {
        return new TraceView(r.id(), r.uploaded(), r.name(), r.analysis(), TraceFindings.sentences(r.analysis()),
                "/api/v1/traces/" + r.id() + "/picture");
    }
}
