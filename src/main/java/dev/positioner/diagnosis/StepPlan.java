package dev.positioner.diagnosis;

import dev.positioner.knowledge.CheckDef;
import dev.positioner.knowledge.Fault;

/**
 * The next step towards a working valve: a check, or a repair of a fault (exactly one is set), or
 * neither with the reason why not. Costs are expected minute-equivalents to a working valve: with
 * repairs only from here ({@code expectedCostNow}), and with this step first.
 */
public record StepPlan(CheckDef check, Fault repair, String why, String stopReason, double expectedCostNow,
        double expectedCostWithStep) {

    static StepPlan stop(String reason, double now) {
        return new StepPlan(null, null, null, reason, now, Double.NaN);
    }

    boolean isRepair() {
        return repair != null;
    }
}
