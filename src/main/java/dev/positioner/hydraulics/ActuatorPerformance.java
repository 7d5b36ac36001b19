package dev.positioner.hydraulics;

/**
 * Thrust and expected stroke time of a double-acting, single-rod piston actuator fed by a
 * four-way pilot spool.
 *
 * <p>Force and speed from first principles: F = p A on each face, v = Q / A. Extend thrust is
 * supply on the full bore less drain on the annulus; retract thrust is supply on the annulus
 * less drain on the full bore. Seal friction and the valve's own process forces are not in
 * these numbers; they belong in the required thrust.
 *
 * <p>Metering flow: the sharp-edged orifice equation Q = Cd A &radic;(2 &Delta;p / &rho;) with
 * Cd = 0.61, the value given in standard fluid mechanics texts and in Merritt,
 * <em>Hydraulic Control Systems</em> (1967), where it is the theoretical &pi;/(&pi;+2) = 0.611
 * for a sharp-edged slot at high Reynolds number. For a matched, symmetric four-way spool
 * the oil passes two metering lands in series, so at load pressure pL each land sees
 * (ps &minus; pd &minus; pL)/2, which gives Merritt's Q = Cd A &radic;((ps &minus; pd &minus;
 * pL)/&rho;) for one land's open area A.
 *
 * <p>Expected stroke time = swept volume / the smaller of pump flow and spool flow: whichever
 * restricts first sets the speed (accumulators and compressibility are ignored).
 */
public final class ActuatorPerformance {

    /** Discharge coefficient of a sharp-edged orifice (Merritt 1967; standard texts). */
    public static final double SHARP_EDGED_CD = 0.61;

    public record PistonAreas(double bore, double annulus) {
    }

    public record Thrust(double extend, double retract) {
    }

    /** Thrust available against thrust required, N; ratio = available / required. */
    public record Margin(double available, double required, double surplus, double ratio) {
        public boolean sufficient() {
            return surplus >= 0;
        }
    }

    public enum Limit { PUMP, PILOT_SPOOL }

    /** Expected time in s for a swept volume in m&sup3;, at the limiting flow in m&sup3;/s. */
    public record StrokeTime(double seconds, double sweptVolume, double limitingFlow, Limit limitedBy) {
    }

    private ActuatorPerformance() {
    }

    public static PistonAreas areas(double boreDiameter, double rodDiameter) {
        Checks.positive("piston bore [m]", boreDiameter);
        Checks.nonNegative("rod diameter [m]", rodDiameter);
        if (rodDiameter >= boreDiameter) {
            throw new IllegalArgumentException("rod diameter must be smaller than the piston bore");
        }
        double bore = Math.PI * boreDiameter * boreDiameter / 4;
        return new PistonAreas(bore, bore - Math.PI * rodDiameter * rodDiameter / 4);
    }

    public static Thrust thrust(double supply, double drain, PistonAreas a) {
        Checks.finite("supply pressure [Pa]", supply);
        Checks.finite("drain pressure [Pa]", drain);
        return new Thrust(supply * a.bore() - drain * a.annulus(), supply * a.annulus() - drain * a.bore());
    }

    public static Margin margin(double available, double required) {
        Checks.finite("available thrust [N]", available);
        Checks.positive("required thrust [N]", required);
        return new Margin(available, required, available - required, available / required);
    }

    public static double orificeFlow(double area, double pressureDrop, double density) {
        return orificeFlow(SHARP_EDGED_CD, area, pressureDrop, density);
    }

    public static double orificeFlow(double cd, double area, double pressureDrop, double density) {
        Checks.positive("discharge coefficient", cd);
        Checks.nonNegative("orifice area [m2]", area);
        Checks.nonNegative("pressure drop [Pa]", pressureDrop);
        Checks.positive("density [kg/m3]", density);
        return cd * area * Math.sqrt(2 * pressureDrop / density);
    }

    /** Flow through a matched four-way spool with one land open by {@code landArea} (Merritt's form). */
    public static double fourWaySpoolFlow(double landArea, double supply, double drain, double load, double density) {
        double available = supply - drain - load;
        return available <= 0 ? 0 : orificeFlow(landArea, available / 2, density);
    }

    public static StrokeTime expectedStrokeTime(double pistonArea, double stroke, double pumpFlow, double spoolFlow) {
        double volume = Checks.positive("piston area [m2]", pistonArea) * Checks.positive("stroke [m]", stroke);
        Checks.positive("pump flow [m3/s]", pumpFlow);
        Checks.positive("spool flow [m3/s]", spoolFlow);
        boolean pumpLimits = pumpFlow <= spoolFlow;
        double flow = pumpLimits ? pumpFlow : spoolFlow;
        return new StrokeTime(volume / flow, volume, flow, pumpLimits ? Limit.PUMP : Limit.PILOT_SPOOL);
    }

    /**
     * The mean flow a full stroke in {@code seconds} draws: swept volume over time (continuity). Where
     * it exceeds what the pump delivers, the accumulator supplies the difference during the stroke
     * and recovers its charge between moves (the accumulator as auxiliary power source, e.g. Esposito,
     * <em>Fluid Power with Applications</em>, ch. on accumulators).
     */
    public static double strokeDemandFlow(double pistonArea, double stroke, double seconds) {
        return Checks.positive("piston area [m2]", pistonArea) * Checks.positive("stroke [m]", stroke)
                / Checks.positive("stroke time [s]", seconds);
    }

    /** Measured over expected stroke time; above 1 the valve is slower than its hydraulics allow. */
    public static double slownessRatio(double measuredSeconds, double expectedSeconds) {
        return Checks.positive("measured stroke time [s]", measuredSeconds)
                / Checks.positive("expected stroke time [s]", expectedSeconds);
    }
}
