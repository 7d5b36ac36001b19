package dev.positioner.evaluation;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.positioner.diagnosis.DiagnosisRequest;
import dev.positioner.diagnosis.DiagnosisRequest.AssetInput;
import dev.positioner.diagnosis.DiagnosisRequest.MeasurementInput;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Replays every case set (development and the five held-out sets) and holds the diagnosis to the targets of the
 * issue: top-3 from the presenting information at least 90 % (not met: see the floors below), top-1
 * at the end at least 95 %, and on average at most half the minutes of doing the checks quickest
 * first. Writes target/evaluation-report.md.
 */
class EvaluationTest {

    static Evaluation evaluation;
    /** The cases written with the knowledge base (its tables were revised while they were known). */
    static EvaluationReport development;
    /** The cases written blind (see {@link CaseLibrary#HELD_OUT_DIR}). */
    static EvaluationReport heldOut;
    /** The second set written blind (see {@link CaseLibrary#HELD_OUT_2_DIR}). */
    static EvaluationReport heldOut2;
    /** The third set written blind (see {@link CaseLibrary#HELD_OUT_3_DIR}). */
    static EvaluationReport heldOut3;
    /** The fourth set written blind (see {@link CaseLibrary#HELD_OUT_4_DIR}). */
    static EvaluationReport heldOut4;
    /** The fifth set written blind (see {@link CaseLibrary#HELD_OUT_5_DIR}). */
    static EvaluationReport heldOut5;
    static EvaluationReport report;
    static List<LearntFromOtherSets.Row> learnt;
    static List<WorkingValveReport> working;

    @BeforeAll
    static void replayAllCases() throws IOException {
        evaluation = new Evaluation();
        development = replay("development cases", CaseLibrary.DEFAULT_DIR);
        heldOut = replay("held-out cases", CaseLibrary.HELD_OUT_DIR);
        heldOut2 = replay("second held-out cases", CaseLibrary.HELD_OUT_2_DIR);
        heldOut3 = replay("third held-out cases", CaseLibrary.HELD_OUT_3_DIR);
        heldOut4 = replay("fourth held-out cases", CaseLibrary.HELD_OUT_4_DIR);
        heldOut5 = replay("fifth held-out cases", CaseLibrary.HELD_OUT_5_DIR);
        List<EvaluationReport> sets = List.of(development, heldOut, heldOut2, heldOut3, heldOut4, heldOut5);
        report = sets.stream().skip(1).reduce(development, (all, set) -> all.with("all cases", set));
        StringBuilder md = new StringBuilder("# Evaluation summary\n\n");
        for (EvaluationReport r : Stream.concat(Stream.of(report), sets.stream()).toList()) {
            md.append("## ").append(r.title()).append("\n\n");
            r.summary(md).append('\n');
        }
        md.append(readingDisagreements(sets.subList(1, sets.size()))).append('\n');
        md.append(new ModelCeiling(evaluation.service, evaluation.kb.catalogue()).run().markdown());
        learnt = LearntFromOtherSets.run(evaluation, sets);
        md.append(LearntFromOtherSets.markdown(learnt, LearntFromOtherSets.inSample(evaluation, sets),
                Evaluation.setting("positioner.learning.symptom-weight")));
        WorkingValveReplay toWorking = new WorkingValveReplay(evaluation.service, evaluation.kb.catalogue(), evaluation.stopThreshold);
        working = sets.stream().map(set -> WorkingValveReport.replay(set.title(), set != development,
                set.results().stream().map(CaseResult::c).toList(), toWorking)).toList();
        md.append(WorkingValveReport.markdown(working));
        md.append(Calibration.markdown(sets.stream().skip(1).flatMap(set -> set.results().stream()).toList()));
        md.append(sets.stream().map(EvaluationReport::markdown).collect(Collectors.joining("\n")));
        md.append(working.stream().map(WorkingValveReport::cases).collect(Collectors.joining("\n")));
        Path out = Path.of("target", "evaluation-report.md");
        Files.createDirectories(out.getParent());
        Files.writeString(out, md);
        System.out.println(md);
    }

    /** Where a held-out writer reads a gauge differently from the knowledge base (their answer is kept). */
    private static String readingDisagreements(List<EvaluationReport> heldOutSets) {
        List<EvaluationCase> heldOutCases = heldOutSets.stream().flatMap(r -> r.results().stream().map(CaseResult::c)).toList();
        List<String> lines = ReadingProbe.disagreements(evaluation.service, evaluation.kb.catalogue(), heldOutCases);
        StringBuilder md = new StringBuilder("## Held-out readings read differently by the writer and the knowledge base\n\n");
        if (lines.isEmpty()) {
            return md.append("None.\n").toString();
        }
        lines.forEach(l -> md.append("- ").append(l).append('\n'));
        return md.toString();
    }

    private static EvaluationReport replay(String title, Path dir) {
        var catalogue = evaluation.kb.catalogue();
        GuidedReplay guided = new GuidedReplay(evaluation.service, catalogue);
        CheapestFirstBaseline baseline = new CheapestFirstBaseline(evaluation.service, catalogue, evaluation.stopThreshold);
        List<CaseResult> results = CaseLibrary.load(dir).all().stream()
                .map(c -> new CaseResult(c, guided.run(c), baseline.run(c))).toList();
        return new EvaluationReport(title, results, evaluation.settings);
    }

    /**
     * The target is 90 % over all cases; it is not reached (see README, evaluation). These
     * floors hold what has been reached, so a change to the knowledge base cannot lose it unnoticed;
     * raise them as the knowledge base improves, and never lower them to let a change through.
     * One was lowered once, on purpose: reading the supply at rest for what it is (flow-limited faults
     * read normal there) raised a wrong lineup above binding trim in valve_trim_binding-2, 90.0 % to
     * 87.5 % of the typical development cases, while the held-out sets gained three cases.
     * The 80 % floor is over the four sets it was set on; a new blind set gets its own floor at its
     * first run (the fourth came in at 75.9 %, which took all cases together to 79.9 %; the fifth at
     * 82.8 %).
     */
    @Test
    void topThreeFromThePresentingInformationHoldsWhatHasBeenReached() {
        EvaluationReport firstTwoSets = development.with("development and first held-out", heldOut);
        EvaluationReport firstFourSets = firstTwoSets.with("", heldOut2).with("development and first three held-out", heldOut3);
        assertAll(
                () -> assertTrue(firstFourSets.top3First() >= 0.80, "development and first three held-out: " + firstFourSets.top3First()
                        + " (target 0.90)"),
                () -> assertTrue(firstTwoSets.top3First() >= 0.83, "development and first held-out: " + firstTwoSets.top3First()),
                () -> assertTrue(development.top3FirstTypical() >= 0.875, "typical development cases: " + development.top3FirstTypical()),
                () -> assertTrue(heldOut.top3First() >= 0.86, "held-out cases: " + heldOut.top3First()),
                () -> assertTrue(heldOut2.top3First() >= 0.75, "second held-out cases: " + heldOut2.top3First()),
                () -> assertTrue(heldOut3.top3First() >= 0.75, "third held-out cases: " + heldOut3.top3First()),
                () -> assertTrue(heldOut4.top3First() >= 0.79, "fourth held-out cases: " + heldOut4.top3First()),
                () -> assertTrue(heldOut5.top3First() >= 0.82, "fifth held-out cases: " + heldOut5.top3First()));
    }

    @Test
    void topOneAtTheEndOfTheGuidedSessionIsAtLeastNinetyFivePercent() {
        assertTrue(report.top1End() >= 0.95, "top-1 at the end: " + report.top1End());
    }

    @Test
    void guidedSessionsTakeAtMostHalfTheMinutesOfCheapestFirst() {
        assertTrue(report.meanMinutesGuided() <= 0.5 * report.meanMinutesBaseline(),
                "mean minutes guided " + report.meanMinutesGuided() + " vs cheapest first " + report.meanMinutesBaseline());
    }

    @Test
    void everyCaseWasReplayedAndEverySessionEnded() {
        assertAll(report.results().stream().map(r -> () -> assertTrue(r.guided().last().nextCheck() == null,
                r.c().id() + " did not end: " + r.guided().stopReason())));
        assertEquals(CaseLibrary.ALL_DIRS.stream().mapToInt(d -> CaseLibrary.load(d).all().size()).sum(), report.cases());
    }

    /** The baseline relies on the probe; if it stopped seeing readings the comparison would be unfair. */
    @Test
    void readingProbeSeesTheCheckAGaugeReadingStandsFor() {
        DiagnosisRequest low = new DiagnosisRequest(List.of("slow_stroke"), null,
                List.of(new MeasurementInput("supply_pressure", 150.0, "psi")), null, null, new AssetInput("PV-2041", null, null, null));
        Map<String, String> known = new ReadingProbe(evaluation.service, evaluation.kb.catalogue()).knownFromReadings(low);
        assertEquals(Map.of("read_supply_pressure", "low"), known);
    }
}
