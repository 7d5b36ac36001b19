package dev.positioner.diagnosis;

import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.IntStream;

/**
 * Why a hypothesis stands where it does: the pieces of evidence that moved it most, each with the
 * factor by which it is more (or less) likely under this cause than under the causes on average
 * (P(e | h) divided by the prior-weighted mean of P(e | g)). A factor of 1 means no influence.
 */
final class Reasons {

    /** Evidence that moves a cause by less than this factor either way is not worth a line. */
    static final double NOTABLE = 1.5;
    static final int MAX_REASONS = 4;

    private Reasons() {
    }

    static List<String> forHypothesis(int h, double[] prior, List<EvidenceItem> items, String priorNote) {
        List<String> reasons = IntStream.range(0, items.size()).boxed()
                .map(i -> new Scored(items.get(i), items.get(i).likelihood()[h] / Bayes.predictive(prior, items.get(i).likelihood())))
                .filter(s -> s.factor >= NOTABLE || s.factor <= 1 / NOTABLE)
                .sorted(Comparator.comparingDouble((Scored s) -> -Math.abs(Math.log(s.factor))))
                .limit(MAX_REASONS)
                .map(Reasons::say)
                .collect(java.util.stream.Collectors.toCollection(java.util.ArrayList::new));
        if (priorNote != null) {
            reasons.add(priorNote);
        }
        return reasons;
    }

    private static String say(Scored s) {
        String direction = s.factor >= 1
                ? String.format(Locale.ROOT, "%.1fx more likely with this cause than on average", s.factor)
                : String.format(Locale.ROOT, "%.1fx less likely with this cause than on average", 1 / s.factor);
        return s.item.label() + " - " + direction + ".";
    }

    private record Scored(EvidenceItem item, double factor) {
    }
}
