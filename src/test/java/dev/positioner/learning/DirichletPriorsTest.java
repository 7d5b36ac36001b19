package dev.positioner.learning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

class DirichletPriorsTest {

    static final double[] BASE = {0.045, 0.455, 0.5};

    @Test
    void noClosuresLeaveTheCataloguePriors() {
        double[] p = DirichletPriors.update(BASE, new int[3], new int[3], 50, 0.5);
        for (int h = 0; h < 3; h++) {
            assertEquals(BASE[h], p[h], 1e-12);
        }
    }

    @Test
    void twoClosuresOnTheValveAddTwoToFiftyCatalogueClosures() {
        // (50 * 0.045 + 2) / (50 + 2) = 4.25 / 52, worked by hand.
        double[] p = DirichletPriors.update(BASE, new int[] {2, 0, 0}, new int[3], 50, 0.5);
        assertEquals(4.25 / 52, p[0], 1e-12);
        assertEquals(50 * 0.455 / 52, p[1], 1e-12);
        assertEquals(1.0, Arrays.stream(p).sum(), 1e-12);
    }

    @Test
    void closuresOnOtherValvesOfTheSiteCountLess() {
        double[] own = DirichletPriors.update(BASE, new int[] {4, 0, 0}, new int[3], 50, 0.5);
        double[] site = DirichletPriors.update(BASE, new int[3], new int[] {4, 0, 0}, 50, 0.5);
        // (2.25 + 4 * 0.5) / (50 + 4 * 0.5) for four site closures at half weight.
        assertEquals(4.25 / 52, site[0], 1e-12);
        assertTrue(own[0] > site[0]);
    }

    @Test
    void aFewClosuresCannotSwampTheCatalogueButManyTakeOver() {
        double[] few = DirichletPriors.update(BASE, new int[] {0, 5, 0}, new int[3], 50, 0.5);
        assertTrue(few[2] > 0.4, "a cause never confirmed keeps most of its prior after five closures: " + few[2]);
        double[] many = DirichletPriors.update(BASE, new int[] {0, 500, 0}, new int[3], 50, 0.5);
        assertTrue(many[1] > 0.9 && many[0] > 0, Arrays.toString(many));
    }

    @Test
    void refusesNonsense() {
        assertThrows(IllegalArgumentException.class, () -> DirichletPriors.update(BASE, new int[2], new int[3], 50, 0.5));
        assertThrows(IllegalArgumentException.class, () -> DirichletPriors.update(BASE, new int[3], new int[3], 0, 0.5));
    }
}
