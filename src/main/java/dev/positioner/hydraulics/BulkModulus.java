package dev.positioner.hydraulics;

/**
 * Effective bulk modulus of oil carrying free (undissolved) air, optionally in a compliant
 * container.
 *
 * <p>Source: Merritt, <em>Hydraulic Control Systems</em> (Wiley, 1967), the series-compliance
 * form 1/&beta;e = 1/&beta;c + 1/&beta;oil + (Va/Vt)(1/&beta;air): the stiffnesses of container,
 * liquid and gas add like springs in series. The air term uses &beta;air = n p, p the
 * absolute pressure and n the polytropic exponent: 1.4 (adiabatic) for the fast pressure
 * changes of a stroke or an oscillation, 1.0 (isothermal) for slow ones. Va/Vt is the volume
 * of free air over the total volume at that pressure; air that has dissolved does not count.
 *
 * <p>Why it matters here: a few percent of entrained air cuts the stiffness of the oil column
 * by an order of magnitude, lowering the natural frequency (see
 * {@link HydraulicNaturalFrequency}) and making the valve spongy or prone to hunting.
 */
public final class BulkModulus {

    public static final double ADIABATIC_AIR = 1.4;
    /** Tangent bulk modulus of mineral hydraulic oil, Pa: about 1.5 GPa (from memory; data sheets give 1.4-1.8). */
    public static final double MINERAL_OIL = 1.5e9;
    /** Standard atmosphere, Pa, to turn gauge pressure into the absolute pressure the air term needs. */
    public static final double ATMOSPHERE = 101_325;
    public static final double ISOTHERMAL_AIR = 1.0;

    private BulkModulus() {
    }

    /** Bulk modulus of air, Pa, at an absolute pressure [Pa]: n p. */
    public static double air(double absolutePressure, double polytropicExponent) {
        return Checks.positive("absolute pressure [Pa]", absolutePressure)
                * Checks.positive("polytropic exponent", polytropicExponent);
    }

    /** Oil with free air in a rigid container. */
    public static double effective(double oil, double airVolumeFraction, double absolutePressure,
                                   double polytropicExponent) {
        return effective(oil, Double.POSITIVE_INFINITY, airVolumeFraction, absolutePressure, polytropicExponent);
    }

    /** Oil with free air in a container of bulk modulus {@code container}, Pa (infinite if rigid). */
    public static double effective(double oil, double container, double airVolumeFraction,
                                   double absolutePressure, double polytropicExponent) {
        Checks.positive("oil bulk modulus [Pa]", oil);
        if (!(container > 0)) {
            throw new IllegalArgumentException("container bulk modulus must be positive, was " + container);
        }
        Checks.nonNegative("air volume fraction", airVolumeFraction);
        if (airVolumeFraction >= 1) {
            throw new IllegalArgumentException("air volume fraction must be below 1, was " + airVolumeFraction);
        }
        double compliance = 1 / container + 1 / oil
                + airVolumeFraction / air(absolutePressure, polytropicExponent);
        return 1 / compliance;
    }
}
