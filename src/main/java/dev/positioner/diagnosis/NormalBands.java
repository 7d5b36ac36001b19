package dev.positioner.diagnosis;

import dev.positioner.diagnosis.facts.Assumption;
import dev.positioner.diagnosis.facts.Band;
import dev.positioner.diagnosis.facts.Calculated;
import dev.positioner.diagnosis.facts.Design;
import dev.positioner.hydraulics.ActuatorPerformance;
import dev.positioner.hydraulics.IsoVgGrade;
import dev.positioner.hydraulics.OilViscosity;
import dev.positioner.hydraulics.SupplyBand;
import dev.positioner.measure.UnitConverter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The normal band of each reading for one valve, from its design data or stated defaults. These are
 * the limits the interpretation rules compare readings against; each carries its basis so a
 * finding can say why a value counts as low or high.
 */
final class NormalBands {

    /** Typical plant supply for this class of positioner (base vocabulary note). */
    static final double DEFAULT_SUPPLY_PSI = 250;
    /** ±10 % around nominal: common practice for a regulated hydraulic supply (see SupplyBand). */
    static final double SUPPLY_TOLERANCE = SupplyBand.DEFAULT_BAND;
    /** Filter element change-out about 2/3 of a 25 psid bypass setting (from memory: filter makers' guidance). */
    static final double FILTER_DP_HIGH_PSI = 15;
    /** A free-draining return should read a few psi at most (from memory). */
    static final double DRAIN_HIGH_PSI = 5;
    /**
     * Oil is too cold when it is thicker than the pump and positioner accept: the asset's own limit
     * ({@code max_oil_viscosity}, from their data sheets) or, without one, 200 mm2/s. That default is a
     * rule of thumb recalled from makers' data: industrial pumps run continuously up to a few hundred
     * mm2/s (their cold-start limits, 800-2000 mm2/s, are higher; compilations such as Herzog, Marougy
     * and Michael, "Fluid viscosity selection criteria for hydraulic pumps and motors", 2003), while
     * servo-class pilot stages recommend up to about 100 mm2/s and tolerate a few hundred; the more
     * demanding part governs. Not checked here, so a site should set its own. Between {@link #IDEAL_MAX_CST} and the limit the oil
     * is thicker than ideal (slower amplifier and pilot, more line loss) but not the cause of a fault
     * on its own. Thinner than 10 mm2/s is too thin for pump and seals (same compilation, from memory).
     * Mineral oil over 60 degC is hot whatever its viscosity: the widely quoted rule of thumb that
     * oxidation life halves for every 10 degC above 60 degC (an Arrhenius rate rule; common practice).
     */
    static final double DEFAULT_MAX_OIL_CST = 200, IDEAL_MAX_CST = 100, MIN_WORKING_CST = 10, OIL_HOT_DEGC = 60;
    /** Grade assumed when none is given: the most common grade in such systems (from memory). */
    static final IsoVgGrade DEFAULT_GRADE = IsoVgGrade.VG46;
    /**
     * Against a stated design (reference) stroke time: more than 25 % longer is slow for strokes over
     * 10 s, more than 50 % for shorter ones. These are the stroke-time acceptance limits of the ASME
     * OM Code (Subsection ISTC, power-operated valves), recalled from memory, clause not checked here.
     */
    static final double STROKE_SLOW_FACTOR_LONG = 1.25, STROKE_SLOW_FACTOR_SHORT = 1.5, LONG_STROKE_S = 10;
    /** Against the ideal fill time of the swept volume, which is a lower bound: 1.5 x (common practice). */
    static final double STROKE_SLOW_FACTOR_CALCULATED = 1.5;
    /** Creep above 0.5 % of travel per minute at steady signal is abnormal (from memory). */
    static final double CREEP_PERCENT_PER_MIN = 0.5;
    /** Reservoir sight glass: below 30 % is low, above 95 % is overfilled (from memory). */
    static final double LEVEL_LOW = 30, LEVEL_HIGH = 95;
    /** Pump delivering under 85 % of rated flow is worn (common practice for volumetric efficiency). */
    static final double PUMP_FLOW_FRACTION = 0.85;
    /** Water above 500 ppm in mineral oil is usually free or emulsified (from memory). */
    static final double WATER_HIGH_PPM = 500;
    /** Dead band above 1 % of span is large for a hydraulic positioner (common practice). */
    static final double DEAD_BAND_HIGH = 1.0;
    /** Hysteresis above 1 % of span is large for a hydraulic positioner (common practice). */
    static final double HYSTERESIS_HIGH = 1.0;
    /*
     * How far off a field reading can be at a band limit (see Band: within it a reading is borderline).
     * Pressure: ASME B40.100 accuracy Grade A, ±1 % of span over the middle half of the dial and ±2 %
     * over the first and last quarters (grade table recalled from memory), on a gauge whose range is
     * about twice the working pressure (common practice, so that the working point sits mid-dial):
     * ±2 % of nominal for supply and discharge. Drain and filter gauges are low-range, taken as
     * 0-30 psi (from memory): the 5 psi drain limit is in the first quarter (±2 % of 30 psi), the
     * 15 psid filter limit mid-dial (±1 %). Oil temperature: a dial thermometer to ±1 % of a 0-120 degC
     * span (ASME B40.200 Grade A, from memory). Sight glass: ±5 % of the glass by eye (from memory).
     * Creep: stem travel read to about 0.5 % on the travel indicator over a 5-minute hold, ±0.1 % per
     * minute (common practice, from memory).
     */
    static final double GAUGE_SPAN_PER_NOMINAL = 2, GAUGE_MID_ACCURACY = 0.01, GAUGE_END_ACCURACY = 0.02;
    static final double LOW_RANGE_GAUGE_PSI = 30, THERMOMETER_MARGIN_DEGC = 1.2, LEVEL_MARGIN = 5;
    static final double CREEP_MARGIN_PERCENT_PER_MIN = 0.1;
    /** Stroke length assumed when none is given, only to convert percent creep rates. */
    static final double DEFAULT_STROKE_M = 0.15;

    private NormalBands() {
    }

    static List<Object> facts(AssetSpec asset) {
        List<Object> facts = new ArrayList<>();
        double supplyPa = designOr(asset, "supply_pressure_nominal", psi(DEFAULT_SUPPLY_PSI), facts,
                "Supply nominal not given: assumed 250 psi (17.2 bar), the usual plant value.");
        String supplyBasis = String.format(Locale.ROOT, "nominal %.0f psi ±10 %%, common practice",
                UnitConverter.convert(supplyPa, "Pa", "psi"));
        double supplyMargin = GAUGE_MID_ACCURACY * GAUGE_SPAN_PER_NOMINAL * supplyPa;
        facts.add(new Band("supply_pressure", supplyPa * (1 - SUPPLY_TOLERANCE), supplyPa * (1 + SUPPLY_TOLERANCE),
                "Pa", supplyBasis, supplyMargin));
        facts.add(new Band("pump_discharge_pressure", supplyPa * (1 - SUPPLY_TOLERANCE), Double.NaN, "Pa", supplyBasis, supplyMargin));
        facts.add(new Band("supply_filter_dp", Double.NaN, psi(FILTER_DP_HIGH_PSI), "Pa",
                "change-out at about 2/3 of a 25 psid bypass, from memory", psi(GAUGE_MID_ACCURACY * LOW_RANGE_GAUGE_PSI)));
        facts.add(new Band("drain_pressure", Double.NaN, psi(DRAIN_HIGH_PSI), "Pa",
                "a free-draining return reads a few psi at most, from memory", psi(GAUGE_END_ACCURACY * LOW_RANGE_GAUGE_PSI)));
        facts.add(oilBand(asset, facts));
        facts.add(new Band("reservoir_level", LEVEL_LOW, LEVEL_HIGH, "percent", "sight-glass marks, from memory", LEVEL_MARGIN));
        facts.add(new Band("water_content", Double.NaN, WATER_HIGH_PPM, "ppm", "free water likely above it, from memory"));
        facts.add(new Band("dead_band", Double.NaN, DEAD_BAND_HIGH, "percent", "common practice for hydraulic positioners"));
        facts.add(new Band("hysteresis", Double.NaN, HYSTERESIS_HIGH, "percent", "common practice for hydraulic positioners"));
        double stroke = designOr(asset, "stroke_length", DEFAULT_STROKE_M, null, null);
        facts.add(new Band("creep_rate", Double.NaN, CREEP_PERCENT_PER_MIN / 100 * stroke / 60, "m_per_s",
                "0.5 % of travel per minute, from memory", CREEP_MARGIN_PERCENT_PER_MIN / 100 * stroke / 60));
        strokeBands(asset, facts);
        Double rated = asset.value("pump_rated_flow");
        if (rated != null) {
            facts.add(new Band("pump_flow", rated * PUMP_FLOW_FRACTION, Double.NaN, "m3_per_s",
                    "85 % of rated pump flow, common practice"));
        }
        asset.design().forEach((q, v) -> facts.add(new Design(q, v, false)));
        return facts;
    }

    /** The temperatures at which this grade leaves what this valve accepts (ASTM D341, VI 100). */
    private static Band oilBand(AssetSpec asset, List<Object> facts) {
        IsoVgGrade grade;
        try {
            grade = asset.oilGrade() == null ? null : IsoVgGrade.parse(asset.oilGrade());
        } catch (IllegalArgumentException e) {
            grade = null;
        }
        if (grade == null) {
            facts.add(new Assumption("Oil grade " + (asset.oilGrade() == null ? "not given" : asset.oilGrade() + " outside VG10-VG150")
                    + ": assumed ISO VG46 for the working temperature band."));
            grade = DEFAULT_GRADE;
        }
        Double own = asset.value("max_oil_viscosity");
        double limit = own != null ? own : DEFAULT_MAX_OIL_CST;
        facts.add(new Calculated("max_oil_viscosity", limit, "mm2_per_s"));
        if (own == null) {
            facts.add(new Assumption(String.format(Locale.ROOT, "No oil viscosity limit in the design data: oil thicker than %.0f mm²/s "
                    + "counts as too cold, a rule of thumb for industrial pumps to confirm against this pump's and positioner's data.",
                    DEFAULT_MAX_OIL_CST)));
        }
        final IsoVgGrade g = grade;
        return OIL_BANDS.computeIfAbsent(g.name() + "@" + limit, key -> {
            double cold = temperatureAt(g, limit);
            double hot = Math.min(OIL_HOT_DEGC, temperatureAt(g, MIN_WORKING_CST));
            return new Band("oil_temperature", cold, hot, "degC", String.format(Locale.ROOT,
                    "%s between %.0f and 10 mm²/s (%s), at most 60 °C, ASTM D341 with VI 100", g.name(), limit,
                    own != null ? "this valve's limit" : "rule of thumb"), THERMOMETER_MARGIN_DEGC);
        });
    }

    /** The band depends on the grade and the limit only, so each pair is solved once rather than per request. */
    private static final java.util.Map<String, Band> OIL_BANDS = new java.util.concurrent.ConcurrentHashMap<>();

    /** Solves viscosity(t) = target by bisection; viscosity falls monotonically with temperature. */
    static double temperatureAt(IsoVgGrade grade, double targetCst) {
        double lo = -40, hi = 200;
        for (int i = 0; i < 60; i++) {
            double mid = (lo + hi) / 2;
            if (OilViscosity.viscosityAtCelsius(grade, mid) > targetCst) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return (lo + hi) / 2;
    }

    /**
     * Stroke times are slow beyond the acceptance limit on the design time (see
     * {@link #STROKE_SLOW_FACTOR_LONG}); without one, beyond 1.5 x the time the rated pump flow needs
     * to fill the swept volume (a lower bound: the pilot spool may limit more).
     */
    private static void strokeBands(AssetSpec asset, List<Object> facts) {
        Double design = asset.value("design_stroke_time");
        double factor;
        String basis;
        if (design != null) {
            factor = design > LONG_STROKE_S ? STROKE_SLOW_FACTOR_LONG : STROKE_SLOW_FACTOR_SHORT;
            basis = String.format(Locale.ROOT, "design %.0f s + %.0f %%, stroke-time acceptance limit after the ASME OM Code (from memory)",
                    design, (factor - 1) * 100);
        } else if (asset.value("piston_bore") != null && asset.value("stroke_length") != null
                && asset.value("pump_rated_flow") != null) {
            var expected = expectedStroke(asset);
            design = expected.seconds();
            factor = STROKE_SLOW_FACTOR_CALCULATED;
            basis = String.format(Locale.ROOT, "1.5 x %.0f s, the swept volume over the %s, common practice", design,
                    expected.limitedBy() == ActuatorPerformance.Limit.PUMP ? "rated pump flow" : "pilot spool's orifice flow");
            facts.add(new Calculated("stroke_time_expected", design, "s"));
        } else {
            facts.add(new Assumption("No design stroke time (nor bore, stroke and pump flow) given: measured stroke times are reported but not judged."));
            return;
        }
        facts.add(new Band("stroke_time_open", Double.NaN, design * factor, "s", basis));
        facts.add(new Band("stroke_time_close", Double.NaN, design * factor, "s", basis));
    }

    /**
     * The smaller of the rated pump flow and, when the pilot port is known, the flow of a matched
     * four-way spool at nominal supply with no load (sharp-edged orifice, Cd 0.61; Merritt 1967).
     */
    static ActuatorPerformance.StrokeTime expectedStroke(AssetSpec asset) {
        double area = ActuatorPerformance.areas(asset.value("piston_bore"), 0).bore();
        double spoolFlow = Double.MAX_VALUE;
        Double port = asset.value("pilot_port_diameter");
        if (port != null) {
            Double nominal = asset.value("supply_pressure_nominal");
            double supply = nominal != null ? nominal : psi(DEFAULT_SUPPLY_PSI);
            spoolFlow = ActuatorPerformance.fourWaySpoolFlow(Math.PI * port * port / 4, supply, 0, 0,
                    OilViscosity.densityAtCelsius(40));
        }
        return ActuatorPerformance.expectedStrokeTime(area, asset.value("stroke_length"), asset.value("pump_rated_flow"), spoolFlow);
    }

    private static double designOr(AssetSpec asset, String quantity, double fallback, List<Object> facts, String note) {
        Double v = asset.value(quantity);
        if (v != null) {
            return v;
        }
        if (facts != null) {
            facts.add(new Assumption(note));
            facts.add(new Design(quantity, fallback, true));
        }
        return fallback;
    }

    private static double psi(double psi) {
        return UnitConverter.convert(psi, "psi", "Pa");
    }
}
