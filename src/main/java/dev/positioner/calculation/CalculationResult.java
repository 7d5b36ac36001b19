package dev.positioner.calculation;

import java.util.List;

/**
 * What a calculation gives: each result in the units technicians use (a pressure in psi, bar and
 * kPa), a sentence, the method and its source, and anything assumed.
 */
public record CalculationResult(String calculation, List<Result> results, String method, List<String> sources,
        List<String> assumptions) {

    public record Result(String name, String text, List<Amount> values) {
    }

    public record Amount(double value, String unit) {
    }
}
