package dev.positioner.knowledge;

import java.util.List;
import java.util.Map;

/**
 * A check a technician can make, what it costs, what it needs, and P(outcome | fault). Faults not
 * listed under {@code given} take the {@code otherwise} distribution. {@code disturbs} names its
 * {@link Disturbance} classes (one or more: a check can bypass this valve and load a shared unit); {@code resultAfterHours} is how long its result takes to come back
 * when that is longer than the job (a laboratory count): such a check is not proposed for tonight,
 * but its result counts when a client sends one. {@code persons}: how many people the check needs.
 */
public record CheckDef(String code, String title, double minutes, boolean bypass, List<String> outcomes,
        List<String> instructions, List<String> cautions, Map<String, Double> otherwise,
        Map<String, Map<String, Double>> given, List<String> sources, List<String> disturbs, double resultAfterHours, int persons) {

    public boolean resultLater() {
        return resultAfterHours > 0;
    }

    public double likelihood(String outcome, String fault) {
        Map<String, Double> row = given.getOrDefault(fault, otherwise);
        return row.getOrDefault(outcome, 0.0);
    }

    public String normalOutcome() {
        return outcomes.get(0);
    }
}
