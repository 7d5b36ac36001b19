package dev.positioner.calculation;

import dev.positioner.api.FieldError;
import dev.positioner.api.InvalidRequestException;
import dev.positioner.diagnosis.DiagnosisRequest.MeasurementInput;
import dev.positioner.measure.QuantityDef;
import dev.positioner.measure.QuantityReader;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** The validated inputs of one calculation in canonical units; missing required ones are field errors. */
final class Inputs {

    private final Map<String, Double> values = new LinkedHashMap<>();
    private final List<FieldError> errors = new ArrayList<>();

    Inputs(CalculationRequest request, Map<String, QuantityDef> defs) {
        if (request == null) {
            throw new InvalidRequestException("$", "a JSON body is required");
        }
        QuantityReader reader = new QuantityReader(defs, errors);
        List<MeasurementInput> inputs = request.inputs() == null ? List.of() : request.inputs();
        for (int i = 0; i < inputs.size(); i++) {
            MeasurementInput m = inputs.get(i);
            String field = "inputs[" + i + "]";
            if (m == null) {
                errors.add(new FieldError(field, "must be an object with quantity, value and unit"));
                continue;
            }
            double v = reader.read(field, m.quantity(), m.value(), m.unit(), 0.15);
            if (!Double.isNaN(v) && values.put(m.quantity(), v) != null) {
                errors.add(new FieldError(field + ".quantity", "'" + m.quantity() + "' is given twice"));
            }
        }
    }

    double require(String quantity) {
        Double v = values.get(quantity);
        if (v == null) {
            errors.add(new FieldError("inputs", "needs " + quantity));
            return Double.NaN;
        }
        return v;
    }

    /** The first of the quantities given, e.g. a measured pump flow before the rated one. */
    double requireOneOf(String... quantities) {
        for (String q : quantities) {
            if (values.containsKey(q)) {
                return values.get(q);
            }
        }
        errors.add(new FieldError("inputs", "needs one of " + String.join(", ", quantities)));
        return Double.NaN;
    }

    Double optional(String quantity) {
        return values.get(quantity);
    }

    void error(String field, String message) {
        errors.add(new FieldError(field, message));
    }

    /** Throws the collected errors, if any; call before computing. */
    void check() {
        if (!errors.isEmpty()) {
            throw new InvalidRequestException(errors);
        }
    }
}
