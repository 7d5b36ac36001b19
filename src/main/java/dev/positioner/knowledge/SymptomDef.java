package dev.positioner.knowledge;

import java.util.List;
import java.util.Map;

/** A symptom and P(present | fault); faults not listed take {@code otherwise}. */
public record SymptomDef(String code, String text, double otherwise, Map<String, Double> given,
        List<String> sources) {

    public double present(String fault) {
        return given.getOrDefault(fault, otherwise);
    }
}
