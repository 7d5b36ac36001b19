package dev.positioner.session;

import dev.positioner.diagnosis.DiagnosisRequest;
import dev.positioner.diagnosis.DiagnosisRequest.AssetInput;
import dev.positioner.diagnosis.DiagnosisRequest.CheckInput;
import dev.positioner.diagnosis.DiagnosisRequest.MeasurementInput;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * What a session knows now: the events folded in order, retracted ones skipped. A later answer to
 * the same question (the same symptom, quantity or check) replaces the earlier one, as a technician
 * re-reading a gauge expects; the earlier event stays in the history.
 */
final class SessionState {

    private final Map<String, Boolean> symptoms = new LinkedHashMap<>();
    private final Map<String, MeasurementInput> readings = new LinkedHashMap<>();
    private final Map<String, String> checks = new LinkedHashMap<>();
    private final Set<String> unavailable = new LinkedHashSet<>();
    private final Set<String> traces = new LinkedHashSet<>();

    /** Which event retracted which: a retraction counts only while it is not itself retracted. */
    static Map<Integer, Integer> retractions(List<SessionEvent> events) {
        Map<Integer, Integer> retractedBy = new HashMap<>();
        for (int i = events.size() - 1; i >= 0; i--) {
            SessionEvent e = events.get(i);
            if (e.type() == EventType.RETRACTION && !retractedBy.containsKey(e.seq())) {
                retractedBy.putIfAbsent(e.data().retracts(), e.seq());
            }
        }
        return retractedBy;
    }

    static SessionState of(List<SessionEvent> events) {
        Map<Integer, Integer> retracted = retractions(events);
        SessionState s = new SessionState();
        events.stream().filter(e -> !retracted.containsKey(e.seq())).forEach(s::apply);
        return s;
    }

    /** Each symptom reported and not retracted, present (true) or absent (false), in the order first reported. */
    Map<String, Boolean> symptoms() {
        return Collections.unmodifiableMap(new LinkedHashMap<>(symptoms));
    }

    void apply(SessionEvent e) {
        EventData d = e.data();
        switch (e.type()) {
            case SYMPTOM -> {
                symptoms.remove(d.symptom());
                symptoms.put(d.symptom(), d.present());
            }
            case READING -> {
                readings.remove(d.quantity());
                readings.put(d.quantity(), new MeasurementInput(d.quantity(), d.value(), d.unit()));
            }
            case CHECK -> {
                checks.remove(d.check());
                checks.put(d.check(), d.outcome());
            }
            case UNAVAILABLE -> unavailable.add(d.check());
            case TRACE -> {
                if (d.traceId() != null) {
                    traces.add(d.traceId());
                }
            }
            default -> {
                // opening, notes, retractions, closing and reopening carry no evidence
            }
        }
    }

    /**
     * The one-shot request this state amounts to. {@code first} names the item just added, put first
     * in its list so that a validation error about it reads as index 0 and can be mapped back to the
     * field of the request that carried it.
     */
    DiagnosisRequest request(String tag, SessionEvent first) {
        List<String> present = new ArrayList<>();
        List<String> absent = new ArrayList<>();
        symptoms.forEach((code, p) -> (p ? present : absent).add(code));
        List<MeasurementInput> measurements = new ArrayList<>(readings.values());
        List<CheckInput> done = new ArrayList<>();
        checks.forEach((check, outcome) -> done.add(new CheckInput(check, outcome)));
        List<String> cannot = new ArrayList<>(unavailable);
        List<String> traceIds = new ArrayList<>(traces);
        if (first != null) {
            EventData d = first.data();
            switch (first.type()) {
                case SYMPTOM -> moveFirst(d.present() ? present : absent, d.symptom());
                case READING -> measurements.sort((a, b) -> Boolean.compare(!a.quantity().equals(d.quantity()),
                        !b.quantity().equals(d.quantity())));
                case CHECK -> done.sort((a, b) -> Boolean.compare(!a.check().equals(d.check()), !b.check().equals(d.check())));
                case UNAVAILABLE -> moveFirst(cannot, d.check());
                case TRACE -> moveFirst(traceIds, d.traceId());
                default -> {
                }
            }
        }
        return new DiagnosisRequest(present, absent, measurements, done, cannot, new AssetInput(tag, null, null, null), traceIds);
    }

    private static void moveFirst(List<String> list, String item) {
        if (list.remove(item)) {
            list.add(0, item);
        }
    }
}
