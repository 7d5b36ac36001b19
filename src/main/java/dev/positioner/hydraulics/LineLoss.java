package dev.positioner.hydraulics;

/**
 * Pressure drop along a straight drain or return line of round bore (fittings not included).
 *
 * <p>Laminar flow: the Hagen–Poiseuille law, &Delta;p = 128 &mu; L Q / (&pi; d<sup>4</sup>),
 * equivalent to Darcy–Weisbach with f = 64/Re. Otherwise Darcy–Weisbach,
 * &Delta;p = f (L/d) &rho; v&sup2;/2, with the Swamee–Jain (1976) explicit approximation of the
 * Colebrook equation, f = 0.25 / [log10(&epsilon;/(3.7 d) + 5.74/Re<sup>0.9</sup>)]&sup2;. Both
 * are in standard fluid mechanics texts (e.g. White, <em>Fluid Mechanics</em>).
 *
 * <p>Thresholds: laminar below Re 2000, the lower end of the 2000 to 2300 range quoted in
 * texts for the end of laminar pipe flow and the value commonly used in fluid power work;
 * fully turbulent from Re 4000, where the Moody chart's turbulent curves start. In between
 * the flow is reported as transitional and the turbulent correlation is used, which gives the
 * higher of the two estimates (the safe side when asking whether a line can cause back
 * pressure). The default roughness, 1.5 &micro;m for drawn tubing, is a common table value
 * quoted from memory.
 */
public final class LineLoss {

    public static final double LAMINAR_BELOW_RE = 2000;
    public static final double TURBULENT_FROM_RE = 4000;
    /** Absolute roughness of drawn steel or copper tubing, m (common table value, from memory). */
    public static final double DRAWN_TUBING_ROUGHNESS = 1.5e-6;

    public enum Regime { LAMINAR, TRANSITIONAL, TURBULENT }

    public enum Method { HAGEN_POISEUILLE, DARCY_WEISBACH_SWAMEE_JAIN }

    /** Pressure drop in Pa, mean velocity in m/s, Darcy friction factor, and how it was found. */
    public record Result(double pressureDrop, double reynolds, double velocity, double frictionFactor,
                         Regime regime, Method method) {
    }

    private LineLoss() {
    }

    /** Reynolds number from flow [m&sup3;/s], bore [m] and kinematic viscosity [mm&sup2;/s]. */
    public static double reynolds(double flow, double bore, double viscosityCst) {
        return velocity(flow, bore) * bore / (Checks.positive("viscosity [cSt]", viscosityCst) * 1e-6);
    }

    /** Same as the full form with the drawn-tubing roughness. */
    public static Result pressureDrop(double flow, double bore, double length, double viscosityCst, double density) {
        return pressureDrop(flow, bore, length, viscosityCst, density, DRAWN_TUBING_ROUGHNESS);
    }

    public static Result pressureDrop(double flow, double bore, double length, double viscosityCst,
                                      double density, double roughness) {
        Checks.nonNegative("flow [m3/s]", flow);
        Checks.positive("bore [m]", bore);
        Checks.nonNegative("length [m]", length);
        Checks.positive("density [kg/m3]", density);
        Checks.nonNegative("roughness [m]", roughness);
        double v = velocity(flow, bore);
        double re = reynolds(flow, bore, viscosityCst);
        if (re < LAMINAR_BELOW_RE) {
            double mu = density * viscosityCst * 1e-6;
            double dp = 128 * mu * length * flow / (Math.PI * Math.pow(bore, 4));
            // With no flow the friction factor is undefined; 0 keeps the record plain numbers.
            double f = re > 0 ? 64 / re : 0;
            return new Result(dp, re, v, f, Regime.LAMINAR, Method.HAGEN_POISEUILLE);
        }
        double f = swameeJain(re, roughness / bore);
        double dp = f * (length / bore) * density * v * v / 2;
        Regime regime = re < TURBULENT_FROM_RE ? Regime.TRANSITIONAL : Regime.TURBULENT;
        return new Result(dp, re, v, f, regime, Method.DARCY_WEISBACH_SWAMEE_JAIN);
    }

    /** Darcy friction factor by Swamee–Jain; relativeRoughness is &epsilon;/d. */
    public static double swameeJain(double reynolds, double relativeRoughness) {
        Checks.positive("Reynolds number", reynolds);
        Checks.nonNegative("relative roughness", relativeRoughness);
        double log = Math.log10(relativeRoughness / 3.7 + 5.74 / Math.pow(reynolds, 0.9));
        return 0.25 / (log * log);
    }

    private static double velocity(double flow, double bore) {
        Checks.positive("bore [m]", bore);
        return flow / (Math.PI * bore * bore / 4);
    }
}
