package dev.positioner.diagnosis.facts;

/**
 * Checks that disturb this class (a code of disturbances.yaml) are held back for now, for the reason
 * given: a valve stroked on what an accumulator holds, with the pump stopped, may not come back.
 */
public record Hold(String disturbance, String reason) {
}
