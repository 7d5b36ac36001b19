package dev.positioner.trace;

import io.quarkus.arc.DefaultBean;
import jakarta.enterprise.context.ApplicationScoped;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

/**
 * Keeps the most recent analyses in memory, bounded so a busy site cannot exhaust the heap.
 * Used when no database-backed store is installed; analyses do not survive a restart here.
 */
@ApplicationScoped
@DefaultBean
public class InMemoryTraceStore implements TraceStore {

    static final int CAPACITY = 500;

    private final Map<String, TraceRecord> traces = new LinkedHashMap<>(16, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<String, TraceRecord> eldest) {
            return size() > CAPACITY;
        }
    };

    @Override
    public synchronized void save(TraceRecord trace) {
        traces.put(trace.id(), trace);
    }

    @Override
    public synchronized Optional<TraceRecord> find(String id) {
        return Optional.ofNullable(traces.get(id));
    }
}
