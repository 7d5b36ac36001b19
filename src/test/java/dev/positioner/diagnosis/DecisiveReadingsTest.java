package dev.positioner.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.positioner.diagnosis.DiagnosisRequest.AssetInput;
import dev.positioner.diagnosis.DiagnosisRequest.MeasurementInput;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Numeric readings in mixed units that, with the valve's design data, decide between causes the
 * symptoms alone leave open. PV-2041 of the demo plant: VG46, 6 m of 12.7 mm drain line, 2 gpm pump.
 */
class DecisiveReadingsTest {

    static DiagnosisService service;

    @BeforeAll
    static void build() {
        service = Standalone.service();
    }

    static DiagnosisResponse diagnose(List<String> symptoms, MeasurementInput... readings) {
        return service.diagnose(new DiagnosisRequest(symptoms, List.of(), List.of(readings), List.of(), List.of(),
                new AssetInput("PV-2041", null, null, null)));
    }

    static MeasurementInput m(String q, double v, String unit) {
        return new MeasurementInput(q, v, unit);
    }

    @Test
    void drainPressureThatColdOilCannotExplainPointsToARestriction() {
        // 50 degF = 10 degC: VG46 is about 300 mm2/s there. Laminar drop at 2 gpm in 6 m of 12.7 mm
        // line is about 3 bar (Hagen-Poiseuille); 8 bar measured is far beyond that.
        DiagnosisResponse r = diagnose(List.of("slow_stroke", "drain_backpressure"),
                m("oil_temperature", 50, "degF"), m("drain_pressure", 8, "bar"));
        assertTrue(r.decision().rulesFired().contains("CTX-DRN-03"), r.decision().rulesFired().toString());
        assertRestrictionStaysInTheRunning(r);
        assertTrue(r.findings().stream().anyMatch(f -> f.code().equals("drain_pressure_unexplained")));
    }

    @Test
    void drainPressureAtRestIsJudgedAtTheFlowThatPassesAtRest() {
        // PV-2041, VG46 at 10 degC: about 260 mm2/s. At rest only about 0.5 L/min passes to drain;
        // Hagen-Poiseuille in 6 m of 12.7 mm line: dp = 128 mu L Q / (pi d^4)
        // = 128 x 0.226 Pa s x 6 m x 8.3e-6 m3/s / (pi x 2.60e-8 m4) = about 17 kPa (2.5 psi).
        // 20 psi at rest is eight times that: a restriction, not the oil (field review R22).
        DiagnosisResponse r = diagnose(List.of("slow_stroke", "drain_backpressure"),
                m("oil_temperature", 10, "degC"), m("drain_pressure", 20, "psi"));
        assertTrue(r.decision().rulesFired().contains("CTX-DRN-03"), r.decision().rulesFired().toString());
        assertFalse(r.decision().rulesFired().contains("CTX-DRN-01"), r.decision().rulesFired().toString());
        assertTrue(r.findings().stream().anyMatch(f -> f.code().equals("drain_drop_at_rest")
                && Math.abs(f.value() - 2.5) < 0.5), r.findings().toString());
        assertRestrictionStaysInTheRunning(r);
    }

    /**
     * The oil here is also colder than the valve accepts (about 260 mm2/s against 200), which is a
     * cause in its own right, so it may lead; what matters is that the restriction is not explained
     * away by it: a return-side cause stays among the first two.
     */
    static void assertRestrictionStaysInTheRunning(DiagnosisResponse r) {
        var firstTwo = r.hypotheses().subList(0, 2).stream().map(h -> h.fault()).toList();
        assertTrue(firstTwo.contains("drain_line_restricted") || firstTwo.contains("reservoir_vent_blocked"), firstTwo.toString());
    }

    @Test
    void drainPressureInAStrokeThatColdOilDoesExplainPointsAwayFromARestriction() {
        // The same oil during a full-speed stroke: the swept volume over the design 40 s is
        // 0.0324 m2 x 0.1016 m / 40 s = 8.2e-5 m3/s (4.9 L/min), and the line drops
        // 128 x 0.226 x 6 x 8.2e-5 / (pi x 2.60e-8) = about 170 kPa (25 psi). 20 psi is within it.
        DiagnosisResponse r = diagnose(List.of("slow_stroke"), m("oil_temperature", 10, "degC"),
                m("drain_pressure_in_stroke", 20, "psi"));
        assertTrue(r.decision().rulesFired().contains("CTX-DRN-05"), r.decision().rulesFired().toString());
        assertFalse(r.decision().rulesFired().contains("CTX-DRN-04"));
        assertTrue(r.findings().stream().anyMatch(f -> f.code().equals("drain_drop_in_stroke")
                && Math.abs(f.value() - 25) < 4), r.findings().toString());
    }

    @Test
    void lowSupplyWithNormalDischargePointsBetweenPumpAndPositioner() {
        // 14.1 bar at the positioner (204 psi, below 225) with 1.72 MPa (249 psi) at the pump.
        DiagnosisResponse r = service.diagnose(new DiagnosisRequest(List.of("slow_stroke"), List.of(),
                List.of(m("supply_pressure", 14.1, "bar"), m("pump_discharge_pressure", 1.72, "MPa"),
                        m("supply_filter_dp", 45, "psi")),
                List.of(), List.of(), new AssetInput("PV-2041", null, null, null)));
        assertEquals("supply_filter_clogged", r.hypotheses().get(0).fault());
        assertTrue(r.hypotheses().get(0).reasons().stream().anyMatch(s -> s.contains("45.0 psi")), r.hypotheses().get(0).reasons().toString());
    }

    @Test
    void particleCountsOverTargetAreJudgedByIso4406() {
        // 4000/1000/150 per mL = 19/17/14 (ISO 4406 table: 2500-5000 -> 19, 640-1300 -> 17, 80-160 -> 14).
        DiagnosisResponse r = diagnose(List.of("erratic_motion"), m("particle_count_4um", 4000, "per_mL"),
                m("particle_count_6um", 1000, "per_mL"), m("particle_count_14um", 150, "per_mL"));
        assertTrue(r.findings().stream().anyMatch(f -> f.text().contains("19/17/14") && f.text().contains("16/14/11")));
        assertTrue(r.decision().rulesFired().contains("INT-CLN-01"));
        assertEquals("oil_contaminated", r.hypotheses().get(0).fault());
    }

    @Test
    void slowStrokesAgainstTheDesignTimeInMinutes() {
        // 1.6 min = 96 s against PV-2041's 40 s design: slow both ways.
        DiagnosisResponse r = diagnose(List.of(), m("stroke_time_open", 1.6, "min"), m("stroke_time_close", 95, "s"));
        assertTrue(r.decision().rulesFired().contains("INT-MOT-01"));
    }
}
