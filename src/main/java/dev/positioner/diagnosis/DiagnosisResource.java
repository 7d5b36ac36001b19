package dev.positioner.diagnosis;

import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.core.MediaType;

/** {@code POST /api/v1/diagnoses}: the one-shot contract other clients are written against. */
@Path("/api/v1/diagnoses")
public class DiagnosisResource {

    private final DiagnosisService service;

    public DiagnosisResource(DiagnosisService service) {
        this.service = service;
    }

    /**
     * Pure function of the body: the same request always gets the same answer and nothing is stored,
     * so a maintenance system may retry it freely.
     */
    @POST
    @Consumes(MediaType.APPLICATION_JSON)
    @Produces(MediaType.APPLICATION_JSON)
    public DiagnosisResponse diagnose(DiagnosisRequest request) {
        return service.diagnose(request);
    }
}
