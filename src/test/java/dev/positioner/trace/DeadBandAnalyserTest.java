package dev.positioner.trace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DeadBandAnalyserTest {

    private static DeadBandResult analyse(java.util.function.Consumer<SampleConsumer> gen) {
        DeadBandAnalyser a = new DeadBandAnalyser(TraceAnalysisOptions.defaults());
        gen.accept(a);
        return a.finish();
    }

    @Test
    void backlashGivesItsWidthAsDeadBandAndNoPureHysteresis() {
        // ramps 10..90 % at 0.1 %/s sampled at 5/s: the input moves 0.02 % a sample, which
        // bounds how finely the onset of movement can be located
        DeadBandResult r = analyse(out -> SyntheticTraces.backlashRamps(0.2, 10, 90, 0.1, 2, 2.0,
                x -> x, 0, 1, out));
        assertEquals(3, r.reversals());
        assertEquals(2.0, r.deadBandPercent(), 0.05, r.toString());
        assertEquals(2.0, r.deadBandMaxPercent(), 0.05);
        // up curve u - 1, down curve u + 1: curves 2 % apart, all of it dead band
        assertEquals(2.0, r.hysteresisPlusDeadBandPercent(), 0.05);
        assertEquals(0.0, r.hysteresisPercent(), 0.05);
        assertEquals(0.0, r.independentLinearityPercent(), 0.02);
        assertEquals(0.0, r.terminalLinearityPercent(), 0.02);
        assertEquals(10.0, r.rangeLowPercent(), 0.5);
        assertEquals(90.0, r.rangeHighPercent(), 0.5);
        // first reversal at the top; the 4-sample moving mean rounds the apex off by 0.02 %
        assertEquals(90.0, r.measured().get(0).input(), 0.03);
    }

    @Test
    void noisyBacklashStaysWithinTolerance() {
        // position noise sigma 0.03 %. The movement thresholds (0.2 and 0.4 %) are reached one
        // noise draw early or late, about sigma of input each at slope 1; the extrapolated onset
        // combines two of them, so about 2.2 sigma = 0.07 % per reversal, averaged over three.
        DeadBandResult r = analyse(out -> SyntheticTraces.backlashRamps(0.2, 10, 90, 0.1, 2, 1.5,
                x -> x, 0.03, 7, out));
        assertEquals(1.5, r.deadBandPercent(), 0.15, r.toString());
        // bin means of about 25 samples: sigma 0.006 %, so the up/down gap is found closely
        assertEquals(1.5, r.hysteresisPlusDeadBandPercent(), 0.15, r.toString());
        assertTrue(r.independentLinearityPercent() < 0.1, r.toString());
    }

    @Test
    void linearityOfACurvedCharacteristic() {
        // position = input + 2 sin(pi (input - 10) / 80) on 10..90 %: 2 % of bow. The line
        // through the ends misses the middle by the bow less its value at the ends; the minimax
        // line halves that. The ends used: the up curve starts only once the input has moved
        // the 0.5 % reversal threshold, so the first shared bin is centred on 10.75 %, and the
        // dead band plus one bin is trimmed at each end, leaving ends 1.25 to 1.75 % inside the
        // ramp range, where the bow is 2 sin(pi 1.25 / 80) = 0.098 to 0.137 %.
        DeadBandResult r = analyse(out -> SyntheticTraces.backlashRamps(0.2, 10, 90, 0.2, 1, 0,
                x -> x + 2 * Math.sin(Math.PI * (x - 10) / 80), 0, 1, out));
        assertNotNull(r.terminalLinearityPercent(), r.toString());
        double term = r.terminalLinearityPercent();
        assertTrue(term >= 2 - 2 * Math.sin(Math.PI * 1.75 / 80) - 0.005
                && term <= 2 - 2 * Math.sin(Math.PI * 1.25 / 80) + 0.005, r.toString());
        assertEquals(r.terminalLinearityPercent() / 2, r.independentLinearityPercent(), 0.01);
        assertEquals(0.0, r.deadBandPercent(), 0.05);
    }

    @Test
    void stepsAndSteadyInputGiveNoDeadBand() {
        DeadBandResult r = analyse(out -> SyntheticTraces.firstOrderSteps(0.2, 0.6, 2.0,
                new double[] {40, 50, 40, 50}, 30, 0.05, 3, out));
        assertEquals(0, r.reversals());
        assertNull(r.deadBandPercent());
        assertNull(r.hysteresisPlusDeadBandPercent());
        assertTrue(r.note().contains("no ramp reversal"), r.note());
    }

    @Test
    void smallReversalInsideTheDeadBandIsNotMeasured() {
        // input reverses by 1 % inside a 2 % backlash: the valve never moves back, so that
        // reversal yields no figure rather than a wrong one
        DeadBandAnalyser a = new DeadBandAnalyser(TraceAnalysisOptions.defaults());
        double x = 20 - 1.0;
        double t = 0;
        double[] legs = {20, 60, 59, 80}; // up, small dip, up again
        double u = legs[0];
        for (int leg = 1; leg < legs.length; leg++) {
            while (Math.abs(u - legs[leg]) > 1e-9) {
                u += Math.signum(legs[leg] - u) * Math.min(0.02, Math.abs(legs[leg] - u));
                if (u > x + 1) {
                    x = u - 1;
                } else if (u < x - 1) {
                    x = u + 1;
                }
                a.accept(Sample.of(t, u, x));
                t += 0.2;
            }
        }
        DeadBandResult r = a.finish();
        assertEquals(2, r.reversals());
        // only the second reversal (at 59 %) is measured, and it is right that it reads 1 %:
        // the dip never took up the slack on the down side, so only half the backlash remains
        assertEquals(1, r.measured().size(), r.toString());
        assertEquals(59.0, r.measured().get(0).input(), 0.03); // apex of the moving mean
        assertEquals(1.0, r.deadBandPercent(), 0.05);
    }

    @Test
    void laggingNoisyPositionerStillShowsItsBacklash() {
        // 2 % backlash, then a 1.5 s first-order lag; ramps at 0.2 %/s; noise sigma 0.03 % on
        // input and 0.05 % on position. The lag smears the onset of movement over about
        // rate x tau = 0.3 % of input, which bounds the error of the extrapolated onset.
        java.util.Random rnd = new java.util.Random(21);
        DeadBandAnalyser a = new DeadBandAnalyser(TraceAnalysisOptions.defaults());
        double x = 54;
        double y = 54;
        for (int k = 0; k < 20_000; k++) {
            double t = k * 0.2;
            double ph = (t % 400) / 200;
            double u = ph <= 1 ? 55 - 40 * ph : 15 + 40 * (ph - 1);
            if (u > x + 1) {
                x = u - 1;
            } else if (u < x - 1) {
                x = u + 1;
            }
            y += (x - y) * 0.2 / 1.5;
            a.accept(Sample.of(t, u + 0.03 * rnd.nextGaussian(), y + 0.05 * rnd.nextGaussian()));
        }
        DeadBandResult r = a.finish();
        assertTrue(r.reversals() >= 19, r.toString());
        assertEquals(2.0, r.deadBandPercent(), 0.3, r.toString());
        assertTrue(r.deadBandMaxPercent() < 2.6, r.toString());
    }
}
