package dev.positioner.trace;

import java.util.Optional;

/** Where analysed traces are kept, so sessions and diagnoses can refer to them by id. */
public interface TraceStore {

    void save(TraceRecord trace);

    Optional<TraceRecord> find(String id);
}
