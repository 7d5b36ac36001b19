package dev.positioner.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;
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
        String leader = r.hypotheses().get(0).fault();
        assertTrue(leader.equals("drain_line_restricted") || leader.equals("reservoir_vent_blocked"), leader);
        assertTrue(r.findings().stream().anyMatch(f -> f.code().equals("drain_pressure_unexplained")));
    }

    @Test
    void drainPressureThatColdOilDoesExplainPointsToTheOil() {
        // The same cold oil with 20 psi at the drain: within the ~3 bar (45 psi) thick oil alone would give.
        DiagnosisResponse r = diagnose(List.of("slow_stroke", "drain_backpressure"),
                m("oil_temperature", 10, "degC"), m("drain_pressure", 20, "psi"));
        assertTrue(r.decision().rulesFired().contains("CTX-DRN-01"), r.decision().rulesFired().toString());
        assertEquals("oil_too_cold", r.hypotheses().get(0).fault());
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
