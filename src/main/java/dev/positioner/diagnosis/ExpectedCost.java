package dev.positioner.diagnosis;


/**
 * Expected cost of repair (ECR) of the single-fault troubleshooting model of Heckerman, Breese and
 * Rommelse, "Decision-theoretic troubleshooting", Communications of the ACM 38(3), 1995. With
 * each cause i repaired (and the repair tested) at cost C_i, the best order is by p_i / C_i
 * descending (Kadane and Simon 1977, used by the paper), and its expected cost is
 * ECR = sum_i C_i (1 - sum_{j before i} p_j): a repair is paid for only while the problem is still there.
 * The expected cost of observing check o first is ECO(o) = c_o + sum_k P(o = k) ECR(p | o = k).
 */
public final class ExpectedCost {

    private ExpectedCost() {
    }

    public static double ecr(double[] p, double[] repairCost) {
        Integer[] order = order(p, repairCost);
        double cost = 0;
        double repairedAlready = 0;
        for (int i : order) {
            cost += repairCost[i] * (1 - repairedAlready);
            repairedAlready += p[i];
        }
        return cost;
    }

    /** @param outcomeLikelihood [outcome][hypothesis] = P(outcome | hypothesis) */
    public static double eco(double[] p, double[] repairCost, double checkCost, double[][] outcomeLikelihood) {
        double expected = checkCost;
        for (double[] likelihood : outcomeLikelihood) {
            double pk = Bayes.predictive(p, likelihood);
            if (pk > 0) {
                expected += pk * ecr(Bayes.update(p, likelihood), repairCost);
            }
        }
        return expected;
    }

    /** Hypothesis indices in repair order: p / C descending. */
    public static Integer[] order(double[] p, double[] repairCost) {
        // Insertion sort of a few dozen indices: the planner calls this a hundred times per request.
        int n = p.length;
        Integer[] order = new Integer[n];
        double[] key = new double[n];
        for (int i = 0; i < n; i++) {
            double k = p[i] / repairCost[i];
            int j = i;
            while (j > 0 && key[j - 1] < k) {
                key[j] = key[j - 1];
                order[j] = order[j - 1];
                j--;
            }
            key[j] = k;
            order[j] = i;
        }
        return order;
    }
}
