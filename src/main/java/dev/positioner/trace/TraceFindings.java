package dev.positioner.trace;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * What a trace's metrics mean, as sentences for a technician and as the measurement codes the
 * diagnosis already understands (dead_band, hysteresis, oscillation_amplitude, oscillation_period,
 * all in percent of travel or seconds), so a trace feeds the same rules a hand measurement does.
 */
public final class TraceFindings {

    private TraceFindings() {
    }

    /** Measurement code -> value (percent or s) that the trace supports. */
    public static Map<String, Double> measurements(TraceAnalysis a) {
        Map<String, Double> out = new LinkedHashMap<>();
        DeadBandResult db = a.deadBand();
        if (db != null && db.deadBandPercent() != null) {
            out.put("dead_band", db.deadBandPercent());
        }
        if (db != null && db.hysteresisPercent() != null) {
            out.put("hysteresis", Math.max(0, db.hysteresisPercent()));
        }
        OscillationResult osc = a.oscillation();
        if (osc != null && osc.detected() && osc.peakToPeakPercent() != null && osc.periodSeconds() != null) {
            out.put("oscillation_amplitude", osc.peakToPeakPercent());
            out.put("oscillation_period", osc.periodSeconds());
        }
        return out;
    }

    public static List<String> sentences(TraceAnalysis a) {
        List<String> out = new ArrayList<>();
        TraceSummary s = a.summary();
        out.add(String.format(Locale.ROOT, "%d samples over %.0f s (%.1f per second).", s.sampleCount(), s.durationSeconds(), s.sampleRateHz()));
        if (a.stepCount() > 0) {
            StepResponse first = a.steps().get(0);
            out.add(String.format(Locale.ROOT, "%d input step(s); the first: dead time %s s, T63 %s s, T86 %s s, overshoot %s %%.",
                    a.stepCount(), num(first.deadTimeSeconds()), num(first.t63Seconds()), num(first.t86Seconds()), num(first.overshootPercent())));
        }
        DeadBandResult db = a.deadBand();
        if (db != null && db.deadBandPercent() != null) {
            out.add(String.format(Locale.ROOT, "Dead band %.2f %% and hysteresis %s %% of span from %d reversals (ISA-75.13.01 terms).",
                    db.deadBandPercent(), num(db.hysteresisPercent()), db.reversals()));
        }
        OscillationResult osc = a.oscillation();
        if (osc != null && osc.detected()) {
            out.add(String.format(Locale.ROOT, "Hunting with a steady input: period %s s, %s %% peak to peak (Hagglund 1995 detector).",
                    num(osc.periodSeconds()), num(osc.peakToPeakPercent())));
        }
        StictionResult st = a.stiction();
        if (st != null) {
            out.add("Stiction test (Horch 1999): " + st.verdict().name().toLowerCase(Locale.ROOT).replace('_', ' ') + " - " + st.reason());
        }
        return out;
    }

    private static String num(Double v) {
        return v == null ? "n/a" : String.format(Locale.ROOT, "%.2f", v);
    }
}
