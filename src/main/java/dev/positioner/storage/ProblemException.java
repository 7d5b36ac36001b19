package dev.positioner.storage;

import dev.positioner.api.Problem;
import jakarta.ws.rs.core.Response;

/**
 * A request that is well formed but cannot be served now: unknown tag or session (404), a state
 * conflict such as closing a closed session (409), an idempotency key reused for another request
 * (422). Answered as RFC 9457 problem details like the invalid-request errors.
 */
public class ProblemException extends RuntimeException {

    private final Problem problem;

    public ProblemException(int status, String type, String title, String detail) {
        super(detail);
        this.problem = new Problem("/problems/" + type, title, status, detail, null, null);
    }

    public static ProblemException notFound(String what, String id) {
        return new ProblemException(404, "not-found", "Not found", "no " + what + " '" + id + "'");
    }

    public static ProblemException conflict(String detail) {
        return new ProblemException(409, "conflict", "Conflicts with the current state", detail);
    }

    public Response response() {
        return Problem.response(problem);
    }
}
