package dev.positioner.hydraulics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ActuatorPerformanceTest {

    private static final double PSI = 6894.757293168;

    @Test
    void eightInchPistonAt250Psi() {
        // F = p A by hand: bore 8 in = 0.2032 m -> A = pi * 0.2032^2 / 4 = 0.032429 m2;
        // rod 2 in = 0.0508 m -> annulus = 0.032429 - pi * 0.0508^2 / 4 = 0.030402 m2.
        // 250 psi = 1 723 689 Pa: extend 1 723 689 * 0.032429 = 55 898 N, retract * 0.030402 = 52 404 N.
        ActuatorPerformance.PistonAreas a = ActuatorPerformance.areas(0.2032, 0.0508);
        assertEquals(0.032429, a.bore(), 1e-6);
        assertEquals(0.030402, a.annulus(), 1e-6);
        ActuatorPerformance.Thrust t = ActuatorPerformance.thrust(250 * PSI, 0, a);
        assertEquals(55_898, t.extend(), 1);
        assertEquals(52_404, t.retract(), 1);
    }

    @Test
    void strokeDemandAgainstThePump() {
        // Continuity, by hand: bore 160 mm -> A = pi * 0.16^2 / 4 = 0.0201062 m2; stroke 80 mm sweeps
        // 0.0201062 * 0.08 = 1.60850e-3 m3 (1.61 L). In 12 s that is 1.34041e-4 m3/s = 8.04 L/min, more
        // than a 6 L/min (1e-4 m3/s) pump: the pump alone needs 1.60850e-3 / 1e-4 = 16.1 s.
        double area = ActuatorPerformance.areas(0.16, 0).bore();
        assertEquals(1.34041e-4, ActuatorPerformance.strokeDemandFlow(area, 0.08, 12), 1e-9);
        assertEquals(16.085, ActuatorPerformance.expectedStrokeTime(area, 0.08, 1e-4, Double.MAX_VALUE).seconds(), 1e-3);
        assertThrows(IllegalArgumentException.class, () -> ActuatorPerformance.strokeDemandFlow(area, 0.08, 0));
    }

    @Test
    void drainBackPressureOpposesEachStroke() {
        // Extend: ps*Abore - pd*Aannulus; retract: ps*Aannulus - pd*Abore. pd = 20 psi = 137 895 Pa:
        // extend 55 898 - 137 895 * 0.030402 = 51 706 N; retract 52 404 - 137 895 * 0.032429 = 47 932 N.
        ActuatorPerformance.Thrust t =
                ActuatorPerformance.thrust(250 * PSI, 20 * PSI, ActuatorPerformance.areas(0.2032, 0.0508));
        assertEquals(51_706, t.extend(), 1);
        assertEquals(47_932, t.retract(), 1);
    }

    @Test
    void thrustMargin() {
        ActuatorPerformance.Margin m = ActuatorPerformance.margin(55_898, 40_000);
        assertEquals(15_898, m.surplus(), 1e-9);
        assertEquals(1.39745, m.ratio(), 1e-5);
        assertTrue(m.sufficient());
        assertFalse(ActuatorPerformance.margin(35_000, 40_000).sufficient());
    }

    @Test
    void dischargeCoefficientIsTheSharpEdgedValue() {
        // Merritt (1967): Cd = pi / (pi + 2) = 0.611 for a sharp-edged slot; texts round it to 0.61.
        assertEquals(Math.PI / (Math.PI + 2), ActuatorPerformance.SHARP_EDGED_CD, 0.005);
        assertEquals(0.61, ActuatorPerformance.SHARP_EDGED_CD, 0.0);
    }

    @Test
    void sharpEdgedOrificeFlow() {
        // Q = Cd A sqrt(2 dp / rho) by hand: A = 10 mm2, dp = 1 MPa, rho = 870 kg/m3:
        // sqrt(2e6 / 870) = 47.946 m/s; Q = 0.61 * 1e-5 * 47.946 = 2.9247e-4 m3/s (17.55 L/min).
        assertEquals(2.9247e-4, ActuatorPerformance.orificeFlow(1e-5, 1e6, 870), 1e-8);
        // Matched four-way spool (Merritt): each land takes half of ps - pd - pL, so 2 MPa across
        // the valve gives the same flow as 1 MPa across one orifice.
        assertEquals(2.9247e-4, ActuatorPerformance.fourWaySpoolFlow(1e-5, 2.1e6, 0.1e6, 0, 870), 1e-8);
        assertEquals(0, ActuatorPerformance.fourWaySpoolFlow(1e-5, 1e6, 0, 1.2e6, 870));
    }

    @Test
    void strokeTimeFromSweptVolumeAndTheSmallerFlow() {
        // v = Q / A by hand: Q = 10 L/min = 1.6667e-4 m3/s, A = 0.032429 m2 -> v = 5.139 mm/s;
        // 100 mm stroke: V = 3.2429e-3 m3, t = V / Q = 19.46 s.
        double area = ActuatorPerformance.areas(0.2032, 0.0508).bore();
        ActuatorPerformance.StrokeTime pumpLimited =
                ActuatorPerformance.expectedStrokeTime(area, 0.100, 10.0 / 60_000, 2.9247e-4);
        assertEquals(19.46, pumpLimited.seconds(), 0.01);
        assertEquals(ActuatorPerformance.Limit.PUMP, pumpLimited.limitedBy());
        // A spool passing only 5 L/min doubles the time and becomes the limit.
        ActuatorPerformance.StrokeTime spoolLimited =
                ActuatorPerformance.expectedStrokeTime(area, 0.100, 10.0 / 60_000, 5.0 / 60_000);
        assertEquals(38.91, spoolLimited.seconds(), 0.01);
        assertEquals(ActuatorPerformance.Limit.PILOT_SPOOL, spoolLimited.limitedBy());
    }

    @Test
    void slownessRatio() {
        assertEquals(2.0, ActuatorPerformance.slownessRatio(38.92, 19.46), 1e-9);
        assertThrows(IllegalArgumentException.class, () -> ActuatorPerformance.slownessRatio(10, 0));
    }

    @Test
    void rejectsImpossibleGeometry() {
        assertThrows(IllegalArgumentException.class, () -> ActuatorPerformance.areas(0.05, 0.05));
        assertThrows(IllegalArgumentException.class, () -> ActuatorPerformance.areas(-0.2, 0.05));
    }
}
