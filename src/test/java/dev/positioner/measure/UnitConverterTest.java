package dev.positioner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Conversions against the defined values of the units (NIST SP 811, Appendix B). */
class UnitConverterTest {

    static final QuantityDef PRESSURE = new QuantityDef("supply_pressure", QuantityKind.PRESSURE,
            List.of("psi", "bar", "kPa", "MPa"), -101325, 69e6, null);
    static final QuantityDef SIGNAL = new QuantityDef("input_signal", QuantityKind.SIGNAL,
            List.of("mA", "psi", "bar", "percent"), -30, 130, null);
    static final QuantityDef CREEP = new QuantityDef("creep_rate", QuantityKind.RATE,
            List.of("percent_per_min", "mm_per_min", "in_per_min"), 0, 0.05, null);

    @Test
    void pressureUnits() {
        // NIST SP 811: 1 psi = 6.894757 E+03 Pa; 1 bar = 1 E+05 Pa exactly.
        assertEquals(6894.757, UnitConverter.toCanonical(PRESSURE, 1, "psi", 0), 1e-3);
        assertEquals(1.0e5, UnitConverter.toCanonical(PRESSURE, 1, "bar", 0), 1e-9);
        assertEquals(250 * 6894.757, UnitConverter.toCanonical(PRESSURE, 250, "psi", 0), 0.5);
        assertEquals(1.7e6, UnitConverter.toCanonical(PRESSURE, 1.7, "MPa", 0), 1e-6);
    }

    @Test
    void temperatureAndFlow() {
        // degF to degC: (212 - 32) / 1.8 = 100; 1 US gal = 3.785411784 L exactly.
        assertEquals(100.0, UnitConverter.convert(212, "degF", "degC"), 1e-9);
        assertEquals(-273.15, UnitConverter.convert(0, "K", "degC"), 1e-9);
        assertEquals(3.785411784e-3 / 60, UnitConverter.convert(1, "gpm", "m3_per_s"), 1e-12);
        assertEquals(0.0254, UnitConverter.convert(1, "in", "m"), 1e-12);
        // 1 lbf = 4.448222 N (NIST SP 811).
        assertEquals(4.448222, UnitConverter.convert(1, "lbf", "N"), 1e-6);
    }

    @Test
    void signalsBecomePercentOfSpan() {
        // 4-20 mA: 12 mA is mid-span; 3-15 psi: 9 psi is mid-span; 0.2-1.0 bar: 0.6 bar mid-span.
        assertEquals(50.0, UnitConverter.toCanonical(SIGNAL, 12, "mA", 0), 1e-9);
        assertEquals(50.0, UnitConverter.toCanonical(SIGNAL, 9, "psi", 0), 1e-9);
        assertEquals(50.0, UnitConverter.toCanonical(SIGNAL, 0.6, "bar", 0), 1e-9);
        assertEquals(0.0, UnitConverter.toCanonical(SIGNAL, 4, "mA", 0), 1e-9);
    }

    @Test
    void creepInPercentNeedsTheStroke() {
        // 1 %/min of a 100 mm stroke = 1 mm/min = 1e-3 / 60 m/s.
        assertEquals(1e-3 / 60, UnitConverter.toCanonical(CREEP, 1, "percent_per_min", 0.1), 1e-15);
        assertEquals(1e-3 / 60, UnitConverter.toCanonical(CREEP, 1, "mm_per_min", 0.1), 1e-15);
    }

    @Test
    void aUnitOfTheWrongQuantityIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> UnitConverter.toCanonical(PRESSURE, 1, "degC", 0));
    }
}
