package dev.positioner.hydraulics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class LineLossTest {

    @Test
    void laminarDrainLineByHagenPoiseuille() {
        // Hand calculation, Hagen-Poiseuille (any fluid mechanics text):
        // Q = 10 L/min = 1.6667e-4 m3/s, d = 10 mm, L = 5 m, nu = 46 cSt, rho = 870 kg/m3.
        // A = pi * 0.01^2 / 4 = 7.854e-5 m2; v = Q / A = 2.1221 m/s; Re = v d / nu = 2.1221 * 0.01 / 46e-6 = 461.3.
        // mu = rho * nu = 870 * 46e-6 = 0.04002 Pa s.
        // dp = 128 mu L Q / (pi d^4) = 128 * 0.04002 * 5 * 1.6667e-4 / (pi * 1e-8) = 135 880 Pa (1.36 bar).
        LineLoss.Result r = LineLoss.pressureDrop(10.0 / 60_000, 0.010, 5, 46, 870);
        assertEquals(LineLoss.Regime.LAMINAR, r.regime());
        assertEquals(LineLoss.Method.HAGEN_POISEUILLE, r.method());
        assertEquals(461.3, r.reynolds(), 0.1);
        assertEquals(2.1221, r.velocity(), 1e-4);
        assertEquals(135_880, r.pressureDrop(), 1);
        // The laminar Darcy friction factor is 64 / Re (same law written another way).
        assertEquals(64 / 461.32, r.frictionFactor(), 1e-4);
    }

    @Test
    void laminarLimitIsReynolds2000() {
        // Threshold 2000: lower end of the 2000-2300 range in fluid mechanics texts (common practice in fluid power).
        // Re = 4 Q / (pi d nu): with d = 0.01 m and nu = 10 cSt, Re = 2000 at Q = 2000 * pi * 0.01 * 1e-5 / 4.
        double qAt2000 = 2000 * Math.PI * 0.01 * 10e-6 / 4;
        assertEquals(LineLoss.Regime.LAMINAR, LineLoss.pressureDrop(qAt2000 * 0.999, 0.01, 1, 10, 870).regime());
        assertEquals(LineLoss.Regime.TRANSITIONAL, LineLoss.pressureDrop(qAt2000, 0.01, 1, 10, 870).regime());
        assertEquals(LineLoss.Regime.TURBULENT, LineLoss.pressureDrop(qAt2000 * 2, 0.01, 1, 10, 870).regime());
    }

    @Test
    void swameeJainAgreesWithMoodyChartForSmoothPipe() {
        // Smooth-pipe Darcy friction factors read from the Moody chart (Colebrook): 0.0309 at Re 1e4,
        // 0.0180 at Re 1e5. Swamee and Jain (1976) claim about 1 % agreement with Colebrook.
        assertEquals(0.0309, LineLoss.swameeJain(1e4, 0), 0.0309 * 0.015);
        assertEquals(0.0180, LineLoss.swameeJain(1e5, 0), 0.0180 * 0.015);
        // Same claim against an iterated Colebrook-White solution for a rough pipe, eps/d = 1e-3.
        assertEquals(colebrook(1e5, 1e-3), LineLoss.swameeJain(1e5, 1e-3), colebrook(1e5, 1e-3) * 0.015);
    }

    @Test
    void turbulentDropIsDarcyWeisbach() {
        // Q = 60 L/min = 1e-3 m3/s, d = 12 mm, L = 3 m, nu = 10 cSt, rho = 870.
        // v = 1e-3 / (pi * 0.012^2 / 4) = 8.842 m/s; Re = 8.842 * 0.012 / 1e-5 = 10 610 -> turbulent.
        // dp = f (L/d) rho v^2 / 2 with f from Swamee-Jain at eps = 1.5 um.
        LineLoss.Result r = LineLoss.pressureDrop(1e-3, 0.012, 3, 10, 870);
        assertEquals(LineLoss.Regime.TURBULENT, r.regime());
        assertEquals(LineLoss.Method.DARCY_WEISBACH_SWAMEE_JAIN, r.method());
        assertEquals(10_610, r.reynolds(), 1);
        double f = LineLoss.swameeJain(r.reynolds(), 1.5e-6 / 0.012);
        assertEquals(f * (3 / 0.012) * 870 * 8.842 * 8.842 / 2, r.pressureDrop(), r.pressureDrop() * 1e-3);
    }

    @Test
    void noFlowNoDrop() {
        LineLoss.Result r = LineLoss.pressureDrop(0, 0.01, 5, 46, 870);
        assertEquals(0, r.pressureDrop());
        assertEquals(0, r.frictionFactor());
    }

    @Test
    void rejectsMeaninglessInput() {
        assertThrows(IllegalArgumentException.class, () -> LineLoss.pressureDrop(1e-4, 0, 5, 46, 870));
        assertThrows(IllegalArgumentException.class, () -> LineLoss.pressureDrop(-1e-4, 0.01, 5, 46, 870));
        assertThrows(IllegalArgumentException.class, () -> LineLoss.pressureDrop(1e-4, 0.01, 5, 0, 870));
    }

    private static double colebrook(double re, double relativeRoughness) {
        double f = 0.02;
        for (int i = 0; i < 50; i++) {
            double rhs = -2 * Math.log10(relativeRoughness / 3.7 + 2.51 / (re * Math.sqrt(f)));
            f = 1 / (rhs * rhs);
        }
        return f;
    }
}
