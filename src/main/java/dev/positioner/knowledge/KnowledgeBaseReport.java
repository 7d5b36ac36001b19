package dev.positioner.knowledge;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * What a reliability engineer needs to see about the knowledge base: counts, codes, and the blind
 * spots, i.e. every pair of faults that no check separates by at least {@code separationThreshold}
 * in total variation distance (half the sum of |P(o | a) - P(o | b)| over the outcomes). Two faults
 * below it look alike to every check: the service can rank them but not tell them apart.
 */
public record KnowledgeBaseReport(int faults, int symptoms, int checks, int rules, int cautions,
        double separationThreshold, List<String> faultCodes, List<String> symptomCodes, List<String> checkCodes,
        List<Pair> indistinguishable) {

    /** Below 0.3 a check shifts the odds between two faults by less than about 2:1 (modelling choice). */
    public static final double SEPARATION = 0.3;

    public record Pair(String faultA, String faultB, String bestCheck, double separation) {
    }

    public static KnowledgeBaseReport of(KnowledgeBase kb) {
        Catalogue c = kb.catalogue();
        List<String> faults = List.copyOf(c.faults().keySet());
        List<Pair> pairs = new ArrayList<>();
        for (int i = 0; i < faults.size(); i++) {
            for (int j = i + 1; j < faults.size(); j++) {
                Pair best = bestSeparation(c, faults.get(i), faults.get(j));
                if (best.separation() < SEPARATION) {
                    pairs.add(best);
                }
            }
        }
        int rules = kb.rules().getKiePackages().stream().mapToInt(p -> p.getRules().size()).sum();
        return new KnowledgeBaseReport(faults.size(), c.symptoms().size(), c.checks().size(), rules, c.cautions().size(),
                SEPARATION, faults, List.copyOf(c.symptoms().keySet()), List.copyOf(c.checks().keySet()), pairs);
    }

    static Pair bestSeparation(Catalogue c, String a, String b) {
        String bestCheck = null;
        double best = -1;
        for (Map.Entry<String, CheckDef> e : c.checks().entrySet()) {
            CheckDef check = e.getValue();
            double distance = 0;
            for (String outcome : check.outcomes()) {
                distance += Math.abs(check.likelihood(outcome, a) - check.likelihood(outcome, b));
            }
            distance /= 2;
            if (distance > best) {
                best = distance;
                bestCheck = e.getKey();
            }
        }
        return new Pair(a, b, bestCheck, best);
    }
}
