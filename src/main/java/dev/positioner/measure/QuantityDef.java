package dev.positioner.measure;

import java.util.List;

/**
 * One quantity a client may send: its code, kind, the unit codes accepted for it and the range of
 * canonical values that is physically possible. Values outside the range are rejected as
 * impossible, not clipped: a mistyped reading must not turn into evidence.
 */
public record QuantityDef(String code, QuantityKind kind, List<String> units, double min, double max, String meaning) {

    public boolean accepts(String unit) {
        return units.contains(unit);
    }
}
