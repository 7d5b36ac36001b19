package dev.positioner.hydraulics;

/**
 * Kinematic viscosity of a mineral oil at temperature, and its density.
 *
 * <p>Viscosity: ASTM D341, <em>Standard Practice for Viscosity-Temperature Equations and Charts
 * for Liquid Petroleum or Hydrocarbon Products</em>: log10 log10(&nu; + 0.7) = A &minus; B
 * log10 T, with &nu; in mm&sup2;/s and T in kelvin, fitted through two known points (normally
 * 40 and 100 &deg;C). D341 states this simple form for viscosities of 2.0 mm&sup2;/s and above;
 * below that it adds correction terms that are not implemented here, so results under
 * 2 mm&sup2;/s (thin oil, very hot) are only indicative. Oils thickened with VI improvers are
 * not described well by the equation.
 *
 * <p>Density: &rho;(t) = &rho;15 / (1 + &alpha;(t &minus; 15)), with &rho;15 = 870 kg/m&sup3; and
 * &alpha; = 6.5&times;10<sup>&minus;4</sup> 1/K. Both are from memory, typical of mineral
 * hydraulic oils (data sheets quote roughly 860 to 880 kg/m&sup3; at 15 &deg;C); use the oil's own
 * data sheet when it is known.
 */
public final class OilViscosity {

    /** Assumed density at 15 &deg;C, kg/m&sup3; (from memory, typical mineral hydraulic oil). */
    public static final double DENSITY_15C = 870.0;
    /** Assumed volumetric thermal expansion coefficient, 1/K (from memory, typical mineral oil). */
    public static final double EXPANSION_PER_K = 6.5e-4;

    private static final double CELSIUS_TO_KELVIN = 273.15;

    private OilViscosity() {
    }

    /** Constants of one ASTM D341 line; T in kelvin, &nu; in mm&sup2;/s, logs base 10. */
    public record WaltherFit(double a, double b) {

        public double viscosityAtKelvin(double kelvin) {
            Checks.positive("temperature [K]", kelvin);
            return Math.pow(10, Math.pow(10, a - b * Math.log10(kelvin))) - 0.7;
        }

        public double viscosityAtCelsius(double celsius) {
            return viscosityAtKelvin(celsius + CELSIUS_TO_KELVIN);
        }
    }

    /** Fits the D341 line through two (T [K], &nu; [mm&sup2;/s]) points. */
    public static WaltherFit fitKelvin(double t1, double nu1, double t2, double nu2) {
        Checks.positive("t1 [K]", t1);
        Checks.positive("t2 [K]", t2);
        Checks.positive("nu1 [cSt]", nu1);
        Checks.positive("nu2 [cSt]", nu2);
        if (t1 == t2) {
            throw new IllegalArgumentException("the two temperatures must differ");
        }
        double b = (loglog(nu2) - loglog(nu1)) / (Math.log10(t1) - Math.log10(t2));
        return new WaltherFit(loglog(nu2) + b * Math.log10(t2), b);
    }

    /** Fits the D341 line through two (t [&deg;C], &nu; [mm&sup2;/s]) points. */
    public static WaltherFit fitCelsius(double t1, double nu1, double t2, double nu2) {
        return fitKelvin(t1 + CELSIUS_TO_KELVIN, nu1, t2 + CELSIUS_TO_KELVIN, nu2);
    }

    /** Viscosity, mm&sup2;/s, of a grade at its midpoint, assuming viscosity index 100 (see {@link IsoVgGrade}). */
    public static double viscosityAtCelsius(IsoVgGrade grade, double celsius) {
        return fitCelsius(40, grade.midpoint40(), 100, grade.viscosity100AtVi100()).viscosityAtCelsius(celsius);
    }

    /** Density, kg/m&sup3;, at a temperature in &deg;C, from the assumed 15 &deg;C density and expansion. */
    public static double densityAtCelsius(double celsius) {
        Checks.finite("temperature [degC]", celsius);
        return DENSITY_15C / (1 + EXPANSION_PER_K * (celsius - 15));
    }

    private static double loglog(double nu) {
        return Math.log10(Math.log10(nu + 0.7));
    }
}
