package dev.positioner.evaluation;

import dev.positioner.diagnosis.DiagnosisRequest.CheckInput;
import dev.positioner.diagnosis.DiagnosisResponse;
import dev.positioner.diagnosis.DiagnosisService;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.CheckDef;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Replays a case as a guided session: send the presenting information, then do whatever check the
 * service names next, answering from the case's truth, until the service stops asking (or 40 checks,
 * which would itself be a failure worth seeing in the report).
 */
public final class GuidedReplay {

    public static final int MAX_STEPS = 40;

    private final DiagnosisService service;
    private final Catalogue catalogue;

    public GuidedReplay(DiagnosisService service, Catalogue catalogue) {
        this.service = service;
        this.catalogue = catalogue;
    }

    private double repairMinutes(String fault) {
        return catalogue.hypothesis(fault).repairMinutes();
    }

    public ReplayResult run(EvaluationCase c) {
        DiagnosisResponse first = service.diagnose(c.request());
        DiagnosisResponse r = first;
        List<CheckInput> done = new ArrayList<>();
        List<ReplayStep> steps = new ArrayList<>();
        Set<String> asked = new HashSet<>();
        while (r.nextCheck() != null && steps.size() < MAX_STEPS) {
            CheckDef check = catalogue.checks().get(r.nextCheck().check());
            if (!asked.add(check.code())) {
                return new ReplayResult(c, first, r, steps, "the service asked for " + check.code() + " a second time", this::repairMinutes);
            }
            String outcome = c.answer(check);
            done.add(new CheckInput(check.code(), outcome));
            r = service.diagnose(Requests.withChecks(c.request(), done));
            steps.add(new ReplayStep(check.code(), outcome, check.minutes(), check.bypass(),
                    Requests.leader(r).fault(), Requests.leader(r).probability()));
        }
        String stop = r.nextCheck() == null ? r.decision().stopReason() : "stopped after " + MAX_STEPS + " checks";
        return new ReplayResult(c, first, r, steps, stop, this::repairMinutes);
    }
}
