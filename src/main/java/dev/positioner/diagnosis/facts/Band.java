package dev.positioner.diagnosis.facts;

/**
 * The normal band of a reading for this valve, in canonical units; NaN leaves a side open.
 * {@code basis} says where the band comes from (design data, default, standard), for the reasons.
 *
 * <p>{@code margin} is how far off a field reading of this kind can be at the limit (gauge accuracy,
 * reading resolution), in the same canonical unit. A reading closer to a limit than that proves
 * neither side: it is borderline, the decision rule of ISO 14253-1 (conformity with a specification
 * is proved only outside the uncertainty zone around the limit; likewise JCGM 106:2012 on guard
 * bands). A margin of zero makes the band sharp.
 */
public record Band(String quantity, double low, double high, String unit, String basis, double margin) {

    public Band(String quantity, double low, double high, String unit, String basis) {
        this(quantity, low, high, unit, basis, 0);
    }

    /** Below the low limit by more than the margin. */
    public boolean below(double value) {
        return !Double.isNaN(low) && value < low - margin;
    }

    /** Above the high limit by more than the margin. */
    public boolean above(double value) {
        return !Double.isNaN(high) && value > high + margin;
    }

    /** Inside the band by at least the margin on each closed side. */
    public boolean within(double value) {
        return (Double.isNaN(low) || value >= low + margin) && (Double.isNaN(high) || value <= high - margin);
    }

    /** Within the margin of a limit: neither within nor outside the band. */
    public boolean borderline(double value) {
        return !below(value) && !above(value) && !within(value);
    }

    /** The limit a borderline reading is near. */
    public double nearestLimit(double value) {
        if (Double.isNaN(low)) {
            return high;
        }
        if (Double.isNaN(high)) {
            return low;
        }
        return Math.abs(value - low) <= Math.abs(value - high) ? low : high;
    }
}
