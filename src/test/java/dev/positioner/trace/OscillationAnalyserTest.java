package dev.positioner.trace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class OscillationAnalyserTest {

    private static OscillationResult analyse(java.util.function.Consumer<SampleConsumer> gen) {
        OscillationAnalyser a = new OscillationAnalyser(TraceAnalysisOptions.defaults());
        gen.accept(a);
        return a.finish();
    }

    @Test
    void sineGivesItsPeriodAndPeakToPeak() {
        OscillationResult r = analyse(out -> SyntheticTraces.sine(0.2, 600, 50, 8, 2, 0, 1, out));
        assertTrue(r.detected(), r.toString());
        // half-periods are timed between band crossings, each within one 0.2 s sample; the
        // errors do not accumulate, and the mean over ~150 half-cycles is far tighter
        assertEquals(8.0, r.periodSeconds(), 0.05);
        // a sample lands within 0.1 s of each peak: amplitude loss 2(1 - cos(2 pi 0.1/8)) < 0.01
        assertEquals(4.0, r.peakToPeakPercent(), 0.02);
        // the detector waits one reference period (10 s) after the input first appears
        assertTrue(r.windowStart() >= 10 && r.windowStart() < 20, r.toString());
        assertTrue(r.windowEnd() > 590, r.toString());
    }

    @Test
    void detectionFollowsTheIaeLimit() {
        // defaults: a = 1 %, reference period 10 s, so IAE_lim = 2a/omega_u = 10/pi = 3.18 %*s.
        // A sine of amplitude A and period P gives A P / pi per half-cycle.
        assertEquals(10 / Math.PI, analyse(out -> { }).iaeLimit(), 1e-9);
        assertTrue(analyse(out -> SyntheticTraces.sine(0.2, 600, 50, 8, 1.5, 0, 1, out))
                .detected(), "A P = 12 > 10");
        assertFalse(analyse(out -> SyntheticTraces.sine(0.2, 600, 50, 8, 1.1, 0, 1, out))
                .detected(), "A P = 8.8 < 10");
    }

    @Test
    void noiseAloneIsNotOscillation() {
        OscillationResult r = analyse(out -> SyntheticTraces.sine(0.2, 1200, 50, 8, 0, 0.1, 5, out));
        assertFalse(r.detected(), r.toString());
    }

    @Test
    void noisySineStillMeasured() {
        // sigma 0.1 %: the half-cycle peak is the largest of several noisy samples near the top,
        // about one sigma high on each side, so peak-to-peak reads up to ~0.3 % high
        OscillationResult r = analyse(out -> SyntheticTraces.sine(0.2, 600, 50, 8, 2, 0.1, 9, out));
        assertTrue(r.detected());
        assertEquals(8.0, r.periodSeconds(), 0.1);
        assertEquals(4.15, r.peakToPeakPercent(), 0.25);
    }

    @Test
    void offsetBetweenInputAndPositionDoesNotHideHunting() {
        // position reads 3 % below input on average: removed by the slow mean
        OscillationResult r = analyse(out -> SyntheticTraces.sine(0.2, 600, 50, 8, 2, 0, 1,
                s -> out.accept(Sample.of(s.time(), s.input(), s.position() - 3))));
        assertTrue(r.detected(), r.toString());
        assertEquals(4.0, r.peakToPeakPercent(), 0.1);
    }

    @Test
    void movingInputRestartsTheCount() {
        // the same hunting, but the input steps 5 % every 20 s: never five periods of steady
        // input, so never ten load disturbances in one steady stretch
        OscillationResult r = analyse(out -> SyntheticTraces.sine(0.2, 600, 50, 8, 2, 0, 1,
                s -> {
                    double u = 50 + 5 * (((int) (s.time() / 20)) % 2);
                    out.accept(Sample.of(s.time(), u, s.position() + u - 50));
                }));
        assertFalse(r.detected(), r.toString());
    }

    @Test
    void huntingAfterAStepIsTimedFromWhenItStarts() {
        // a 10 % step at 90 s answered by a 1.5 s lag, then hunting (9 s, 1.5 % amplitude) from
        // 150 s to 380 s. The hold-off after the input change keeps the step response out of
        // the count, so the window and the period belong to the hunting alone.
        OscillationAnalyser a = new OscillationAnalyser(TraceAnalysisOptions.defaults());
        double y = 45;
        for (int k = 0; k < 2500; k++) {
            double t = k * 0.2;
            double u = t < 90 ? 45 : 55;
            y += (u - y) * 0.2 / 1.5;
            double hunt = t > 150 && t < 380 ? 1.5 * Math.sin(2 * Math.PI * (t - 150) / 9) : 0;
            a.accept(Sample.of(t, u, y + hunt));
        }
        OscillationResult r = a.finish();
        assertTrue(r.detected(), r.toString());
        assertEquals(9.0, r.periodSeconds(), 0.1);
        assertEquals(3.0, r.peakToPeakPercent(), 0.05);
        assertTrue(r.windowStart() >= 150 && r.windowStart() < 160, r.toString());
        assertTrue(r.windowEnd() > 370 && r.windowEnd() <= 385, r.toString());
    }
}
