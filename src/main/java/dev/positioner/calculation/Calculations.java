package dev.positioner.calculation;

import dev.positioner.calculation.CalculationResult.Result;
import dev.positioner.hydraulics.ActuatorPerformance;
import dev.positioner.hydraulics.BulkModulus;
import dev.positioner.hydraulics.HydraulicNaturalFrequency;
import dev.positioner.hydraulics.Iso4406;
import dev.positioner.hydraulics.IsoVgGrade;
import dev.positioner.hydraulics.LineLoss;
import dev.positioner.hydraulics.OilViscosity;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The calculations a technician can ask for, one method each. They validate their inputs, call
 * the methods of {@code dev.positioner.hydraulics} and say what was used.
 */
final class Calculations {

    static final String D341 = "ASTM D341 viscosity-temperature equation; 100 degC value for VI 100 from ASTM D2270; grade limits ISO 3448";
    private static final double OIL_BULK_MODULUS = BulkModulus.MINERAL_OIL;
    private static final double ATMOSPHERE = BulkModulus.ATMOSPHERE;

    private Calculations() {
    }

    static CalculationResult viscosity(Inputs in, CalculationRequest request) {
        double t = in.require("oil_temperature");
        IsoVgGrade grade = grade(in, request);
        in.check();
        double nu = OilViscosity.viscosityAtCelsius(grade, t);
        double rho = OilViscosity.densityAtCelsius(t);
        return new CalculationResult("viscosity", List.of(
                new Result("kinematic_viscosity", String.format(Locale.ROOT, "%s at %.1f degC: %.1f mm2/s (cSt)", grade, t, nu), Amounts.of(nu, "cSt")),
                new Result("density", "assumed 870 kg/m3 at 15 degC with thermal expansion", Amounts.of(rho, "kg_per_m3")),
                new Result("dynamic_viscosity", "kinematic viscosity times density", Amounts.of(nu * rho / 1000, "mPa_s"))),
                "ASTM D341 line through 40 and 100 degC", List.of(D341), List.of("Viscosity index 100 (a plain mineral oil without VI improver)."));
    }

    static CalculationResult drainLineDrop(Inputs in, CalculationRequest request) {
        double t = in.require("oil_temperature");
        double bore = in.require("drain_line_bore");
        double length = in.require("drain_line_length");
        double flow = in.requireOneOf("pump_flow", "pump_rated_flow");
        IsoVgGrade grade = grade(in, request);
        in.check();
        double nu = OilViscosity.viscosityAtCelsius(grade, t);
        LineLoss.Result r = LineLoss.pressureDrop(flow, bore, length, nu, OilViscosity.densityAtCelsius(t));
        String regime = r.regime().name().toLowerCase(Locale.ROOT);
        return new CalculationResult("drain-line-drop", List.of(
                new Result("pressure_drop", String.format(Locale.ROOT, "%s flow (Re %.0f): %s", regime, r.reynolds(),
                        r.method() == LineLoss.Method.HAGEN_POISEUILLE ? "Hagen-Poiseuille" : "Darcy-Weisbach, Swamee-Jain friction factor"),
                        Amounts.pressure(r.pressureDrop())),
                new Result("reynolds_number", "laminar below 2000, turbulent from 4000", Amounts.of(r.reynolds(), "1")),
                new Result("velocity", "mean velocity in the line", Amounts.of(r.velocity(), "m_per_s")),
                new Result("kinematic_viscosity", grade + " at the oil temperature", Amounts.of(nu, "cSt"))),
                r.method() == LineLoss.Method.HAGEN_POISEUILLE ? "Hagen-Poiseuille (laminar)" : "Darcy-Weisbach with Swamee-Jain",
                List.of("Hagen-Poiseuille law for laminar pipe flow", "Darcy-Weisbach equation; Swamee and Jain, J. Hydraulics Div. ASCE 102(5), 1976", D341),
                List.of("Straight smooth drawn tubing; fittings and return filter not included.", "Viscosity index 100."));
    }

    static CalculationResult strokeTime(Inputs in) {
        double bore = in.require("piston_bore");
        double stroke = in.require("stroke_length");
        double flow = in.requireOneOf("pump_flow", "pump_rated_flow");
        Double rod = in.optional("rod_diameter");
        Double measured = in.optional("stroke_time_open");
        Double port = in.optional("pilot_port_diameter");
        Double supply = in.optional("supply_pressure") != null ? in.optional("supply_pressure") : in.optional("supply_pressure_nominal");
        if (port != null && supply == null) {
            in.error("inputs", "with pilot_port_diameter, needs supply_pressure or supply_pressure_nominal");
        }
        in.check();
        var areas = areas(in, bore, rod);
        double spoolFlow = port == null ? Double.MAX_VALUE
                : ActuatorPerformance.fourWaySpoolFlow(Math.PI * port * port / 4, supply, 0, 0, OilViscosity.densityAtCelsius(40));
        var extend = ActuatorPerformance.expectedStrokeTime(areas.bore(), stroke, flow, spoolFlow);
        var retract = ActuatorPerformance.expectedStrokeTime(areas.annulus(), stroke, flow, spoolFlow);
        String limit = extend.limitedBy() == ActuatorPerformance.Limit.PUMP ? "the pump flow" : "the pilot spool's orifice flow";
        List<Result> results = new ArrayList<>(List.of(
                new Result("stroke_time_full_bore", "swept volume of the full bore over " + limit, Amounts.seconds(extend.seconds())),
                new Result("stroke_time_rod_side", "swept volume of the annulus over " + limit, Amounts.seconds(retract.seconds()))));
        if (port != null) {
            results.add(new Result("pilot_spool_flow", "matched four-way spool fully open, no load, Cd 0.61",
                    Amounts.in(spoolFlow, "m3_per_s", "L_per_min", "gpm")));
        }
        if (measured != null) {
            double ratio = ActuatorPerformance.slownessRatio(measured, extend.seconds());
            results.add(new Result("slowness_ratio", String.format(Locale.ROOT, "the measured stroke takes %.1f times the pump-limited time", ratio),
                    Amounts.of(ratio, "ratio")));
        }
        return new CalculationResult("stroke-time", results, "t = A x stroke / Q (continuity), Q the smaller of pump and spool flow",
                List.of("Continuity of an incompressible fluid", "Sharp-edged orifice equation, Cd 0.61; four-way spool flow after H. E. Merritt, Hydraulic Control Systems, 1967"),
                List.of(port == null ? "No pilot port given: the pump limits the flow." : "Spool flow at the supply given, load pressure zero, oil density at 40 degC.",
                        "Leakage and compressibility neglected: a lower bound on the stroke time."));
    }

    static CalculationResult thrust(Inputs in) {
        double supply = in.requireOneOf("supply_pressure", "supply_pressure_nominal");
        double bore = in.require("piston_bore");
        Double rod = in.optional("rod_diameter");
        Double drain = in.optional("drain_pressure");
        Double required = in.optional("required_thrust");
        in.check();
        var areas = areas(in, bore, rod);
        var thrust = ActuatorPerformance.thrust(supply, drain == null ? 0 : drain, areas);
        List<Result> results = new ArrayList<>(List.of(
                new Result("thrust_extend", "supply on the full bore, drain on the annulus", Amounts.force(thrust.extend())),
                new Result("thrust_retract", "supply on the annulus, drain on the full bore", Amounts.force(thrust.retract()))));
        if (required != null) {
            var margin = ActuatorPerformance.margin(Math.min(thrust.extend(), thrust.retract()), required);
            results.add(new Result("thrust_margin", String.format(Locale.ROOT, "weaker direction makes %.2f times the required thrust%s",
                    margin.ratio(), margin.sufficient() ? "" : ": not enough"), Amounts.of(margin.ratio(), "ratio")));
        }
        return new CalculationResult("thrust", results, "F = p x A on each side of the piston", List.of("Pressure times area (statics)"),
                List.of(drain == null ? "Drain pressure taken as zero." : "Drain pressure as given.", "Seal and packing friction not deducted."));
    }

    static CalculationResult iso4406(Inputs in, CalculationRequest request) {
        double c4 = in.require("particle_count_4um");
        double c6 = in.require("particle_count_6um");
        double c14 = in.require("particle_count_14um");
        Iso4406.Code target = Iso4406.SERVO_TARGET;
        List<String> assumptions = new ArrayList<>();
        if (request.cleanlinessTarget() != null) {
            try {
                target = Iso4406.parse(request.cleanlinessTarget());
            } catch (IllegalArgumentException e) {
                in.error("cleanlinessTarget", "'" + request.cleanlinessTarget() + "' is not an ISO 4406 code such as 16/14/11");
            }
        } else {
            assumptions.add("No target given: 16/14/11, a common target for servo-class positioners (common practice).");
        }
        in.check();
        Iso4406.Code code = Iso4406.fromCounts(c4, c6, c14);
        var comparison = Iso4406.compare(code, target);
        String verdict = comparison.withinTarget() ? "within target " + target
                : "over target " + target + " at " + comparison.exceedances().stream()
                        .map(x -> x.size() + " by " + x.steps()).reduce((a, b) -> a + ", " + b).orElse("");
        return new CalculationResult("iso4406", List.of(new Result("iso4406_code", code + ": " + verdict,
                List.of(new CalculationResult.Amount(code.r4(), "scale_4um"), new CalculationResult.Amount(code.r6(), "scale_6um"),
                        new CalculationResult.Amount(code.r14(), "scale_14um")))),
                "ISO 4406 scale numbers for counts per mL at 4, 6 and 14 um(c)", List.of("ISO 4406:2021 Table 1"), assumptions);
    }

    static CalculationResult naturalFrequency(Inputs in) {
        double bore = in.require("piston_bore");
        double stroke = in.require("stroke_length");
        double mass = in.require("moving_mass");
        double supply = in.requireOneOf("supply_pressure", "supply_pressure_nominal");
        Double air = in.optional("entrained_air");
        in.check();
        double area = ActuatorPerformance.areas(bore, 0).bore();
        double volume = area * stroke;
        double beta = BulkModulus.effective(OIL_BULK_MODULUS, air == null ? 0 : air / 100, supply / 2 + ATMOSPHERE, BulkModulus.ADIABATIC_AIR);
        var f = HydraulicNaturalFrequency.centred(beta, area, volume, mass);
        return new CalculationResult("natural-frequency", List.of(
                new Result("effective_bulk_modulus", "oil with the given free air at half supply pressure", Amounts.pressure(beta)),
                new Result("natural_frequency", String.format(Locale.ROOT, "centred piston: %.1f Hz", f.hertz()), Amounts.of(f.hertz(), "Hz"))),
                "omega_h = sqrt(4 beta_e A^2 / (V_t M)), centred piston", List.of("H. E. Merritt, Hydraulic Control Systems, Wiley, 1967"),
                List.of("Oil bulk modulus 1.5 GPa (from memory, typical mineral oil).", "Line volumes between spool and piston neglected.",
                        air == null ? "No free air." : "Free air as given, compressed adiabatically (n = 1.4)."));
    }

    private static ActuatorPerformance.PistonAreas areas(Inputs in, double bore, Double rod) {
        if (rod != null && rod >= bore) {
            in.error("inputs", "rod_diameter must be smaller than piston_bore");
            in.check();
        }
        return ActuatorPerformance.areas(bore, rod == null ? 0 : rod);
    }

    private static IsoVgGrade grade(Inputs in, CalculationRequest request) {
        if (request.oilGrade() == null) {
            in.error("oilGrade", "is required, e.g. VG46");
            return null;
        }
        try {
            return IsoVgGrade.parse(request.oilGrade());
        } catch (IllegalArgumentException e) {
            in.error("oilGrade", "'" + request.oilGrade() + "' is not an ISO 3448 grade from VG10 to VG150");
            return null;
        }
    }
}
