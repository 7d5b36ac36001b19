package dev.positioner.hydraulics;

/**
 * Internal leakage inferred from creep, and pump volumetric efficiency.
 *
 * <p>Both are continuity and a ratio, first principles rather than a published method: oil that
 * lets a blocked piston creep at velocity v must leave the shrinking chamber at Q = A v, A the
 * area of that chamber's piston face (full bore or annulus). Volumetric efficiency follows the
 * usual fluid power definition, actual over theoretical delivery; the pump's rated flow stands
 * in for its theoretical flow (common practice in the field, where displacement and speed are
 * rarely at hand), so a new pump may show slightly under 1.
 */
public final class Leakage {

    private Leakage() {
    }

    /** Creep velocity, m/s, from a creep rate in percent of stroke per minute and the stroke [m]. */
    public static double creepVelocityFromPercentPerMinute(double percentPerMinute, double stroke) {
        Checks.finite("creep rate [%/min]", percentPerMinute);
        return percentPerMinute / 100 * Checks.positive("stroke [m]", stroke) / 60;
    }

    /** Creep velocity, m/s, from millimetres per minute; a convenience, since technicians time creep that way. */
    public static double creepVelocityFromMmPerMinute(double mmPerMinute) {
        return Checks.finite("creep rate [mm/min]", mmPerMinute) / 1000 / 60;
    }

    /** Leakage flow, m&sup3;/s, equivalent to a creep velocity [m/s] of a face of area [m&sup2;]; sign ignored. */
    public static double internalLeakageFlow(double pistonArea, double creepVelocity) {
        return Checks.positive("piston area [m2]", pistonArea) * Math.abs(Checks.finite("creep velocity [m/s]", creepVelocity));
    }

    /** Measured over rated pump flow (any consistent units); 1 is as rated. */
    public static double volumetricEfficiency(double measuredFlow, double ratedFlow) {
        return Checks.nonNegative("measured flow", measuredFlow) / Checks.positive("rated flow", ratedFlow);
    }
}
