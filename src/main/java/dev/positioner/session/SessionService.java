package dev.positioner.session;

import com.fasterxml.jackson.databind.ObjectMapper;
import dev.positioner.api.FieldError;
import dev.positioner.api.InvalidRequestException;
import dev.positioner.asset.AssetRecord;
import dev.positioner.asset.AssetRegistry;
import dev.positioner.diagnosis.DiagnosisRequest;
import dev.positioner.diagnosis.DiagnosisRequest.AssetInput;
import dev.positioner.diagnosis.DiagnosisResponse;
import dev.positioner.diagnosis.DiagnosisService;
import dev.positioner.session.SessionRequests.Add;
import dev.positioner.session.SessionRequests.Close;
import dev.positioner.session.SessionRequests.Open;
import dev.positioner.session.SessionRequests.Reopen;
import dev.positioner.storage.ProblemException;
import dev.positioner.storage.Storage;
import jakarta.enterprise.context.ApplicationScoped;
import java.sql.Connection;
import java.sql.SQLException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;

/**
 * Writes to sessions. Each write is one transaction that locks the session row, so appends from
 * several instances are ordered and sequence numbers never collide; the diagnosis is recomputed
 * inside it, which is also how an addition is validated before it is stored.
 */
@ApplicationScoped
public class SessionService {

    /** What a write produced; {@code replayed} when an idempotency key matched an earlier request. */
    public record Outcome(SessionView view, boolean replayed) {
    }

    private final Storage storage;
    private final SessionRepository repo;
    private final AssetRegistry assets;
    private final DiagnosisService diagnosis;
    private final Closures closures;
    private final ObjectMapper json;

    SessionService(Storage storage, SessionRepository repo, AssetRegistry assets, DiagnosisService diagnosis,
            Closures closures, ObjectMapper json) {
        this.storage = storage;
        this.repo = repo;
        this.assets = assets;
        this.diagnosis = diagnosis;
        this.closures = closures;
        this.json = json;
    }

    public Outcome open(Open body, String header) {
        if (body == null) {
            throw new InvalidRequestException("$", "a JSON body is required");
        }
        String key = Idempotency.key(header, body.clientRequestId(), "clientRequestId");
        Open request = new Open(body.tag(), body.workOrder(), body.author(), body.symptoms(), body.absentSymptoms(),
                body.measurements(), body.checks(), body.unavailableChecks(), null);
        String hash = Idempotency.hash(json, request);
        List<FieldError> errors = new ArrayList<>();
        Text.required(errors, "tag", body.tag(), 64);
        Text.required(errors, "author", body.author(), 100);
        Text.optional(errors, "workOrder", body.workOrder(), 100);
        if (!errors.isEmpty()) {
            throw new InvalidRequestException(errors);
        }
        // Two instances may race on one key: the loser's insert hits the unique key, and its second
        // attempt finds the winner's session and answers with it.
        for (int attempt = 1; ; attempt++) {
            try {
                return storage.inTransaction(c -> openIn(c, request, key, hash));
            } catch (RuntimeException e) {
                if (key == null || attempt >= 3 || !Storage.isUniqueViolation(e)) {
                    throw e;
                }
            }
        }
    }

    private Outcome openIn(Connection c, Open r, String key, String hash) throws SQLException {
        if (key != null) {
            Optional<SessionRow> earlier = repo.sessionByOpenKey(c, key);
            if (earlier.isPresent()) {
                Idempotency.requireSame(earlier.get().openHash(), hash, key);
                return new Outcome(view(c, earlier.get(), earlier.get().openSeq(), true), true);
            }
        }
        if (assets.find(c, r.tag()).isEmpty()) {
            throw ProblemException.notFound("valve tag", r.tag());
        }
        // Validates everything the opening carries, with the request's own field names.
        DiagnosisResponse first = diagnosis.diagnose(new DiagnosisRequest(r.symptoms(), r.absentSymptoms(), r.measurements(),
                r.checks(), r.unavailableChecks(), new AssetInput(r.tag(), null, null, null)));
        Instant now = now();
        List<SessionEvent> events = new ArrayList<>();
        events.add(new SessionEvent(1, EventType.OPENED, r.author(), now, EventData.opened(r.workOrder()), null));
        each(r.symptoms(), s -> events.add(event(events, EventType.SYMPTOM, r.author(), now, EventData.symptom(s, true))));
        each(r.absentSymptoms(), s -> events.add(event(events, EventType.SYMPTOM, r.author(), now, EventData.symptom(s, false))));
        each(r.measurements(), m -> events.add(event(events, EventType.READING, r.author(), now,
                EventData.reading(m.quantity(), m.value(), m.unit()))));
        each(r.checks(), k -> events.add(event(events, EventType.CHECK, r.author(), now, EventData.check(k.check(), k.outcome()))));
        each(r.unavailableChecks(), k -> events.add(event(events, EventType.UNAVAILABLE, r.author(), now, EventData.unavailable(k))));
        int last = events.size();
        SessionRow row = new SessionRow(UUID.randomUUID().toString(), r.tag(), r.workOrder(), r.author(), now,
                SessionRow.OPEN, last, hash, last);
        repo.insertSession(c, row, key);
        for (SessionEvent e : events) {
            repo.insertEvent(c, row.id(), e, null, null);
        }
        return new Outcome(new SessionView(row.id(), row.tag(), row.workOrder(), row.status(), row.openedBy(), row.openedAt(),
                last, null, events, first, null), false);
    }

    /** Adds one event of the given type (symptom, reading, check, unavailable, trace, note, retraction). */
    public Outcome add(String sessionId, EventType type, Add body, String header) {
        if (body == null) {
            throw new InvalidRequestException("$", "a JSON body is required");
        }
        String key = Idempotency.key(header, body.clientEventId(), "clientEventId");
        EventData data = EventChecks.data(type, body);
        String hash = Idempotency.hash(json, List.of(type.code(), data, body.author()));
        return onLockedSession(sessionId, key, hash, (c, s) -> {
            if (s.closed()) {
                throw ProblemException.conflict("session " + s.id() + " is closed; reopen it before adding to it");
            }
            List<SessionEvent> events = repo.events(c, s.id(), s.lastSeq());
            SessionEvent e = new SessionEvent(s.lastSeq() + 1, type, body.author(), now(), data, null);
            if (type == EventType.RETRACTION) {
                EventChecks.retraction(events, data.retracts());
            }
            List<SessionEvent> after = new ArrayList<>(events);
            after.add(e);
            DiagnosisResponse d = diagnose(s.tag(), after, e);
            repo.insertEvent(c, s.id(), e, key, hash);
            repo.updateSession(c, s.id(), s.status(), e.seq());
            return new Outcome(new SessionView(s.id(), s.tag(), s.workOrder(), s.status(), s.openedBy(), s.openedAt(),
                    e.seq(), e, null, d, null), false);
        });
    }

    public Outcome close(String sessionId, Close body, String header) {
        if (body == null) {
            throw new InvalidRequestException("$", "a JSON body is required");
        }
        String key = Idempotency.key(header, body.clientEventId(), "clientEventId");
        closures.check(body);
        EventData data = EventData.closed(body.confirmedFault(), body.action().strip(),
                body.parts() == null ? List.of() : body.parts().stream().map(String::strip).toList(), body.minutes(), body.remarks());
        String hash = Idempotency.hash(json, List.of("closed", data, body.author()));
        return onLockedSession(sessionId, key, hash, (c, s) -> {
            if (s.closed()) {
                throw ProblemException.conflict("session " + s.id() + " is already closed");
            }
            SessionEvent e = new SessionEvent(s.lastSeq() + 1, EventType.CLOSED, body.author(), now(), data, null);
            String site = assets.find(c, s.tag()).map(AssetRecord::site).orElse(null);
            repo.insertEvent(c, s.id(), e, key, hash);
            repo.insertClosure(c, closures.record(s, e, site));
            repo.insertClosureSymptoms(c, s.id(), e.seq(), SessionState.of(repo.events(c, s.id(), s.lastSeq())).symptoms());
            repo.updateSession(c, s.id(), SessionRow.CLOSED, e.seq());
            return new Outcome(view(c, s, e.seq(), false), false);
        });
    }

    public Outcome reopen(String sessionId, Reopen body, String header) {
        if (body == null) {
            throw new InvalidRequestException("$", "a JSON body is required");
        }
        String key = Idempotency.key(header, body.clientEventId(), "clientEventId");
        List<FieldError> errors = new ArrayList<>();
        Text.required(errors, "reason", body.reason(), 2000);
        Text.required(errors, "author", body.author(), 100);
        if (!errors.isEmpty()) {
            throw new InvalidRequestException(errors);
        }
        EventData data = EventData.reopened(body.reason().strip());
        String hash = Idempotency.hash(json, List.of("reopened", data, body.author()));
        return onLockedSession(sessionId, key, hash, (c, s) -> {
            if (!s.closed()) {
                throw ProblemException.conflict("session " + s.id() + " is open; only a closed session can be reopened");
            }
            SessionEvent e = new SessionEvent(s.lastSeq() + 1, EventType.REOPENED, body.author(), now(), data, null);
            repo.insertEvent(c, s.id(), e, key, hash);
            repo.markReopened(c, s.id(), e.recordedAt());
            repo.updateSession(c, s.id(), SessionRow.OPEN, e.seq());
            return new Outcome(view(c, new SessionRow(s.id(), s.tag(), s.workOrder(), s.openedBy(), s.openedAt(),
                    SessionRow.OPEN, e.seq(), s.openHash(), s.openSeq()), e.seq(), false), false);
        });
    }

    /** The session as it stood right after event {@code upToSeq}; a replay rebuilds exactly that. */
    SessionView view(Connection c, SessionRow s, int upToSeq, boolean allEvents) throws SQLException {
        List<SessionEvent> events = repo.events(c, s.id(), upToSeq);
        Map<Integer, Integer> retracted = SessionState.retractions(events);
        List<SessionEvent> shown = events.stream().map(e -> e.withRetractedBy(retracted.get(e.seq()))).toList();
        SessionEvent last = shown.get(shown.size() - 1);
        boolean closed = last.type() == EventType.CLOSED;
        ClosureRecord closure = !closed ? null : repo.closures(c, s.id(), null, null, Integer.MAX_VALUE).stream()
                .filter(k -> k.seq() == last.seq()).findFirst().map(closures::titled).orElse(null);
        String status = upToSeq == s.lastSeq() ? s.status() : (closed ? SessionRow.CLOSED : SessionRow.OPEN);
        return new SessionView(s.id(), s.tag(), s.workOrder(), status, s.openedBy(), s.openedAt(), upToSeq,
                allEvents ? null : last, allEvents ? shown : null, diagnose(s.tag(), events, null), closure);
    }

    /**
     * Locks the session row (which orders appends from several instances) and, if this request's
     * Idempotency-Key was seen before, answers as the first time; otherwise runs {@code step}.
     */
    private Outcome onLockedSession(String sessionId, String key, String hash, Step step) {
        return storage.inTransaction(c -> {
            SessionRow s = locked(c, sessionId);
            Optional<Outcome> replay = replay(c, s, key, hash);
            return replay.isPresent() ? replay.get() : step.run(c, s);
        });
    }

    @FunctionalInterface
    private interface Step {
        Outcome run(Connection c, SessionRow s) throws SQLException;
    }

    private Optional<Outcome> replay(Connection c, SessionRow s, String key, String hash) throws SQLException {
        if (key == null) {
            return Optional.empty();
        }
        Optional<SessionRepository.Keyed> earlier = repo.eventByKey(c, s.id(), key);
        if (earlier.isEmpty()) {
            return Optional.empty();
        }
        Idempotency.requireSame(earlier.get().hash(), hash, key);
        return Optional.of(new Outcome(view(c, s, earlier.get().event().seq(), false), true));
    }

    private SessionRow locked(Connection c, String id) throws SQLException {
        return repo.session(c, id, true).orElseThrow(() -> ProblemException.notFound("session", id));
    }

    DiagnosisResponse diagnose(String tag, List<SessionEvent> events, SessionEvent added) {
        SessionState state = SessionState.of(events);
        try {
            return diagnosis.diagnose(state.request(tag, added));
        } catch (InvalidRequestException e) {
            throw EventChecks.toRequestFields(e, added);
        }
    }

    private static SessionEvent event(List<SessionEvent> events, EventType type, String author, Instant at, EventData data) {
        return new SessionEvent(events.size() + 1, type, author, at, data, null);
    }

    private static <T> void each(List<T> items, java.util.function.Consumer<T> action) {
        if (items != null) {
            items.forEach(action);
        }
    }

    /** Milliseconds are all a technician needs, and what every database stores without rounding. */
    static Instant now() {
        return Instant.now().truncatedTo(ChronoUnit.MILLIS);
    }
}
