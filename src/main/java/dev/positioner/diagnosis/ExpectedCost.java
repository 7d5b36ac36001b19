package dev.positioner.diagnosis;

import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.IntStream;

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
        Integer[] order = IntStream.range(0, p.length).boxed().toArray(Integer[]::new);
        Arrays.sort(order, Comparator.comparingDouble((Integer i) -> -p[i] / repairCost[i]));
        return order;
    }
}
