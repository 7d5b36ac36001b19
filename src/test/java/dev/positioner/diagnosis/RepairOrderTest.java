package dev.positioner.diagnosis;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** The expected cost to a working valve when only repairs are left, against published and brute-force values. */
class RepairOrderTest {

    static RepairCosts costs(double[] cost, double[] fix, double callForHelp) {
        return new RepairCosts(cost, fix, new boolean[cost.length], callForHelp);
    }

    /**
     * S. Ross, A First Course in Probability (chapter 7 problems: "two possible causes for a breakdown
     * of a machine"): checking cause i costs C_i and repairing it R_i; the expected cost of checking 1
     * first is E1 = C1 + p R1 + (1 - p)(C2 + R2), of checking 2 first E2 = C2 + (1 - p) R2 + p (C1 + R1),
     * and 1 should go first exactly when C1 / p <= C2 / (1 - p), the "P over C" rule. A perfect check
     * followed by its repair is, in our terms, a step costing C_i that always finds cause i when it is
     * there, so our ECR over the C_i plus the repair paid once, p R1 + (1 - p) R2, must equal the
     * cheaper of E1 and E2, in that order.
     */
    @Test
    void reproducesTheTwoCauseMachineBreakdownExample() {
        double p = 0.3, c1 = 10, c2 = 40, r1 = 50, r2 = 20;
        double e1 = c1 + p * r1 + (1 - p) * (c2 + r2);
        double e2 = c2 + (1 - p) * r2 + p * (c1 + r1);
        RepairCosts steps = costs(new double[] {c1, c2}, new double[] {1, 1}, 0);
        double ours = RepairOrder.ecr(new double[] {p, 1 - p}, steps, new boolean[2]) + p * r1 + (1 - p) * r2;
        // c1 / p = 33.3 <= c2 / (1 - p) = 57.1: cause 1 first, E1 = 10 + 15 + 0.7 x 60 = 67.
        assertEquals(67.0, e1, 1e-9);
        assertEquals(Math.min(e1, e2), ours, 1e-9);
        assertArrayEquals(new int[] {0, 1}, RepairOrder.order(new double[] {p, 1 - p}, steps, new boolean[2]));
        // Make checking cause 1 dear enough and the order turns, as the rule says: 60 / 0.3 > 40 / 0.7.
        RepairCosts dear = costs(new double[] {60, c2}, new double[] {1, 1}, 0);
        assertArrayEquals(new int[] {1, 0}, RepairOrder.order(new double[] {p, 1 - p}, dear, new boolean[2]));
        double e2dear = c2 + (1 - p) * r2 + p * (60 + r1);
        assertEquals(e2dear, RepairOrder.ecr(new double[] {p, 1 - p}, dear, new boolean[2]) + p * r1 + (1 - p) * r2, 1e-9);
    }

    /**
     * With imperfect repairs each tried once, the p f / C order is optimal for a single fault
     * (Breese and Heckerman 1996, after Kadane and Simon 1977): no other order of the same repairs is
     * cheaper. Checked against every permutation on seeded random problems of five causes.
     */
    @Test
    void thePOverCOrderIsNoDearerThanAnyOtherOrder() {
        Random random = new Random(20261202);
        for (int trial = 0; trial < 200; trial++) {
            int n = 5;
            double[] p = new double[n];
            double[] cost = new double[n];
            double[] fix = new double[n];
            double sum = 0;
            for (int i = 0; i < n; i++) {
                p[i] = 0.05 + random.nextDouble();
                sum += p[i];
                cost[i] = 5 + random.nextDouble() * 200;
                fix[i] = 0.5 + random.nextDouble() * 0.5;
            }
            for (int i = 0; i < n; i++) {
                p[i] /= sum;
            }
            RepairCosts r = costs(cost, fix, 300);
            double ours = RepairOrder.ecr(p, r, new boolean[n]);
            double best = Double.POSITIVE_INFINITY;
            for (List<Integer> order : permutations(n)) {
                best = Math.min(best, costOf(order, p, r));
            }
            assertEquals(best, ours, 1e-9, "trial " + trial);
        }
    }

    @Test
    void aFailedRepairLeavesItsCauseOnlyAsFarAsTheRepairCanFail() {
        RepairCosts r = costs(new double[] {10, 10}, new double[] {0.8, 0.9}, 100);
        double[] after = RepairOrder.afterFailedRepair(new double[] {0.5, 0.5}, r, 0);
        // P(not fixed) = 1 - 0.5 x 0.8 = 0.6; cause 0 keeps 0.5 x 0.2 = 0.1 of it: 1/6.
        assertEquals(0.1 / 0.6, after[0], 1e-12);
        assertEquals(0.5 / 0.6, after[1], 1e-12);
    }

    private static double costOf(List<Integer> order, double[] p, RepairCosts r) {
        double cost = 0, fixed = 0;
        for (int h : order) {
            cost += r.cost()[h] * (1 - fixed);
            fixed += p[h] * r.fix()[h];
        }
        return cost + r.callForHelp() * (1 - fixed);
    }

    private static List<List<Integer>> permutations(int n) {
        List<List<Integer>> out = new ArrayList<>();
        permute(new ArrayList<>(), new boolean[n], out);
        return out;
    }

    private static void permute(List<Integer> prefix, boolean[] used, List<List<Integer>> out) {
        if (prefix.size() == used.length) {
            out.add(new ArrayList<>(prefix));
            return;
        }
        for (int i = 0; i < used.length; i++) {
            if (!used[i]) {
                used[i] = true;
                prefix.add(i);
                permute(prefix, used, out);
                prefix.remove(prefix.size() - 1);
                used[i] = false;
            }
        }
    }
}
