package dev.positioner.hydraulics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class Iso4406Test {

    // ISO 4406:1999 Table 1 / ISO 4406:2021 Table 1: scale number, "more than", "up to and including"
    // (particles per mL). Each row is checked at its lower bound (belongs to the scale below), just
    // above it, and at its upper bound (belongs to this scale).
    @ParameterizedTest(name = "scale {0}: more than {1} up to and including {2}")
    @CsvSource({
        "1, 0.01, 0.02", "2, 0.02, 0.04", "3, 0.04, 0.08", "4, 0.08, 0.16", "5, 0.16, 0.32",
        "6, 0.32, 0.64", "7, 0.64, 1.3", "8, 1.3, 2.5", "9, 2.5, 5", "10, 5, 10", "11, 10, 20",
        "12, 20, 40", "13, 40, 80", "14, 80, 160", "15, 160, 320", "16, 320, 640", "17, 640, 1300",
        "18, 1300, 2500", "19, 2500, 5000", "20, 5000, 10000", "21, 10000, 20000", "22, 20000, 40000",
        "23, 40000, 80000", "24, 80000, 160000", "25, 160000, 320000", "26, 320000, 640000",
        "27, 640000, 1300000", "28, 1300000, 2500000"})
    void publishedTableRows(int scale, double moreThan, double upToAndIncluding) {
        assertEquals(scale - 1, Iso4406.scaleNumber(moreThan), "the lower bound belongs to the scale below");
        assertEquals(scale, Iso4406.scaleNumber(Math.nextUp(moreThan)), "just more than the lower bound");
        assertEquals(scale, Iso4406.scaleNumber(upToAndIncluding), "the upper bound is included");
        assertEquals(upToAndIncluding, Iso4406.upperLimit(scale), 0.0);
    }

    @Test
    void boundaryExamplesOfTheMoreThanUpToAndIncludingRule() {
        assertEquals(13, Iso4406.scaleNumber(80));     // ISO 4406 Table 1: 13 is >40 to 80
        assertEquals(14, Iso4406.scaleNumber(80.01));  // 14 is >80 to 160
        assertEquals(14, Iso4406.scaleNumber(160));
        assertEquals(17, Iso4406.scaleNumber(1300));   // rounded limit 1 300, not 1 280
        assertEquals(17, Iso4406.scaleNumber(1281));   // still 17: a computed 2^n limit (1 280) would give 18
        assertEquals(0, Iso4406.scaleNumber(0));       // scale 0 is >0.00 to 0.01; a zero count reported as 0
        assertEquals(0, Iso4406.scaleNumber(0.01));
    }

    @Test
    void countsAboveTheTableAreRejected() {
        // ISO 4406 Table 1 ends at 28 (>1 300 000 to 2 500 000); above that the code is ">28".
        assertEquals(28, Iso4406.scaleNumber(2_500_000));
        assertThrows(IllegalArgumentException.class, () -> Iso4406.scaleNumber(2_500_001));
        assertThrows(IllegalArgumentException.class, () -> Iso4406.scaleNumber(-1));
        assertThrows(IllegalArgumentException.class, () -> Iso4406.scaleNumber(Double.NaN));
    }

    @Test
    void threePartCodeFromCounts() {
        // Counts per mL at >=4, >=6, >=14 um(c): 500 is in 16 (>320-640), 100 in 14 (>80-160),
        // 15 in 11 (>10-20), per ISO 4406 Table 1.
        assertEquals(new Iso4406.Code(16, 14, 11), Iso4406.fromCounts(500, 100, 15));
        assertThrows(IllegalArgumentException.class, () -> Iso4406.fromCounts(100, 500, 15),
                "cumulative counts cannot grow with particle size");
    }

    @Test
    void parseAndFormat() {
        Iso4406.Code code = Iso4406.parse(" 18 / 16/13 ");
        assertEquals(new Iso4406.Code(18, 16, 13), code);
        assertEquals("18/16/13", code.toString());
        assertEquals(code, Iso4406.parse(code.toString()));
        assertThrows(IllegalArgumentException.class, () -> Iso4406.parse("18/16"));
        assertThrows(IllegalArgumentException.class, () -> Iso4406.parse("-/16/13"));
        assertThrows(IllegalArgumentException.class, () -> Iso4406.parse("29/16/13"));
        assertThrows(IllegalArgumentException.class, () -> Iso4406.parse(null));
    }

    @Test
    void comparisonNamesEachSizeOverTarget() {
        Iso4406.Comparison c = Iso4406.compare(Iso4406.parse("19/14/13"), Iso4406.parse("16/14/11"));
        assertFalse(c.withinTarget());
        assertEquals(List.of(new Iso4406.Exceedance("4um", 19, 16, 3), new Iso4406.Exceedance("14um", 13, 11, 2)),
                c.exceedances());
        assertTrue(Iso4406.compare(Iso4406.parse("15/14/9"), Iso4406.parse("16/14/11")).withinTarget());
    }

    @Test
    void servoTargetIsTheCommonPracticeValue() {
        // Common practice (filter makers' charts, from memory), not a figure of ISO 4406 itself.
        assertEquals("16/14/11", Iso4406.SERVO_TARGET.toString());
    }
}
