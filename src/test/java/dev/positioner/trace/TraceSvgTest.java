package dev.positioner.trace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;

class TraceSvgTest {

    private static String render(java.util.function.Consumer<SampleConsumer> gen) {
        TraceAnalyser a = new TraceAnalyser(TraceAnalysisOptions.defaults());
        PlotDecimator p = new PlotDecimator();
        gen.accept(a.andThen(p));
        return TraceSvg.render(p.finish(), a.finish());
    }

    private static Document parse(String svg) throws Exception {
        return DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    }

    private static int count(String svg, String needle) {
        Matcher m = Pattern.compile(Pattern.quote(needle)).matcher(svg);
        int n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }

    @Test
    void stepsAreMarkedAndTheSvgIsWellFormed() throws Exception {
        String svg = render(out -> SyntheticTraces.firstOrderSteps(0.2, 0.6, 2.0,
                new double[] {40, 50, 45, 55}, 30, 0.05, 1, out));
        Document doc = parse(svg);
        assertEquals("svg", doc.getDocumentElement().getTagName());
        assertEquals(3, count(svg, "class=\"step\""));
        assertTrue(svg.contains(">S1<") && svg.contains(">S3<"));
        assertTrue(svg.contains(">time, s<") && svg.contains(">%<"), "axis units");
        assertTrue(svg.contains(">input<") && svg.contains(">position<"), "legend");
        assertFalse(svg.contains("controller output"), "no such column, no such key");
        assertFalse(svg.contains("class=\"oscillation\""));
    }

    @Test
    void oscillationWindowIsShadedAndLabelled() throws Exception {
        String svg = render(out -> SyntheticTraces.sine(0.2, 600, 50, 8, 2, 0.05, 1, out));
        parse(svg);
        assertEquals(1, count(svg, "class=\"oscillation\""));
        assertTrue(svg.contains("oscillation 8.0 s, 4."), svg.substring(0, 200));
    }

    @Test
    void deadBandIsAnnotatedAndReversalsRinged() throws Exception {
        TraceAnalyser a = new TraceAnalyser(TraceAnalysisOptions.defaults());
        PlotDecimator p = new PlotDecimator();
        SyntheticTraces.backlashRamps(0.2, 10, 90, 0.1, 2, 2.0, x -> x, 0, 1, a.andThen(p));
        TraceAnalysis result = a.finish();
        String svg = TraceSvg.render(p.finish(), result);
        parse(svg);
        // the value itself is checked in DeadBandAnalyserTest; here, that it is written out
        assertTrue(svg.contains(String.format(java.util.Locale.ROOT, "dead band %.2f %%",
                result.deadBand().deadBandPercent())), "annotation");
        assertEquals(3, count(svg, "class=\"reversal\""));
    }

    @Test
    void thickLinesAndLargeTextForATabletInPoorLight() {
        String svg = render(out -> SyntheticTraces.sine(0.2, 100, 50, 8, 2, 0, 1, out));
        Matcher widths = Pattern.compile("<polyline[^>]*stroke-width=\"(\\d+)\"").matcher(svg);
        int lines = 0;
        while (widths.find()) {
            assertTrue(Integer.parseInt(widths.group(1)) >= 4, "trace lines at least 4 px");
            lines++;
        }
        assertEquals(2, lines);
        Matcher fonts = Pattern.compile("font-size=\"(\\d+)\"").matcher(svg);
        while (fonts.find()) {
            assertTrue(Integer.parseInt(fonts.group(1)) >= 24, "text at least 24 px");
        }
        // never more than ~2000 points a line, even for long traces
        Matcher pts = Pattern.compile("points=\"([^\"]*)\"").matcher(render(out ->
                SyntheticTraces.sine(0.01, 20_000, 50, 8, 2, 0, 1, out)));
        while (pts.find()) {
            assertTrue(pts.group(1).split(" ").length <= 2000);
        }
    }

    @Test
    void textIsEscaped() {
        assertEquals("a &lt;b&gt; &amp; &quot;c&quot;", TraceSvg.escape("a <b> & \"c\""));
    }
}
