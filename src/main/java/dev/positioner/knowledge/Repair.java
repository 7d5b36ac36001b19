package dev.positioner.knowledge;

import java.util.List;

/**
 * The repair of one fault and what it takes to get the valve working again: minutes of work to a
 * working valve, parts cost in the site's money, whether it can be undone, the chance it fixes the
 * valve when that fault is present, what it disturbs, and the job as steps (tools, spares, the
 * adjustments that follow, cautions, what to add to the return to service, and what to do when it
 * cannot be finished tonight).
 */
public record Repair(String fault, String action, double minutes, double partsCost, boolean reversible,
        double fixChance, List<String> disturbs, List<String> tools, List<String> spares, List<String> steps,
        List<String> adjustments, List<String> cautions, List<String> returnToService, List<String> ifNotTonight,
        List<String> sources) {

    /** A repair known only by its action and minutes (the unlisted cause: escalation). */
    public static Repair minimal(String fault, String action, double minutes, List<String> sources) {
        return new Repair(fault, action, minutes, 0, true, 0.5, List.of("nothing"), List.of(), List.of(), List.of(), List.of(),
                List.of(), List.of(), List.of(), sources);
    }
}
