package dev.positioner.trace;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;

/**
 * Traces with known answers for the analyser tests. Each generator streams samples into a
 * consumer so a long trace needs no memory; {@link #collect} keeps a short one for inspection.
 * Noise is Gaussian from a seeded {@link Random}, so every run sees the same trace.
 */
final class SyntheticTraces {

    private SyntheticTraces() {
    }

    static List<Sample> collect(java.util.function.Consumer<SampleConsumer> generator) {
        List<Sample> out = new ArrayList<>();
        generator.accept(out::add);
        return out;
    }

    /**
     * Input stepping through {@code levels}, each held {@code hold} s (the first from t=0, each
     * later one switched exactly on a sample time), and a position that is a first-order lag of
     * time constant {@code tau} behind a pure dead time {@code deadTime}. The position is the
     * exact continuous response at each sample time, so T63 = deadTime + tau and
     * T86 = deadTime + 2 tau hold to rounding, whatever the sample interval.
     */
    static void firstOrderSteps(double dt, double deadTime, double tau, double[] levels,
                                double hold, double noiseSigma, long seed, SampleConsumer out) {
        Random rnd = new Random(seed);
        int perHold = (int) Math.round(hold / dt);
        int n = perHold * levels.length;
        double target = levels[0];
        double yRef = levels[0];
        double tRef = 0;
        int nextChange = 1;
        for (int k = 0; k < n; k++) {
            double t = k * dt;
            // the lag sees each input change deadTime after it was applied
            while (nextChange < levels.length && t >= nextChange * perHold * dt + deadTime) {
                double tc = nextChange * perHold * dt + deadTime;
                yRef = target + (yRef - target) * Math.exp(-(tc - tRef) / tau);
                tRef = tc;
                target = levels[nextChange++];
            }
            double y = target + (yRef - target) * Math.exp(-(t - tRef) / tau);
            double u = levels[Math.min(levels.length - 1, k / perHold)];
            out.accept(Sample.of(t, u, y + noiseSigma * rnd.nextGaussian()));
        }
    }

    /**
     * One step of {@code size} at {@code tStep} (on a sample time) into an underdamped
     * second-order position response, natural frequency {@code wn} rad/s and damping
     * {@code zeta}: overshoot is exp(-pi zeta / sqrt(1 - zeta^2)) of the step.
     */
    static void secondOrderStep(double dt, double duration, double tStep, double from,
                                double size, double wn, double zeta, SampleConsumer out) {
        double wd = wn * Math.sqrt(1 - zeta * zeta);
        double phi = Math.acos(zeta);
        int n = (int) Math.round(duration / dt);
        for (int k = 0; k < n; k++) {
            double t = k * dt;
            double tau = t - tStep;
            double y = from;
            if (tau > 0) {
                y += size * (1 - Math.exp(-zeta * wn * tau) / Math.sqrt(1 - zeta * zeta)
                        * Math.sin(wd * tau + phi));
            }
            out.accept(Sample.of(t, t >= tStep - 1e-9 ? from + size : from, y));
        }
    }

    /** Steady input {@code level}; position hunting as a sine of the given period and amplitude. */
    static void sine(double dt, double duration, double level, double period, double amplitude,
                     double noiseSigma, long seed, SampleConsumer out) {
        Random rnd = new Random(seed);
        int n = (int) Math.round(duration / dt);
        for (int k = 0; k < n; k++) {
            double t = k * dt;
            double y = level + amplitude * Math.sin(2 * Math.PI * t / period);
            out.accept(Sample.of(t, level, y + noiseSigma * rnd.nextGaussian()));
        }
    }

    /**
     * Triangular input ramps between {@code low} and {@code high} at {@code rate} %/s, starting
     * upward from {@code low}, and a position that is {@code shape} of the input seen through
     * a backlash of total width {@code deadBand}: the input must travel the whole width on
     * each reversal before the position moves, so the dead band is exactly {@code deadBand}.
     */
    static void backlashRamps(double dt, double low, double high, double rate, int cycles,
                              double deadBand, DoubleUnaryOperator shape, double noiseSigma,
                              long seed, SampleConsumer out) {
        Random rnd = new Random(seed);
        double half = (high - low) / rate;
        int n = (int) Math.round(cycles * 2 * half / dt);
        double x = low - deadBand / 2;   // backlash output, starts engaged on the up side
        for (int k = 0; k <= n; k++) {
            double t = k * dt;
            double ph = (t % (2 * half)) / half;
            double u = ph <= 1 ? low + (high - low) * ph : high - (high - low) * (ph - 1);
            if (u > x + deadBand / 2) {
                x = u - deadBand / 2;
            } else if (u < x - deadBand / 2) {
                x = u + deadBand / 2;
            }
            double y = shape.applyAsDouble(x);
            out.accept(Sample.of(t, u, y + noiseSigma * rnd.nextGaussian()));
        }
    }
}
