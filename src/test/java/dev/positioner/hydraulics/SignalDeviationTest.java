package dev.positioner.hydraulics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.positioner.hydraulics.SignalDeviation.Range;
import org.junit.jupiter.api.Test;

class SignalDeviationTest {

    @Test
    void rangeEndsInSi() {
        // 4-20 mA (IEC 60381-1); 3-15 psi = 20.684-103.421 kPa (1 psi = 6894.757 Pa); 20-100 kPa (IEC 60382).
        assertEquals(0.004, Range.CURRENT_4_20_MA.lower(), 0.0);
        assertEquals(0.020, Range.CURRENT_4_20_MA.upper(), 0.0);
        assertEquals(20_684.27, Range.PNEUMATIC_3_15_PSI.lower(), 0.01);
        assertEquals(103_421.36, Range.PNEUMATIC_3_15_PSI.upper(), 0.01);
        assertEquals(50, Range.PNEUMATIC_20_100_KPA.percentOfSpan(60_000), 1e-9);
    }

    @Test
    void currentSignal() {
        // 12 mA is mid-span; 12.16 mA against 12 mA is 0.16 / 16 = 1 % of span high.
        SignalDeviation.Result r = SignalDeviation.compare(Range.CURRENT_4_20_MA, 0.01216, 0.012);
        assertEquals(51, r.inputPercent(), 1e-9);
        assertEquals(50, r.commandedPercent(), 1e-9);
        assertEquals(1, r.deviationPercentOfSpan(), 1e-9);
        // Below 4 mA is off the bottom of the range, shown as negative percent.
        assertEquals(-25, Range.CURRENT_4_20_MA.percentOfSpan(0.0), 1e-9);
    }

    @Test
    void pneumaticSignal() {
        // 8.76 psi against 9 psi: -0.24 / 12 = -2 % of span.
        double psi = 6894.757293168;
        SignalDeviation.Result r = SignalDeviation.compare(Range.PNEUMATIC_3_15_PSI, 8.76 * psi, 9 * psi);
        assertEquals(-2, r.deviationPercentOfSpan(), 1e-9);
    }

    @Test
    void percentSignal() {
        assertEquals(-3.5, SignalDeviation.compare(Range.PERCENT, 71.5, 75).deviationPercentOfSpan(), 1e-9);
    }
}
