package dev.positioner.trace;

import java.util.Locale;

/**
 * Draws input and position against time as a self-contained SVG string, with the findings of
 * a {@link TraceAnalysis} marked: steps as dashed verticals, the oscillation window shaded, the
 * dead band written out and its measured reversals ringed.
 *
 * <p>Made for a tablet held in poor light: dark lines on white, strokes 4-5 px and text 26-30 px
 * at the 1280 x 720 design size, colours told apart by line style too (the controller output is
 * dashed) so the plot survives a monochrome screen or colour-blind eyes.
 */
public final class TraceSvg {

    static final int W = 1280;
    static final int H = 720;
    private static final int LEFT = 120;
    private static final int RIGHT = 40;
    private static final int TOP = 140;
    private static final int BOTTOM = 100;
    static final String INPUT = "#0b4f9c";
    static final String POSITION = "#111111";
    static final String CONTROLLER = "#6b6b6b";
    static final String STEP = "#a64b00";
    static final String SHADE = "#f3dfa2";

    private TraceSvg() {
    }

    public static String render(PlotData plot, TraceAnalysis analysis) {
        StringBuilder b = new StringBuilder(64 * 1024);
        double vMin = Double.POSITIVE_INFINITY;
        double vMax = Double.NEGATIVE_INFINITY;
        for (PlotData.Series s : new PlotData.Series[] {plot.input(), plot.position(),
                plot.controllerOutput()}) {
            if (s != null) {
                for (double v : s.v()) {
                    vMin = Math.min(vMin, v);
                    vMax = Math.max(vMax, v);
                }
            }
        }
        if (vMin > vMax) {
            vMin = 0;
            vMax = 100;
        }
        double pad = Math.max(1, (vMax - vMin) * 0.05);
        SvgAxis x = SvgAxis.nice(plot.startTime(), plot.endTime(), 8, LEFT, W - RIGHT, false);
        SvgAxis y = SvgAxis.nice(vMin - pad, vMax + pad, 6, H - BOTTOM, TOP, true);
        b.append("<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 ").append(W).append(' ')
                .append(H).append("\" width=\"").append(W).append("\" height=\"").append(H)
                .append("\" role=\"img\" font-family=\"DejaVu Sans, Arial, sans-serif\">\n");
        b.append("<title>Input and valve position against time</title>\n");
        b.append("<rect width=\"100%\" height=\"100%\" fill=\"#ffffff\"/>\n");
        oscillation(b, analysis.oscillation(), x);
        grid(b, x, y);
        steps(b, analysis, x);
        line(b, plot.input(), x, y, INPUT, 4, null);
        if (plot.controllerOutput() != null) {
            line(b, plot.controllerOutput(), x, y, CONTROLLER, 4, "14 10");
        }
        line(b, plot.position(), x, y, POSITION, 5, null);
        deadBand(b, analysis.deadBand(), x, y);
        legend(b, plot.controllerOutput() != null, analysis);
        b.append("</svg>\n");
        return b.toString();
    }

    private static void grid(StringBuilder b, SvgAxis x, SvgAxis y) {
        b.append("<g stroke=\"#c8c8c8\" stroke-width=\"1.5\">\n");
        for (double v = y.firstTick(); v <= y.hi + 1e-9; v += y.step) {
            b.append(String.format(Locale.ROOT, "<line x1=\"%d\" y1=\"%.1f\" x2=\"%d\" y2=\"%.1f\"/>%n",
                    LEFT, y.px(v), W - RIGHT, y.px(v)));
        }
        b.append("</g>\n<g fill=\"#111111\" font-size=\"26\">\n");
        for (double v = y.firstTick(); v <= y.hi + 1e-9; v += y.step) {
            b.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"%.1f\" text-anchor=\"end\">%s</text>%n",
                    LEFT - 12, y.px(v) + 9, num(v, y.step)));
        }
        for (double t = x.firstTick(); t <= x.hi + 1e-9; t += x.step) {
            b.append(String.format(Locale.ROOT, "<line x1=\"%.1f\" y1=\"%d\" x2=\"%.1f\" y2=\"%d\" stroke=\"#111111\" stroke-width=\"3\"/>%n",
                    x.px(t), H - BOTTOM, x.px(t), H - BOTTOM + 12));
            b.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%d\" text-anchor=\"middle\">%s</text>%n",
                    x.px(t), H - BOTTOM + 42, num(t, x.step)));
        }
        b.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"%d\" text-anchor=\"middle\">time, s</text>%n",
                (LEFT + W - RIGHT) / 2, H - 18));
        b.append(String.format(Locale.ROOT, "<text transform=\"translate(34 %d) rotate(-90)\" text-anchor=\"middle\">%%</text>%n",
                (TOP + H - BOTTOM) / 2));
        b.append("</g>\n");
        b.append(String.format(Locale.ROOT, "<rect x=\"%d\" y=\"%d\" width=\"%d\" height=\"%d\" fill=\"none\" stroke=\"#111111\" stroke-width=\"3\"/>%n",
                LEFT, TOP, W - RIGHT - LEFT, H - BOTTOM - TOP));
    }

    private static void line(StringBuilder b, PlotData.Series s, SvgAxis x, SvgAxis y,
                             String colour, int width, String dash) {
        if (s == null || s.size() == 0) {
            return;
        }
        b.append("<polyline fill=\"none\" stroke=\"").append(colour).append("\" stroke-width=\"")
                .append(width).append("\" stroke-linejoin=\"round\" stroke-linecap=\"round\"");
        if (dash != null) {
            b.append(" stroke-dasharray=\"").append(dash).append('"');
        }
        b.append(" points=\"");
        for (int i = 0; i < s.size(); i++) {
            b.append(String.format(Locale.ROOT, "%.1f,%.1f ", x.px(s.t()[i]), y.px(s.v()[i])));
        }
        b.setLength(b.length() - 1);
        b.append("\"/>\n");
    }

    private static void steps(StringBuilder b, TraceAnalysis a, SvgAxis x) {
        double lastLabel = Double.NEGATIVE_INFINITY;
        for (StepResponse s : a.steps()) {
            double px = x.px(s.startTime());
            b.append(String.format(Locale.ROOT, "<line class=\"step\" x1=\"%.1f\" y1=\"%d\" x2=\"%.1f\" y2=\"%d\" stroke=\"%s\" stroke-width=\"3\" stroke-dasharray=\"10 8\"/>%n",
                    px, TOP, px, H - BOTTOM, STEP));
            // labels only where they will not collide
            if (px - lastLabel > 60) {
                b.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%d\" font-size=\"24\" font-weight=\"bold\" fill=\"%s\" text-anchor=\"middle\">S%d</text>%n",
                        px, TOP + 28, STEP, s.index()));
                lastLabel = px;
            }
        }
    }

    private static void oscillation(StringBuilder b, OscillationResult o, SvgAxis x) {
        if (o == null || !o.detected()) {
            return;
        }
        double a = x.px(o.windowStart());
        double c = x.px(o.windowEnd());
        b.append(String.format(Locale.ROOT, "<rect class=\"oscillation\" x=\"%.1f\" y=\"%d\" width=\"%.1f\" height=\"%d\" fill=\"%s\"/>%n",
                a, TOP, Math.max(4, c - a), H - BOTTOM - TOP, SHADE));
    }

    private static void deadBand(StringBuilder b, DeadBandResult d, SvgAxis x, SvgAxis y) {
        if (d == null || d.deadBandPercent() == null) {
            return;
        }
        for (DeadBandResult.Reversal r : d.measured()) {
            b.append(String.format(Locale.ROOT, "<circle class=\"reversal\" cx=\"%.1f\" cy=\"%.1f\" r=\"11\" fill=\"none\" stroke=\"%s\" stroke-width=\"4\"/>%n",
                    x.px(r.time()), y.px(r.input()), STEP));
        }
    }

    private static void legend(StringBuilder b, boolean co, TraceAnalysis a) {
        b.append("<g font-size=\"28\" fill=\"#111111\">\n");
        int lx = LEFT;
        lx = key(b, lx, "input", INPUT, 4, null);
        lx = key(b, lx, "position", POSITION, 5, null);
        if (co) {
            lx = key(b, lx, "controller output", CONTROLLER, 4, "14 10");
        }
        b.append("</g>\n");
        java.util.List<String> facts = new java.util.ArrayList<>();
        DeadBandResult d = a.deadBand();
        if (d != null && d.deadBandPercent() != null) {
            facts.add(String.format(Locale.ROOT, "dead band %.2f %%", d.deadBandPercent())
                    + (d.hysteresisPercent() == null ? ""
                    : String.format(Locale.ROOT, ", hysteresis %.2f %%", d.hysteresisPercent())));
        }
        OscillationResult o = a.oscillation();
        if (o != null && o.detected()) {
            facts.add(String.format(Locale.ROOT, "oscillation %.1f s, %.2f %% p-p (shaded)",
                    o.periodSeconds(), o.peakToPeakPercent()));
        }
        if (a.stepCount() > 0) {
            facts.add(a.stepCount() + (a.stepCount() == 1 ? " step" : " steps"));
        }
        // two lines at most; about 16 px a character for 26 px bold text
        int perLine = (W - LEFT - RIGHT) / 16;
        StringBuilder line = new StringBuilder();
        int y = 88;
        for (String f : facts) {
            if (line.length() > 0 && line.length() + 3 + f.length() > perLine && y < 120) {
                factLine(b, line.toString(), y);
                line.setLength(0);
                y += 34;
            }
            line.append(line.length() > 0 ? "  ·  " : "").append(f);
        }
        if (line.length() > 0) {
            factLine(b, line.toString(), y);
        }
    }

    private static void factLine(StringBuilder b, String text, int y) {
        b.append(String.format(Locale.ROOT, "<text class=\"facts\" x=\"%d\" y=\"%d\" font-size=\"26\" font-weight=\"bold\" fill=\"%s\">%s</text>%n",
                LEFT, y, STEP, escape(text)));
    }

    private static int key(StringBuilder b, int lx, String label, String colour, int width,
                           String dash) {
        b.append(String.format(Locale.ROOT, "<line x1=\"%d\" y1=\"38\" x2=\"%d\" y2=\"38\" stroke=\"%s\" stroke-width=\"%d\"%s/>%n",
                lx, lx + 50, colour, width + 1, dash == null ? "" : " stroke-dasharray=\"" + dash + "\""));
        b.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"48\">%s</text>%n", lx + 62, escape(label)));
        return lx + 62 + 17 * label.length() + 40;
    }

    /** Tick label with as many decimals as the tick step needs. */
    private static String num(double v, double step) {
        int decimals = (int) Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
        return String.format(Locale.ROOT, "%." + decimals + "f", v + 0.0);
    }

    static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;")
                .replace("\"", "&quot;");
    }
}
