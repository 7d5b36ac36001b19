package dev.positioner.evaluation;

import dev.positioner.diagnosis.DiagnosisRequest.CheckInput;
import dev.positioner.diagnosis.DiagnosisResponse;
import dev.positioner.diagnosis.DiagnosisService;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.CheckDef;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * What a methodical technician without the planner would do: every check not yet known and not
 * marked unavailable, quickest first (ties in catalogue order), re-ranking after each with the same
 * service, until the leading cause reaches the stopping probability or no check is left. Checks the
 * presenting measurements already stand for are not repeated and cost nothing.
 */
public final class CheapestFirstBaseline {

    private final DiagnosisService service;
    private final Catalogue catalogue;
    private final ReadingProbe probe;
    private final double stopProbability;

    public CheapestFirstBaseline(DiagnosisService service, Catalogue catalogue, double stopProbability) {
        this.service = service;
        this.catalogue = catalogue;
        this.probe = new ReadingProbe(service, catalogue);
        this.stopProbability = stopProbability;
    }

    private double repairMinutes(String fault) {
        return catalogue.hypothesis(fault).repairMinutes();
    }

    public ReplayResult run(EvaluationCase c) {
        DiagnosisResponse first = service.diagnose(c.request());
        Map<String, String> known = probe.knownFromReadings(c.request());
        Set<String> unavailable = c.request().unavailableChecks() == null ? Set.of() : Set.copyOf(c.request().unavailableChecks());
        List<CheckDef> order = catalogue.checks().values().stream()
                .sorted(Comparator.comparingDouble(CheckDef::minutes)).toList(); // stable: ties keep catalogue order
        DiagnosisResponse r = first;
        List<CheckInput> done = new ArrayList<>();
        List<ReplayStep> steps = new ArrayList<>();
        for (CheckDef check : order) {
            if (Requests.leader(r).probability() >= stopProbability) {
                break;
            }
            if (known.containsKey(check.code()) || unavailable.contains(check.code())) {
                continue;
            }
            String outcome = c.answer(check);
            done.add(new CheckInput(check.code(), outcome));
            r = service.diagnose(Requests.withChecks(c.request(), done));
            steps.add(new ReplayStep(check.code(), outcome, check.minutes(), check.bypass(),
                    Requests.leader(r).fault(), Requests.leader(r).probability()));
        }
        String stop = Requests.leader(r).probability() >= stopProbability ? "leader at or above the stopping probability"
                : "no checks left";
        return new ReplayResult(c, first, r, steps, stop, this::repairMinutes);
    }
}
