package dev.positioner.diagnosis;

/**
 * Expected cost to a working valve when only repairs are left (Breese and Heckerman,
 * "Decision-theoretic troubleshooting: a framework for repair and experiment", UAI 1996): repairs
 * that have not been tried, done in order of P(h) x P(fix | h) / cost descending (the "P over C"
 * order of Kadane and Simon, 1977, optimal for a single fault with independent repairs), each paid
 * for only while the valve is still not working; whatever chance remains after the last repair is
 * the cost of calling for help. With perfect repairs this is the expected cost of repair of
 * Heckerman, Breese and Rommelse (CACM 1995), see {@link ExpectedCost}.
 */
final class RepairOrder {

    private RepairOrder() {
    }

    static double ecr(double[] p, RepairCosts r, boolean[] tried) {
        int n = p.length;
        int[] order = order(p, r, tried);
        double cost = 0;
        double fixedBefore = 0;
        for (int k = 0; k < order.length; k++) {
            int h = order[k];
            cost += r.cost()[h] * (1 - fixedBefore);
            fixedBefore += p[h] * r.fix()[h];
        }
        return cost + r.callForHelp() * Math.max(0, 1 - fixedBefore);
    }

    /** Untried hypotheses, best first: p f / C descending (insertion sort of a few dozen). */
    static int[] order(double[] p, RepairCosts r, boolean[] tried) {
        int n = p.length;
        int[] order = new int[n];
        double[] key = new double[n];
        int m = 0;
        for (int h = 0; h < n; h++) {
            if (tried[h]) {
                continue;
            }
            double k = p[h] * r.fix()[h] / r.cost()[h];
            int j = m++;
            while (j > 0 && key[j - 1] < k) {
                key[j] = key[j - 1];
                order[j] = order[j - 1];
                j--;
            }
            key[j] = k;
            order[j] = h;
        }
        return java.util.Arrays.copyOf(order, m);
    }

    /** Belief after repairing h without the valve working again: h stays possible only as far as the repair can fail. */
    static double[] afterFailedRepair(double[] p, RepairCosts r, int h) {
        double[] out = p.clone();
        double notFixed = 1 - p[h] * r.fix()[h];
        out[h] = p[h] * (1 - r.fix()[h]);
        for (int i = 0; i < out.length; i++) {
            out[i] = notFixed > 0 ? out[i] / notFixed : p[i];
        }
        return out;
    }
}
