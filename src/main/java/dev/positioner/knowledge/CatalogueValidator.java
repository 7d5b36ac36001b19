package dev.positioner.knowledge;

import dev.positioner.measure.UnitConverter;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Checks the meaning of a catalogue that has been read: every base code present, probabilities
 * strictly inside (0,1) (a zero would let one mistaken answer rule a cause out for good), every
 * outcome table complete and summing to 1, every reference resolving, every number sourced.
 */
final class CatalogueValidator {

    /** Sums are accepted within this tolerance so that tables can be written to two or three decimals. */
    static final double SUM_TOLERANCE = 0.001;

    /**
     * ISO 14224:2016 Annex B failure-mode codes that can apply to a valve, its actuator and its
     * hydraulic supply (the equipment-class tables list them per class).
     */
    static final Set<String> ISO14224_MODES = Set.of("AIR", "BRD", "DOP", "ELP", "ELU", "ERO", "FTC", "FTF",
            "FTI", "FTO", "FTS", "HIO", "INL", "LBP", "LCP", "LOO", "NOI", "NOO", "OHE", "OTH", "PDE", "PLU",
            "SER", "SPO", "STD", "STP", "UNK", "VIB");

    /** Cautions every step that needs a bypass must carry (see DESIGN safety section). */
    static final List<String> BYPASS_CAUTIONS = List.of("operator_permission", "fail_position", "process_upset");

    /** The class of steps that disturb nothing; every other class moves something and needs permission. */
    static final String UNDISTURBED = "nothing";

    private final Catalogue catalogue;
    private final Map<String, Integer> lines;
    private final List<KnowledgeProblem> problems = new ArrayList<>();

    CatalogueValidator(Catalogue catalogue, Map<String, Integer> lines) {
        this.catalogue = catalogue;
        this.lines = lines;
    }

    List<KnowledgeProblem> validate(BaseVocabulary base) {
        checkBase(base);
        catalogue.disturbances().values().forEach(this::checkDisturbance);
        checkFaults();
        catalogue.symptoms().values().forEach(this::checkSymptom);
        catalogue.checks().values().forEach(this::checkCheck);
        checkQuantities();
        return problems;
    }

    private void checkBase(BaseVocabulary base) {
        missing("faults.yaml", base.faults(), catalogue.faults().keySet(), "fault");
        missing("symptoms.yaml", base.symptoms(), catalogue.symptoms().keySet(), "symptom");
        missing("quantities.yaml", base.measurements(), catalogue.measurements().keySet(), "measurement");
        missing("checks.yaml", base.checkOutcomes().keySet(), catalogue.checks().keySet(), "check");
        base.checkOutcomes().forEach((code, outcomes) -> {
            CheckDef check = catalogue.checks().get(code);
            if (check == null) {
                return;
            }
            if (check.outcomes().size() < outcomes.size()
                    || !check.outcomes().subList(0, outcomes.size()).equals(outcomes)) {
                add("checks.yaml", code, "outcomes must begin with the base outcomes " + outcomes
                        + " in that order, found " + check.outcomes());
            }
            if (base.bypassChecks().contains(code) && !check.bypass()) {
                add("checks.yaml", code, "the base vocabulary says this check needs a bypass; it cannot be dropped");
            }
        });
    }

    private void missing(String file, Collection<String> required, Collection<String> present, String what) {
        required.stream().filter(code -> !present.contains(code))
                .forEach(code -> problems.add(new KnowledgeProblem("rules/catalogue/" + file, 0, code,
                        "base " + what + " code is missing (codes may be added, never dropped)")));
    }

    private void checkFaults() {
        double sum = catalogue.unlisted().prior();
        for (Fault fault : catalogue.hypotheses()) {
            String key = fault == catalogue.unlisted() ? "unlisted" : fault.code();
            probability("faults.yaml", key, "prior", fault.prior());
            if (fault != catalogue.unlisted()) {
                sum += fault.prior();
            }
            checkRepair(fault.code(), fault.repair());
            if (!ISO14224_MODES.contains(fault.failureMode())) {
                add("faults.yaml", key, "failureMode '" + fault.failureMode() + "' is not an ISO 14224 code we know");
            }
            sources("faults.yaml", key, fault.sources());
        }
        probability("faults.yaml", "unlisted", "symptomPresent", catalogue.unlistedSymptomPresent());
        if (Math.abs(sum - 1.0) > SUM_TOLERANCE) {
            add("faults.yaml", null, String.format("priors of all faults and the unlisted cause sum to %.4f, not 1", sum));
        }
    }

    private void checkSymptom(SymptomDef symptom) {
        String key = symptom.code();
        probability("symptoms.yaml", key, "otherwise", symptom.otherwise());
        symptom.given().forEach((fault, p) -> {
            knownFault("symptoms.yaml", key + "/" + fault, fault);
            probability("symptoms.yaml", key + "/" + fault, "P(present | " + fault + ")", p);
        });
        sources("symptoms.yaml", key, symptom.sources());
    }

    private void checkCheck(CheckDef check) {
        String key = check.code();
        if (!(check.minutes() > 0)) {
            add("checks.yaml", key, "minutes must be positive");
        }
        if (check.outcomes().isEmpty() || Set.copyOf(check.outcomes()).size() != check.outcomes().size()) {
            add("checks.yaml", key, "outcomes must be a non-empty list without repeats");
        }
        distribution(check, key + "/otherwise", "otherwise", check.otherwise());
        check.given().forEach((fault, row) -> {
            knownFault("checks.yaml", key + "/" + fault, fault);
            distribution(check, key + "/" + fault, fault, row);
        });
        check.cautions().stream().filter(c -> !catalogue.cautions().containsKey(c))
                .forEach(c -> add("checks.yaml", key, "unknown caution code '" + c + "'"));
        if (check.bypass()) {
            BYPASS_CAUTIONS.stream().filter(c -> !check.cautions().contains(c))
                    .forEach(c -> add("checks.yaml", key, "a check that needs a bypass must carry caution '" + c + "'"));
        }
        disturbs("checks.yaml", key, "check", check.disturbs(), check.cautions());
        boolean classBypass = check.disturbs().stream().map(catalogue::disturbance)
                .anyMatch(d -> d != null && d.bypass());
        if (classBypass != check.bypass()) {
            add("checks.yaml", key, "bypass: " + check.bypass() + " disagrees with what it disturbs " + check.disturbs()
                    + " (a bypass or out-of-service class means bypass: true); change one of them");
        }
        if (check.persons() < 1 || check.persons() > 4) {
            add("checks.yaml", key, "persons must be 1 to 4");
        }
        if (check.persons() > 1 && !catalogue.cautions().containsKey("lone_working")) {
            add("checks.yaml", key, "a check for more than one person needs the caution 'lone_working' in cautions.yaml");
        }
        if (!(check.resultAfterHours() >= 0)) {
            add("checks.yaml", key, "resultAfterHours must be zero or a positive number of hours");
        }
        if (check.instructions().isEmpty()) {
            add("checks.yaml", key, "instructions are missing");
        }
        sources("checks.yaml", key, check.sources());
    }

    private void checkDisturbance(Disturbance d) {
        if (!(d.penaltyMinutes() >= 0)) {
            add("disturbances.yaml", d.code(), "penaltyMinutes must be zero or positive");
        }
        d.cautions().stream().filter(c -> !catalogue.cautions().containsKey(c))
                .forEach(c -> add("disturbances.yaml", d.code(), "unknown caution code '" + c + "'"));
        if (!d.code().equals(UNDISTURBED) && !d.cautions().contains("operator_permission")) {
            add("disturbances.yaml", d.code(), "a class that disturbs anything must carry caution 'operator_permission'");
        }
        if (d.bypass()) {
            BYPASS_CAUTIONS.stream().filter(c -> !d.cautions().contains(c))
                    .forEach(c -> add("disturbances.yaml", d.code(), "a bypass class must carry caution '" + c + "'"));
        }
        sources("disturbances.yaml", d.code(), d.sources());
    }

    private void disturbs(String file, String key, String what, List<String> classes, List<String> cautions) {
        if (classes.isEmpty()) {
            add(file, key, "disturbs is missing: name a class of disturbances.yaml " + catalogue.disturbances().keySet());
        }
        for (String code : classes) {
            Disturbance d = catalogue.disturbance(code);
            if (d == null) {
                add(file, key, "disturbs '" + code + "' is not a class of disturbances.yaml " + catalogue.disturbances().keySet());
                continue;
            }
            d.cautions().stream().filter(c -> !cautions.contains(c))
                    .forEach(c -> add(file, key, "a " + what + " that disturbs '" + d.code() + "' must carry caution '" + c + "'"));
        }
    }

    private void checkRepair(String fault, Repair r) {
        if (!(r.minutes() > 0)) {
            add("repairs.yaml", fault, "minutes must be a positive number of minutes");
        }
        if (!(r.fixChance() > 0 && r.fixChance() <= 1)) {
            add("repairs.yaml", fault, "fixChance = " + r.fixChance() + " must lie in (0, 1]");
        }
        if (!(r.partsCost() >= 0)) {
            add("repairs.yaml", fault, "partsCost must be zero or positive");
        }
        if (r.action().isBlank()) {
            add("repairs.yaml", fault, "action is missing");
        }
        disturbs("repairs.yaml", fault, "repair", r.disturbs(), r.cautions());
        r.cautions().stream().filter(c -> !catalogue.cautions().containsKey(c))
                .forEach(c -> add("repairs.yaml", fault, "unknown caution code '" + c + "'"));
        sources("repairs.yaml", fault, r.sources());
    }

    private void distribution(CheckDef check, String key, String row, Map<String, Double> dist) {
        double sum = 0;
        for (String outcome : check.outcomes()) {
            Double p = dist.get(outcome);
            if (p == null) {
                add("checks.yaml", key, "row '" + row + "' has no probability for outcome '" + outcome + "'");
            } else {
                probability("checks.yaml", key, "P(" + outcome + " | " + row + ")", p);
                sum += p;
            }
        }
        dist.keySet().stream().filter(o -> !check.outcomes().contains(o))
                .forEach(o -> add("checks.yaml", key, "row '" + row + "' names unknown outcome '" + o + "'"));
        if (Math.abs(sum - 1.0) > SUM_TOLERANCE) {
            add("checks.yaml", key, String.format("row '%s' sums to %.4f, not 1", row, sum));
        }
    }

    private void checkQuantities() {
        Map<String, dev.positioner.measure.QuantityDef> all = new java.util.LinkedHashMap<>(catalogue.measurements());
        all.putAll(catalogue.design());
        all.values().forEach(q -> {
            q.units().stream().filter(u -> !UnitConverter.isKnownUnit(u))
                    .forEach(u -> add("quantities.yaml", q.code(), "unknown unit code '" + u + "'"));
            if (!(q.min() < q.max())) {
                add("quantities.yaml", q.code(), "min must be below max");
            }
        });
    }

    private void probability(String file, String key, String what, double p) {
        if (!(p > 0 && p < 1)) {
            add(file, key, what + " = " + p + " must lie strictly between 0 and 1");
        }
    }

    private void knownFault(String file, String key, String fault) {
        if (!catalogue.faults().containsKey(fault)) {
            add(file, key, "unknown fault code '" + fault + "'");
        }
    }

    private void sources(String file, String key, List<String> ids) {
        if (ids.isEmpty()) {
            add(file, key, "no source given (name a source id, or common_practice / from_memory)");
        }
        ids.stream().filter(id -> !catalogue.sources().containsKey(id))
                .forEach(id -> add(file, key, "unknown source id '" + id + "'"));
    }

    private void add(String file, String key, String message) {
        int line = key == null ? 0 : lines.getOrDefault(file + "/" + key, lines.getOrDefault(file + "/" + key.split("/")[0], 0));
        problems.add(new KnowledgeProblem("rules/catalogue/" + file, line, key, message));
    }
}
