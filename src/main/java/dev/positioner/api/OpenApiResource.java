package dev.positioner.api;

import jakarta.ws.rs.GET;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.core.Response;
import java.io.IOException;
import java.io.InputStream;

/**
 * Serves the contract exactly as written in {@code openapi/openapi.yaml} (packaged on the
 * classpath at build time): the spec file is the source of truth, not something generated from code.
 */
@Path("/q/openapi")
public class OpenApiResource {

    @GET
    @Produces("application/yaml")
    public Response spec() throws IOException {
        try (InputStream in = OpenApiResource.class.getResourceAsStream("/openapi/openapi.yaml")) {
            if (in == null) {
                return Response.status(404).build();
            }
            return Response.ok(in.readAllBytes(), "application/yaml").build();
        }
    }
}
