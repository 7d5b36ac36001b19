package dev.positioner.hydraulics;

/**
 * Hydraulic natural frequency of a piston and its load held by the two trapped oil columns.
 *
 * <p>Source: Merritt, <em>Hydraulic Control Systems</em> (Wiley, 1967): for a symmetric
 * double-acting actuator with the piston centred, &omega;h = &radic;(4 &beta;e A&sup2; / (Vt M)),
 * Vt the total oil volume of both sides (chambers plus lines to the valve) and M the moving
 * mass. The same spring model for any piston position and unequal areas (each column a spring
 * of stiffness &beta;e A&sup2;/V) gives &omega;&sup2; = (&beta;e / M)(A1&sup2;/V1 + A2&sup2;/V2),
 * which reduces to Merritt's form when A1 = A2 and V1 = V2 = Vt/2, where it is lowest.
 *
 * <p>Why it matters here: the positioner loop must stay well below this frequency; entrained
 * air or long soft hoses lower it and a valve that was stable starts to hunt.
 */
public final class HydraulicNaturalFrequency {

    public record Result(double radiansPerSecond, double hertz) {
    }

    private HydraulicNaturalFrequency() {
    }

    /** Merritt's centred, symmetric form. Inputs in Pa, m&sup2;, m&sup3;, kg. */
    public static Result centred(double effectiveBulkModulus, double pistonArea, double totalVolume, double movingMass) {
        Checks.positive("effective bulk modulus [Pa]", effectiveBulkModulus);
        Checks.positive("piston area [m2]", pistonArea);
        Checks.positive("total volume [m3]", totalVolume);
        Checks.positive("moving mass [kg]", movingMass);
        return of(Math.sqrt(4 * effectiveBulkModulus * pistonArea * pistonArea / (totalVolume * movingMass)));
    }

    /** Two columns of their own area and volume, e.g. a single-rod piston off centre. */
    public static Result twoColumns(double effectiveBulkModulus, double area1, double volume1,
                                    double area2, double volume2, double movingMass) {
        Checks.positive("effective bulk modulus [Pa]", effectiveBulkModulus);
        Checks.positive("area 1 [m2]", area1);
        Checks.positive("volume 1 [m3]", volume1);
        Checks.positive("area 2 [m2]", area2);
        Checks.positive("volume 2 [m3]", volume2);
        Checks.positive("moving mass [kg]", movingMass);
        double stiffness = effectiveBulkModulus * (area1 * area1 / volume1 + area2 * area2 / volume2);
        return of(Math.sqrt(stiffness / movingMass));
    }

    private static Result of(double omega) {
        return new Result(omega, omega / (2 * Math.PI));
    }
}
