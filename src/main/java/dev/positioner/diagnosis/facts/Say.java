package dev.positioner.diagnosis.facts;

import dev.positioner.measure.UnitConverter;
import java.util.Locale;

/**
 * Sentences for findings, in the unit the technician used. Kept here so rule consequences stay one
 * line and every rule words its finding the same way.
 */
public final class Say {

    private Say() {
    }

    public static Finding belowBand(String code, String what, Reading r, Band b) {
        return new Finding(code, String.format(Locale.ROOT, "%s %s is below the normal band %s (%s).", what,
                show(r.givenValue(), r.givenUnit()), band(r, b), b.basis()), r.givenValue(), r.givenUnit(), band(r, b));
    }

    public static Finding aboveBand(String code, String what, Reading r, Band b) {
        return new Finding(code, String.format(Locale.ROOT, "%s %s is above the normal band %s (%s).", what,
                show(r.givenValue(), r.givenUnit()), band(r, b), b.basis()), r.givenValue(), r.givenUnit(), band(r, b));
    }

    public static Finding withinBand(String code, String what, Reading r, Band b) {
        return new Finding(code, String.format(Locale.ROOT, "%s %s is within the normal band %s.", what,
                show(r.givenValue(), r.givenUnit()), band(r, b)), r.givenValue(), r.givenUnit(), band(r, b));
    }

    public static Finding nearBandLimit(String code, String what, Reading r, Band b) {
        double limit = b.nearestLimit(r.value());
        double given = toGiven(limit, r);
        double margin = Math.abs(toGiven(limit + b.margin(), r) - given);
        return new Finding(code, String.format(Locale.ROOT,
                "%s %s is within the reading uncertainty (±%s) of the band limit %s: it neither confirms nor rules out a deviation,"
                        + " so it is not counted; take it again with a calibrated test instrument if it matters.",
                what, show(r.givenValue(), r.givenUnit()), show(margin, r.givenUnit()), show(given, r.givenUnit())),
                r.givenValue(), r.givenUnit(), band(r, b));
    }

    /** "supply_pressure" becomes "Supply pressure". */
    public static String label(String code) {
        String words = code.replace('_', ' ');
        return Character.toUpperCase(words.charAt(0)) + words.substring(1);
    }

    public static Finding signalDeviation(Reading input, Reading commanded) {
        double deviation = input.value() - commanded.value();
        return new Finding("input_signal_deviation", String.format(Locale.ROOT,
                "Input at the positioner %s against %s commanded: %s %% of span (more than 2 %% counts as deviating).",
                show(input.givenValue(), input.givenUnit()), show(commanded.givenValue(), commanded.givenUnit()),
                fmt(deviation)), deviation, "percent", "within ±2 % of span");
    }

    public static Finding positionError(Reading input, Reading position, double expected) {
        double error = position.value() - expected;
        return new Finding("position_error", String.format(Locale.ROOT,
                ("commanded_signal".equals(input.quantity()) ? "With the controller sending %s" : "With %s at the positioner")
                        + " the stem should sit at %s %% open and sits at %s: %s %% of travel off (more than 2 %% counts).",
                show(input.givenValue(), input.givenUnit()), fmt(expected), show(position.givenValue(), position.givenUnit()),
                fmt(error)), error, "percent", "within ±2 % of travel");
    }

    /** The band in the technician's unit; an open side is written as "at most" / "at least". */
    public static String band(Reading r, Band b) {
        String unit = r.givenUnit();
        if (Double.isNaN(b.low())) {
            return "at most " + show(toGiven(b.high(), r), unit);
        }
        if (Double.isNaN(b.high())) {
            return "at least " + show(toGiven(b.low(), r), unit);
        }
        return fmt(toGiven(b.low(), r)) + "-" + show(toGiven(b.high(), r), unit);
    }

    public static String show(double value, String unit) {
        return fmt(value) + " " + unit;
    }

    static String fmt(double v) {
        double a = Math.abs(v);
        String pattern = a >= 100 ? "%.0f" : a >= 10 ? "%.1f" : a >= 1 ? "%.2f" : "%.3g";
        return String.format(Locale.ROOT, pattern, v);
    }

    /** Canonical band limit back into the reading's unit, by the ratio the reading itself implies for linear units. */
    private static double toGiven(double canonical, Reading r) {
        if (r.unit().equals(r.givenUnit())) {
            return canonical;
        }
        try {
            return UnitConverter.convert(canonical, r.unit(), r.givenUnit());
        } catch (IllegalArgumentException e) {
            // Signal units (mA) and percent-of-stroke rates have no JSR 385 unit: scale linearly.
            return r.value() == 0 ? canonical : canonical * r.givenValue() / r.value();
        }
    }
}
