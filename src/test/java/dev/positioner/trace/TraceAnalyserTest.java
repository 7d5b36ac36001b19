package dev.positioner.trace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.time.Instant;
import java.util.Locale;
import org.junit.jupiter.api.Test;

class TraceAnalyserTest {

    @Test
    void csvInMilliampsWithIsoTimesGivesTheSameStepFiguresAsPercentSeconds() {
        // a first-order trace (dead time 0.6 s, tau 2 s) written the way a historian would:
        // ISO-8601 stamps and 4-20 mA signals; after conversion the ISA-75.25.01 figures must
        // come out as for the plain trace
        StringBuilder csv = new StringBuilder("timestamp,input (mA),position (mA)\n");
        Instant t0 = Instant.parse("2024-06-01T22:15:00Z");
        SyntheticTraces.firstOrderSteps(0.2, 0.6, 2.0, new double[] {40, 50}, 30, 0, 1, s ->
                csv.append(t0.plusMillis(Math.round(s.time() * 1000))).append(',')
                        .append(String.format(Locale.ROOT, "%.5f,%.5f%n",
                                4 + 0.16 * s.input(), 4 + 0.16 * s.position())));
        TraceAnalysis a = TraceAnalyser.analyseCsv(new StringReader(csv.toString()),
                new TraceCsvReader(SignalUnit.MILLIAMP, SignalUnit.MILLIAMP),
                TraceAnalysisOptions.defaults());
        assertEquals(300, a.summary().sampleCount());
        assertEquals(59.8, a.summary().durationSeconds(), 1e-9);
        assertEquals(5.0, a.summary().sampleRateHz(), 0.02);
        assertEquals(1, a.stepCount());
        StepResponse s = a.steps().get(0);
        assertEquals(30.0, s.startTime(), 1e-9);
        assertEquals(10.0, s.inputStepPercent(), 1e-3);
        // 5 decimals of mA are 3e-4 % of span: far below the 0.01 s tolerance at T63
        assertEquals(2.6, s.t63Seconds(), 0.01);
        assertEquals(4.6, s.t86Seconds(), 0.01);
        assertFalse(a.oscillation().detected());
        assertEquals(StictionVerdict.CANNOT_TELL, a.stiction().verdict());
    }

    @Test
    void stictionLoopTraceIsAnalysedEndToEnd() {
        TraceAnalyser a = new TraceAnalyser(TraceAnalysisOptions.defaults());
        LoopSimulator.run(0.2, 1500, 0.5, 2, 0, 100, new LoopSimulator.StickSlipValve(3, 1.5), 2,
                0.5, 1, 0.05, 11, a);
        TraceAnalysis r = a.finish();
        assertTrue(r.summary().hasControllerOutput());
        assertTrue(r.summary().hasProcessValue());
        assertEquals(StictionVerdict.STICTION_LIKELY, r.stiction().verdict(), r.stiction().reason());
        // the input (controller output) never holds still, so this is not "hunting at steady
        // input", and the slow ramps of a limit cycle are not taken for steps
        assertFalse(r.oscillation().detected(), r.oscillation().toString());
        assertEquals(0, r.stepCount());
        // each reversal of the controller output must travel S = 3 % before the valve breaks
        // free, and the dead-band analysis sees just that; the output ramps about 0.04 % a
        // sample here, and the slip shows within about three samples of the 4-sample means
        assertEquals(3.0, r.deadBand().deadBandPercent(), 0.15, r.deadBand().toString());
        assertTrue(r.deadBand().reversals() > 80);
    }

    @Test
    void optionsRefuseNonsense() {
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> TraceAnalysisOptions.defaults().withReferencePeriodSeconds(0));
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> TraceAnalysisOptions.defaults().withObservableChangePercent(Double.NaN));
        assertEquals(20.0, TraceAnalysisOptions.defaults().withReferencePeriodSeconds(20)
                .referencePeriodSeconds(), 0);
    }
}
