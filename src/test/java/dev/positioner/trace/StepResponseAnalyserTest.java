package dev.positioner.trace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class StepResponseAnalyserTest {

    private static final TraceAnalysisOptions O = TraceAnalysisOptions.defaults();

    private static List<StepResponse> analyse(java.util.function.Consumer<SampleConsumer> gen) {
        StepResponseAnalyser a = new StepResponseAnalyser(O);
        gen.accept(a);
        return a.finish();
    }

    @Test
    void firstOrderLagWithDeadTimeGivesKnownT63AndT86() {
        // dead time 0.6 s, tau 2 s, 5 samples/s: T63 = 2.6 s, T86 = 4.6 s
        List<StepResponse> steps = analyse(out -> SyntheticTraces.firstOrderSteps(0.2, 0.6, 2.0,
                new double[] {40, 50, 45, 45.5}, 30, 0, 1, out));
        assertEquals(3, steps.size());
        for (StepResponse s : steps) {
            // interpolating an exponential linearly over 0.2 s errs by well under 0.01 s here
            assertEquals(2.6, s.t63Seconds(), 0.01, s.toString());
            assertEquals(4.6, s.t86Seconds(), 0.01, s.toString());
            // dead time is read where 1 % of the change is reached: tau ln(1/0.99) = 0.02 s late
            assertEquals(0.62, s.deadTimeSeconds(), 0.01, s.toString());
            // the final value is a tail mean a hair short of the asymptote, hence not exactly 0
            assertEquals(0.0, s.overshootPercent(), 0.01);
            // a first-order lag enters the +/-2 % band after dead time + tau ln 50 = 8.42 s
            assertEquals(0.6 + 2 * Math.log(50), s.settlingTimeSeconds(), 0.02);
            assertNull(s.note());
        }
        assertEquals(10.0, steps.get(0).inputStepPercent(), 1e-9);
        assertEquals(30.0, steps.get(0).startTime(), 1e-9);
        assertEquals(-5.0, steps.get(1).inputStepPercent(), 1e-9);
        assertEquals(50.0, steps.get(1).positionBefore(), 1e-3);  // settled after 15 tau
        assertEquals(0.5, steps.get(2).inputStepPercent(), 1e-9); // the smallest step counted
    }

    @Test
    void deadTimeBetweenSamplesIsFoundToWithinOneInterval() {
        List<StepResponse> steps = analyse(out -> SyntheticTraces.firstOrderSteps(0.2, 0.7, 1.5,
                new double[] {20, 30}, 20, 0, 1, out));
        StepResponse s = steps.get(0);
        // the response starts between two samples; the sample interval bounds the error
        assertEquals(0.7, s.deadTimeSeconds(), 0.2);
        assertEquals(2.2, s.t63Seconds(), 0.02);
    }

    @Test
    void noisyFirstOrderLagStaysWithinNoiseTolerances() {
        // position noise sigma 0.05 % on a 10 % step. The dead-time threshold becomes 3 sigma
        // (0.15 %, 1.5 % of the step: tau ln(1/0.985) = 0.03 s late). At T63 the slope is
        // 10/2/e = 1.84 %/s, so one sigma of noise shifts a crossing by 0.03 s; 0.1 s allows
        // for the first-crossing bias of three sigma.
        List<StepResponse> steps = analyse(out -> SyntheticTraces.firstOrderSteps(0.2, 0.6, 2.0,
                new double[] {40, 50, 40}, 40, 0.05, 42, out));
        assertEquals(2, steps.size());
        for (StepResponse s : steps) {
            assertEquals(0.63, s.deadTimeSeconds(), 0.1, s.toString());
            assertEquals(2.6, s.t63Seconds(), 0.1, s.toString());
            assertEquals(4.6, s.t86Seconds(), 0.15, s.toString());
            // noise peaks of about 3 sigma read as up to 1.5 % overshoot of a 10 % step
            assertTrue(s.overshootPercent() < 2.5, s.toString());
            // band = max(0.2 %, 3 sigma) = 0.2 %; noise moves the last exit by about a second
            assertNotNull(s.settlingTimeSeconds(), s.toString());
            assertEquals(8.42, s.settlingTimeSeconds(), 1.5, s.toString());
        }
    }

    @Test
    void underdampedResponseGivesTheoreticalOvershoot() {
        double zeta = 0.5;
        double expected = 100 * Math.exp(-Math.PI * zeta / Math.sqrt(1 - zeta * zeta)); // 16.3 %
        List<StepResponse> steps = analyse(out -> SyntheticTraces.secondOrderStep(0.1, 60, 10,
                30, 10, 1.0, zeta, out));
        assertEquals(1, steps.size());
        // sampling at 0.1 s misses the true peak by at most 0.05 s: about 0.02 % of the step
        assertEquals(expected, steps.get(0).overshootPercent(), 0.1);
        // the last exit from the +/-2 % band, found by evaluating the response on a 0.1 ms
        // grid, is at 8.076 s; interpolating the band crossing between 0.1 s samples of a
        // decaying oscillation is good to a few hundredths of a second
        assertEquals(8.076, steps.get(0).settlingTimeSeconds(), 0.05);
    }

    @Test
    void rampIsNotAStep() {
        StepResponseAnalyser a = new StepResponseAnalyser(O);
        for (int k = 0; k < 1000; k++) {
            double t = k * 0.2;
            double u = 10 + 0.1 * k; // 0.5 %/s: 0.1 % a sample, never 0.5 % within 3 samples
            a.accept(Sample.of(t, u, u));
        }
        assertEquals(0, a.finish().size());
        // a fast ramp covers the threshold within three samples but never holds still
        StepResponseAnalyser fast = new StepResponseAnalyser(O);
        for (int k = 0; k < 300; k++) {
            double u = 10 + 0.3 * k;
            fast.accept(Sample.of(k * 0.2, u, u));
        }
        assertEquals(0, fast.finish().size());
    }

    @Test
    void stuckValveIsReportedAsNoResponse() {
        StepResponseAnalyser a = new StepResponseAnalyser(O);
        for (int k = 0; k < 200; k++) {
            a.accept(Sample.of(k * 0.2, k < 50 ? 30 : 35, 30));
        }
        List<StepResponse> steps = a.finish();
        assertEquals(1, steps.size());
        assertNull(steps.get(0).t63Seconds());
        assertTrue(steps.get(0).note().contains("no observable"));
    }
}
