package dev.positioner.diagnosis;

import dev.positioner.diagnosis.facts.Assumption;
import dev.positioner.diagnosis.facts.Calculated;
import dev.positioner.diagnosis.facts.Finding;
import dev.positioner.diagnosis.facts.Reading;
import dev.positioner.hydraulics.ActuatorPerformance;
import dev.positioner.hydraulics.BulkModulus;
import dev.positioner.hydraulics.HydraulicNaturalFrequency;
import dev.positioner.hydraulics.Iso4406;
import dev.positioner.hydraulics.IsoVgGrade;
import dev.positioner.hydraulics.Leakage;
import dev.positioner.hydraulics.LineLoss;
import dev.positioner.hydraulics.OilViscosity;
import dev.positioner.measure.UnitConverter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * What the readings mean by calculation, for this valve: the drain-line drop thick oil would cause,
 * the thrust the measured supply can make, the ISO 4406 code of a particle count, the leakage a
 * creep rate implies, pump efficiency, the actuator's hydraulic natural frequency and whether the
 * pump alone can make the design stroke. Each result
 * is a {@link Finding} for the technician and, where a rule needs it, a {@link Calculated} fact.
 * The methods and their sources are in {@code dev.positioner.hydraulics}.
 */
final class EngineeringFindings {

    static final double OIL_BULK_MODULUS = BulkModulus.MINERAL_OIL;
    /** Free air assumed when judging whether air could make the actuator resonate: 1 % by volume (from memory, a badly aerated oil). */
    static final double AIR_FRACTION = 0.01;
    static final double ATMOSPHERE = BulkModulus.ATMOSPHERE;
    /** Flow to drain at rest when the positioner's is not given: 0.5 L/min, the top of the usual 0.1-0.5 L/min of spool leakage and amplifier bleed (from memory). */
    static final double REST_FLOW_M3_PER_S = UnitConverter.convert(0.5, "L_per_min", "m3_per_s");

    private final AssetSpec asset;
    private final Map<String, Reading> readings;
    private final List<Object> facts = new ArrayList<>();

    private EngineeringFindings(AssetSpec asset, Map<String, Reading> readings) {
        this.asset = asset;
        this.readings = readings;
    }

    static List<Object> facts(AssetSpec asset, Map<String, Reading> readings) {
        EngineeringFindings f = new EngineeringFindings(asset, readings);
        f.drainLine();
        f.thrust();
        f.cleanliness();
        f.leakage();
        f.pumpEfficiency();
        f.naturalFrequency();
        f.strokeDemand();
        return f.facts;
    }

    /**
     * The oil's viscosity at the measured temperature (ASTM D341), and the return line's pressure drop
     * (Hagen-Poiseuille or Darcy-Weisbach) at the flow that passes when each drain reading is taken:
     * at rest only the positioner's leakage and bleed; during a full-speed stroke the exhausting
     * chamber's flow, the swept volume over the stroke time.
     */
    private void drainLine() {
        Reading t = readings.get("oil_temperature");
        if (t == null) {
            return;
        }
        IsoVgGrade grade = grade();
        double nu = OilViscosity.viscosityAtCelsius(grade, t.value());
        facts.add(new Calculated("oil_viscosity", nu, "mm2_per_s"));
        double limit = asset.value("max_oil_viscosity") != null ? asset.value("max_oil_viscosity") : NormalBands.DEFAULT_MAX_OIL_CST;
        facts.add(new Calculated("oil_viscosity_over_limit", nu / limit, "ratio"));
        facts.add(new Finding("oil_viscosity", String.format(Locale.ROOT,
                "At %s the %s oil is about %.0f mm²/s; %s", Facts.show(t), grade.name(), nu,
                nu > limit ? String.format(Locale.ROOT, "that is thicker than the %.0f mm²/s this valve's pump and positioner accept.", limit)
                        : nu > NormalBands.IDEAL_MAX_CST ? String.format(Locale.ROOT,
                                "thicker than ideal (above 100 mm²/s) but within the %.0f mm²/s this valve accepts: it slows the valve a little, it is not a fault on its own.", limit)
                        : "within the usual working range."), nu, "mm²/s", String.format(Locale.ROOT, "at most %.0f", limit)));
        Double bore = asset.value("drain_line_bore");
        Double length = asset.value("drain_line_length");
        if (bore == null || length == null) {
            return;
        }
        double density = OilViscosity.densityAtCelsius(t.value());
        Double restFlow = asset.value("positioner_rest_flow");
        if (restFlow == null) {
            restFlow = REST_FLOW_M3_PER_S;
            facts.add(new Assumption("No rest flow of the positioner given: 0.5 L/min assumed passing to drain at rest (spool leakage and amplifier bleed, the top of the usual range)."));
        }
        LineLoss.Result rest = LineLoss.pressureDrop(restFlow, bore, length, nu, density);
        facts.add(new Calculated("drain_drop_at_rest", rest.pressureDrop(), "Pa"));
        facts.add(drainFinding("drain_drop_at_rest", "with the valve at rest (%.1f L/min)", restFlow, rest));
        Double strokeFlow = strokeFlow();
        if (readings.containsKey("drain_pressure_in_stroke") && strokeFlow != null) {
            LineLoss.Result stroke = LineLoss.pressureDrop(strokeFlow, bore, length, nu, density);
            facts.add(new Calculated("drain_drop_in_stroke", stroke.pressureDrop(), "Pa"));
            facts.add(drainFinding("drain_drop_in_stroke", "during a full-speed stroke (%.1f L/min)", strokeFlow, stroke));
        }
    }

    private static Finding drainFinding(String code, String when, double flow, LineLoss.Result r) {
        return new Finding(code, String.format(Locale.ROOT, "The return line should drop about %s " + when + " at this oil temperature.",
                Facts.pressure(r.pressureDrop()), UnitConverter.convert(flow, "m3_per_s", "L_per_min")), UnitConverter.convert(r.pressureDrop(), "Pa", "psi"), "psi", null);
    }

    /** Flow out of the exhausting chamber in a full stroke: swept volume over the measured (or design) stroke time. */
    private Double strokeFlow() {
        Double bore = asset.value("piston_bore");
        Double stroke = asset.value("stroke_length");
        Double time = readings.containsKey("stroke_time_open") ? readings.get("stroke_time_open").value()
                : readings.containsKey("stroke_time_close") ? readings.get("stroke_time_close").value() : asset.value("design_stroke_time");
        if (bore == null || stroke == null || time == null) {
            return asset.value("pump_rated_flow");
        }
        return ActuatorPerformance.areas(bore, 0).bore() * stroke / time;
    }

    /** Thrust from (supply - drain) over the piston, against what the valve needs. */
    private void thrust() {
        Double bore = asset.value("piston_bore");
        Double required = asset.value("required_thrust");
        if (bore == null || required == null) {
            return;
        }
        double rod = asset.value("rod_diameter") == null ? 0 : asset.value("rod_diameter");
        if (asset.value("rod_diameter") == null) {
            facts.add(new Assumption("No rod diameter given: the thrust is for the full bore, as if the piston had no rod."));
        }
        if (!readings.containsKey("drain_pressure")) {
            facts.add(new Assumption("No drain pressure reading: the thrust is worked out with the drain at zero."));
        }
        Reading supply = readings.get("supply_pressure");
        double supplyPa = supply != null ? supply.value() : nominalSupply();
        double drainPa = readings.containsKey("drain_pressure") ? readings.get("drain_pressure").value() : 0;
        var areas = ActuatorPerformance.areas(bore, rod);
        var thrust = ActuatorPerformance.thrust(supplyPa, drainPa, areas);
        double weakest = Math.min(thrust.extend(), rod > 0 ? thrust.retract() : thrust.extend());
        var margin = ActuatorPerformance.margin(weakest, required);
        facts.add(new Calculated("thrust_margin_ratio", margin.ratio(), "ratio"));
        facts.add(new Finding("thrust_margin", String.format(Locale.ROOT,
                "At %s supply the piston makes %s in its weaker direction against %s required: %.2f times what is needed.",
                supply != null ? Facts.show(supply) : Facts.pressure(supplyPa) + " (nominal)", Facts.force(weakest),
                Facts.force(required), margin.ratio()), margin.ratio(), "ratio", "at least 1.0"));
    }

    private void cleanliness() {
        Reading c4 = readings.get("particle_count_4um");
        Reading c6 = readings.get("particle_count_6um");
        Reading c14 = readings.get("particle_count_14um");
        if (c4 == null || c6 == null || c14 == null) {
            return;
        }
        Iso4406.Code code = Iso4406.fromCounts(c4.value(), c6.value(), c14.value());
        Iso4406.Code target;
        if (asset.cleanlinessTarget() != null) {
            target = Iso4406.parse(asset.cleanlinessTarget());
        } else {
            target = Iso4406.SERVO_TARGET;
            facts.add(new Assumption("No cleanliness target given: assumed 16/14/11, a common target for servo-class positioners."));
        }
        var comparison = Iso4406.compare(code, target);
        int worst = comparison.exceedances().stream().mapToInt(Iso4406.Exceedance::steps).max().orElse(0);
        facts.add(new Calculated("iso4406_steps_over_target", worst, "steps"));
        facts.add(new Finding("iso4406_code", String.format(Locale.ROOT, "Particle counts give ISO 4406 code %s against a target of %s%s.",
                code, target, worst > 0 ? ": " + worst + " scale step(s) over, each step doubling the count" : ": within target"),
                worst, "steps over target", target.toString()));
    }

    private void leakage() {
        Reading creep = readings.get("creep_rate");
        Double bore = asset.value("piston_bore");
        if (creep == null || bore == null) {
            return;
        }
        double flow = Leakage.internalLeakageFlow(ActuatorPerformance.areas(bore, 0).bore(), creep.value());
        facts.add(new Finding("creep_leakage", String.format(Locale.ROOT,
                "A creep of %s on this piston means about %.0f mL/min passing the spool lands or piston seals.",
                Facts.show(creep), flow * 6e7), flow * 6e7, "mL/min", null));
    }

    private void pumpEfficiency() {
        Reading flow = readings.get("pump_flow");
        Double rated = asset.value("pump_rated_flow");
        if (flow == null || rated == null) {
            return;
        }
        double efficiency = Leakage.volumetricEfficiency(flow.value(), rated);
        facts.add(new Calculated("pump_volumetric_efficiency", efficiency, "fraction"));
        facts.add(new Finding("pump_volumetric_efficiency", String.format(Locale.ROOT,
                "The pump delivers %s, %.0f %% of its rated %.1f L/min.", Facts.show(flow), efficiency * 100, rated * 60_000),
                efficiency * 100, "percent", "at least 85 %"));
    }

    /** Merritt's centred-piston natural frequency, with and without the assumed free air. */
    private void naturalFrequency() {
        Reading period = readings.get("oscillation_period");
        Double bore = asset.value("piston_bore");
        Double stroke = asset.value("stroke_length");
        Double mass = asset.value("moving_mass");
        if (period == null || bore == null || stroke == null || mass == null) {
            return;
        }
        double area = ActuatorPerformance.areas(bore, 0).bore();
        double volume = area * stroke;
        double pAbs = nominalSupply() / 2 + ATMOSPHERE; // a centred, balanced piston sits near half supply
        double dry = HydraulicNaturalFrequency.centred(OIL_BULK_MODULUS, area, volume, mass).hertz();
        double aerated = HydraulicNaturalFrequency.centred(
                BulkModulus.effective(OIL_BULK_MODULUS, AIR_FRACTION, pAbs, BulkModulus.ADIABATIC_AIR), area, volume, mass).hertz();
        double measured = 1 / period.value();
        facts.add(new Calculated("natural_frequency_aerated", aerated, "Hz"));
        facts.add(new Calculated("oscillation_frequency", measured, "Hz"));
        facts.add(new Finding("hydraulic_natural_frequency", String.format(Locale.ROOT,
                "The oil column's natural frequency is about %.0f Hz, %.0f Hz with 1 %% free air; the valve cycles at %.2f Hz.",
                dry, aerated, measured), aerated, "Hz", null));
    }

    /**
     * Whether the pump alone can make the design stroke: the full-bore swept volume over the design
     * stroke time against the rated pump flow. Above 1 the accumulator carries part of every full
     * stroke, and without its charge the stroke can be no quicker than the pump alone fills the bore.
     */
    private void strokeDemand() {
        Double bore = asset.value("piston_bore");
        Double stroke = asset.value("stroke_length");
        Double design = asset.value("design_stroke_time");
        Double pump = asset.value("pump_rated_flow");
        if (bore == null || stroke == null || design == null || pump == null) {
            return;
        }
        double area = ActuatorPerformance.areas(bore, 0).bore();
        double demand = ActuatorPerformance.strokeDemandFlow(area, stroke, design);
        double ratio = demand / pump;
        double pumpOnly = ActuatorPerformance.expectedStrokeTime(area, stroke, pump, Double.MAX_VALUE).seconds();
        facts.add(new Calculated("stroke_demand_over_pump", ratio, "ratio"));
        String verdict = ratio > 1
                ? String.format(Locale.ROOT, "the accumulator supplies about %.0f %% of it, and without its charge a full stroke takes at least %.0f s",
                        100 * (1 - 1 / ratio), pumpOnly)
                : String.format(Locale.ROOT, "the pump alone can make it (a full stroke on the pump alone takes about %.0f s)", pumpOnly);
        facts.add(new Finding("stroke_demand", String.format(Locale.ROOT,
                "A full stroke in the design %.0f s draws about %.1f L/min against the pump's rated %.1f L/min: %s.",
                design, demand * 60_000, pump * 60_000, verdict), ratio, "ratio", null));
    }

    private double nominalSupply() {
        Double nominal = asset.value("supply_pressure_nominal");
        return nominal != null ? nominal : UnitConverter.convert(NormalBands.DEFAULT_SUPPLY_PSI, "psi", "Pa");
    }

    private IsoVgGrade grade() {
        try {
            return asset.oilGrade() == null ? NormalBands.DEFAULT_GRADE : IsoVgGrade.parse(asset.oilGrade());
        } catch (IllegalArgumentException e) {
            return NormalBands.DEFAULT_GRADE;
        }
    }

    /** Formatting in the units technicians read: psi with bar, N with lbf. */
    static final class Facts {
        static String show(Reading r) {
            return dev.positioner.diagnosis.facts.Say.show(r.givenValue(), r.givenUnit());
        }

        static String pressure(double pa) {
            return String.format(Locale.ROOT, "%.1f psi (%.2f bar)", UnitConverter.convert(pa, "Pa", "psi"),
                    UnitConverter.convert(pa, "Pa", "bar"));
        }

        static String force(double n) {
            return String.format(Locale.ROOT, "%.1f kN (%.0f lbf)", n / 1000, UnitConverter.convert(n, "N", "lbf"));
        }
    }
}
