package dev.positioner.diagnosis;

import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.CheckDef;
import dev.positioner.knowledge.Fault;
import java.util.List;

/**
 * P(outcome | h) for every hypothesis, catalogue order with the unlisted cause last. The unlisted
 * cause is taken to behave like an average catalogued cause: its outcome probability is the
 * prior-weighted mean over the faults. A uniform distribution would make every normal result count
 * as evidence against "something else", and the planner would chase those results for nothing.
 */
final class Likelihoods {

    private Likelihoods() {
    }

    static double[] ofOutcome(Catalogue catalogue, CheckDef check, String outcome) {
        List<Fault> hypotheses = catalogue.hypotheses();
        double[] l = new double[hypotheses.size()];
        double weighted = 0;
        double weights = 0;
        for (int h = 0; h < l.length - 1; h++) {
            Fault f = hypotheses.get(h);
            l[h] = check.likelihood(outcome, f.code());
            weighted += f.prior() * l[h];
            weights += f.prior();
        }
        l[l.length - 1] = weighted / weights;
        return l;
    }

    /**
     * [outcome][hypothesis] table of a check, for the planner's look-ahead. The catalogue never
     * changes while the service runs, so each table is built once; callers must not modify it.
     */
    static double[][] ofCheck(Catalogue catalogue, CheckDef check) {
        return TABLES.computeIfAbsent(check, c -> {
            double[][] table = new double[c.outcomes().size()][];
            for (int k = 0; k < table.length; k++) {
                table[k] = ofOutcome(catalogue, c, c.outcomes().get(k));
            }
            return table;
        });
    }

    private static final java.util.Map<CheckDef, double[][]> TABLES =
            java.util.Collections.synchronizedMap(new java.util.IdentityHashMap<>());
}
