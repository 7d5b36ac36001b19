package dev.positioner.session;

import dev.positioner.api.FieldError;
import dev.positioner.api.InvalidRequestException;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.Fault;
import dev.positioner.knowledge.KnowledgeBase;
import dev.positioner.session.SessionRequests.Close;
import jakarta.enterprise.context.ApplicationScoped;
import java.util.ArrayList;
import java.util.List;

/**
 * Turns a confirmed fault into the closure record: ISO 14224 failure mode, mechanism and cause wording
 * come from the fault catalogue, so every closure of one fault is coded the same way. "not_found"
 * is the honest close of a job whose cause was not confirmed: ISO 14224 failure mode UNK (unknown)
 * and failure mechanism 6.1 (no cause found).
 */
@ApplicationScoped
class Closures {

    static final String NOT_FOUND = "not_found";

    private final Catalogue catalogue;

    Closures(KnowledgeBase knowledge) {
        this.catalogue = knowledge.catalogue();
    }

    void check(Close b) {
        List<FieldError> errors = new ArrayList<>();
        if (b.confirmedFault() == null || b.confirmedFault().isBlank()) {
            errors.add(new FieldError("confirmedFault", "is required: a fault code, '" + catalogue.unlisted().code()
                    + "' for a cause outside the catalogue, or '" + NOT_FOUND + "'"));
        } else if (!NOT_FOUND.equals(b.confirmedFault()) && catalogue.hypothesis(b.confirmedFault()) == null) {
            errors.add(new FieldError("confirmedFault", "unknown fault '" + b.confirmedFault() + "'"));
        }
        Text.required(errors, "action", b.action(), 2000);
        Text.required(errors, "author", b.author(), 100);
        Text.optional(errors, "remarks", b.remarks(), 2000);
        if (b.minutes() == null || !Double.isFinite(b.minutes()) || b.minutes() < 0 || b.minutes() > 100_000) {
            errors.add(new FieldError("minutes", b.minutes() == null ? "is required" : "must be between 0 and 100000"));
        }
        List<String> parts = b.parts() == null ? List.of() : b.parts();
        for (int i = 0; i < parts.size(); i++) {
            String p = parts.get(i);
            if (p == null || p.isBlank()) {
                errors.add(new FieldError("parts[" + i + "]", "must not be empty"));
            } else {
                Text.optional(errors, "parts[" + i + "]", p, 200);
            }
        }
        if (parts.size() > 50) {
            errors.add(new FieldError("parts", "at most 50 parts"));
        }
        if (!errors.isEmpty()) {
            throw new InvalidRequestException(errors);
        }
    }

    ClosureRecord record(SessionRow s, SessionEvent closed, String site) {
        EventData d = closed.data();
        String code = d.fault();
        Fault f = NOT_FOUND.equals(code) ? null : catalogue.hypothesis(code);
        String mode = f == null ? "UNK" : f.failureMode();
        String mechanism = f == null ? "6.1 No cause found" : f.mechanism();
        String cause = f == null ? "No cause found" : f.cause() != null ? f.cause() : "Cause outside the fault catalogue; see remarks";
        return titled(new ClosureRecord(s.id(), closed.seq(), s.tag(), site, s.workOrder(), code, null, mode, mechanism, cause,
                d.action(), d.parts(), d.minutes(), d.text(), closed.author(), closed.recordedAt(), null));
    }

    /** Title of a fault code or of not_found; null for a code the catalogue does not know. */
    String title(String code) {
        if (NOT_FOUND.equals(code)) {
            return "No cause found";
        }
        Fault f = catalogue.hypothesis(code);
        return f == null ? null : f.title();
    }

    ClosureRecord titled(ClosureRecord k) {
        String title = title(k.confirmedFault());
        return new ClosureRecord(k.sessionId(), k.seq(), k.tag(), k.site(), k.workOrder(), k.confirmedFault(), title,
                k.failureMode(), k.failureMechanism(), k.failureCause(), k.action(), k.parts(), k.minutes(), k.remarks(),
                k.closedBy(), k.closedAt(), k.reopenedAt());
    }
}
