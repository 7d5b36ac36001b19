package dev.positioner.knowledge;

import java.util.List;

/**
 * A fault of the catalogue: the cause a technician would confirm and repair. {@code prior} is the
 * probability that it is the cause before any evidence; {@code repairMinutes} is what confirming
 * and repairing it costs, used by the check planner to weigh a check against simply trying a repair.
 */
public record Fault(String code, String title, String group, double prior, String failureMode,
        String mechanism, String cause, double repairMinutes, String action, List<String> sources) {
}
