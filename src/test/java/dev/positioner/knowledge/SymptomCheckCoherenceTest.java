package dev.positioner.knowledge;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Several symptoms are what an operator sees of something a check measures (a slow stroke and the
 * stroke-time test, a low supply gauge and the supply reading). The two tables are written
 * separately, so this holds them to each other for every fault: a report cannot be much more likely
 * than the test shows (a test on the valve is at least as sensitive as an operator's eye), and where
 * the test nearly always shows the fault the report should not be rare either. Where a fault really
 * shows differently in service than under the test, the pair is listed below with the reason.
 */
class SymptomCheckCoherenceTest {

    /** What each symptom reports, as the check and outcomes that measure the same thing. */
    static final Map<String, Map.Entry<String, Set<String>>> MEASURED_BY = Map.of(
            "slow_stroke", Map.entry("stroke_time_test", Set.of("slow_both", "slow_one_direction")),
            "low_supply_pressure", Map.entry("watch_supply_during_stroke", Set.of("sags_then_recovers", "low_throughout")),
            "drain_backpressure", Map.entry("read_drain_pressure", Set.of("high")),
            "creep_at_zero_signal", Map.entry("creep_test", Set.of("creeps")),
            "external_leak", Map.entry("inspect_external_leaks", Set.of("leaking")),
            "noisy_pump", Map.entry("listen_pump", Set.of("noisy")),
            "oil_overheating", Map.entry("read_oil_temperature", Set.of("hot")),
            "oil_foaming_or_milky", Map.entry("inspect_oil_sample", Set.of("milky", "foamy")),
            "position_offset", Map.entry("calibration_check", Set.of("zero_error", "span_error")),
            "overshoot", Map.entry("step_test", Set.of("overshoot")));

    /** Symptom/fault pairs that show differently in service than under the check, and why. */
    static final Map<String, String> EXPLAINED = Map.ofEntries(
            Map.entry("slow_stroke/pump_drive_failed", "with no supply the valve does not move at all: reported as no movement"),
            Map.entry("position_offset/pump_drive_failed", "reported as no movement; the calibration check finds it at one end"),
            Map.entry("position_offset/ports_reversed", "it runs to one end: reported as wrong direction"),
            Map.entry("creep_at_zero_signal/pump_drive_failed", "reported as no movement; the held test signal shows the drift"),
            Map.entry("creep_at_zero_signal/signal_not_as_commanded", "the creep test uses a test signal, which removes the fault"),
            Map.entry("position_offset/signal_not_as_commanded", "the calibrator replaces the faulty signal"),
            Map.entry("creep_at_zero_signal/pilot_null_offset", "an offset null drifts the valve off its seat in service; the creep test at mid travel shows less"),
            Map.entry("overshoot/controller_loop_oscillating", "the step test is made in manual, away from the loop"),
            Map.entry("overshoot/pilot_spool_sticking", "stick-slip overshoots in service; a small-step test records it as dead band first"),
            Map.entry("overshoot/feedback_linkage_backlash", "as for stick-slip: the step test sees the lost motion as dead band"),
            Map.entry("overshoot/packing_friction_high", "as for stick-slip: the step test sees the friction as dead band"),
            Map.entry("low_supply_pressure/accumulator_precharge_lost", "the sag lasts only as long as a large move; few see the gauge then"),
            Map.entry("low_supply_pressure/oil_too_cold", "the thick-oil sag is shallow and comes with the slow stroke that gets reported instead"));

    /** Slack for judgement (from memory): 0.1 either way is within how well these numbers are known. */
    static final double SLACK = 0.1;

    static Catalogue catalogue;

    @BeforeAll
    static void load() {
        catalogue = KnowledgeBaseLoader.load(Path.of("rules")).catalogue();
    }

    @Test
    void everySymptomAgreesWithTheCheckThatMeasuresIt() {
        List<String> tension = new ArrayList<>();
        MEASURED_BY.forEach((symptom, measured) -> {
            SymptomDef s = catalogue.symptoms().get(symptom);
            CheckDef check = catalogue.checks().get(measured.getKey());
            for (String fault : catalogue.faults().keySet()) {
                if (EXPLAINED.containsKey(symptom + "/" + fault)) {
                    continue;
                }
                double reported = s.present(fault);
                double shown = measured.getValue().stream().mapToDouble(o -> check.likelihood(o, fault)).sum();
                if (reported > shown + SLACK || (shown >= 0.5 && reported < shown / 2)) {
                    tension.add(String.format(Locale.ROOT, "%s given %s is %.2f but %s shows it with %.2f",
                            symptom, fault, reported, check.code(), shown));
                }
            }
        });
        assertTrue(tension.isEmpty(), String.join("\n", tension));
    }

    /**
     * The supply read at rest and the watch through a large move see the same gauge: low at rest is
     * the watch's "low throughout", give or take a single look.
     */
    @Test
    void theSupplyReadAtRestAgreesWithTheWatchThroughAMove() {
        CheckDef atRest = catalogue.checks().get("read_supply_pressure");
        CheckDef watch = catalogue.checks().get("watch_supply_during_stroke");
        List<String> tension = new ArrayList<>();
        for (String fault : catalogue.faults().keySet()) {
            double low = atRest.likelihood("low", fault);
            double throughout = watch.likelihood("low_throughout", fault);
            if (Math.abs(low - throughout) > SLACK) {
                tension.add(String.format(Locale.ROOT, "%s: low at rest %.2f, low throughout a move %.2f", fault, low, throughout));
            }
        }
        assertTrue(tension.isEmpty(), String.join("\n", tension));
    }

    @Test
    void everyExplainedPairStillNamesARealSymptomAndFault() {
        EXPLAINED.keySet().forEach(pair -> {
            String[] parts = pair.split("/");
            assertTrue(MEASURED_BY.containsKey(parts[0]) && catalogue.faults().containsKey(parts[1]), pair);
        });
    }
}
