package dev.positioner.trace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class TraceCsvReaderTest {

    private final List<Sample> got = new ArrayList<>();

    /** Header plus {@code n} rows t=i*0.2, input 50, position 49.5, with one row replaced. */
    private static String csv(String header, int n, int badRowIndex, String badRow) {
        StringBuilder b = new StringBuilder(header).append('\n');
        for (int i = 0; i < n; i++) {
            b.append(i == badRowIndex ? badRow : String.format(java.util.Locale.ROOT,
                    "%.1f,50,49.5", i * 0.2)).append('\n');
        }
        return b.toString();
    }

    private TraceSummary read(String text) {
        return new TraceCsvReader().read(new StringReader(text), got::add);
    }

    private TraceFormatException fail(String text) {
        return assertThrows(TraceFormatException.class, () -> read(text));
    }

    @Test
    void readsSecondsAndSummarises() {
        TraceSummary s = read(csv("t,input,position", 25, -1, null));
        assertEquals(25, s.sampleCount());
        assertEquals(4.8, s.durationSeconds(), 1e-9);
        assertEquals(5.0, s.sampleRateHz(), 1e-9);
        assertFalse(s.hasControllerOutput());
        assertEquals(49.5, got.get(3).position(), 0);
        assertTrue(Double.isNaN(got.get(3).controllerOutput()));
    }

    @Test
    void acceptsAliasesUnitsInHeadersQuotesAndSemicolons() {
        StringBuilder b = new StringBuilder("\"Time (s)\";Signal [%];Travel;OP;PV;note\n");
        for (int i = 0; i < 20; i++) {
            b.append(i).append(";\"40\";41;42;7.5;x\n");
        }
        TraceSummary s = read(b.toString());
        assertTrue(s.hasControllerOutput());
        assertTrue(s.hasProcessValue());
        Sample first = got.get(0);
        assertEquals(40, first.input(), 0);
        assertEquals(41, first.position(), 0);
        assertEquals(42, first.controllerOutput(), 0);
        assertEquals(7.5, first.processValue(), 0);
    }

    @Test
    void isoTimesBecomeSecondsFromFirstRowWithOffsetsAndWithout() {
        StringBuilder b = new StringBuilder("timestamp,input,position\n");
        java.time.OffsetDateTime t0 = java.time.OffsetDateTime.parse("2024-03-01T10:59:58+01:00");
        for (int i = 0; i < 20; i++) {
            // 250 ms apart, crossing a minute boundary, written with an offset
            b.append(t0.plusNanos(i * 250_000_000L)).append(",50,50\n");
        }
        read(b.toString());
        assertEquals(0.0, got.get(0).time(), 1e-9);
        assertEquals(0.25, got.get(1).time(), 1e-9);
        assertEquals(4.75, got.get(19).time(), 1e-9);

        got.clear();
        StringBuilder c = new StringBuilder("time,input,position\n");
        for (int i = 0; i < 20; i++) {
            c.append("2024-03-01 23:59:").append(40 + i).append(".5,50,50\n");
        }
        c.append("2024-03-02 00:00:00.5,50,50\n"); // across midnight
        read(c.toString());
        assertEquals(20.0, got.get(20).time(), 1e-9);
    }

    @Test
    void convertsMilliampsAndPsiToPercent() {
        StringBuilder b = new StringBuilder("t,input,position\n");
        for (int i = 0; i < 20; i++) {
            b.append(i).append(",12,20\n");
        }
        new TraceCsvReader(SignalUnit.MILLIAMP, SignalUnit.MILLIAMP)
                .read(new StringReader(b.toString()), got::add);
        assertEquals(50.0, got.get(0).input(), 1e-12);   // 12 mA is mid-span of 4-20 mA
        assertEquals(100.0, got.get(0).position(), 1e-12);

        got.clear();
        StringBuilder c = new StringBuilder("t,input,position\n");
        for (int i = 0; i < 20; i++) {
            c.append(i).append(",6,0\n");
        }
        new TraceCsvReader(SignalUnit.PSI, SignalUnit.PERCENT)
                .read(new StringReader(c.toString()), got::add);
        assertEquals(25.0, got.get(0).input(), 1e-12);   // 6 psi of 3-15 psi is a quarter
        assertEquals(0.0, got.get(0).position(), 0);
        assertEquals(SignalUnit.MILLIAMP, SignalUnit.parse(" mA "));
        assertEquals(-12.5, SignalUnit.MILLIAMP.toPercent(2), 1e-12);
    }

    @Test
    void wrongUnitIsCaughtByPlausibility() {
        // a percent file read as mA: 50 "mA" would be 287.5 % of span
        TraceFormatException e = assertThrows(TraceFormatException.class, () ->
                new TraceCsvReader(SignalUnit.MILLIAMP, SignalUnit.PERCENT)
                        .read(new StringReader(csv("t,input,position", 20, -1, null)), got::add));
        assertEquals(2, e.row());
        assertEquals("input", e.column());
        assertTrue(e.getMessage().contains("unit"), e.getMessage());
    }

    @Test
    void missingHeaderIsReported() {
        TraceFormatException e = fail(csv("0.0,50,50", 20, -1, null));
        assertEquals(1, e.row());
        assertTrue(e.getMessage().contains("header"), e.getMessage());
    }

    @Test
    void missingColumnIsNamed() {
        TraceFormatException e = fail("t,input,flow\n1,2,3\n");
        assertEquals(1, e.row());
        assertTrue(e.getMessage().contains("no position column"), e.getMessage());
        TraceFormatException twice = fail("t,input,sp,position\n");
        assertEquals("sp", twice.column());
    }

    @Test
    void nonNumericValueGivesRowAndColumn() {
        // data rows start on line 2, so index 7 is line 9
        TraceFormatException e = fail(csv("t,input,position", 30, 7, "1.4,50,abc"));
        assertEquals(9, e.row());
        assertEquals("position", e.column());
        assertTrue(e.getMessage().contains("'abc' is not a number"), e.getMessage());
    }

    @Test
    void nanAndInfinityAreRefused() {
        TraceFormatException nan = fail(csv("t,input,position", 30, 4, "0.8,NaN,50"));
        assertEquals(6, nan.row());
        assertEquals("input", nan.column());
        TraceFormatException inf = fail(csv("t,input,position", 30, 5, "1.0,50,-Infinity"));
        assertEquals(7, inf.row());
        assertEquals("position", inf.column());
    }

    @Test
    void emptyCellAndShortRowAreRefused() {
        assertEquals("input", fail(csv("t,input,position", 30, 2, "0.4,,50")).column());
        TraceFormatException shortRow = fail(csv("t,input,position", 30, 3, "0.6,50"));
        assertEquals(5, shortRow.row());
        assertEquals("position", shortRow.column());
    }

    @Test
    void nonMonotonicTimeGivesTheRow() {
        TraceFormatException back = fail(csv("t,input,position", 30, 10, "1.0,50,50"));
        assertEquals(12, back.row());
        assertEquals("t", back.column());
        assertTrue(back.getMessage().contains("does not increase"), back.getMessage());
        // a repeated time is refused too: analysis divides by the sample interval
        TraceFormatException same = fail(csv("t,input,position", 30, 10, "1.8,50,50"));
        assertEquals(12, same.row());
    }

    @Test
    void mixedTimeFormsAreRefused() {
        TraceFormatException e = fail(csv("t,input,position", 30, 3,
                "2024-03-01T10:00:00Z,50,50"));
        assertEquals(5, e.row());
        assertTrue(e.getMessage().contains("not a number of seconds"), e.getMessage());
    }

    @Test
    void tooFewSamplesSaysWhy() {
        TraceFormatException e = fail(csv("t,input,position", 19, -1, null));
        assertEquals(20, e.row()); // last line read
        assertNull(e.column());
        assertTrue(e.getMessage().contains("at least 20"), e.getMessage());
        assertTrue(e.getMessage().contains("because"), e.getMessage());
        read(csv("t,input,position", 20, -1, null)); // exactly 20 is enough
    }

    @Test
    void blankAndCommentLinesAreSkippedButCounted() {
        String text = "# exported by the historian\nt,input,position\n\n"
                + csv("", 25, -1, null).substring(1).replace("0.4,50,49.5", "0.4,50,bad");
        TraceFormatException e = fail(text);
        assertEquals(6, e.row()); // comment 1, header 2, blank 3, rows 0.0/0.2 on 4/5
    }

    @Test
    void sampleLimitIsEnforced() {
        TraceCsvReader r = new TraceCsvReader(1_000_000, 50, SignalUnit.PERCENT, SignalUnit.PERCENT);
        TraceFormatException e = assertThrows(TraceFormatException.class, () ->
                r.read(new StringReader(csv("t,input,position", 60, -1, null)), got::add));
        assertEquals(52, e.row()); // the 51st sample, on line 52
        assertTrue(e.getMessage().contains("more than 50 samples"), e.getMessage());
    }

    @Test
    void byteLimitIsEnforcedOnStreams() {
        String text = csv("t,input,position", 5000, -1, null);
        TraceCsvReader r = new TraceCsvReader(10_000, 1000, SignalUnit.PERCENT, SignalUnit.PERCENT);
        TraceFormatException e = assertThrows(TraceFormatException.class, () -> r.read(
                new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)), got::add));
        assertTrue(e.getMessage().contains("larger than 10000 bytes"), e.getMessage());
        assertTrue(got.size() < 1000, "stopped early, not after buffering the whole input");
    }

    @Test
    void overlongLineIsRefused() {
        String text = "t,input,position\n" + "1".repeat(5000) + "\n";
        TraceFormatException e = fail(text);
        assertEquals(2, e.row());
    }

    @Test
    void crlfLineEndsAreRead() {
        TraceSummary s = read(csv("t,input,position", 20, -1, null).replace("\n", "\r\n"));
        assertEquals(20, s.sampleCount());
    }

    @Test
    void gateChecksJsonStyleSamplesWithSampleNumbers() {
        SampleGate gate = new SampleGate(100, got::add);
        gate.offer(1, Sample.of(0, 50, 50));
        TraceFormatException e = assertThrows(TraceFormatException.class,
                () -> gate.offer(2, Sample.of(0.2, Double.POSITIVE_INFINITY, 50)));
        assertEquals(2, e.row());
        assertEquals("input", e.column());
        assertThrows(TraceFormatException.class, () -> gate.finish(2));
    }

    /** Hands out at most {@code chunk} characters a read, to put buffer edges everywhere. */
    private static final class ChunkedReader extends java.io.Reader {
        private final String text;
        private final int chunk;
        private int pos;

        ChunkedReader(String text, int chunk) {
            this.text = text;
            this.chunk = chunk;
        }

        @Override
        public int read(char[] cbuf, int off, int len) {
            if (pos >= text.length()) {
                return -1;
            }
            int n = Math.min(Math.min(len, chunk), text.length() - pos);
            text.getChars(pos, pos + n, cbuf, off);
            pos += n;
            return n;
        }

        @Override
        public void close() {
        }
    }

    @Test
    void linesSplitAcrossReadsAreReassembledForEveryLineEnding() {
        for (String eol : new String[] {"\n", "\r\n", "\r"}) {
            for (int chunk : new int[] {1, 2, 3, 7, 64}) {
                got.clear();
                StringBuilder b = new StringBuilder("t,input,position").append(eol);
                for (int i = 0; i < 300; i++) {
                    b.append(i).append(",").append(i % 100).append(".25,").append(i % 50)
                            .append(eol);
                }
                new TraceCsvReader().read(new ChunkedReader(b.toString(), chunk), got::add);
                assertEquals(300, got.size(), eol.replace("\r", "CR") + " chunk " + chunk);
                for (int i = 0; i < 300; i++) {
                    assertEquals(i, got.get(i).time(), 0);
                    assertEquals(i % 100 + 0.25, got.get(i).input(), 0);
                    assertEquals(i % 50, got.get(i).position(), 0);
                }
            }
        }
        // and row numbers stay right across the edges
        String bad = csv("t,input,position", 40, 30, "6.0,50,oops").replace("\n", "\r\n");
        TraceFormatException e = assertThrows(TraceFormatException.class, () ->
                new TraceCsvReader().read(new ChunkedReader(bad, 5), got::add));
        assertEquals(32, e.row());
    }
}
