package dev.positioner.trace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import org.junit.jupiter.api.Test;

class FastDecimalTest {

    @Test
    void agreesBitForBitWithParseDouble() {
        Random rnd = new Random(3);
        for (int i = 0; i < 50_000; i++) {
            int decimals = rnd.nextInt(8);
            String s = String.format(java.util.Locale.ROOT, "%." + decimals + "f",
                    (rnd.nextDouble() - 0.3) * Math.pow(10, rnd.nextInt(9)));
            assertEquals(Double.doubleToLongBits(Double.parseDouble(s)),
                    Double.doubleToLongBits(FastDecimal.parse(s)), s);
        }
        for (String s : new String[] {"0", "-0", "+1.5", "12.", ".25", "1e3", "1234567890123456.7",
                "0.1", "99.999", "-0.000001", "Infinity", "NaN"}) {
            assertEquals(Double.doubleToLongBits(Double.parseDouble(s)),
                    Double.doubleToLongBits(FastDecimal.parse(s)), s);
        }
    }

    @Test
    void rejectsWhatParseDoubleRejects() {
        for (String s : new String[] {"", "-", ".", "1.2.3", "abc", "1,5", "--1"}) {
            assertThrows(NumberFormatException.class, () -> FastDecimal.parse(s), s);
        }
    }
}
