package dev.positioner.session;

import dev.positioner.api.InvalidRequestException;
import dev.positioner.session.SessionRequests.Add;
import dev.positioner.session.SessionRequests.Close;
import dev.positioner.session.SessionRequests.Open;
import dev.positioner.session.SessionRequests.Reopen;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.DefaultValue;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.HeaderParam;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.MediaType;
import jakarta.ws.rs.core.Response;
import java.net.URI;
import java.util.List;

/**
 * Guided sessions over HTTP. Every POST stores one thing and answers with the diagnosis after it;
 * a retry with the same Idempotency-Key gets the first answer again, marked Idempotent-Replayed.
 */
@Path("/api/v1/sessions")
@Produces(MediaType.APPLICATION_JSON)
@Consumes(MediaType.APPLICATION_JSON)
public class SessionResource {

    static final String KEY = "Idempotency-Key";
    static final String REPLAYED = "Idempotent-Replayed";

    public record SessionList(List<SessionView.Summary> sessions) {
    }

    private final SessionService service;
    private final SessionQueries queries;

    public SessionResource(SessionService service, SessionQueries queries) {
        this.service = service;
        this.queries = queries;
    }

    @POST
    public Response open(Open body, @HeaderParam(KEY) String key) {
        SessionService.Outcome o = service.open(body, key);
        return Response.status(201).location(URI.create("/api/v1/sessions/" + o.view().id()))
                .header(REPLAYED, o.replayed()).entity(o.view()).build();
    }

    @GET
    public SessionList search(@QueryParam("tag") String tag, @QueryParam("fault") String fault,
            @QueryParam("status") String status, @QueryParam("limit") @DefaultValue("100") int limit) {
        return new SessionList(queries.search(tag, fault, status, Limits.check(limit)));
    }

    @GET
    @Path("{id}")
    public SessionView get(@PathParam("id") String id) {
        return queries.get(id);
    }

    /** The path segment of each kind of event a session takes, as the contract names them. */
    private static final java.util.Map<String, EventType> EVENT_PATHS = java.util.Map.of(
            "symptoms", EventType.SYMPTOM, "readings", EventType.READING, "checks", EventType.CHECK,
            "unavailable-checks", EventType.UNAVAILABLE, "traces", EventType.TRACE, "notes", EventType.NOTE,
            "retractions", EventType.RETRACTION);

    /** {@code POST /sessions/{id}/symptoms|readings|checks|unavailable-checks|traces|notes|retractions}. */
    @POST
    @Path("{id}/{kind}")
    public Response add(@PathParam("id") String id, @PathParam("kind") String kind, Add body, @HeaderParam(KEY) String key) {
        EventType type = EVENT_PATHS.get(kind);
        if (type == null) {
            throw new jakarta.ws.rs.NotFoundException("a session takes " + String.join(", ", new java.util.TreeSet<>(EVENT_PATHS.keySet()))
                    + ", closure and reopening; not '" + kind + "'");
        }
        return created(service.add(id, type, body, key));
    }

    @POST
    @Path("{id}/closure")
    public Response close(@PathParam("id") String id, Close body, @HeaderParam(KEY) String key) {
        return created(service.close(id, body, key));
    }

    @POST
    @Path("{id}/reopening")
    public Response reopen(@PathParam("id") String id, Reopen body, @HeaderParam(KEY) String key) {
        return created(service.reopen(id, body, key));
    }

    private static Response created(SessionService.Outcome o) {
        return Response.status(201).header(REPLAYED, o.replayed()).entity(o.view()).build();
    }

    /** Page sizes shared by the list endpoints. */
    static final class Limits {
        private Limits() {
        }

        static int check(int limit) {
            if (limit < 1 || limit > 1000) {
                throw new InvalidRequestException("limit", "must be between 1 and 1000");
            }
            return limit;
        }
    }
}
