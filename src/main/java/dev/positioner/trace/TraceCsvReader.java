package dev.positioner.trace;

import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;

/**
 * Streams a CSV trace row by row into a {@link SampleConsumer}; the file is never held whole.
 *
 * <p>Format: a header row is required; columns {@code t}/{@code time} (seconds, or ISO-8601
 * date-times counted from the first row), {@code input}, {@code position}, and optionally
 * {@code controller_output} and {@code process_value} (aliases in {@link TraceColumns}). The
 * delimiter is a comma, or a semicolon or tab if the header has no comma. Blank lines and lines
 * starting with '#' are skipped; cells may be wrapped in double quotes but may not contain the
 * delimiter; decimal commas are not read.
 *
 * <p>Units: the signal unit applies to input and controller output, the position unit to
 * position (a 4-20 mA feedback transmitter, say). The process value is passed through unscaled.
 */
public final class TraceCsvReader {

    /** 2,000,000 samples is about four days at 5 samples/s, beyond any one troubleshooting job. */
    public static final int DEFAULT_MAX_SAMPLES = 2_000_000;
    /** 2 M rows of five columns fit comfortably; a larger upload is not a single trace. */
    public static final long DEFAULT_MAX_BYTES = 128L * 1024 * 1024;
    static final int MAX_LINE_CHARS = 1024;
    /**
     * Converted signals outside this range are taken as a wrong unit rather than a reading:
     * a live-zero signal can sit a little outside 0..100 % (3.8 mA is -1.25 %), never this far.
     */
    static final double PLAUSIBLE_LOW = -25;
    static final double PLAUSIBLE_HIGH = 125;

    private final long maxBytes;
    private final int maxSamples;
    private final SignalUnit signalUnit;
    private final SignalUnit positionUnit;

    public TraceCsvReader() {
        this(DEFAULT_MAX_BYTES, DEFAULT_MAX_SAMPLES, SignalUnit.PERCENT, SignalUnit.PERCENT);
    }

    public TraceCsvReader(SignalUnit signalUnit, SignalUnit positionUnit) {
        this(DEFAULT_MAX_BYTES, DEFAULT_MAX_SAMPLES, signalUnit, positionUnit);
    }

    public TraceCsvReader(long maxBytes, int maxSamples, SignalUnit signalUnit,
                          SignalUnit positionUnit) {
        if (maxBytes <= 0) {
            throw new IllegalArgumentException("maxBytes must be positive");
        }
        this.maxBytes = maxBytes;
        this.maxSamples = maxSamples;
        this.signalUnit = signalUnit;
        this.positionUnit = positionUnit;
    }

    /** Reads UTF-8 bytes; the byte limit is enforced on the decoded characters (ASCII: same). */
    public TraceSummary read(InputStream in, SampleConsumer sink) {
        return read(new InputStreamReader(in, StandardCharsets.UTF_8), sink);
    }

    public TraceSummary read(Reader in, SampleConsumer sink) {
        LineSource lines = new LineSource(in, maxBytes, MAX_LINE_CHARS);
        String line = nextContent(lines);
        if (line == null) {
            throw new TraceFormatException(0, null, "empty trace: a header row and at least "
                    + SampleGate.MIN_SAMPLES + " samples are needed");
        }
        TraceColumns cols = TraceColumns.parse(line, lines.lineNumber());
        SampleGate gate = new SampleGate(maxSamples, sink, cols.names[cols.index[0]]);
        TraceTime time = new TraceTime();
        String[] cells = new String[cols.names.length];
        int[] idx = cols.index;
        int ti = idx[0];
        int ii = idx[1];
        int pi = idx[2];
        int ci = idx[3];
        int vi = idx[4];
        while ((line = nextContent(lines)) != null) {
            long row = lines.lineNumber();
            split(line, cols, cells, row);
            double t = time.seconds(cells[ti], row, cols.names[ti]);
            double u = signal(cells, ii, cols, row, signalUnit);
            double y = signal(cells, pi, cols, row, positionUnit);
            double co = ci < 0 ? Double.NaN : signal(cells, ci, cols, row, signalUnit);
            double pv = vi < 0 ? Double.NaN : number(cells[vi], row, cols.names[vi]);
            gate.offer(row, new Sample(t, u, y, co, pv));
        }
        return gate.finish(lines.lineNumber());
    }

    private static String nextContent(LineSource lines) {
        String line;
        while ((line = lines.next()) != null) {
            String t = line.strip();
            if (!t.isEmpty() && t.charAt(0) != '#') {
                return line;
            }
        }
        return null;
    }

    /** Splits into {@code cells}; too few cells is an error, extra cells are ignored. */
    private static void split(String line, TraceColumns cols, String[] cells, long row) {
        int n = 0;
        int start = 0;
        char d = cols.delimiter;
        for (int i = 0; i <= line.length() && n < cells.length; i++) {
            if (i == line.length() || line.charAt(i) == d) {
                cells[n++] = TraceColumns.unquote(line.substring(start, i).trim());
                start = i + 1;
            }
        }
        if (n < cells.length) {
            throw new TraceFormatException(row, cols.names[n], "row has " + n + " values but the "
                    + "header has " + cells.length + " columns");
        }
    }

    private static double signal(String[] cells, int i, TraceColumns cols, long row,
                                 SignalUnit unit) {
        double pct = unit.toPercent(number(cells[i], row, cols.names[i]));
        if (pct < PLAUSIBLE_LOW || pct > PLAUSIBLE_HIGH) {
            throw new TraceFormatException(row, cols.names[i], "value " + cells[i] + " is "
                    + String.format(java.util.Locale.ROOT, "%.1f", pct) + " % of span when read as "
                    + unit + "; outside " + PLAUSIBLE_LOW + ".." + PLAUSIBLE_HIGH
                    + " %, so the unit is probably wrong");
        }
        return pct;
    }

    private static double number(String cell, long row, String column) {
        if (cell.isEmpty()) {
            throw new TraceFormatException(row, column, "empty value");
        }
        double v;
        try {
            v = FastDecimal.parse(cell);
        } catch (NumberFormatException e) {
            throw new TraceFormatException(row, column, "'" + cell + "' is not a number"
                    + (cell.indexOf(',') >= 0 ? " (decimal commas are not supported)" : ""));
        }
        if (!Double.isFinite(v)) {
            throw new TraceFormatException(row, column, "value is " + cell
                    + "; NaN and infinite values are not allowed");
        }
        return v;
    }
}
