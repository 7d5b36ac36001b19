package dev.positioner.hydraulics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class BulkModulusTest {

    private static final double PSI = 6894.757293168;

    @Test
    void onePercentAirAtSupplyPressure() {
        // Merritt (1967) series form, hand arithmetic: beta_oil = 1.6 GPa, 1 % free air at
        // 1.8 MPa absolute (about 250 psig), adiabatic n = 1.4 -> beta_air = 1.4 * 1.8e6 = 2.52e6 Pa.
        // 1/beta_e = 1/1.6e9 + 0.01/2.52e6 = 6.250e-10 + 3.968e-9 = 4.593e-9 -> beta_e = 217.7 MPa,
        // about an eighth of the oil alone.
        assertEquals(2.52e6, BulkModulus.air(1.8e6, BulkModulus.ADIABATIC_AIR), 1e-6);
        assertEquals(217.7e6, BulkModulus.effective(1.6e9, 0.01, 1.8e6, BulkModulus.ADIABATIC_AIR), 0.1e6);
    }

    @Test
    void threeComplianceTerms() {
        // Hand arithmetic in psi, all three terms of the series form: liquid 250 000 psi, container
        // 3 000 000 psi, 1 % air at 500 psia isothermal (beta_air = 500 psi):
        // 1/beta_e = 1/3e6 + 1/2.5e5 + 0.01/500 = 3.333e-7 + 4.000e-6 + 2.000e-5 = 2.4333e-5 -> 41 096 psi.
        double betaE = BulkModulus.effective(250_000 * PSI, 3_000_000 * PSI, 0.01, 500 * PSI, BulkModulus.ISOTHERMAL_AIR);
        assertEquals(41_096, betaE / PSI, 1);
    }

    @Test
    void withoutAirAndRigidWallsItIsTheOil() {
        assertEquals(1.6e9, BulkModulus.effective(1.6e9, 0, 1e5, BulkModulus.ADIABATIC_AIR), 1e-3);
    }

    @Test
    void rejectsImpossibleFractions() {
        assertThrows(IllegalArgumentException.class, () -> BulkModulus.effective(1.6e9, 1.0, 1e6, 1.4));
        assertThrows(IllegalArgumentException.class, () -> BulkModulus.effective(1.6e9, -0.01, 1e6, 1.4));
        assertThrows(IllegalArgumentException.class, () -> BulkModulus.effective(1.6e9, 0.01, 0, 1.4));
    }
}
