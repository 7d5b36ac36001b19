package dev.positioner.trace;

import dev.positioner.measure.UnitConverter;

/**
 * Units a trace column may be logged in, each converted to percent of span.
 * Sources: IEC 60381-1 (analogue direct-current signals, 4 to 20 mA) and IEC 60382 (analogue
 * pneumatic signal, 20 to 100 kPa, the metric form of the customary 3 to 15 psi range).
 */
public enum SignalUnit {
    PERCENT("percent"),
    MILLIAMP("mA"),
    PSI("psi");

    private final String unitCode;

    SignalUnit(String unitCode) {
        this.unitCode = unitCode;
    }

    /** Linear map of the live-zero range onto 0..100 % (4 mA and 3 psi are 0 %); the ranges live in UnitConverter. */
    public double toPercent(double value) {
        return UnitConverter.signalPercent(value, unitCode);
    }

    /** Parses "%", "percent", "mA", "psi" (case-insensitive), as a REST parameter would give. */
    public static SignalUnit parse(String text) {
        String t = text == null ? "" : text.trim().toLowerCase(java.util.Locale.ROOT);
        switch (t) {
            case "%": case "pct": case "percent": return PERCENT;
            case "ma": case "milliamp": case "milliamps": return MILLIAMP;
            case "psi": case "psig": return PSI;
            default: throw new IllegalArgumentException("unknown signal unit '" + text
                    + "': expected one of %, mA, psi");
        }
    }
}
