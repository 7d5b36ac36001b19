package dev.positioner.trace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class PlotDecimatorTest {

    @Test
    void longTraceIsThinnedButKeepsASingleSampleSpike() {
        PlotDecimator d = new PlotDecimator();
        int n = 1_000_000;
        for (int k = 0; k < n; k++) {
            double y = k == 654_321 ? 95 : k == 123_456 ? 5 : 50;
            d.accept(Sample.of(k * 0.2, 50, y));
        }
        PlotData p = d.finish();
        assertTrue(p.position().size() <= 2 * PlotDecimator.DEFAULT_BUCKETS, "at most 2000 points");
        double max = Double.NEGATIVE_INFINITY;
        double min = Double.POSITIVE_INFINITY;
        double tMax = 0;
        for (int i = 0; i < p.position().size(); i++) {
            if (p.position().v()[i] > max) {
                max = p.position().v()[i];
                tMax = p.position().t()[i];
            }
            min = Math.min(min, p.position().v()[i]);
        }
        assertEquals(95, max, 0);
        assertEquals(654_321 * 0.2, tMax, 1e-6); // drawn at its own time, not a bucket's
        assertEquals(5, min, 0);
        assertNull(p.controllerOutput());
        assertEquals((n - 1) * 0.2, p.endTime(), 1e-6);
    }

    @Test
    void pointsStayInTimeOrder() {
        PlotDecimator d = new PlotDecimator(10);
        SyntheticTraces.sine(0.2, 100, 50, 8, 2, 0.3, 4, d);
        PlotData.Series s = d.finish().position();
        for (int i = 1; i < s.size(); i++) {
            assertTrue(s.t()[i] > s.t()[i - 1], "time order at " + i);
        }
        assertTrue(s.size() <= 20);
    }

    @Test
    void shortTraceIsDrawnWhole() {
        PlotDecimator d = new PlotDecimator();
        for (int k = 0; k < 30; k++) {
            d.accept(new Sample(k, k, 2 * k, 3 * k, Double.NaN));
        }
        PlotData p = d.finish();
        assertEquals(30, p.input().size());
        assertEquals(87, p.controllerOutput().v()[29], 0);
    }
}
