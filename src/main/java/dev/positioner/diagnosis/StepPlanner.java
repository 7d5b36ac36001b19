package dev.positioner.diagnosis;

import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.CheckDef;
import dev.positioner.knowledge.Fault;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Chooses the next step to a working valve among every available check and every repair not yet
 * tried, by expected cost to a working valve (Breese and Heckerman, UAI 1996), looking two steps
 * ahead: each candidate is valued at its cost plus, over its outcomes, the cheaper of finishing
 * with repairs only ({@link RepairOrder}) or taking the best further step first. A repair's
 * outcomes are "the valve works" (the job ends) and "it does not" (the fault stays possible only as
 * far as the repair can fail). To keep this cheap the two-step value is worked out for the
 * {@code breadth} best candidates by their one-step value, with the same number of checks and
 * repairs considered at the second step (the look-ahead of the SACSO troubleshooters, Jensen et
 * al., "The SACSO methodology for troubleshooting complex systems", AI EDAM 15, 2001, is of this
 * kind). A check whose result comes back after the job is never a step. A repair that cannot be
 * undone (a pump overhaul) is proposed only once its fault reaches {@code irreversibleMinimum}.
 * In "find the cause first" mode only checks are proposed until one cause reaches the stopping
 * threshold, then that cause's repair.
 */
public final class StepPlanner {

    private final Catalogue catalogue;
    private final List<Fault> hypotheses;
    private final RepairCosts repairs;
    private final double stopThreshold;
    private final double irreversibleMinimum;
    private final int breadth;

    public StepPlanner(Catalogue catalogue, double stopThreshold, double moneyPerHour, double irreversibleMinimum, int breadth) {
        this.catalogue = catalogue;
        this.hypotheses = catalogue.hypotheses();
        this.repairs = RepairCosts.of(catalogue, moneyPerHour);
        this.stopThreshold = stopThreshold;
        this.irreversibleMinimum = irreversibleMinimum;
        this.breadth = breadth;
    }

    public double repairCost(int hypothesis) {
        return repairs.cost()[hypothesis];
    }

    /** A candidate step: a check (index into checks) or a repair (hypothesis index), and its value. */
    private record Candidate(CheckDef check, int repair, double value) {
    }

    public StepPlan plan(double[] p, Set<String> doneChecks, Set<String> unavailable, Set<String> triedRepairs,
            boolean causeFirst) {
        boolean[] tried = new boolean[p.length];
        for (int h = 0; h < p.length; h++) {
            tried[h] = triedRepairs.contains(hypotheses.get(h).code());
        }
        double now = RepairOrder.ecr(p, repairs, tried);
        int leader = Bayes.argmax(p);
        List<CheckDef> checks = catalogue.checks().values().stream()
                .filter(c -> !doneChecks.contains(c.code()) && !unavailable.contains(c.code()) && !c.resultLater()).toList();
        List<Candidate> first = new ArrayList<>();
        for (CheckDef c : checks) {
            first.add(new Candidate(c, -1, oneStepCheck(p, tried, c)));
        }
        for (int h = 0; h < p.length; h++) {
            if (!tried[h]) {
                first.add(new Candidate(null, h, oneStepRepair(p, tried, h)));
            }
        }
        if (first.isEmpty()) {
            return StepPlan.stop("Every repair has been tried and no check is left: call for help with the record of this job.", now);
        }
        first.sort(Comparator.comparingDouble(Candidate::value));
        List<CheckDef> innerChecks = first.stream().filter(c -> c.check() != null).limit(breadth).map(Candidate::check).toList();
        Candidate best = null;
        for (Candidate c : allowed(first, p, leader, tried, causeFirst)) {
            double v = twoStep(c, p, tried, doneChecks, innerChecks);
            if (best == null || v < best.value()) {
                best = new Candidate(c.check(), c.repair(), v);
            }
        }
        if (best == null) {
            return StepPlan.stop("No check can be made and no repair is allowed yet: call for help with the record of this job.", now);
        }
        return best.check() != null
                ? new StepPlan(best.check(), null, whyCheck(best.check(), p), null, now, best.value())
                : new StepPlan(null, hypotheses.get(best.repair()), whyRepair(best.repair(), p), null, now, best.value());
    }

    /** The candidates that may be proposed, best one-step value first, at most {@code breadth} of them. */
    private List<Candidate> allowed(List<Candidate> sorted, double[] p, int leader, boolean[] tried, boolean causeFirst) {
        boolean leaderClear = p[leader] >= stopThreshold;
        List<Candidate> out = new ArrayList<>();
        for (Candidate c : sorted) {
            boolean ok;
            if (c.check() != null) {
                ok = !(causeFirst && leaderClear);
            } else if (causeFirst) {
                ok = leaderClear ? c.repair() == leader : !hasCheck(sorted);
            } else {
                ok = repairs.reversible()[c.repair()] || p[c.repair()] >= irreversibleMinimum;
            }
            if (ok) {
                out.add(c);
            }
            if (out.size() == breadth) {
                break;
            }
        }
        return out;
    }

    private static boolean hasCheck(List<Candidate> candidates) {
        return candidates.stream().anyMatch(c -> c.check() != null);
    }

    private double oneStepCheck(double[] p, boolean[] tried, CheckDef c) {
        double[][] table = Likelihoods.ofCheck(catalogue, c);
        double v = cost(c);
        for (double[] l : table) {
            double pk = Bayes.predictive(p, l);
            if (pk > 0) {
                v += pk * RepairOrder.ecr(Bayes.update(p, l), repairs, tried);
            }
        }
        return v;
    }

    private double oneStepRepair(double[] p, boolean[] tried, int h) {
        boolean[] next = tried.clone();
        next[h] = true;
        return repairs.cost()[h] + (1 - p[h] * repairs.fix()[h]) * RepairOrder.ecr(RepairOrder.afterFailedRepair(p, repairs, h), repairs, next);
    }

    private double twoStep(Candidate c, double[] p, boolean[] tried, Set<String> doneChecks, List<CheckDef> innerChecks) {
        if (c.check() != null) {
            double[][] table = Likelihoods.ofCheck(catalogue, c.check());
            double v = cost(c.check());
            for (double[] l : table) {
                double pk = Bayes.predictive(p, l);
                if (pk > 0) {
                    v += pk * bestAfter(Bayes.update(p, l), tried, c.check(), innerChecks);
                }
            }
            return v;
        }
        int h = c.repair();
        boolean[] next = tried.clone();
        next[h] = true;
        return repairs.cost()[h] + (1 - p[h] * repairs.fix()[h])
                * bestAfter(RepairOrder.afterFailedRepair(p, repairs, h), next, null, innerChecks);
    }

    /** The cheaper of finishing with repairs only and the best one-step continuation. */
    private double bestAfter(double[] p, boolean[] tried, CheckDef justDone, List<CheckDef> innerChecks) {
        double best = RepairOrder.ecr(p, repairs, tried);
        for (CheckDef c : innerChecks) {
            if (c != justDone) {
                best = Math.min(best, oneStepCheck(p, tried, c));
            }
        }
        int[] order = RepairOrder.order(p, repairs, tried);
        for (int k = 0; k < Math.min(breadth, order.length); k++) {
            best = Math.min(best, oneStepRepair(p, tried, order[k]));
        }
        return best;
    }

    double cost(CheckDef c) {
        return c.minutes() + catalogue.penaltyMinutes(c.disturbs());
    }

    /** In a technician's words: how long, and what the likeliest telling answer would mean. */
    private String whyCheck(CheckDef check, double[] p) {
        double[][] table = Likelihoods.ofCheck(catalogue, check);
        int bestOutcome = -1;
        double bestLead = 0;
        int bestLeader = 0;
        for (int k = 1; k < table.length; k++) {
            if (Bayes.predictive(p, table[k]) < 0.02) {
                continue;
            }
            double[] after = Bayes.update(p, table[k]);
            int lead = Bayes.argmax(after);
            if (after[lead] > bestLead) {
                bestLead = after[lead];
                bestLeader = lead;
                bestOutcome = k;
            }
        }
        String time = String.format(Locale.ROOT, "%.0f minutes", check.minutes());
        if (bestOutcome < 0) {
            return time + "; it rules out causes that would otherwise cost more to chase.";
        }
        String likely = bestLead >= 0.8 ? "it is almost certainly" : bestLead >= 0.5 ? "it is most likely" : "it points to";
        return String.format(Locale.ROOT, "%s; if it comes out %s, %s %s.", time,
                check.outcomes().get(bestOutcome).replace('_', ' '), likely, lower(hypotheses.get(bestLeader).title()));
    }

    private String whyRepair(int h, double[] p) {
        Fault f = hypotheses.get(h);
        return String.format(Locale.ROOT, "About %.0f minutes; it is the cause in about %.0f %% of cases like this, "
                        + "and trying it now is quicker on average than any check first. If the valve still misbehaves, say so and carry on.",
                f.repair().minutes(), p[h] * 100);
    }

    private static String lower(String title) {
        return title.isEmpty() ? title : Character.toLowerCase(title.charAt(0)) + title.substring(1);
    }
}
