package dev.positioner.trace;

import dev.positioner.api.FieldError;
import dev.positioner.api.InvalidRequestException;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.DefaultValue;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.NotFoundException;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.MediaType;
import jakarta.ws.rs.core.Response;
import java.io.InputStream;
import java.net.URI;

/**
 * {@code /api/v1/traces}: upload a logged trace (CSV or JSON), get its metrics and picture. The
 * body is parsed as it streams in; errors name the row and column.
 */
@Path("/api/v1/traces")
public class TraceResource {

    private final TraceService service;

    public TraceResource(TraceService service) {
        this.service = service;
    }

    @POST
    @Consumes({"text/csv", MediaType.TEXT_PLAIN})
    @Produces(MediaType.APPLICATION_JSON)
    public Response uploadCsv(InputStream body, @QueryParam("name") String name,
            @QueryParam("signalUnit") @DefaultValue("percent") String signal,
            @QueryParam("positionUnit") @DefaultValue("percent") String position) {
        return created(guard(() -> service.analyseCsv(body, name, unit("signalUnit", signal), unit("positionUnit", position))));
    }

    @POST
    @Consumes(MediaType.APPLICATION_JSON)
    @Produces(MediaType.APPLICATION_JSON)
    public Response uploadJson(InputStream body, @QueryParam("name") String name,
            @QueryParam("signalUnit") @DefaultValue("percent") String signal,
            @QueryParam("positionUnit") @DefaultValue("percent") String position) {
        return created(guard(() -> service.analyseJson(body, name, unit("signalUnit", signal), unit("positionUnit", position))));
    }

    @GET
    @Path("/{id}")
    @Produces(MediaType.APPLICATION_JSON)
    public TraceView get(@PathParam("id") String id) {
        return TraceView.of(find(id));
    }

    /** The trace with its steps, dead band and hunting window marked, for the tablet and for reports. */
    @GET
    @Path("/{id}/picture")
    @Produces("image/svg+xml")
    public String picture(@PathParam("id") String id) {
        return find(id).svg();
    }

    private TraceRecord find(String id) {
        return service.find(id).orElseThrow(() -> new NotFoundException("no trace '" + id + "'"));
    }

    private static Response created(TraceRecord r) {
        return Response.created(URI.create("/api/v1/traces/" + r.id())).entity(TraceView.of(r)).build();
    }

    private static TraceRecord guard(java.util.function.Supplier<TraceRecord> upload) {
        try {
            return upload.get();
        } catch (TraceFormatException e) {
            String field = e.row() > 0 ? "row " + e.row() + (e.column() == null ? "" : ", column " + e.column())
                    : e.column() == null ? "$" : e.column();
            throw new InvalidRequestException(java.util.List.of(new FieldError(field, e.getMessage())));
        }
    }

    private static SignalUnit unit(String param, String text) {
        try {
            return SignalUnit.parse(text);
        } catch (IllegalArgumentException e) {
            throw new InvalidRequestException(param, "'" + text + "' is not a signal unit; use percent, mA or psi");
        }
    }
}
