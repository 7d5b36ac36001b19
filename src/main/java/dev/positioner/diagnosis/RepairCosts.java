package dev.positioner.diagnosis;

import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.Fault;
import dev.positioner.knowledge.Repair;
import java.util.List;

/**
 * What each hypothesis's repair costs the planner, in minute-equivalents: its minutes to a working
 * valve, its parts at the site's money per hour, and the penalty of what it disturbs (a repair that
 * takes the positioner out of control or stops a shared unit carries the same exposure as a check
 * that does). {@code fix[h]} is P(the repair works | h is the cause). The unlisted cause's repair is
 * escalation; its cost is also what calling for help costs once every repair has been tried.
 */
record RepairCosts(double[] cost, double[] fix, boolean[] reversible, double callForHelp) {

    static RepairCosts of(Catalogue catalogue, double moneyPerHour) {
        List<Fault> hypotheses = catalogue.hypotheses();
        int n = hypotheses.size();
        double[] cost = new double[n];
        double[] fix = new double[n];
        boolean[] reversible = new boolean[n];
        for (int h = 0; h < n; h++) {
            Repair r = hypotheses.get(h).repair();
            cost[h] = minuteEquivalents(catalogue, r, moneyPerHour);
            fix[h] = r.fixChance();
            reversible[h] = r.reversible();
        }
        return new RepairCosts(cost, fix, reversible, cost[n - 1]);
    }

    static double minuteEquivalents(Catalogue catalogue, Repair r, double moneyPerHour) {
        return r.minutes() + (moneyPerHour > 0 ? r.partsCost() / moneyPerHour * 60 : 0) + catalogue.penaltyMinutes(r.disturbs());
    }
}
