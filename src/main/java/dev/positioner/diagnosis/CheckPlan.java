package dev.positioner.diagnosis;

import dev.positioner.knowledge.CheckDef;

/**
 * The planner's decision: the check to do next (null to stop), why, and the expected costs that
 * decided it, in minutes (bypass checks include the process-exposure penalty).
 */
public record CheckPlan(CheckDef check, String why, String stopReason, double expectedCostNow,
        double expectedCostWithCheck) {
}
