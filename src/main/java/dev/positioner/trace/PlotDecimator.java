package dev.positioner.trace;

/**
 * Thins a trace of any length to at most two points per bucket per series, the minimum and
 * the maximum in the order they occurred, so a one-sample spike still shows on the plot. The
 * bucket count is fixed: when all are full, neighbours are merged in pairs and each bucket
 * covers twice as many samples from then on. Memory is O(buckets) whatever the trace length.
 */
public final class PlotDecimator implements SampleConsumer {

    /** 1000 buckets give at most 2000 points per series: finer than any tablet screen. */
    public static final int DEFAULT_BUCKETS = 1000;
    private static final int SERIES = 3;

    private final int cap;
    private final double[][] minV;
    private final double[][] minT;
    private final double[][] maxV;
    private final double[][] maxT;
    private int full;           // completed buckets
    private long span = 1;      // samples per bucket
    private long inBucket;
    private boolean coSeen = true;
    private double first = Double.NaN;
    private double last;

    public PlotDecimator() {
        this(DEFAULT_BUCKETS);
    }

    public PlotDecimator(int buckets) {
        if (buckets < 2 || buckets % 2 != 0) {
            throw new IllegalArgumentException("buckets must be even and at least 2");
        }
        cap = buckets;
        minV = new double[SERIES][cap];
        minT = new double[SERIES][cap];
        maxV = new double[SERIES][cap];
        maxT = new double[SERIES][cap];
    }

    @Override
    public void accept(Sample s) {
        if (Double.isNaN(first)) {
            first = s.time();
        }
        last = s.time();
        coSeen &= s.hasControllerOutput();
        if (full == cap) {
            halve();
        }
        double[] v = {s.input(), s.position(), s.controllerOutput()};
        int b = full;
        for (int k = 0; k < SERIES; k++) {
            if (inBucket == 0 || v[k] < minV[k][b]) {
                minV[k][b] = v[k];
                minT[k][b] = s.time();
            }
            if (inBucket == 0 || v[k] > maxV[k][b]) {
                maxV[k][b] = v[k];
                maxT[k][b] = s.time();
            }
        }
        if (++inBucket == span) {
            inBucket = 0;
            full++;
        }
    }

    private void halve() {
        for (int k = 0; k < SERIES; k++) {
            for (int i = 0; i < cap / 2; i++) {
                int a = 2 * i;
                int b = a + 1;
                boolean minFromA = minV[k][a] <= minV[k][b];
                boolean maxFromA = maxV[k][a] >= maxV[k][b];
                minV[k][i] = minFromA ? minV[k][a] : minV[k][b];
                minT[k][i] = minFromA ? minT[k][a] : minT[k][b];
                maxV[k][i] = maxFromA ? maxV[k][a] : maxV[k][b];
                maxT[k][i] = maxFromA ? maxT[k][a] : maxT[k][b];
            }
        }
        full = cap / 2;
        span *= 2;
    }

    public PlotData finish() {
        int n = full + (inBucket > 0 ? 1 : 0);
        return new PlotData(series(0, n), series(1, n), coSeen && n > 0 ? series(2, n) : null,
                Double.isNaN(first) ? 0 : first, last);
    }

    private PlotData.Series series(int k, int n) {
        double[] t = new double[2 * n];
        double[] v = new double[2 * n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            boolean minFirst = minT[k][i] <= maxT[k][i];
            double ta = minFirst ? minT[k][i] : maxT[k][i];
            double va = minFirst ? minV[k][i] : maxV[k][i];
            double tb = minFirst ? maxT[k][i] : minT[k][i];
            double vb = minFirst ? maxV[k][i] : minV[k][i];
            t[m] = ta;
            v[m++] = va;
            if (tb != ta) {
                t[m] = tb;
                v[m++] = vb;
            }
        }
        return new PlotData.Series(java.util.Arrays.copyOf(t, m), java.util.Arrays.copyOf(v, m));
    }
}
