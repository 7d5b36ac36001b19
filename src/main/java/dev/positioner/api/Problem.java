package dev.positioner.api;

import com.fasterxml.jackson.annotation.JsonInclude;
import jakarta.ws.rs.core.Response;
import java.util.List;

/**
 * RFC 9457 problem details. {@code field} names the first offending field so that a maintenance
 * system can show it without parsing prose; {@code errors} lists them all.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record Problem(String type, String title, int status, String detail, String field, List<FieldError> errors) {

    public static final String MEDIA_TYPE = "application/problem+json";

    public static Response badRequest(List<FieldError> errors) {
        FieldError first = errors.get(0);
        return response(new Problem("/problems/invalid-request", "The request is not valid", 400,
                first.field() + ": " + first.message(), first.field(), errors));
    }

    public static Response response(Problem problem) {
        return Response.status(problem.status()).type(MEDIA_TYPE).entity(problem).build();
    }
}
