package dev.positioner.diagnosis.facts;

/**
 * The normal band of a reading for this valve, in canonical units; NaN leaves a side open.
 * {@code basis} says where the band comes from (design data, default, standard), for the reasons.
 */
public record Band(String quantity, double low, double high, String unit, String basis) {

    public boolean below(double value) {
        return !Double.isNaN(low) && value < low;
    }

    public boolean above(double value) {
        return !Double.isNaN(high) && value > high;
    }

    public boolean within(double value) {
        return !below(value) && !above(value);
    }
}
