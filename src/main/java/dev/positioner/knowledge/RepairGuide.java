package dev.positioner.knowledge;

import java.util.List;

/**
 * Steps that follow every repair: the return to service (leak check, bleeding, level, as-found and
 * as-left calibration, strokes, step test, hand-back) and what to do when the job cannot be
 * finished tonight (make safe, tell operations, whom to call).
 */
public record RepairGuide(List<String> returnToService, List<String> ifNotTonight) {

    public static RepairGuide empty() {
        return new RepairGuide(List.of(), List.of());
    }
}
