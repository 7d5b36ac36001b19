package dev.positioner.session;

import dev.positioner.api.InvalidRequestException;
import dev.positioner.asset.AssetRegistry;
import dev.positioner.storage.ProblemException;
import dev.positioner.storage.Storage;
import jakarta.enterprise.context.ApplicationScoped;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Reads: one session, lists of sessions and closures, and history per valve and per fault. */
@ApplicationScoped
public class SessionQueries {

    public record FaultCount(String fault, String title, int count, Instant lastConfirmedAt) {
    }

    public record AssetHistory(String tag, List<FaultCount> confirmedFaults, List<SessionView.Summary> sessions) {
    }

    public record FaultHistory(String fault, String title, int count, List<ClosureRecord> closures) {
    }

    private final Storage storage;
    private final SessionRepository repo;
    private final SessionService service;
    private final AssetRegistry assets;
    private final Closures closures;

    SessionQueries(Storage storage, SessionRepository repo, SessionService service, AssetRegistry assets, Closures closures) {
        this.storage = storage;
        this.repo = repo;
        this.service = service;
        this.assets = assets;
        this.closures = closures;
    }

    public SessionView get(String id) {
        return storage.read(c -> {
            SessionRow s = repo.session(c, id, false).orElseThrow(() -> ProblemException.notFound("session", id));
            return service.view(c, s, s.lastSeq(), true);
        });
    }

    public List<SessionView.Summary> search(String tag, String fault, String status, int limit) {
        if (status != null && !status.equals(SessionRow.OPEN) && !status.equals(SessionRow.CLOSED)) {
            throw new InvalidRequestException("status", "must be 'open' or 'closed'");
        }
        return storage.read(c -> {
            List<SessionView.Summary> out = new ArrayList<>();
            for (SessionRow s : repo.search(c, tag, fault, status, limit)) {
                String confirmed = s.closed() ? repo.closures(c, s.id(), null, null, 1).stream()
                        .map(ClosureRecord::confirmedFault).findFirst().orElse(null) : null;
                out.add(new SessionView.Summary(s.id(), s.tag(), s.workOrder(), s.status(), s.openedBy(), s.openedAt(),
                        s.lastSeq(), confirmed));
            }
            return out;
        });
    }

    public List<ClosureRecord> closures(String tag, String fault, int limit) {
        return storage.read(c -> repo.closures(c, null, tag, fault, limit)).stream().map(closures::titled).toList();
    }

    /** Past jobs on a valve, and how often each fault was confirmed on it (reopened closures left out). */
    public AssetHistory assetHistory(String tag, int limit) {
        if (assets.find(tag).isEmpty()) {
            throw ProblemException.notFound("valve tag", tag);
        }
        Map<String, FaultCount> counts = new LinkedHashMap<>();
        for (ClosureRecord k : closures(tag, null, Integer.MAX_VALUE)) {
            if (k.reopenedAt() == null) {
                FaultCount was = counts.get(k.confirmedFault());
                counts.put(k.confirmedFault(), new FaultCount(k.confirmedFault(), k.faultTitle(),
                        was == null ? 1 : was.count() + 1, was == null ? k.closedAt() : was.lastConfirmedAt()));
            }
        }
        List<FaultCount> sorted = new ArrayList<>(counts.values());
        sorted.sort((a, b) -> Integer.compare(b.count(), a.count()));
        return new AssetHistory(tag, sorted, search(tag, null, null, limit));
    }

    public FaultHistory faultHistory(String fault, int limit) {
        if (!Closures.NOT_FOUND.equals(fault) && closures.title(fault) == null) {
            throw ProblemException.notFound("fault", fault);
        }
        List<ClosureRecord> all = closures(null, fault, Integer.MAX_VALUE);
        int standing = (int) all.stream().filter(k -> k.reopenedAt() == null).count();
        return new FaultHistory(fault, closures.title(fault), standing, all.subList(0, Math.min(limit, all.size())));
    }
}
