package dev.positioner.diagnosis.facts;

/**
 * What a reading or combination means, in a sentence a technician understands. {@code value} and
 * {@code unit} are in the technician's unit where there is one; {@code limit} is the expected value
 * or band in words ("225-275 psi"); NaN value for findings without a number.
 */
public record Finding(String code, String text, double value, String unit, String limit) {

    public static Finding note(String code, String text) {
        return new Finding(code, text, Double.NaN, null, null);
    }
}
