package dev.positioner.calculation;

import dev.positioner.calculation.CalculationResult.Amount;
import dev.positioner.measure.UnitConverter;
import java.util.List;

/** One canonical value shown in each of the units technicians read it in. */
final class Amounts {

    private Amounts() {
    }

    static List<Amount> pressure(double pa) {
        return in(pa, "Pa", "psi", "bar", "kPa");
    }

    static List<Amount> force(double n) {
        return in(n, "N", "kN", "lbf");
    }

    static List<Amount> seconds(double s) {
        return List.of(new Amount(round(s), "s"));
    }

    static List<Amount> of(double value, String unit) {
        return List.of(new Amount(round(value), unit));
    }

    static List<Amount> in(double canonical, String from, String... units) {
        return java.util.Arrays.stream(units).map(u -> new Amount(round(UnitConverter.convert(canonical, from, u)), u)).toList();
    }

    /** Five significant figures: more than any gauge reads, fewer than look like false precision. */
    static double round(double v) {
        if (v == 0 || !Double.isFinite(v)) {
            return v;
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(5)).doubleValue();
    }
}
