package dev.positioner.hydraulics;

import java.util.Locale;

/**
 * ISO 3448 viscosity grades used for hydraulic oils, VG10 to VG150.
 *
 * <p>Source: ISO 3448:1992, <em>Industrial liquid lubricants — ISO viscosity
 * classification</em>. The grade number is the midpoint kinematic viscosity at 40 &deg;C in
 * mm&sup2;/s and the grade limits are the midpoint &plusmn;10 %.
 *
 * <p>The 100 &deg;C viscosity of each grade is not part of ISO 3448; it depends on the oil.
 * {@link #viscosity100AtVi100()} assumes viscosity index 100, typical of the HM mineral
 * hydraulic oils these positioners run on (an assumption, not a measurement). For VI 100 the
 * ASTM D2270 definition makes the oil's 40 &deg;C viscosity equal to the tabulated H value for
 * its 100 &deg;C viscosity Y, so Y is found by inverse linear interpolation between the two
 * rows of ASTM D2270 Table 1 that bracket the grade midpoint (rows copied below as
 * {Y, H}). When a data sheet gives the real 100 &deg;C value, prefer it.
 */
public enum IsoVgGrade {
    VG10(10, 2.6, 9.647, 2.7, 10.25),
    VG15(15, 3.4, 14.93, 3.5, 15.66),
    VG22(22, 4.2, 21.21, 4.3, 22.05),
    VG32(32, 5.3, 31.40, 5.4, 32.37),
    VG46(46, 6.7, 45.33, 6.8, 46.44),
    VG68(68, 8.7, 67.64, 8.8, 68.79),
    VG100(100, 11.3, 98.97, 11.4, 100.2),
    VG150(150, 15.0, 149.7, 15.1, 151.2);

    private static final double TOLERANCE = 0.10;

    private final double midpoint40;
    private final double yLow;
    private final double hLow;
    private final double yHigh;
    private final double hHigh;

    IsoVgGrade(double midpoint40, double yLow, double hLow, double yHigh, double hHigh) {
        this.midpoint40 = midpoint40;
        this.yLow = yLow;
        this.hLow = hLow;
        this.yHigh = yHigh;
        this.hHigh = hHigh;
    }

    /** Midpoint kinematic viscosity at 40 &deg;C, mm&sup2;/s. */
    public double midpoint40() {
        return midpoint40;
    }

    /** Lower grade limit at 40 &deg;C, mm&sup2;/s (midpoint less 10 %). */
    public double min40() {
        return midpoint40 * (1 - TOLERANCE);
    }

    /** Upper grade limit at 40 &deg;C, mm&sup2;/s (midpoint plus 10 %). */
    public double max40() {
        return midpoint40 * (1 + TOLERANCE);
    }

    /** Whether a measured 40 &deg;C viscosity lies within the grade limits (limits inclusive). */
    public boolean contains(double viscosity40Cst) {
        return viscosity40Cst >= min40() && viscosity40Cst <= max40();
    }

    /** 100 &deg;C kinematic viscosity, mm&sup2;/s, of an oil of this grade with viscosity index 100. */
    public double viscosity100AtVi100() {
        return yLow + (yHigh - yLow) * (midpoint40 - hLow) / (hHigh - hLow);
    }

    /** Accepts "VG46", "ISO VG 46", "iso-vg46" and the like. */
    public static IsoVgGrade parse(String text) {
        if (text == null) {
            throw new IllegalArgumentException("oil grade is missing");
        }
        String digits = text.toUpperCase(Locale.ROOT).replaceAll("[\\s_-]", "").replaceFirst("^(ISO)?VG", "");
        for (IsoVgGrade grade : values()) {
            if (grade.name().substring(2).equals(digits)) {
                return grade;
            }
        }
        throw new IllegalArgumentException("unknown ISO VG grade: " + text);
    }
}
