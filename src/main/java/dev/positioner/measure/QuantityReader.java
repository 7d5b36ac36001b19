package dev.positioner.measure;

import dev.positioner.api.FieldError;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Reads one {quantity, value, unit} from a client into its canonical value, or records why it
 * cannot: unknown quantity, missing or non-finite value, unit of another kind, impossible value.
 * Shared by every endpoint that takes quantities so they all answer a bad value the same way.
 */
public final class QuantityReader {

    private final Map<String, QuantityDef> defs;
    private final List<FieldError> errors;

    public QuantityReader(Map<String, QuantityDef> defs, List<FieldError> errors) {
        this.defs = defs;
        this.errors = errors;
    }

    /** @return the canonical value, or NaN after recording an error under {@code field} */
    public double read(String field, String quantity, Double value, String unit, double strokeLengthM) {
        QuantityDef def = quantity == null ? null : defs.get(quantity);
        if (def == null) {
            errors.add(new FieldError(field + ".quantity", quantity == null ? "is required" : "unknown quantity '" + quantity + "'"));
            return Double.NaN;
        }
        if (value == null || !Double.isFinite(value)) {
            errors.add(new FieldError(field + ".value", value == null ? "is required" : "must be a finite number"));
            return Double.NaN;
        }
        if (unit == null || !def.accepts(unit)) {
            errors.add(new FieldError(field + ".unit", (unit == null ? "is required" : "unit '" + unit + "' is not accepted")
                    + " for " + def.code() + "; use one of " + def.units()));
            return Double.NaN;
        }
        double canonical = UnitConverter.toCanonical(def, value, unit, strokeLengthM);
        if (canonical < def.min() || canonical > def.max()) {
            errors.add(new FieldError(field + ".value", String.format(Locale.ROOT, "%s %s is not a possible %s",
                    value, unit, def.code().replace('_', ' '))));
            return Double.NaN;
        }
        return canonical;
    }

    public QuantityDef def(String quantity) {
        return defs.get(quantity);
    }
}
