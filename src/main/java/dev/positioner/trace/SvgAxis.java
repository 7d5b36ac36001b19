package dev.positioner.trace;

/** A linear plot axis with "nice" ticks (1, 2 or 5 times a power of ten). */
final class SvgAxis {

    final double lo;
    final double hi;
    final double step;
    private final double pixLo;
    private final double pixHi;

    private SvgAxis(double lo, double hi, double step, double pixLo, double pixHi) {
        this.lo = lo;
        this.hi = hi;
        this.step = step;
        this.pixLo = pixLo;
        this.pixHi = pixHi;
    }

    /** Axis covering [min, max], widened to whole ticks, at most about {@code maxTicks}. */
    static SvgAxis nice(double min, double max, int maxTicks, double pixLo, double pixHi,
                        boolean snapOut) {
        if (!(max > min)) {
            max = min + 1;
        }
        double raw = (max - min) / maxTicks;
        double mag = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = mag * (raw <= mag ? 1 : raw <= 2 * mag ? 2 : raw <= 5 * mag ? 5 : 10);
        double lo = snapOut ? Math.floor(min / step) * step : min;
        double hi = snapOut ? Math.ceil(max / step) * step : max;
        return new SvgAxis(lo, hi, step, pixLo, pixHi);
    }

    double px(double v) {
        return pixLo + (v - lo) / (hi - lo) * (pixHi - pixLo);
    }

    double firstTick() {
        return Math.ceil(lo / step - 1e-9) * step;
    }
}
