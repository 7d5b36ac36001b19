package dev.positioner.evaluation;

/** One case replayed both ways. */
public record CaseResult(EvaluationCase c, ReplayResult guided, ReplayResult baseline) {
}
