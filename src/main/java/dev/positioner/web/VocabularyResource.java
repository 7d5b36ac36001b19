package dev.positioner.web;

import dev.positioner.asset.AssetDirectory;
import dev.positioner.knowledge.KnowledgeBase;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.core.MediaType;

/** {@code GET /api/v1/vocabulary}: what to call each code on screen. */
@Path("/api/v1/vocabulary")
public class VocabularyResource {

    private final KnowledgeBase knowledge;
    private final AssetDirectory assets;

    public VocabularyResource(KnowledgeBase knowledge, AssetDirectory assets) {
        this.knowledge = knowledge;
        this.assets = assets;
    }

    /** Built per call (it is small) so tags registered while running are listed without a restart. */
    @GET
    @Produces(MediaType.APPLICATION_JSON)
    public Vocabulary vocabulary() {
        return Vocabulary.of(knowledge.catalogue(), assets);
    }
}
