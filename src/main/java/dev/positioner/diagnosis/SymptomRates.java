package dev.positioner.diagnosis;

import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.Fault;
import dev.positioner.knowledge.SymptomDef;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * P(symptom present | cause) as a diagnosis uses it, per symptom code in hypothesis order (the
 * "not in the catalogue" cause last): the catalogue's own values, or values revised from closed jobs.
 * {@code basis} says which, for the response's assumptions; null for the catalogue's own.
 */
public record SymptomRates(Map<String, double[]> present, String basis) {

    /** How a source revises one catalogue value; it gets the symptom, the fault and the catalogue's value. */
    @FunctionalInterface
    public interface Revision {
        double rate(String symptom, String fault, double catalogueValue);
    }

    /** The last catalogue's own rates: the same for every request on one knowledge base, so built once. */
    private static volatile Built lastBuilt;

    private record Built(Catalogue of, SymptomRates rates) {
    }

    public static SymptomRates catalogue(Catalogue catalogue) {
        Built built = lastBuilt;
        if (built == null || built.of() != catalogue) {
            built = new Built(catalogue, revised(catalogue, (symptom, fault, p) -> p, null));
            lastBuilt = built;
        }
        return built.rates();
    }

    /** The catalogue's values passed through {@code revision}; the unlisted cause keeps the catalogue's. */
    public static SymptomRates revised(Catalogue catalogue, Revision revision, String basis) {
        List<Fault> hypotheses = catalogue.hypotheses();
        Map<String, double[]> present = new HashMap<>();
        for (SymptomDef s : catalogue.symptoms().values()) {
            double[] p = new double[hypotheses.size()];
            for (int h = 0; h < p.length - 1; h++) {
                String fault = hypotheses.get(h).code();
                p[h] = revision.rate(s.code(), fault, s.present(fault));
            }
            p[p.length - 1] = catalogue.unlistedSymptomPresent();
            present.put(s.code(), p);
        }
        return new SymptomRates(Map.copyOf(present), basis);
    }

    public double present(String symptom, int hypothesis) {
        return present.get(symptom)[hypothesis];
    }
}
