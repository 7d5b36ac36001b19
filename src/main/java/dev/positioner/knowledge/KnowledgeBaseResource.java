package dev.positioner.knowledge;

import jakarta.ws.rs.GET;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.core.MediaType;

/** {@code GET /api/v1/knowledge-base}: counts, codes and blind spots of the loaded knowledge base. */
@Path("/api/v1/knowledge-base")
public class KnowledgeBaseResource {

    private final KnowledgeBaseReport report;

    public KnowledgeBaseResource(KnowledgeBase knowledge) {
        // The base is fixed for the life of the process, so the report is too.
        this.report = KnowledgeBaseReport.of(knowledge);
    }

    @GET
    @Produces(MediaType.APPLICATION_JSON)
    public KnowledgeBaseReport report() {
        return report;
    }
}
