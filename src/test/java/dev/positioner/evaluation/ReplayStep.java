package dev.positioner.evaluation;

/** One check made during a replay, the answer the case gave, and who led afterwards. */
public record ReplayStep(String check, String outcome, double minutes, boolean bypass, String leader,
        double leaderProbability) {
}
