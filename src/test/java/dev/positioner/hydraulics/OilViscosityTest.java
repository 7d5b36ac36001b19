package dev.positioner.hydraulics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class OilViscosityTest {

    // ISO 3448 grade limits at 40 degC, mm2/s (midpoint +/-10 %), as published in the standard's table.
    @ParameterizedTest(name = "{0}: {1} to {2} cSt")
    @CsvSource({"VG10, 9.0, 11.0", "VG15, 13.5, 16.5", "VG22, 19.8, 24.2", "VG32, 28.8, 35.2",
        "VG46, 41.4, 50.6", "VG68, 61.2, 74.8", "VG100, 90.0, 110", "VG150, 135, 165"})
    void iso3448GradeLimits(IsoVgGrade grade, double min, double max) {
        assertEquals(min, grade.min40(), 1e-9);
        assertEquals(max, grade.max40(), 1e-9);
        assertTrue(grade.contains(min) && grade.contains(max), "ISO 3448 limits are inclusive");
        assertFalse(grade.contains(min - 0.01));
        assertFalse(grade.contains(max + 0.01));
    }

    @Test
    void parsesCommonSpellings() {
        assertEquals(IsoVgGrade.VG46, IsoVgGrade.parse("VG46"));
        assertEquals(IsoVgGrade.VG46, IsoVgGrade.parse("ISO VG 46"));
        assertEquals(IsoVgGrade.VG100, IsoVgGrade.parse("iso-vg100"));
        assertThrows(IllegalArgumentException.class, () -> IsoVgGrade.parse("VG47"));
        assertThrows(IllegalArgumentException.class, () -> IsoVgGrade.parse("SAE 30"));
    }

    @Test
    void hundredDegreeValueForViscosityIndex100FromAstmD2270Table() {
        // ASTM D2270 Table 1 rows (Y at 100 degC, H at 40 degC): 6.70 -> 45.33, 6.80 -> 46.44.
        // VI 100 means the 40 degC viscosity equals H, so for VG46:
        // Y = 6.70 + 0.10 * (46 - 45.33) / (46.44 - 45.33) = 6.70 + 0.10 * 0.6036 = 6.7604 mm2/s.
        assertEquals(6.7604, IsoVgGrade.VG46.viscosity100AtVi100(), 1e-4);
        // Rows 5.30 -> 31.40, 5.40 -> 32.37: Y = 5.30 + 0.10 * 0.60 / 0.97 = 5.3619 mm2/s.
        assertEquals(5.3619, IsoVgGrade.VG32.viscosity100AtVi100(), 1e-4);
        // Rows 15.0 -> 149.7, 15.1 -> 151.2: Y = 15.0 + 0.1 * 0.3 / 1.5 = 15.02 mm2/s.
        assertEquals(15.02, IsoVgGrade.VG150.viscosity100AtVi100(), 1e-4);
    }

    @Test
    void bracketingRowsReallyBracketEachGrade() {
        // Guards the copied D2270 rows: the interpolated Y must rise with the grade.
        double previous = 0;
        for (IsoVgGrade grade : IsoVgGrade.values()) {
            double y = grade.viscosity100AtVi100();
            assertTrue(y > previous, grade + " gives " + y);
            previous = y;
        }
    }

    @Test
    void publishedAstmD341WorkedExample() {
        // Public worked example of ASTM D341 ("Viscosity vs Temperature Calculator" spreadsheet,
        // not the standard itself): 32 cSt at 40 degC and 5.4 cSt at 100 degC, temperatures taken
        // as 313 K and 373 K, gives A = 9.5259, B = 3.7449 and 8.5 cSt at 80 degC (353 K).
        OilViscosity.WaltherFit fit = OilViscosity.fitKelvin(313, 32, 373, 5.4);
        assertEquals(9.5259, fit.a(), 1e-4);
        assertEquals(3.7449, fit.b(), 1e-4);
        assertEquals(8.5, fit.viscosityAtKelvin(353), 0.05);
    }

    @Test
    void fitReproducesItsTwoPointsAndIsStraightOnTheD341Axes() {
        // Defining property of ASTM D341: log log(v + 0.7) is linear in log T.
        OilViscosity.WaltherFit fit = OilViscosity.fitCelsius(40, 46, 100, 6.7604);
        assertEquals(46, fit.viscosityAtCelsius(40), 1e-9);
        assertEquals(6.7604, fit.viscosityAtCelsius(100), 1e-9);
        double[] kelvin = {263.15, 303.15, 353.15};
        double[] x = new double[3];
        double[] y = new double[3];
        for (int i = 0; i < 3; i++) {
            x[i] = Math.log10(kelvin[i]);
            y[i] = Math.log10(Math.log10(fit.viscosityAtKelvin(kelvin[i]) + 0.7));
        }
        assertEquals((y[1] - y[0]) / (x[1] - x[0]), (y[2] - y[1]) / (x[2] - x[1]), 1e-9);
    }

    @Test
    void gradeViscosityAtTemperature() {
        assertEquals(46, OilViscosity.viscosityAtCelsius(IsoVgGrade.VG46, 40), 1e-9);
        assertEquals(6.7604, OilViscosity.viscosityAtCelsius(IsoVgGrade.VG46, 100), 1e-4);
        // Cold oil is much thicker: the reason cold starts stroke slowly.
        assertTrue(OilViscosity.viscosityAtCelsius(IsoVgGrade.VG46, 10) > 3 * 46);
    }

    @Test
    void densityFromStatedAssumptions() {
        // Assumptions (from memory, typical mineral oil): 870 kg/m3 at 15 degC, alpha 6.5e-4 1/K.
        // At 40 degC: 870 / (1 + 6.5e-4 * 25) = 870 / 1.01625 = 856.09 kg/m3.
        assertEquals(870, OilViscosity.densityAtCelsius(15), 1e-9);
        assertEquals(856.09, OilViscosity.densityAtCelsius(40), 0.01);
        assertTrue(OilViscosity.densityAtCelsius(0) > 870);
    }

    @Test
    void rejectsMeaninglessInput() {
        assertThrows(IllegalArgumentException.class, () -> OilViscosity.fitCelsius(40, 46, 40, 6.8));
        assertThrows(IllegalArgumentException.class, () -> OilViscosity.fitCelsius(40, -1, 100, 6.8));
        assertThrows(IllegalArgumentException.class, () -> OilViscosity.densityAtCelsius(Double.NaN));
    }
}
