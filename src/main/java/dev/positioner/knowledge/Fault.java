package dev.positioner.knowledge;

import java.util.List;

/**
 * A fault of the catalogue: the cause a technician would confirm and repair. {@code prior} is the
 * probability that it is the cause before any evidence; {@code repair} (from repairs.yaml) is what
 * getting the valve working again costs when it is the cause, which the planner weighs against checks.
 */
public record Fault(String code, String title, String group, double prior, String failureMode,
        String mechanism, String cause, List<String> sources, Repair repair) {

    public double repairMinutes() {
        return repair.minutes();
    }

    public String action() {
        return repair.action();
    }

    Fault withRepair(Repair r) {
        return new Fault(code, title, group, prior, failureMode, mechanism, cause, sources, r);
    }
}
