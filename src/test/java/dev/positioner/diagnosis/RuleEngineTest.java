package dev.positioner.diagnosis;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.positioner.diagnosis.facts.Explained;
import dev.positioner.diagnosis.facts.Observation;
import dev.positioner.diagnosis.facts.Reading;
import dev.positioner.diagnosis.facts.ReportedSymptom;
import dev.positioner.knowledge.KnowledgeBase;
import dev.positioner.knowledge.KnowledgeBaseLoader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** Which rules fire, and which do not, for small situations; facts go straight to the engine. */
class RuleEngineTest {

    static RuleEngine engine;

    @BeforeAll
    static void load() {
        KnowledgeBase kb = KnowledgeBaseLoader.load(Path.of("rules"));
        engine = new RuleEngine(kb);
    }

    static RuleOutcome run(Object... facts) {
        List<Object> all = new ArrayList<>(List.of(facts));
        all.addAll(NormalBands.facts(new AssetSpec("T", "VG46", "16/14/11", Map.of("design_stroke_time", 40.0))));
        return engine.evaluate(all);
    }

    static Reading reading(String q, double canonical, String unit) {
        return new Reading(q, canonical, unit, canonical, unit);
    }

    @Test
    void lowSupplyReadingStandsForTheSupplyCheckAndSubsumesTheSymptom() {
        RuleOutcome o = run(new ReportedSymptom("low_supply_pressure", true, "client"),
                reading("supply_pressure", 205 * 6894.757, "Pa"));
        assertTrue(o.firedRules().containsAll(List.of("INT-GEN-01", "INT-SUP-01", "CTX-OBS-01", "CTX-SUB-01")), o.firedRules().toString());
        assertTrue(o.observations().contains(new Observation("read_supply_pressure", "low", "reading:supply_pressure")));
        assertTrue(o.isSubsumed("low_supply_pressure"));
        assertFalse(o.firedRules().contains("CTX-CON-01"), "a low reading bears the symptom out");
    }

    @Test
    void aNormalReadingContradictsTheReportedSymptom() {
        RuleOutcome o = run(new ReportedSymptom("low_supply_pressure", true, "client"),
                reading("supply_pressure", 250 * 6894.757, "Pa"));
        assertTrue(o.firedRules().contains("CTX-CON-01"));
        assertTrue(o.findings().stream().anyMatch(f -> f.code().equals("contradiction_low_supply_pressure")));
    }

    @Test
    void theTechniciansCheckWinsOverAReadingAndTheDisagreementIsSaid() {
        RuleOutcome o = run(new Observation("read_supply_pressure", "normal", Observation.TECHNICIAN),
                reading("supply_pressure", 150 * 6894.757, "Pa"));
        assertTrue(o.firedRules().contains("CTX-OBS-02"));
        assertFalse(o.firedRules().contains("CTX-OBS-01"));
        assertTrue(o.observations().stream().noneMatch(ob -> ob.outcome().equals("low")));
    }

    @Test
    void coldOilExplainsSlowStrokeAndDrainBackpressure() {
        RuleOutcome o = run(new ReportedSymptom("slow_stroke", true, "client"),
                new ReportedSymptom("drain_backpressure", true, "client"),
                reading("oil_temperature", 5, "degC"));
        assertTrue(o.firedRules().containsAll(List.of("INT-OIL-01", "CTX-EXP-01", "CTX-EXP-03")), o.firedRules().toString());
        assertTrue(o.explained().contains(Explained.symptom("slow_stroke", "cold oil alone slows the stroke")));
        assertTrue(o.explanation("symptom:drain_backpressure").isPresent());
    }

    @Test
    void warmOilExplainsNothing() {
        RuleOutcome o = run(new ReportedSymptom("slow_stroke", true, "client"), reading("oil_temperature", 45, "degC"));
        assertFalse(o.firedRules().contains("CTX-EXP-01"));
        assertTrue(o.explained().isEmpty());
    }

    @Test
    void aSteadyControllerOutputRulesOutLoopCycling() {
        RuleOutcome o = run(new ReportedSymptom("hunting", true, "client"),
                new Observation("trend_controller_output", "steady", Observation.TECHNICIAN));
        assertTrue(o.firedRules().contains("CTX-HUN-01"));
        assertFalse(o.firedRules().contains("CTX-HUN-02"));
        assertTrue(o.findings().stream().anyMatch(f -> f.code().equals("hunting_starts_at_valve")));
    }

    @Test
    void slowMeasuredStrokesBecomeTheSlowStrokeSymptomAndTheTestResult() {
        RuleOutcome o = run(reading("stroke_time_open", 95, "s"), reading("stroke_time_close", 70, "s"));
        assertTrue(o.firedRules().containsAll(List.of("INT-MOT-01", "INT-MOT-04")));
        assertTrue(o.symptoms().contains(new ReportedSymptom("slow_stroke", true, "INT-MOT-04")));
        assertTrue(o.isSubsumed("slow_stroke"), "the stroke test result carries it");
    }

    @Test
    void hotOilAndLeaksBringTheirCautions() {
        RuleOutcome o = run(reading("oil_temperature", 80, "degC"), new ReportedSymptom("external_leak", true, "client"));
        List<String> codes = o.cautions().stream().map(c -> c.code()).toList();
        assertTrue(codes.containsAll(List.of("site_procedures", "hot_oil", "injection_hazard", "spill_and_slip")), codes.toString());
    }

    @Test
    void signalDeviationIsJudgedInPercentOfSpan() {
        // 13.0 mA against 12.0 mA commanded: 1 mA of 16 mA span = 6.25 %.
        RuleOutcome o = run(new Reading("input_signal", 56.25, "percent", 13.0, "mA"),
                new Reading("commanded_signal", 50.0, "percent", 12.0, "mA"));
        assertTrue(o.observations().contains(new Observation("verify_input_signal", "deviates", "reading:input_signal")));
    }

    @Test
    void withoutAMeasuredInputTheStemIsJudgedAgainstTheCommand() {
        // 20 % commanded, stem at 100 %: 80 % of travel off, near neither end of the signal.
        RuleOutcome o = run(reading("commanded_signal", 20, "percent"), reading("stem_position", 100, "percent"));
        assertTrue(o.firedRules().containsAll(List.of("INT-POS-05", "INT-POS-01", "INT-POS-02")), o.firedRules().toString());
        assertTrue(o.findings().stream().anyMatch(f -> f.code().equals("position_error") && f.text().startsWith("With the controller sending")));
    }

    @Test
    void anErrorAgainstTheCommandSaysNothingOfTheCalibration() {
        // Stem at 6 % with 0 % commanded: a position error, but the signal may be what is off.
        RuleOutcome o = run(reading("commanded_signal", 0, "percent"), reading("stem_position", 6, "percent"));
        assertTrue(o.firedRules().contains("INT-POS-02"), o.firedRules().toString());
        assertFalse(o.firedRules().contains("INT-POS-03"));
        // The same stem against a measured 0 % input is a zero error.
        assertTrue(run(reading("input_signal", 0, "percent"), reading("stem_position", 6, "percent")).firedRules().contains("INT-POS-03"));
    }

    @Test
    void aMeasuredInputIsTheReferenceEvenWhenTheCommandIsKnown() {
        // Input measured at 5 %, command 50 %: the stem at 5 % follows its input; the signal is what is wrong.
        RuleOutcome o = run(reading("input_signal", 5, "percent"), reading("commanded_signal", 50, "percent"),
                reading("stem_position", 5, "percent"));
        assertFalse(o.firedRules().contains("INT-POS-05"));
        assertFalse(o.firedRules().contains("INT-POS-01"), o.firedRules().toString());
        assertTrue(o.observations().contains(new Observation("verify_input_signal", "deviates", "reading:input_signal")));
    }
}
