package dev.positioner.trace;

import java.util.Random;

/**
 * Closed loops for the stiction tests: a PI controller, a valve and a first-order process with
 * optional dead time, integrated with ten Euler substeps per logged sample. Each logged sample
 * carries the controller output as both positioner input and controller output, the valve
 * position, and the process value.
 */
final class LoopSimulator {

    /** Valve between controller output and position. */
    interface Valve {
        double move(double input);
    }

    /**
     * Two-parameter stick-slip valve in the spirit of Choudhury, Thornhill and Shah, "Modelling
     * valve stiction", Control Engineering Practice 13 (2005): S is dead band plus stick band,
     * J the slip jump, both % of span. The valve sticks whenever the input stops or reverses; it
     * breaks free once the input has moved S from the sticking point after a reversal (J when
     * continuing the same way), then follows at x - d (S - J) / 2 for direction d. This is a
     * simplified re-statement for test data, not a line-by-line copy of the published algorithm.
     */
    static final class StickSlipValve implements Valve {
        private final double s;
        private final double j;
        private double prevX = Double.NaN;
        private double out;
        private double stuckAt;
        private boolean stuck = true;
        private int lastDir;

        StickSlipValve(double s, double j) {
            this.s = s;
            this.j = j;
        }

        @Override
        public double move(double x) {
            if (Double.isNaN(prevX)) {
                prevX = x;
                out = x;
                stuckAt = x;
                return out;
            }
            int dir = x > prevX ? 1 : x < prevX ? -1 : 0;
            if (!stuck && dir != lastDir) {
                stuck = true;            // stopped or reversed: static friction holds it
                stuckAt = prevX;
            }
            if (stuck && dir != 0) {
                double needed = dir == -lastDir || lastDir == 0 ? s : j;
                if (Math.abs(x - stuckAt) > needed) {
                    stuck = false;
                    lastDir = dir;
                }
            }
            if (!stuck) {
                out = x - lastDir * (s - j) / 2;
            }
            prevX = x;
            return out;
        }
    }

    /** A positioner with no friction: position follows input through a first-order lag. */
    static final class FreeValve implements Valve {
        private final double tau;
        private final double h;
        private double out = Double.NaN;

        FreeValve(double tau, double h) {
            this.tau = tau;
            this.h = h;
        }

        @Override
        public double move(double x) {
            out = Double.isNaN(out) ? x : out + (x - out) * h / tau;
            return out;
        }
    }

    private LoopSimulator() {
    }

    /**
     * Runs the loop at setpoint 50 % with a setpoint bump of {@code bump} at t = 10 s to start
     * things moving. Controller output is clamped to [uMin, uMax]. Process gain 1.
     */
    static void run(double dt, double duration, double kc, double ti, double uMin, double uMax,
                    Valve valve, double processTau, double deadTime, double bump,
                    double noiseSigma, long seed, SampleConsumer out) {
        Random rnd = new Random(seed);
        int sub = 10;
        double h = dt / sub;
        int delaySteps = (int) Math.round(deadTime / h);
        double[] delay = new double[delaySteps + 1];
        int dHead = 0;
        java.util.Arrays.fill(delay, 50);
        double pv = 50;
        double integral = 50 / kc; // starts in balance at 50 % output
        double u = 50;
        double x = valve.move(u);
        int n = (int) Math.round(duration / dt);
        for (int k = 0; k < n; k++) {
            double t = k * dt;
            double sp = t >= 10 ? 50 + bump : 50;
            for (int i = 0; i < sub; i++) {
                double e = sp - pv;
                double unclamped = kc * (e + integral);
                u = Math.max(uMin, Math.min(uMax, unclamped));
                if (u == unclamped) {
                    integral += e * h / ti; // stop integrating while clamped (anti-windup)
                }
                x = valve.move(u);
                delay[dHead] = x;
                dHead = (dHead + 1) % delay.length;
                double delayed = delay[dHead];
                pv += (delayed - pv) * h / processTau;
            }
            double noisyPv = pv + noiseSigma * rnd.nextGaussian();
            out.accept(new Sample(t, u, x + noiseSigma * rnd.nextGaussian(), u, noisyPv));
        }
    }
}
