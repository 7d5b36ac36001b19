package dev.positioner.api;

import jakarta.ws.rs.WebApplicationException;
import jakarta.ws.rs.core.Response;
import jakarta.ws.rs.ext.ExceptionMapper;
import jakarta.ws.rs.ext.Provider;
import java.util.List;

/**
 * Errors the framework raises itself (unreadable body, wrong media type, unknown path) become
 * problem details too, so a client has one error format to handle. The body of a request whose
 * bytes are not valid UTF-8 lands here as a 400.
 */
@Provider
public class HttpProblemMapper implements ExceptionMapper<WebApplicationException> {

    @Override
    public Response toResponse(WebApplicationException e) {
        Response original = e.getResponse();
        if (original.hasEntity()) {
            return original;
        }
        int status = original.getStatus();
        if (status == 400) {
            return Problem.badRequest(List.of(new FieldError("$", "the request body cannot be read: "
                    + (e.getMessage() == null ? "malformed" : e.getMessage()))));
        }
        Response.StatusType type = original.getStatusInfo();
        return Problem.response(new Problem("/problems/http-" + status, type.getReasonPhrase(), status,
                e.getMessage() == null ? type.getReasonPhrase() : e.getMessage(), null, null));
    }
}
