package dev.positioner.trace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class HorchStictionAnalyserTest {

    private static final TraceAnalysisOptions O = TraceAnalysisOptions.defaults();

    /** Flow-like loop (process tau 2 s, dead time 0.5 s) with a stick-slip valve S=3, J=1.5. */
    private static void stictionLoop(double noise, SampleConsumer out) {
        LoopSimulator.run(0.2, 1500, 0.5, 2, 0, 100, new LoopSimulator.StickSlipValve(3, 1.5),
                2, 0.5, 1, noise, 11, out);
    }

    /**
     * Free valve, but a controller with gain above the ultimate gain of a lag-plus-dead-time
     * process (tau 10 s, dead time 2 s: ultimate gain about 8.5), so the loop cycles between
     * output limits 40..60 %.
     */
    private static void aggressiveLoop(double noise, SampleConsumer out) {
        LoopSimulator.run(0.2, 1500, 10, 10, 40, 60, new LoopSimulator.FreeValve(0.5, 0.02), 10, 2,
                1, noise, 12, out);
    }

    private static StictionResult analyse(java.util.function.Consumer<SampleConsumer> gen,
                                          boolean withPv) {
        HorchStictionAnalyser a = new HorchStictionAnalyser(O);
        gen.accept(withPv ? a : s -> a.accept(new Sample(s.time(), s.input(), s.position(),
                s.controllerOutput(), Double.NaN)));
        return a.finish();
    }

    @Test
    void stickSlipValveIsCalledStiction() {
        StictionResult pv = analyse(out -> stictionLoop(0, out), true);
        assertEquals(StictionVerdict.STICTION_LIKELY, pv.verdict(), pv.toString());
        assertEquals("process_value", pv.outputSignal());
        // an integrating controller against a square-ish output: close to a quarter period
        assertTrue(pv.asymmetry() > 0.7, pv.toString());
        StictionResult pos = analyse(out -> stictionLoop(0, out), false);
        assertEquals(StictionVerdict.STICTION_LIKELY, pos.verdict(), pos.toString());
        assertEquals("position", pos.outputSignal());
    }

    @Test
    void noisyStickSlipStillCalledStiction() {
        // sigma 0.1 % on position and process value is small next to the 1.5 % slip jumps, and
        // block averaging and the correlation sum over thousands of samples average it away
        StictionResult r = analyse(out -> stictionLoop(0.1, out), true);
        assertEquals(StictionVerdict.STICTION_LIKELY, r.verdict(), r.toString());
    }

    @Test
    void aggressiveTuningIsNotStiction() {
        StictionResult pv = analyse(out -> aggressiveLoop(0, out), true);
        assertEquals(StictionVerdict.NOT_STICTION, pv.verdict(), pv.toString());
        // process output against controller output at the phase crossover: nearly opposite
        assertTrue(pv.zeroLagCorrelation() < -0.9, pv.toString());
        StictionResult pos = analyse(out -> aggressiveLoop(0.1, out), false);
        assertEquals(StictionVerdict.NOT_STICTION, pos.verdict(), pos.toString());
        assertTrue(pos.zeroLagCorrelation() > 0.9, pos.toString());
    }

    @Test
    void cannotTellWithoutControllerOutput() {
        HorchStictionAnalyser a = new HorchStictionAnalyser(O);
        SyntheticTraces.sine(0.2, 600, 50, 8, 2, 0, 1, a);
        StictionResult r = a.finish();
        assertEquals(StictionVerdict.CANNOT_TELL, r.verdict());
        assertTrue(r.reason().contains("no controller output"), r.reason());
    }

    @Test
    void cannotTellWhenTheLoopIsNotOscillating() {
        // a free valve and sane tuning settle after the bump
        StictionResult r = analyse(out -> LoopSimulator.run(0.2, 1500, 1, 10, 0, 100,
                new LoopSimulator.FreeValve(0.5, 0.02), 10, 2, 1, 0.05, 3, out), true);
        assertEquals(StictionVerdict.CANNOT_TELL, r.verdict(), r.toString());
        assertTrue(r.reason().contains("no sustained oscillation"), r.reason());
    }

    @Test
    void cannotTellOnTooShortATrace() {
        HorchStictionAnalyser a = new HorchStictionAnalyser(O);
        for (int k = 0; k < 40; k++) {
            a.accept(new Sample(k * 0.2, 50, 50, 50 + Math.sin(k), 50));
        }
        StictionResult r = a.finish();
        assertEquals(StictionVerdict.CANNOT_TELL, r.verdict());
        assertTrue(r.reason().contains("at least"), r.reason());
    }

    @Test
    void memoryIsTheWindowNotTheTrace() {
        HorchStictionAnalyser a = new HorchStictionAnalyser(O);
        stictionLoop(0, a);
        StictionResult r = a.finish();
        // 1500 s at 5 samples/s is 7500 samples; only the last 4096 are looked at
        assertEquals(4096, r.samplesUsed());
        assertEquals(4095 * 0.2, r.windowSeconds(), 1e-6);
    }
}
