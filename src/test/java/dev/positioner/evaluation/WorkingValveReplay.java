package dev.positioner.evaluation;

import dev.positioner.diagnosis.DiagnosisRequest;
import dev.positioner.diagnosis.DiagnosisRequest.CheckInput;
import dev.positioner.diagnosis.DiagnosisRequest.RepairInput;
import dev.positioner.diagnosis.DiagnosisResponse;
import dev.positioner.diagnosis.DiagnosisResponse.HypothesisView;
import dev.positioner.diagnosis.DiagnosisService;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.CheckDef;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Replays a case until the valve works: checks answered from the case's truth, repairs answered
 * "fixed" exactly when they repair the case's true cause (a wrong repair never fixes it; the right one
 * always does, since the case says that is what was wrong). Three ways of working:
 * <ul>
 * <li>{@link Policy#NEXT_STEP}: whatever the service's next step is, check or repair;</li>
 * <li>{@link Policy#CHECKS_THEN_REPAIRS}: the service's next check until it stops proposing checks
 * (the leader at the threshold, or no check can change the decision), then repairs of the most
 * probable untried cause, re-ranked after each that did not help;</li>
 * <li>{@link Policy#CHEAPEST_FIRST_THEN_REPAIRS}: checks quickest first until one cause reaches the
 * threshold, then repairs as above.</li>
 * </ul>
 * Minutes are real minutes: the checks' and the repairs' own, without the exposure penalties the
 * planner weighs.
 */
final class WorkingValveReplay {

    enum Policy { NEXT_STEP, CHECKS_THEN_REPAIRS, CHEAPEST_FIRST_THEN_REPAIRS }

    static final int MAX_STEPS = 60;

    /** One repair proposed: the chance the service gave that it would get the valve working, and whether it did. */
    record RepairForecast(double stated, boolean fixed) {
    }

    record Result(EvaluationCase c, Policy policy, boolean fixed, double checkMinutes, double repairMinutes, int checks,
            int wrongRepairs, String finalLeader, List<String> path, List<RepairForecast> forecasts) {

        double minutes() {
            return checkMinutes + repairMinutes;
        }

        boolean solved() {
            return c.truth().equals(finalLeader);
        }
    }

    private final DiagnosisService service;
    private final Catalogue catalogue;
    private final ReadingProbe probe;
    private final double stopProbability;

    WorkingValveReplay(DiagnosisService service, Catalogue catalogue, double stopProbability) {
        this.service = service;
        this.catalogue = catalogue;
        this.probe = new ReadingProbe(service, catalogue);
        this.stopProbability = stopProbability;
    }

    Result run(EvaluationCase c, Policy policy) {
        List<CheckInput> checks = new ArrayList<>();
        List<RepairInput> repairs = new ArrayList<>();
        List<String> path = new ArrayList<>();
        List<RepairForecast> forecasts = new ArrayList<>();
        Set<String> asked = new HashSet<>();
        double checkMinutes = 0;
        double repairMinutes = 0;
        int wrong = 0;
        boolean fixed = false;
        boolean repairing = false;
        Map<String, String> known = probe.knownFromReadings(c.request());
        List<CheckDef> quickestFirst = catalogue.checks().values().stream().sorted(Comparator.comparingDouble(CheckDef::minutes)).toList();
        DiagnosisResponse r = service.diagnose(request(c, checks, repairs, policy));
        while (!fixed && path.size() < MAX_STEPS) {
            String check = null;
            String repair = null;
            double stated = Double.NaN;
            if (policy == Policy.NEXT_STEP) {
                if (r.nextStep() == null) {
                    break;
                }
                if (r.nextStep().kind().equals("check")) {
                    check = r.nextStep().code();
                } else {
                    repair = r.nextStep().code();
                    stated = probability(r, repair) * catalogue.hypothesis(repair).repair().fixChance();
                }
            } else {
                if (!repairing) {
                    check = policy == Policy.CHECKS_THEN_REPAIRS ? (r.nextCheck() == null ? null : r.nextCheck().check())
                            : cheapestUnknown(quickestFirst, r, known, asked, c);
                    repairing = check == null;
                }
                if (repairing) {
                    HypothesisView next = r.hypotheses().stream().filter(h -> repairs.stream().noneMatch(x -> x.fault().equals(h.fault())))
                            .findFirst().orElse(null);
                    if (next == null) {
                        break;
                    }
                    repair = next.fault();
                    stated = next.probability() * catalogue.hypothesis(repair).repair().fixChance();
                }
            }
            if (check != null) {
                if (!asked.add(check)) {
                    path.add(check + " asked twice");
                    break;
                }
                CheckDef def = catalogue.checks().get(check);
                String outcome = c.answer(def);
                checks.add(new CheckInput(check, outcome));
                checkMinutes += def.minutes();
                path.add(check + "=" + outcome);
            } else {
                fixed = repair.equals(c.truth());
                repairs.add(new RepairInput(repair, fixed ? "fixed" : "not_fixed"));
                repairMinutes += catalogue.hypothesis(repair).repair().minutes();
                wrong += fixed ? 0 : 1;
                forecasts.add(new RepairForecast(stated, fixed));
                path.add("REPAIR " + repair + (fixed ? " (fixed)" : " (not fixed)"));
            }
            r = service.diagnose(request(c, checks, repairs, policy));
        }
        return new Result(c, policy, fixed, checkMinutes, repairMinutes, checks.size(), wrong, Requests.leader(r).fault(), path,
                forecasts);
    }

    private String cheapestUnknown(List<CheckDef> quickestFirst, DiagnosisResponse r, Map<String, String> known, Set<String> asked,
            EvaluationCase c) {
        if (Requests.leader(r).probability() >= stopProbability) {
            return null;
        }
        Set<String> unavailable = c.request().unavailableChecks() == null ? Set.of() : Set.copyOf(c.request().unavailableChecks());
        return quickestFirst.stream().map(CheckDef::code)
                .filter(code -> !known.containsKey(code) && !unavailable.contains(code) && !asked.contains(code)
                        && !catalogue.checks().get(code).resultLater())
                .findFirst().orElse(null);
    }

    private static double probability(DiagnosisResponse r, String fault) {
        return r.hypotheses().stream().filter(h -> h.fault().equals(fault)).findFirst().orElseThrow().probability();
    }

    private static DiagnosisRequest request(EvaluationCase c, List<CheckInput> checks, List<RepairInput> repairs, Policy policy) {
        DiagnosisRequest p = c.request();
        return new DiagnosisRequest(p.symptoms(), p.absentSymptoms(), p.measurements(), List.copyOf(checks), p.unavailableChecks(),
                p.asset(), p.traces(), List.copyOf(repairs), null);
    }
}
