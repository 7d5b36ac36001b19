package dev.positioner.session;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import jakarta.enterprise.context.ApplicationScoped;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** SQL for sessions, their events and closures. Every method runs on the caller's connection. */
@ApplicationScoped
class SessionRepository {

    private static final String SESSION_COLUMNS = "id, tag, work_order, opened_by, opened_at, status, last_seq, open_hash, open_seq";
    private static final String EVENT_COLUMNS = "seq, type, author, recorded_at, body";
    private static final String CLOSURE_COLUMNS = "session_id, seq, tag, site, work_order, fault, failure_mode, mechanism,"
            + " cause, action, parts, minutes, remarks, closed_by, closed_at, reopened_at";

    private final ObjectMapper json;

    SessionRepository(ObjectMapper json) {
        this.json = json;
    }

    void insertSession(Connection c, SessionRow s, String openKey) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO work_session (" + SESSION_COLUMNS
                + ", open_key) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
            ps.setString(1, s.id());
            ps.setString(2, s.tag());
            ps.setString(3, s.workOrder());
            ps.setString(4, s.openedBy());
            ps.setTimestamp(5, Timestamp.from(s.openedAt()));
            ps.setString(6, s.status());
            ps.setInt(7, s.lastSeq());
            ps.setString(8, s.openHash());
            ps.setInt(9, s.openSeq());
            ps.setString(10, openKey);
            ps.executeUpdate();
        }
    }

    /** With {@code lock}, holds the row until commit so appends to one session happen one at a time. */
    Optional<SessionRow> session(Connection c, String id, boolean lock) throws SQLException {
        return sessions(c, "SELECT " + SESSION_COLUMNS + " FROM work_session WHERE id = ?" + (lock ? " FOR UPDATE" : ""), id)
                .stream().findFirst();
    }

    Optional<SessionRow> sessionByOpenKey(Connection c, String key) throws SQLException {
        return sessions(c, "SELECT " + SESSION_COLUMNS + " FROM work_session WHERE open_key = ?", key).stream().findFirst();
    }

    /** Newest first; {@code fault} keeps sessions whose standing closure confirmed that fault. */
    List<SessionRow> search(Connection c, String tag, String fault, String status, int limit) throws SQLException {
        String sql = "SELECT " + prefixed("s.", SESSION_COLUMNS) + " FROM work_session s"
                + " WHERE (? IS NULL OR s.tag = ?) AND (? IS NULL OR s.status = ?)"
                + " AND (? IS NULL OR EXISTS (SELECT 1 FROM closure k WHERE k.session_id = s.id AND k.fault = ?"
                + " AND k.reopened_at IS NULL)) ORDER BY s.opened_at DESC, s.id LIMIT ?";
        try (PreparedStatement ps = c.prepareStatement(sql)) {
            ps.setString(1, tag);
            ps.setString(2, tag);
            ps.setString(3, status);
            ps.setString(4, status);
            ps.setString(5, fault);
            ps.setString(6, fault);
            ps.setInt(7, limit);
            return sessions(ps);
        }
    }

    void updateSession(Connection c, String id, String status, int lastSeq) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("UPDATE work_session SET status = ?, last_seq = ? WHERE id = ?")) {
            ps.setString(1, status);
            ps.setInt(2, lastSeq);
            ps.setString(3, id);
            ps.executeUpdate();
        }
    }

    void insertEvent(Connection c, String sessionId, SessionEvent e, String key, String hash) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO session_event (session_id, " + EVENT_COLUMNS
                + ", idempotency_key, request_hash) VALUES (?, ?, ?, ?, ?, ?, ?, ?)")) {
            ps.setString(1, sessionId);
            ps.setInt(2, e.seq());
            ps.setString(3, e.type().code());
            ps.setString(4, e.author());
            ps.setTimestamp(5, Timestamp.from(e.recordedAt()));
            ps.setString(6, write(e.data()));
            ps.setString(7, key);
            ps.setString(8, hash);
            ps.executeUpdate();
        }
    }

    /** Events up to and including {@code upToSeq}, oldest first. */
    List<SessionEvent> events(Connection c, String sessionId, int upToSeq) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT " + EVENT_COLUMNS
                + " FROM session_event WHERE session_id = ? AND seq <= ? ORDER BY seq")) {
            ps.setString(1, sessionId);
            ps.setInt(2, upToSeq);
            List<SessionEvent> out = new ArrayList<>();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(event(rs));
                }
            }
            return out;
        }
    }

    /** The event stored under an idempotency key, with the hash of the request that made it. */
    Optional<Keyed> eventByKey(Connection c, String sessionId, String key) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT " + EVENT_COLUMNS
                + ", request_hash FROM session_event WHERE session_id = ? AND idempotency_key = ?")) {
            ps.setString(1, sessionId);
            ps.setString(2, key);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next() ? Optional.of(new Keyed(event(rs), rs.getString(6))) : Optional.empty();
            }
        }
    }

    record Keyed(SessionEvent event, String hash) {
    }

    /** The symptoms the job reported when it was closed (see V3__closure_symptoms.sql). */
    void insertClosureSymptoms(Connection c, String sessionId, int seq, Map<String, Boolean> symptoms) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO closure_symptom (session_id, seq, symptom, present) VALUES (?, ?, ?, ?)")) {
            for (Map.Entry<String, Boolean> s : symptoms.entrySet()) {
                ps.setString(1, sessionId);
                ps.setInt(2, seq);
                ps.setString(3, s.getKey());
                ps.setBoolean(4, s.getValue());
                ps.addBatch();
            }
            ps.executeBatch();
        }
    }

    void insertClosure(Connection c, ClosureRecord k) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO closure (" + CLOSURE_COLUMNS
                + ") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
            ps.setString(1, k.sessionId());
            ps.setInt(2, k.seq());
            ps.setString(3, k.tag());
            ps.setString(4, k.site());
            ps.setString(5, k.workOrder());
            ps.setString(6, k.confirmedFault());
            ps.setString(7, k.failureMode());
            ps.setString(8, k.failureMechanism());
            ps.setString(9, k.failureCause());
            ps.setString(10, k.action());
            ps.setString(11, write(k.parts()));
            ps.setDouble(12, k.minutes());
            ps.setString(13, k.remarks());
            ps.setString(14, k.closedBy());
            ps.setTimestamp(15, Timestamp.from(k.closedAt()));
            ps.setTimestamp(16, k.reopenedAt() == null ? null : Timestamp.from(k.reopenedAt()));
            ps.executeUpdate();
        }
    }

    void markReopened(Connection c, String sessionId, Instant at) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("UPDATE closure SET reopened_at = ? WHERE session_id = ? AND reopened_at IS NULL")) {
            ps.setTimestamp(1, Timestamp.from(at));
            ps.setString(2, sessionId);
            ps.executeUpdate();
        }
    }

    /** Closures, newest first; the title is filled in by the caller from the catalogue. */
    List<ClosureRecord> closures(Connection c, String sessionId, String tag, String fault, int limit) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT " + CLOSURE_COLUMNS + " FROM closure"
                + " WHERE (? IS NULL OR session_id = ?) AND (? IS NULL OR tag = ?) AND (? IS NULL OR fault = ?)"
                + " ORDER BY closed_at DESC, session_id, seq DESC LIMIT ?")) {
            ps.setString(1, sessionId);
            ps.setString(2, sessionId);
            ps.setString(3, tag);
            ps.setString(4, tag);
            ps.setString(5, fault);
            ps.setString(6, fault);
            ps.setInt(7, limit);
            List<ClosureRecord> out = new ArrayList<>();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    Timestamp reopened = rs.getTimestamp(16);
                    out.add(new ClosureRecord(rs.getString(1), rs.getInt(2), rs.getString(3), rs.getString(4), rs.getString(5),
                            rs.getString(6), null, rs.getString(7), rs.getString(8), rs.getString(9), rs.getString(10),
                            read(rs.getString(11), new TypeReference<List<String>>() { }), rs.getDouble(12), rs.getString(13),
                            rs.getString(14), rs.getTimestamp(15).toInstant(), reopened == null ? null : reopened.toInstant()));
                }
            }
            return out;
        }
    }

    private List<SessionRow> sessions(Connection c, String sql, String param) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(sql)) {
            ps.setString(1, param);
            return sessions(ps);
        }
    }

    private static List<SessionRow> sessions(PreparedStatement ps) throws SQLException {
        List<SessionRow> out = new ArrayList<>();
        try (ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(new SessionRow(rs.getString(1), rs.getString(2), rs.getString(3), rs.getString(4),
                        rs.getTimestamp(5).toInstant(), rs.getString(6), rs.getInt(7), rs.getString(8), rs.getInt(9)));
            }
        }
        return out;
    }

    private SessionEvent event(ResultSet rs) throws SQLException {
        return new SessionEvent(rs.getInt(1), EventType.of(rs.getString(2)), rs.getString(3), rs.getTimestamp(4).toInstant(),
                read(rs.getString(5), new TypeReference<EventData>() { }), null);
    }

    private static String prefixed(String prefix, String columns) {
        return prefix + columns.replace(", ", ", " + prefix);
    }

    private String write(Object value) {
        try {
            return json.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write JSON", e);
        }
    }

    private <T> T read(String text, TypeReference<T> type) {
        try {
            return json.readValue(text, type);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("stored JSON cannot be read: " + text, e);
        }
    }
}
