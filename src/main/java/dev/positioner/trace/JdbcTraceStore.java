package dev.positioner.trace;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.positioner.storage.Storage;
import jakarta.enterprise.context.ApplicationScoped;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Timestamp;
import java.util.Optional;

/**
 * Keeps analysed traces in the service's database, so a session that refers to a trace still
 * finds it after a restart or through another instance. Replaces the in-memory default bean.
 */
@ApplicationScoped
public class JdbcTraceStore implements TraceStore {

    private final Storage storage;
    private final ObjectMapper json;

    public JdbcTraceStore(Storage storage, ObjectMapper json) {
        this.storage = storage;
        this.json = json;
    }

    @Override
    public void save(TraceRecord trace) {
        String analysis = write(trace.analysis());
        storage.inTransaction(c -> {
            try (PreparedStatement st = c.prepareStatement("INSERT INTO trace (id, uploaded, name, analysis, svg) VALUES (?, ?, ?, ?, ?)")) {
                st.setString(1, trace.id());
                st.setTimestamp(2, Timestamp.from(trace.uploaded()));
                st.setString(3, trace.name());
                st.setString(4, analysis);
                st.setString(5, trace.svg());
                st.executeUpdate();
            }
            return null;
        });
    }

    @Override
    public Optional<TraceRecord> find(String id) {
        return storage.read(c -> {
            try (PreparedStatement st = c.prepareStatement("SELECT uploaded, name, analysis, svg FROM trace WHERE id = ?")) {
                st.setString(1, id);
                try (ResultSet rs = st.executeQuery()) {
                    if (!rs.next()) {
                        return Optional.empty();
                    }
                    return Optional.of(new TraceRecord(id, rs.getTimestamp(1).toInstant(), rs.getString(2),
                            read(rs.getString(3)), rs.getString(4)));
                }
            }
        });
    }

    private String write(TraceAnalysis analysis) {
        try {
            return json.writeValueAsString(analysis);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot store the trace analysis", e);
        }
    }

    private TraceAnalysis read(String text) {
        try {
            return json.readValue(text, TraceAnalysis.class);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("stored trace analysis cannot be read", e);
        }
    }
}
