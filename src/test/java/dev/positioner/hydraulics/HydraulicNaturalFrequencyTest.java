package dev.positioner.hydraulics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class HydraulicNaturalFrequencyTest {

    private static final double INCH = 0.0254;

    @Test
    void merrittCentredForm() {
        // omega_h = sqrt(4 beta_e A^2 / (Vt M)) (Merritt 1967), hand arithmetic:
        // beta_e = 7e8 Pa, A = 0.005 m2, Vt = 0.002 m3, M = 500 kg:
        // 4 * 7e8 * 2.5e-5 / (0.002 * 500) = 70 000 s^-2 -> omega = 264.58 rad/s -> f = 42.11 Hz.
        HydraulicNaturalFrequency.Result r = HydraulicNaturalFrequency.centred(7e8, 0.005, 0.002, 500);
        assertEquals(264.58, r.radiansPerSecond(), 0.01);
        assertEquals(42.11, r.hertz(), 0.01);
    }

    @Test
    void twoColumnFormReducesToMerrittsWhenSymmetricAndCentred() {
        HydraulicNaturalFrequency.Result two = HydraulicNaturalFrequency.twoColumns(7e8, 0.005, 0.001, 0.005, 0.001, 500);
        assertEquals(HydraulicNaturalFrequency.centred(7e8, 0.005, 0.002, 500).hertz(), two.hertz(), 1e-9);
        // Off centre the stiffer short column raises the frequency: the centred position is the lowest.
        HydraulicNaturalFrequency.Result offCentre =
                HydraulicNaturalFrequency.twoColumns(7e8, 0.005, 0.0005, 0.005, 0.0015, 500);
        assertEquals(1, Double.compare(offCentre.hertz(), two.hertz()));
    }

    @Test
    void publishedSingleRodExample() {
        // Public worked example (motion-control user forum, two-column form): 4 in bore (12.566 in2),
        // 2.5 in rod (annulus 7.658 in2), 12 in stroke at mid position, 1000 lb moving, 180 000 psi,
        // dead volumes neglected -> 77.03 Hz. By hand in SI: omega^2 = (beta / M) * 2 (A1 + A2) / L
        // = (1.2411e9 / 453.59) * 2 * (8.1073e-3 + 4.9406e-3) / 0.3048 = 2.7361e6 * 0.085616 = 2.3425e5
        // -> omega = 484.0 rad/s -> 77.03 Hz.
        double a1 = Math.PI * Math.pow(4 * INCH, 2) / 4;
        double a2 = a1 - Math.PI * Math.pow(2.5 * INCH, 2) / 4;
        double halfStroke = 6 * INCH;
        HydraulicNaturalFrequency.Result r = HydraulicNaturalFrequency.twoColumns(
                180_000 * 6894.757293168, a1, a1 * halfStroke, a2, a2 * halfStroke, 1000 * 0.45359237);
        assertEquals(77.03, r.hertz(), 0.01);
    }

    @Test
    void rejectsZeroMass() {
        assertThrows(IllegalArgumentException.class, () -> HydraulicNaturalFrequency.centred(7e8, 0.005, 0.002, 0));
    }
}
