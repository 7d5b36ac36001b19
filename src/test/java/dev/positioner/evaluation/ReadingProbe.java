package dev.positioner.evaluation;

import dev.positioner.diagnosis.DiagnosisRequest;
import dev.positioner.diagnosis.DiagnosisRequest.CheckInput;
import dev.positioner.diagnosis.DiagnosisResponse;
import dev.positioner.diagnosis.DiagnosisResponse.FindingView;
import dev.positioner.diagnosis.DiagnosisService;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.CheckDef;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * Which checks the presenting measurements already stand for, and with which outcome. The service
 * does not list these in its response, so the probe asks it: report every check with its k-th outcome
 * at once, and the service names each check whose reading disagrees ("contradiction_" findings). A
 * check that disagrees in some rounds but not in round k is known from a reading, with outcome k.
 * The cheapest-first baseline skips these checks, just as the service's planner does: a technician
 * who already holds the gauge reading does not read it again.
 */
final class ReadingProbe {

    static final String CONTRADICTION = "contradiction_";

    private final DiagnosisService service;
    private final Catalogue catalogue;

    ReadingProbe(DiagnosisService service, Catalogue catalogue) {
        this.service = service;
        this.catalogue = catalogue;
    }

    /** Each case whose readings imply a check outcome other than the case's own answer, one line each. */
    static List<String> disagreements(DiagnosisService service, Catalogue catalogue, List<EvaluationCase> cases) {
        ReadingProbe probe = new ReadingProbe(service, catalogue);
        List<String> out = new ArrayList<>();
        for (EvaluationCase c : cases) {
            probe.knownFromReadings(c.request()).forEach((check, outcome) -> {
                String answer = c.answer(catalogue.checks().get(check));
                if (!answer.equals(outcome)) {
                    out.add(c.id() + ": the readings imply " + check + " = " + outcome + ", the writer answers " + answer);
                }
            });
        }
        return out;
    }

    Map<String, String> knownFromReadings(DiagnosisRequest presenting) {
        int rounds = catalogue.checks().values().stream().mapToInt(c -> c.outcomes().size()).max().orElse(0);
        List<Set<String>> disagreeing = new ArrayList<>();
        for (int k = 0; k < rounds; k++) {
            List<CheckInput> all = new ArrayList<>();
            for (CheckDef c : catalogue.checks().values()) {
                all.add(new CheckInput(c.code(), c.outcomes().get(Math.min(k, c.outcomes().size() - 1))));
            }
            DiagnosisResponse r = service.diagnose(Requests.withChecks(presenting, all));
            disagreeing.add(r.findings().stream().map(FindingView::code).filter(code -> code.startsWith(CONTRADICTION))
                    .map(code -> code.substring(CONTRADICTION.length())).collect(Collectors.toSet()));
        }
        Map<String, String> known = new LinkedHashMap<>();
        for (CheckDef c : catalogue.checks().values()) {
            for (int k = 0; k < c.outcomes().size(); k++) {
                boolean disagreesSomewhere = disagreeing.stream().anyMatch(s -> s.contains(c.code()));
                if (disagreesSomewhere && !disagreeing.get(k).contains(c.code())) {
                    known.put(c.code(), c.outcomes().get(k));
                }
            }
        }
        return known;
    }
}
