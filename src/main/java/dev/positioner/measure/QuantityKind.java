package dev.positioner.measure;

/**
 * The physical kind of a quantity and the canonical unit the service stores it in.
 * Canonical units are SI except where technicians' own scale is the natural one (percent of
 * travel, particles per mL, ppm, kinematic viscosity in mm2/s as oil data sheets give it), because the limits the rules compare against are written so.
 */
public enum QuantityKind {
    PRESSURE("Pa"),
    TEMPERATURE("degC"),
    SIGNAL("percent"),
    FRACTION("percent"),
    RATE("m_per_s"),
    TIME("s"),
    COUNT("per_mL"),
    CONCENTRATION("ppm"),
    FLOW("m3_per_s"),
    LENGTH("m"),
    MASS("kg"),
    FORCE("N"),
    VISCOSITY("mm2_per_s"),
    ISO_VG("grade"),
    ISO4406("code");

    private final String canonicalUnit;

    QuantityKind(String canonicalUnit) {
        this.canonicalUnit = canonicalUnit;
    }

    public String canonicalUnit() {
        return canonicalUnit;
    }

    public boolean isNumeric() {
        return this != ISO_VG && this != ISO4406;
    }
}
