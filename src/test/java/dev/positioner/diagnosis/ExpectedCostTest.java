package dev.positioner.diagnosis;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The expected-cost formulas of Heckerman, Breese and Rommelse, "Decision-theoretic
 * troubleshooting" (CACM 38(3), 1995), on a small example worked by hand.
 *
 * Two faults and one check. p = (0.6, 0.4); repair costs C = (100, 20) minutes.
 * Repair order by p/C: fault 1 has 0.4/20 = 0.02, fault 0 has 0.6/100 = 0.006, so fault 1 first.
 * ECR = C1 + (1 - p1) C0 = 20 + 0.6 * 100 = 80.
 * (The other order would cost 100 + 0.4 * 20 = 108: the ratio rule is the cheaper one.)
 *
 * A check costing 10 with outcomes "a"/"b": P(a | f0) = 0.9, P(a | f1) = 0.2.
 * P(a) = 0.6*0.9 + 0.4*0.2 = 0.62; P(b) = 0.38.
 * p | a = (0.54, 0.08) / 0.62 = (0.870968, 0.129032); p/C: 0.0087 vs 0.00645, fault 0 first:
 *   ECR(a) = 100 + 0.129032 * 20 = 102.580645.
 * p | b = (0.06, 0.32) / 0.38 = (0.157895, 0.842105); fault 1 first:
 *   ECR(b) = 20 + 0.157895 * 100 = 35.789474.
 * ECO = 10 + 0.62 * 102.580645 + 0.38 * 35.789474 = 10 + 63.6 + 13.6 = 87.2.
 * ECO 87.2 > ECR 80: the paper's myopic rule says repair fault 1 first, do not observe.
 */
class ExpectedCostTest {

    static final double[] P = {0.6, 0.4};
    static final double[] C = {100, 20};
    static final double[][] CHECK = {{0.9, 0.2}, {0.1, 0.8}};

    @Test
    void expectedCostOfRepairInRatioOrder() {
        assertArrayEquals(new Integer[] {1, 0}, ExpectedCost.order(P, C));
        assertEquals(80.0, ExpectedCost.ecr(P, C), 1e-9);
    }

    @Test
    void expectedCostOfObservingFirst() {
        assertEquals(87.2, ExpectedCost.eco(P, C, 10, CHECK), 1e-6);
    }

    @Test
    void aCheapDecisiveCheckPaysForItself() {
        // Same faults, a perfect check costing 2: P(a | f0) = 1 - 1e-9 (almost), P(a | f1) ~ 0.
        // After it the right repair is done first: ECR(a) = 100, ECR(b) = 20.
        // ECO = 2 + 0.6 * 100 + 0.4 * 20 = 70 < 80, so observing is worth it.
        double[][] perfect = {{1 - 1e-9, 1e-9}, {1e-9, 1 - 1e-9}};
        assertEquals(70.0, ExpectedCost.eco(P, C, 2, perfect), 1e-6);
    }
}
