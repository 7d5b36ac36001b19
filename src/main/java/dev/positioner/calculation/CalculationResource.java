package dev.positioner.calculation;

import dev.positioner.api.InvalidRequestException;
import dev.positioner.knowledge.KnowledgeBase;
import dev.positioner.measure.QuantityDef;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.core.MediaType;
import java.util.LinkedHashMap;
import java.util.Map;

/** {@code POST /api/v1/calculations/{name}}: one engineering calculation, units in and out. */
@Path("/api/v1/calculations")
public class CalculationResource {

    private final Map<String, QuantityDef> quantities = new LinkedHashMap<>();

    public CalculationResource(KnowledgeBase knowledge) {
        quantities.putAll(knowledge.catalogue().measurements());
        quantities.putAll(knowledge.catalogue().design());
    }

    @POST
    @Path("/{name}")
    @Consumes(MediaType.APPLICATION_JSON)
    @Produces(MediaType.APPLICATION_JSON)
    public CalculationResult calculate(@PathParam("name") String name, CalculationRequest request) {
        Inputs in = new Inputs(request, quantities);
        return switch (name) {
            case "viscosity" -> Calculations.viscosity(in, request);
            case "drain-line-drop" -> Calculations.drainLineDrop(in, request);
            case "stroke-time" -> Calculations.strokeTime(in);
            case "thrust" -> Calculations.thrust(in);
            case "iso4406" -> Calculations.iso4406(in, request);
            case "natural-frequency" -> Calculations.naturalFrequency(in);
            default -> throw new jakarta.ws.rs.NotFoundException("no calculation '" + name
                    + "'; there are viscosity, drain-line-drop, stroke-time, thrust, iso4406, natural-frequency");
        };
    }
}
