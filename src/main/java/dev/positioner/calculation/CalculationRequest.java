package dev.positioner.calculation;

import dev.positioner.diagnosis.DiagnosisRequest.MeasurementInput;
import java.util.List;

/** Inputs of a calculation as {quantity, value, unit}, with the quantity codes of the knowledge base. */
public record CalculationRequest(List<MeasurementInput> inputs, String oilGrade, String cleanlinessTarget) {
}
