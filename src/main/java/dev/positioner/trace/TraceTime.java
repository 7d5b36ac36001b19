package dev.positioner.trace;

import java.time.Instant;
import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.time.temporal.ChronoField;
import java.time.temporal.TemporalAccessor;

/**
 * Reads the time column. The first data row decides the form for the whole file: a plain number
 * is seconds and is kept as logged; an ISO-8601 date-time (historian exports) becomes seconds
 * since the first row. A time without an offset is read as if UTC, which is right for
 * differences unless the log crosses a daylight-saving change; an offset avoids that.
 */
final class TraceTime {

    private Boolean iso;
    private long epoch0;
    private int nano0;
    private boolean started;

    /** Seconds for one cell; {@code row}/{@code column} only name the cell in errors. */
    double seconds(String cell, long row, String column) {
        if (iso == null) {
            iso = !isNumber(cell);
        }
        if (!iso) {
            try {
                return FastDecimal.parse(cell);
            } catch (NumberFormatException e) {
                throw new TraceFormatException(row, column, "'" + cell + "' is not a number of "
                        + "seconds, and earlier rows used seconds");
            }
        }
        Instant t = parseIso(cell, row, column);
        if (!started) {
            epoch0 = t.getEpochSecond();
            nano0 = t.getNano();
            started = true;
        }
        // Differences in whole seconds and nanoseconds separately keep sub-millisecond detail
        // that a double of epoch seconds would lose.
        return (t.getEpochSecond() - epoch0) + (t.getNano() - nano0) * 1e-9;
    }


    private static Instant parseIso(String cell, long row, String column) {
        String s = cell.length() > 10 && cell.charAt(10) == ' '
                ? cell.substring(0, 10) + 'T' + cell.substring(11) : cell;
        try {
            TemporalAccessor ta = DateTimeFormatter.ISO_DATE_TIME.parse(s);
            if (ta.isSupported(ChronoField.OFFSET_SECONDS)) {
                return Instant.from(ta);
            }
            return LocalDateTime.from(ta).toInstant(ZoneOffset.UTC);
        } catch (DateTimeParseException e) {
            throw new TraceFormatException(row, column, "'" + cell + "' is neither seconds nor an "
                    + "ISO-8601 date-time such as 2024-03-01T10:15:30.250Z");
        }
    }

    private static boolean isNumber(String s) {
        try {
            Double.parseDouble(s);
            return true;
        } catch (NumberFormatException e) {
            return false;
        }
    }
}
