package dev.positioner.hydraulics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.positioner.hydraulics.SupplyBand.Status;
import org.junit.jupiter.api.Test;

class SupplyBandTest {

    private static final double PSI = 6894.757293168;
    private static final double NOMINAL = 250 * PSI;

    @Test
    void defaultBandIsTenPercent() {
        // Common practice, not a standard: +/-10 % of 250 psi is 225 to 275 psi.
        SupplyBand.Result r = SupplyBand.classify(205 * PSI, NOMINAL);
        assertEquals(Status.LOW, r.status());
        assertEquals(225, r.lowLimit() / PSI, 1e-9);
        assertEquals(275, r.highLimit() / PSI, 1e-9);
        assertEquals(-0.18, r.deviation(), 1e-12);
    }

    @Test
    void limitsCountAsNormal() {
        SupplyBand.Result r = SupplyBand.classify(NOMINAL, NOMINAL);
        assertEquals(Status.NORMAL, r.status());
        assertEquals(Status.NORMAL, SupplyBand.classify(r.lowLimit(), NOMINAL).status());
        assertEquals(Status.NORMAL, SupplyBand.classify(r.highLimit(), NOMINAL).status());
        assertEquals(Status.LOW, SupplyBand.classify(Math.nextDown(r.lowLimit()), NOMINAL).status());
        assertEquals(Status.HIGH, SupplyBand.classify(Math.nextUp(r.highLimit()), NOMINAL).status());
    }

    @Test
    void siteBand() {
        assertEquals(Status.HIGH, SupplyBand.classify(265 * PSI, NOMINAL, 0.05).status());
        assertThrows(IllegalArgumentException.class, () -> SupplyBand.classify(NOMINAL, NOMINAL, 1.5));
        assertThrows(IllegalArgumentException.class, () -> SupplyBand.classify(NOMINAL, 0));
    }
}
