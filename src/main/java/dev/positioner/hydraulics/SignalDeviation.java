package dev.positioner.hydraulics;

/**
 * The positioner's input signal against what the controller says it sends, as percent of span.
 *
 * <p>Signal ranges: 4–20 mA DC, the standard analogue current signal of IEC 60381-1 and
 * ANSI/ISA-50.00.01; 20–100 kPa, the pneumatic signal of IEC 60382; and 3–15 psi (20.68 to
 * 103.42 kPa), its customary US counterpart. Both readings must be on the same range;
 * expressing the difference in percent of span makes one limit work for all of them.
 */
public final class SignalDeviation {

    private static final double PA_PER_PSI = 6894.757293168;

    /** Lower and upper range values in SI: amperes, pascals, or percent. */
    public enum Range {
        CURRENT_4_20_MA(0.004, 0.020),
        PNEUMATIC_3_15_PSI(3 * PA_PER_PSI, 15 * PA_PER_PSI),
        PNEUMATIC_20_100_KPA(20_000, 100_000),
        PERCENT(0, 100);

        private final double lower;
        private final double upper;

        Range(double lower, double upper) {
            this.lower = lower;
            this.upper = upper;
        }

        public double lower() {
            return lower;
        }

        public double upper() {
            return upper;
        }

        /** Where a value sits in the range, percent of span; below 0 or above 100 is out of range. */
        public double percentOfSpan(double value) {
            return (Checks.finite("signal", value) - lower) / (upper - lower) * 100;
        }
    }

    /** Both signals in percent of span, and input minus commanded in percentage points of span. */
    public record Result(Range range, double inputPercent, double commandedPercent, double deviationPercentOfSpan) {
    }

    private SignalDeviation() {
    }

    public static Result compare(Range range, double input, double commanded) {
        double in = range.percentOfSpan(input);
        double cmd = range.percentOfSpan(commanded);
        return new Result(range, in, cmd, in - cmd);
    }
}
