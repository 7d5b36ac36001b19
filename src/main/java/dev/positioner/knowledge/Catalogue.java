package dev.positioner.knowledge;

import dev.positioner.measure.QuantityDef;
import java.util.List;
import java.util.Map;

/**
 * The whole catalogue as data. Maps keep file order, which is the order reports list entries in.
 * {@code unlisted} is the explicit "not in the catalogue" hypothesis; {@code unlistedSymptomPresent}
 * is P(a reported symptom is present | the cause is not catalogued).
 */
public record Catalogue(Map<String, Fault> faults, Fault unlisted, double unlistedSymptomPresent,
        Map<String, SymptomDef> symptoms, Map<String, CheckDef> checks, Map<String, String> cautions,
        Map<String, String> sources, Map<String, QuantityDef> measurements, Map<String, QuantityDef> design,
        Map<String, Disturbance> disturbances, RepairGuide repairGuide, Map<String, String> alerts) {

    /** The disturbance class of a check, or of a repair; an unknown code is the loader's to refuse. */
    public Disturbance disturbance(String code) {
        return disturbances.get(code);
    }

    /** Minute-equivalents of exposure for a step that disturbs these classes: each exposure adds. */
    public double penaltyMinutes(List<String> classes) {
        double sum = 0;
        for (String code : classes) {
            Disturbance d = disturbances.get(code);
            sum += d == null ? 0 : d.penaltyMinutes();
        }
        return sum;
    }

    /** Faults then the unlisted hypothesis: the index order of every probability vector. */
    public List<Fault> hypotheses() {
        return java.util.stream.Stream.concat(faults.values().stream(), java.util.stream.Stream.of(unlisted))
                .toList();
    }

    public Fault hypothesis(String code) {
        return code.equals(unlisted.code()) ? unlisted : faults.get(code);
    }
}
