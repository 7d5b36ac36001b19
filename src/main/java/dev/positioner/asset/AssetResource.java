package dev.positioner.asset;

import dev.positioner.api.InvalidRequestException;
import dev.positioner.storage.ProblemException;
import dev.positioner.storage.Storage;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.DefaultValue;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.PUT;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.MediaType;
import jakarta.ws.rs.core.Response;
import java.net.URI;
import java.util.List;

/** The valve registry over HTTP: create, read, replace, search and CSV import. */
@Path("/api/v1/assets")
@Produces(MediaType.APPLICATION_JSON)
public class AssetResource {

    public record AssetList(List<AssetRecord> assets) {
    }

    private final AssetRegistry registry;
    private final AssetValidator validator;
    private final CsvImporter importer;
    private final Storage storage;

    public AssetResource(AssetRegistry registry, AssetValidator validator, CsvImporter importer, Storage storage) {
        this.registry = registry;
        this.validator = validator;
        this.importer = importer;
        this.storage = storage;
    }

    @GET
    public AssetList search(@QueryParam("tag") String tag, @QueryParam("area") String area, @QueryParam("site") String site,
            @QueryParam("limit") @DefaultValue("100") int limit, @QueryParam("offset") @DefaultValue("0") int offset) {
        if (limit < 1 || limit > 1000) {
            throw new InvalidRequestException("limit", "must be between 1 and 1000");
        }
        if (offset < 0) {
            throw new InvalidRequestException("offset", "must not be negative");
        }
        return new AssetList(registry.search(tag, area, site, limit, offset));
    }

    @GET
    @Path("{tag}")
    public AssetRecord get(@PathParam("tag") String tag) {
        return registry.find(tag).orElseThrow(() -> ProblemException.notFound("valve tag", tag));
    }

    /**
     * 201 for a new tag. A retry of the same create (same data) answers 200 instead of a conflict,
     * so a maintenance system that lost the first answer can simply send it again.
     */
    @POST
    @Consumes(MediaType.APPLICATION_JSON)
    public Response create(AssetRecord body) {
        AssetRecord asset = valid(body);
        boolean created = storage.inTransaction(c -> {
            var existing = registry.find(c, asset.tag());
            if (existing.isPresent()) {
                if (existing.get().equals(asset)) {
                    return false;
                }
                throw ProblemException.conflict("tag '" + asset.tag() + "' is already registered with other data; use PUT to replace it");
            }
            return registry.create(c, asset);
        });
        return Response.status(created ? 201 : 200).location(URI.create("/api/v1/assets/" + asset.tag())).entity(asset).build();
    }

    /** Replaces the valve's data, or registers it (201) when the tag is new. */
    @PUT
    @Path("{tag}")
    @Consumes(MediaType.APPLICATION_JSON)
    public Response replace(@PathParam("tag") String tag, AssetRecord body) {
        if (body != null && body.tag() != null && !body.tag().equals(tag)) {
            throw new InvalidRequestException("tag", "'" + body.tag() + "' differs from the tag in the path, '" + tag + "'");
        }
        AssetRecord asset = valid(body == null ? null : new AssetRecord(tag, body.description(), body.area(), body.site(),
                body.oilGrade(), body.cleanlinessTarget(), body.design(), body.action(), body.failPosition(), body.returnSpring()));
        boolean created = storage.inTransaction(c -> !registry.update(c, asset) && registry.create(c, asset));
        return Response.status(created ? 201 : 200).entity(asset).build();
    }

    /** Bulk import: every row is checked; good rows are stored, bad ones reported with their row number. */
    @POST
    @Path("import")
    @Consumes({"text/csv", MediaType.TEXT_PLAIN})
    public CsvImporter.Report importCsv(String csv, @QueryParam("update") @DefaultValue("false") boolean update) {
        return importer.importCsv(csv, update);
    }

    private AssetRecord valid(AssetRecord body) {
        if (body == null) {
            throw new InvalidRequestException("$", "a JSON body is required");
        }
        AssetValidator.Result r = validator.validate(body, "");
        if (!r.errors().isEmpty()) {
            throw new InvalidRequestException(r.errors());
        }
        return r.asset();
    }
}
