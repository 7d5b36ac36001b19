package dev.positioner.measure;

import java.util.Map;
import javax.measure.IncommensurableException;
import javax.measure.Unit;

/** Converts a client's value and unit to the canonical unit of its kind. */
public final class UnitConverter {

    /**
     * Standard instrument signal ranges, as (zero, span) in the unit named. 4-20 mA and 3-15 psi
     * are the ranges of IEC 60381-1 and ANSI/ISA-50.00.01 and IEC 60382 (0.2-1.0 bar, the metric
     * pneumatic range). A value in one of these units becomes percent of signal span.
     */
    private static final Map<String, double[]> SIGNAL_RANGES = Map.of(
            "mA", new double[] {4, 16},
            "psi", new double[] {3, 12},
            "bar", new double[] {0.2, 0.8});

    private UnitConverter() {
    }

    /**
     * @param strokeLengthM used only to turn a creep rate in percent of travel per minute into m/s
     * @throws IllegalArgumentException naming the unit when it does not belong to the quantity
     */
    public static double toCanonical(QuantityDef def, double value, String unit, double strokeLengthM) {
        if (!def.accepts(unit)) {
            throw new IllegalArgumentException("unit '" + unit + "' is not accepted for " + def.code()
                    + "; use one of " + def.units());
        }
        return switch (def.kind()) {
            case SIGNAL -> signalPercent(value, unit);
            case FRACTION, COUNT, CONCENTRATION, ISO_VG, ISO4406 -> value;
            case RATE -> unit.equals("percent_per_min")
                    ? value / 100.0 * strokeLengthM / 60.0
                    : convert(value, unit, "m_per_s");
            default -> convert(value, unit, def.kind().canonicalUnit());
        };
    }

    /** Converts between two unit codes of the same dimension, e.g. for showing a limit in psi. */
    public static double convert(double value, String fromUnit, String toUnit) {
        if (fromUnit.equals(toUnit)) {
            return value;
        }
        return CONVERTERS.computeIfAbsent(fromUnit + ">" + toUnit, key -> converter(fromUnit, toUnit)).convert(value);
    }

    /**
     * Building a JSR 385 converter reduces unit products with exact rational arithmetic and was
     * most of the time of a diagnosis; the pairs are few, so each is built once.
     */
    private static final Map<String, javax.measure.UnitConverter> CONVERTERS = new java.util.concurrent.ConcurrentHashMap<>();

    private static javax.measure.UnitConverter converter(String fromUnit, String toUnit) {
        Unit<?> from = UnitCatalog.unit(fromUnit).orElseThrow(() -> unknown(fromUnit));
        Unit<?> to = UnitCatalog.unit(toUnit).orElseThrow(() -> unknown(toUnit));
        try {
            return from.getConverterToAny(to);
        } catch (IncommensurableException e) {
            throw new IllegalArgumentException("cannot convert " + fromUnit + " to " + toUnit);
        }
    }

    public static boolean isKnownUnit(String unit) {
        return UnitCatalog.unit(unit).isPresent() || SIGNAL_RANGES.containsKey(unit)
                || unit.equals("percent") || unit.equals("percent_per_min") || unit.equals("per_mL")
                || unit.equals("ppm");
    }

    /** An instrument signal in percent, mA (4-20), psi (3-15) or bar (0.2-1.0) as percent of span. */
    public static double signalPercent(double value, String unit) {
        if (unit.equals("percent")) {
            return value;
        }
        double[] range = SIGNAL_RANGES.get(unit);
        return (value - range[0]) / range[1] * 100.0;
    }

    private static IllegalArgumentException unknown(String unit) {
        return new IllegalArgumentException("unknown unit '" + unit + "'");
    }
}
