package dev.positioner.session;

import jakarta.ws.rs.DefaultValue;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.MediaType;
import java.util.List;

/** Closure records for maintenance systems and reliability engineers, and history per valve and per fault. */
public final class HistoryResource {

    private HistoryResource() {
    }

    public record ClosureList(List<ClosureRecord> closures) {
    }

    @Path("/api/v1/closures")
    @Produces(MediaType.APPLICATION_JSON)
    public static class Closures {
        private final SessionQueries queries;

        public Closures(SessionQueries queries) {
            this.queries = queries;
        }

        @GET
        public ClosureList list(@QueryParam("tag") String tag, @QueryParam("fault") String fault,
                @QueryParam("limit") @DefaultValue("100") int limit) {
            return new ClosureList(queries.closures(tag, fault, SessionResource.Limits.check(limit)));
        }
    }

    @Path("/api/v1/assets/{tag}/history")
    @Produces(MediaType.APPLICATION_JSON)
    public static class OfAsset {
        private final SessionQueries queries;

        public OfAsset(SessionQueries queries) {
            this.queries = queries;
        }

        @GET
        public SessionQueries.AssetHistory get(@PathParam("tag") String tag, @QueryParam("limit") @DefaultValue("100") int limit) {
            return queries.assetHistory(tag, SessionResource.Limits.check(limit));
        }
    }

    @Path("/api/v1/faults/{fault}/history")
    @Produces(MediaType.APPLICATION_JSON)
    public static class OfFault {
        private final SessionQueries queries;

        public OfFault(SessionQueries queries) {
            this.queries = queries;
        }

        @GET
        public SessionQueries.FaultHistory get(@PathParam("fault") String fault, @QueryParam("limit") @DefaultValue("100") int limit) {
            return queries.faultHistory(fault, SessionResource.Limits.check(limit));
        }
    }
}
