package dev.positioner.evaluation;

import dev.positioner.diagnosis.DiagnosisResponse;
import dev.positioner.diagnosis.DiagnosisResponse.HypothesisView;
import java.util.List;

/** A whole replayed session: the first answer, the last one, and the checks made in between. */
public record ReplayResult(EvaluationCase c, DiagnosisResponse first, DiagnosisResponse last, List<ReplayStep> steps,
        String stopReason, java.util.function.ToDoubleFunction<String> repairMinutes) {

    public int firstRank() {
        return Requests.rank(first, c.truth());
    }

    public int finalRank() {
        return Requests.rank(last, c.truth());
    }

    public HypothesisView finalLeader() {
        return Requests.leader(last);
    }

    public boolean solved() {
        return finalLeader().fault().equals(c.truth());
    }

    /**
     * The cause the expected-cost order would repair first at the end: highest probability per repair
     * minute (the order the planner's expected cost of repair assumes), which need not be the leader.
     */
    public String firstActedOn() {
        return last.hypotheses().stream()
                .max(java.util.Comparator.comparingDouble(h -> h.probability() / repairMinutes.applyAsDouble(h.fault())))
                .orElseThrow().fault();
    }

    public double minutes() {
        return steps.stream().mapToDouble(ReplayStep::minutes).sum();
    }

    public long bypassChecks() {
        return steps.stream().filter(ReplayStep::bypass).count();
    }

    public String path() {
        return steps.isEmpty() ? "(no checks)" : String.join(" > ", steps.stream().map(s -> s.check() + "=" + s.outcome()).toList());
    }
}
