package dev.positioner.diagnosis;

import dev.positioner.diagnosis.facts.Assumption;
import dev.positioner.diagnosis.facts.Band;
import dev.positioner.diagnosis.facts.Design;
import dev.positioner.measure.UnitConverter;
import java.util.ArrayList;
import java.util.List;

/**
 * The normal band of each reading for one valve, from its design data or stated defaults. These are
 * the limits the interpretation rules compare readings against; each carries its basis so a
 * finding can say why a value counts as low or high.
 */
final class NormalBands {

    /** Typical plant supply for this class of positioner (base vocabulary note). */
    static final double DEFAULT_SUPPLY_PSI = 250;
    /** ±10 % around nominal: common practice for a regulated hydraulic supply, not from a standard. */
    static final double SUPPLY_TOLERANCE = 0.10;
    /** Filter element change-out about 2/3 of a 25 psid bypass setting (from memory: filter makers' guidance). */
    static final double FILTER_DP_HIGH_PSI = 15;
    /** A free-draining return should read a few psi at most (from memory). */
    static final double DRAIN_HIGH_PSI = 5;
    /** Working band for mineral hydraulic oil of grades VG32-VG68 (common practice); refined by viscosity later. */
    static final double OIL_COLD_DEGC = 15, OIL_HOT_DEGC = 65;
    /** A stroke half as long again as design is clearly slow (common practice). */
    static final double STROKE_SLOW_FACTOR = 1.5;
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
    /** Stroke length assumed when none is given, only to convert percent creep rates. */
    static final double DEFAULT_STROKE_M = 0.15;

    private NormalBands() {
    }

    static List<Object> facts(AssetSpec asset) {
        List<Object> facts = new ArrayList<>();
        double supplyPa = designOr(asset, "supply_pressure_nominal", psi(DEFAULT_SUPPLY_PSI), facts,
                "Supply nominal not given: assumed 250 psi (17.2 bar), the usual plant value.");
        String supplyBasis = String.format(java.util.Locale.ROOT, "nominal %.0f psi ±10 %%, common practice",
                UnitConverter.convert(supplyPa, "Pa", "psi"));
        facts.add(new Band("supply_pressure", supplyPa * (1 - SUPPLY_TOLERANCE), supplyPa * (1 + SUPPLY_TOLERANCE),
                "Pa", supplyBasis));
        facts.add(new Band("pump_discharge_pressure", supplyPa * (1 - SUPPLY_TOLERANCE), Double.NaN, "Pa", supplyBasis));
        facts.add(new Band("supply_filter_dp", Double.NaN, psi(FILTER_DP_HIGH_PSI), "Pa",
                "change-out at about 2/3 of a 25 psid bypass, from memory"));
        facts.add(new Band("drain_pressure", Double.NaN, psi(DRAIN_HIGH_PSI), "Pa",
                "a free-draining return reads a few psi at most, from memory"));
        facts.add(new Band("oil_temperature", OIL_COLD_DEGC, OIL_HOT_DEGC, "degC",
                "working band of mineral hydraulic oil VG32-VG68, common practice"));
        facts.add(new Band("reservoir_level", LEVEL_LOW, LEVEL_HIGH, "percent", "sight-glass marks, from memory"));
        facts.add(new Band("water_content", Double.NaN, WATER_HIGH_PPM, "ppm", "free water likely above it, from memory"));
        facts.add(new Band("dead_band", Double.NaN, DEAD_BAND_HIGH, "percent", "common practice for hydraulic positioners"));
        double stroke = designOr(asset, "stroke_length", DEFAULT_STROKE_M, null, null);
        facts.add(new Band("creep_rate", Double.NaN, CREEP_PERCENT_PER_MIN / 100 * stroke / 60, "m_per_s",
                "0.5 % of travel per minute, from memory"));
        Double design = asset.value("design_stroke_time");
        if (design != null) {
            String basis = "1.5 x the design stroke time, common practice";
            facts.add(new Band("stroke_time_open", Double.NaN, design * STROKE_SLOW_FACTOR, "s", basis));
            facts.add(new Band("stroke_time_close", Double.NaN, design * STROKE_SLOW_FACTOR, "s", basis));
        } else {
            facts.add(new Assumption("No design stroke time given: measured stroke times are reported but not judged."));
        }
        Double rated = asset.value("pump_rated_flow");
        if (rated != null) {
            facts.add(new Band("pump_flow", rated * PUMP_FLOW_FRACTION, Double.NaN, "m3_per_s",
                    "85 % of rated pump flow, common practice"));
        }
        asset.design().forEach((q, v) -> facts.add(new Design(q, v, false)));
        return facts;
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
