package dev.positioner.session;

import dev.positioner.api.FieldError;
import dev.positioner.api.InvalidRequestException;
import dev.positioner.session.SessionRequests.Add;
import dev.positioner.storage.ProblemException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Checks of one addition that the diagnosis cannot make: required fields per type, and what may be
 * retracted. Codes, units, outcomes and values are left to the diagnosis, which knows the catalogue.
 */
final class EventChecks {

    private EventChecks() {
    }

    static EventData data(EventType type, Add b) {
        List<FieldError> errors = new ArrayList<>();
        Text.required(errors, "author", b.author(), 100);
        EventData data = switch (type) {
            case SYMPTOM -> {
                Text.required(errors, "symptom", b.symptom(), 64);
                yield EventData.symptom(b.symptom(), b.present() == null || b.present());
            }
            case READING -> {
                Text.required(errors, "quantity", b.quantity(), 64);
                Text.required(errors, "unit", b.unit(), 32);
                if (b.value() == null) {
                    errors.add(new FieldError("value", "is required"));
                }
                yield EventData.reading(b.quantity(), b.value(), b.unit());
            }
            case CHECK -> {
                Text.required(errors, "check", b.check(), 64);
                Text.required(errors, "outcome", b.outcome(), 64);
                yield EventData.check(b.check(), b.outcome());
            }
            case UNAVAILABLE -> {
                Text.required(errors, "check", b.check(), 64);
                yield EventData.unavailable(b.check());
            }
            case TRACE -> {
                Text.required(errors, "traceId", b.traceId(), 200);
                Text.optional(errors, "text", b.text(), 2000);
                yield EventData.trace(b.traceId(), b.text());
            }
            case NOTE -> {
                Text.required(errors, "text", b.text(), 2000);
                yield EventData.note(b.text());
            }
            case RETRACTION -> {
                if (b.retracts() == null) {
                    errors.add(new FieldError("retracts", "is required: the seq of the event to retract"));
                }
                Text.optional(errors, "text", b.text(), 2000);
                yield EventData.retraction(b.retracts() == null ? 0 : b.retracts(), b.text());
            }
            default -> throw new IllegalArgumentException("not an addition: " + type);
        };
        if (!errors.isEmpty()) {
            throw new InvalidRequestException(errors);
        }
        return data;
    }

    static void retraction(List<SessionEvent> events, int target) {
        SessionEvent t = events.stream().filter(e -> e.seq() == target).findFirst()
                .orElseThrow(() -> new InvalidRequestException("retracts", "this session has no event " + target));
        if (!t.type().retractable()) {
            throw new InvalidRequestException("retracts", "event " + target + " is a '" + t.type().code()
                    + "' event, which cannot be retracted");
        }
        Integer by = SessionState.retractions(events).get(target);
        if (by != null) {
            throw ProblemException.conflict("event " + target + " is already retracted by event " + by);
        }
    }

    /** Maps the diagnosis's field names for the item just added (index 0) to the request's own. */
    static RuntimeException toRequestFields(InvalidRequestException e, SessionEvent added) {
        List<FieldError> mine = new ArrayList<>();
        List<FieldError> stale = new ArrayList<>();
        Map<String, String> prefixes = added == null ? Map.of() : switch (added.type()) {
            case SYMPTOM -> Map.of(added.data().present() ? "symptoms[0]" : "absentSymptoms[0]", "symptom");
            case READING -> Map.of("measurements[0].", "");
            case CHECK -> Map.of("checks[0].", "");
            case UNAVAILABLE -> Map.of("unavailableChecks[0]", "check");
            case TRACE -> Map.of("traces[0]", "traceId");
            default -> Map.of();
        };
        for (FieldError f : e.errors()) {
            String mapped = null;
            for (var p : prefixes.entrySet()) {
                if (f.field().startsWith(p.getKey())) {
                    mapped = p.getValue() + f.field().substring(p.getKey().length());
                }
            }
            (mapped == null ? stale : mine).add(mapped == null ? f : new FieldError(mapped, f.message()));
        }
        if (stale.isEmpty()) {
            return new InvalidRequestException(mine);
        }
        // Stored events that the knowledge base now rejects: not this request's fault, and not a 500.
        return ProblemException.conflict("the session holds data the current knowledge base rejects: " + stale);
    }
}
