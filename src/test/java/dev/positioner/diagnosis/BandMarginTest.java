package dev.positioner.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.positioner.diagnosis.facts.Band;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * A band with an uncertainty margin sorts a reading three ways (ISO 14253-1: conformity or
 * nonconformity is proved only outside the uncertainty zone around a limit). Band 225-275, margin 5.
 */
class BandMarginTest {

    static final Band SUPPLY = new Band("supply_pressure", 225, 275, "psi", "test", 5);

    @ParameterizedTest(name = "{0} -> {1}")
    @CsvSource({
            "219.9, below", "220, borderline", "225, borderline", "229.9, borderline", "230, within",
            "250, within", "270, within", "270.1, borderline", "280, borderline", "280.1, above"})
    void threeWays(double value, String expected) {
        String got = SUPPLY.below(value) ? "below" : SUPPLY.above(value) ? "above" : SUPPLY.within(value) ? "within" : "borderline";
        assertEquals(expected, got);
        assertEquals(expected.equals("borderline"), SUPPLY.borderline(value));
    }

    @ParameterizedTest
    @CsvSource({"222, 225", "278, 275"})
    void aBorderlineReadingIsNearItsClosestLimit(double value, double limit) {
        assertEquals(limit, SUPPLY.nearestLimit(value));
    }

    @org.junit.jupiter.api.Test
    void anOpenSideHasNoZoneAndNoMarginIsSharp() {
        Band drain = new Band("drain_pressure", Double.NaN, 5, "psi", "test", 0.6);
        assertTrue(drain.within(0));
        assertTrue(drain.borderline(4.5));
        assertTrue(drain.within(4.4));
        Band sharp = new Band("drain_pressure", Double.NaN, 5, "psi", "test");
        assertTrue(sharp.within(5));
        assertTrue(sharp.above(5.01));
        assertFalse(sharp.borderline(5));
    }
}
