package dev.positioner.hydraulics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class LeakageTest {

    @Test
    void creepOfAnEightInchPistonAsLeakageFlow() {
        // Continuity, by hand: 2 mm/min = 3.3333e-5 m/s; A = 0.032429 m2 (8 in bore):
        // Q = 0.032429 * 3.3333e-5 = 1.0810e-6 m3/s = 0.0649 L/min.
        double v = Leakage.creepVelocityFromMmPerMinute(2);
        assertEquals(3.3333e-5, v, 1e-9);
        assertEquals(1.0810e-6, Leakage.internalLeakageFlow(0.032429, v), 1e-10);
        assertEquals(1.0810e-6, Leakage.internalLeakageFlow(0.032429, -v), 1e-10, "direction does not matter");
    }

    @Test
    void percentPerMinuteNeedsTheStroke() {
        // 1 %/min of a 100 mm stroke = 1 mm/min = 1.6667e-5 m/s.
        assertEquals(1.6667e-5, Leakage.creepVelocityFromPercentPerMinute(1, 0.100), 1e-9);
        assertEquals(Leakage.creepVelocityFromMmPerMinute(1), Leakage.creepVelocityFromPercentPerMinute(1, 0.100), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> Leakage.creepVelocityFromPercentPerMinute(1, 0));
    }

    @Test
    void volumetricEfficiency() {
        // Actual over theoretical (rated stands in): 8.5 L/min delivered by a 10 L/min pump = 0.85.
        assertEquals(0.85, Leakage.volumetricEfficiency(8.5, 10), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> Leakage.volumetricEfficiency(8.5, 0));
    }
}
