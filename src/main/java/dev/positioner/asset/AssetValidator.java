package dev.positioner.asset;

import dev.positioner.api.FieldError;
import dev.positioner.diagnosis.DiagnosisRequest.MeasurementInput;
import dev.positioner.diagnosis.facts.ValveAction;
import dev.positioner.hydraulics.Iso4406;
import dev.positioner.hydraulics.IsoVgGrade;
import dev.positioner.knowledge.KnowledgeBase;
import dev.positioner.measure.QuantityDef;
import dev.positioner.measure.UnitConverter;
import jakarta.enterprise.context.ApplicationScoped;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Checks an asset against the same quantity definitions and unit conversion the diagnosis uses, so
 * nothing enters the registry that a diagnosis would later reject. Returns the record with the oil
 * grade and cleanliness code written the one way the diagnosis expects (VG46, 16/14/11).
 */
@ApplicationScoped
public class AssetValidator {

    /** Tags go into URL paths, so no slash or space; plant tags like PV-2041 or 21.FV.003 fit. */
    static final Pattern TAG = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]{0,63}");
    /** Used only for the range check of a creep rate in percent; no design quantity needs it. */
    private static final double ANY_STROKE_M = 0.1;

    private final KnowledgeBase knowledge;

    public AssetValidator(KnowledgeBase knowledge) {
        this.knowledge = knowledge;
    }

    public record Result(AssetRecord asset, List<FieldError> errors) {
    }

    public Result validate(AssetRecord a, String prefix) {
        List<FieldError> errors = new ArrayList<>();
        if (a.tag() == null || !TAG.matcher(a.tag()).matches()) {
            errors.add(new FieldError(prefix + "tag", a.tag() == null ? "is required"
                    : "'" + a.tag() + "' is not a tag: letters, digits, '.', '_' and '-' only, at most 64"));
        }
        limit(errors, prefix + "description", a.description(), 500);
        limit(errors, prefix + "area", a.area(), 200);
        limit(errors, prefix + "site", a.site(), 100);
        String grade = blankToNull(a.oilGrade());
        if (grade != null) {
            try {
                grade = IsoVgGrade.parse(grade).name();
            } catch (IllegalArgumentException e) {
                errors.add(new FieldError(prefix + "oilGrade", "'" + grade + "' is not an ISO 3448 grade from VG10 to VG150"));
            }
        }
        String target = blankToNull(a.cleanlinessTarget());
        if (target != null) {
            try {
                target = Iso4406.parse(target).toString();
            } catch (IllegalArgumentException e) {
                errors.add(new FieldError(prefix + "cleanlinessTarget", "'" + target + "' is not an ISO 4406 code such as 16/14/11"));
            }
        }
        design(a.design(), prefix + "design", errors);
        String action = blankToNull(a.action());
        if (action != null && !ValveAction.ACTIONS.contains(action)) {
            errors.add(new FieldError(prefix + "action", "'" + action + "' is not one of " + ValveAction.ACTIONS));
        }
        String fail = blankToNull(a.failPosition());
        if (fail != null && !ValveAction.FAIL_POSITIONS.contains(fail)) {
            errors.add(new FieldError(prefix + "failPosition", "'" + fail + "' is not one of " + ValveAction.FAIL_POSITIONS));
        }
        AssetRecord clean = new AssetRecord(a.tag(), blankToNull(a.description()), blankToNull(a.area()),
                blankToNull(a.site()), grade, target, a.design(), action, fail, a.returnSpring());
        return new Result(clean, errors);
    }

    private void design(List<MeasurementInput> design, String field, List<FieldError> errors) {
        Set<String> seen = new HashSet<>();
        for (int i = 0; i < design.size(); i++) {
            MeasurementInput m = design.get(i);
            String f = field + "[" + i + "]";
            QuantityDef def = m == null || m.quantity() == null ? null : knowledge.catalogue().design().get(m.quantity());
            if (def == null) {
                errors.add(new FieldError(f + ".quantity", m == null || m.quantity() == null ? "is required"
                        : "unknown design quantity '" + m.quantity() + "'; use one of " + knowledge.catalogue().design().keySet()));
            } else if (!seen.add(def.code())) {
                errors.add(new FieldError(f + ".quantity", "'" + def.code() + "' is given twice"));
            } else if (m.value() == null || !Double.isFinite(m.value())) {
                errors.add(new FieldError(f + ".value", m.value() == null ? "is required" : "must be a finite number"));
            } else if (m.unit() == null || !def.accepts(m.unit())) {
                errors.add(new FieldError(f + ".unit", (m.unit() == null ? "is required" : "unit '" + m.unit()
                        + "' is not accepted") + " for " + def.code() + "; use one of " + def.units()));
            } else {
                double si = UnitConverter.toCanonical(def, m.value(), m.unit(), ANY_STROKE_M);
                if (si < def.min() || si > def.max()) {
                    errors.add(new FieldError(f + ".value", String.format(Locale.ROOT, "%s %s is not a possible %s",
                            m.value(), m.unit(), def.code().replace('_', ' '))));
                }
            }
        }
    }

    private static void limit(List<FieldError> errors, String field, String value, int max) {
        if (value != null && value.length() > max) {
            errors.add(new FieldError(field, "is longer than " + max + " characters"));
        }
    }

    static String blankToNull(String s) {
        return s == null || s.isBlank() ? null : s.strip();
    }
}
