package dev.positioner.hydraulics;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * ISO 4406 solid-particle cleanliness code: scale numbers for particles per mL at &ge; 4, &ge; 6
 * and &ge; 14 &micro;m(c), written as "16/14/11".
 *
 * <p>Source: ISO 4406:1999 (Table 1) and ISO 4406:2021, which keep the same allocation of scale
 * numbers. Scale number R covers counts "more than" the upper limit of R &minus; 1 "up to and
 * including" its own upper limit. The limits roughly double from 0.01 per mL at scale 0 but
 * the standard rounds some of them (1.3, 2.5, 1 300, 2 500, ...), so they are listed here as
 * published, not computed. Counts above 2 500 000 per mL are off the table (reported as "&gt;28").
 *
 * <p>Not handled: the "&ge;" marker the standard adds when fewer than 20 particles were counted,
 * and the two-part microscope form "&minus;/15/12".
 *
 * <p>{@link #SERVO_TARGET} 16/14/11 is common practice for servo-class and proportional valves
 * at moderate pressure, as printed in filter makers' cleanliness charts, quoted from memory;
 * the valve maker's figure takes precedence.
 */
public final class Iso4406 {

    /** Upper limits, particles per mL, of scale numbers 0 to 28 (ISO 4406 Table 1). */
    private static final double[] UPPER = {
        0.01, 0.02, 0.04, 0.08, 0.16, 0.32, 0.64, 1.3, 2.5, 5, 10, 20, 40, 80, 160, 320, 640,
        1_300, 2_500, 5_000, 10_000, 20_000, 40_000, 80_000, 160_000, 320_000, 640_000,
        1_300_000, 2_500_000};

    private static final Pattern CODE = Pattern.compile("\\s*(\\d{1,2})\\s*/\\s*(\\d{1,2})\\s*/\\s*(\\d{1,2})\\s*");

    public record Code(int r4, int r6, int r14) {
        public Code {
            for (int r : new int[] {r4, r6, r14}) {
                if (r < 0 || r >= UPPER.length) {
                    throw new IllegalArgumentException("ISO 4406 scale numbers run from 0 to 28, got " + r);
                }
            }
        }

        @Override
        public String toString() {
            return r4 + "/" + r6 + "/" + r14;
        }
    }

    /** One size range where the measured scale number is above the target, and by how many steps. */
    public record Exceedance(String size, int measured, int target, int steps) {
    }

    public record Comparison(Code measured, Code target, List<Exceedance> exceedances) {
        public boolean withinTarget() {
            return exceedances.isEmpty();
        }
    }

    public static final Code SERVO_TARGET = new Code(16, 14, 11);

    private Iso4406() {
    }

    /** Scale number for a count per mL; a count of zero falls in scale 0. */
    public static int scaleNumber(double countPerMl) {
        Checks.nonNegative("particle count [per mL]", countPerMl);
        for (int r = 0; r < UPPER.length; r++) {
            if (countPerMl <= UPPER[r]) {
                return r;
            }
        }
        throw new IllegalArgumentException("particle count " + countPerMl
                + " per mL is above the ISO 4406 table (more than 2 500 000, code >28)");
    }

    /** Upper limit, particles per mL, of a scale number ("up to and including"). */
    public static double upperLimit(int scaleNumber) {
        if (scaleNumber < 0 || scaleNumber >= UPPER.length) {
            throw new IllegalArgumentException("ISO 4406 scale numbers run from 0 to 28, got " + scaleNumber);
        }
        return UPPER[scaleNumber];
    }

    public static Code fromCounts(double per4um, double per6um, double per14um) {
        if (per4um < per6um || per6um < per14um) {
            throw new IllegalArgumentException("cumulative counts must not increase with size: "
                    + per4um + " / " + per6um + " / " + per14um);
        }
        return new Code(scaleNumber(per4um), scaleNumber(per6um), scaleNumber(per14um));
    }

    public static Code parse(String text) {
        Matcher m = CODE.matcher(text == null ? "" : text);
        if (!m.matches()) {
            throw new IllegalArgumentException("not an ISO 4406 three-part code like 16/14/11: " + text);
        }
        return new Code(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)), Integer.parseInt(m.group(3)));
    }

    public static Comparison compare(Code measured, Code target) {
        List<Exceedance> over = new ArrayList<>();
        add(over, "4um", measured.r4(), target.r4());
        add(over, "6um", measured.r6(), target.r6());
        add(over, "14um", measured.r14(), target.r14());
        return new Comparison(measured, target, List.copyOf(over));
    }

    private static void add(List<Exceedance> over, String size, int measured, int target) {
        if (measured > target) {
            over.add(new Exceedance(size, measured, target, measured - target));
        }
    }
}
