package dev.positioner.diagnosis;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.List;

/** The one-shot response; field names are the contract's (see openapi/openapi.yaml). */
public record DiagnosisResponse(List<HypothesisView> hypotheses, NextCheckView nextCheck, List<FindingView> findings,
        List<String> cautions, List<String> assumptions, DecisionView decision, List<String> alerts, NextStepView nextStep) {

    public record HypothesisView(String fault, String title, double probability, String failureMode,
            String mechanism, String action, List<String> reasons) {
    }

    /** {@code disturbs}: codes of what the check disturbs (disturbances.yaml); {@code persons}: people it needs. */
    public record NextCheckView(String check, String title, double minutes, List<String> outcomes,
            boolean bypassRequired, List<String> instructions, List<String> cautions, String why,
            List<String> disturbs, int persons) {
    }

    /**
     * The next step to a working valve: a check ({@code kind} check, {@code code} its check code) or a
     * repair ({@code kind} repair, {@code code} the fault it repairs, outcomes fixed / not_fixed).
     */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record NextStepView(String kind, String code, String title, double minutes, List<String> outcomes,
            boolean bypassRequired, List<String> instructions, List<String> cautions, String why, List<String> disturbs,
            int persons, Boolean reversible, Double partsCost) {
    }

    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record FindingView(String code, String text, Double value, String unit, String limit) {
    }

    /** How the next check was decided: method, expected costs in minutes, and why it stopped if it did. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record DecisionView(String method, double stopThreshold, Double expectedCostNowMinutes,
            Double expectedCostWithCheckMinutes, String stopReason, List<String> rulesFired, String stepMethod,
            Double costToWorkingValveMinutes, Double costToWorkingValveWithStepMinutes, String stepStopReason,
            boolean findCauseFirst) {
    }
}
