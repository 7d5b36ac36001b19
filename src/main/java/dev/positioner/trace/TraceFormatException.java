package dev.positioner.trace;

/**
 * A trace that cannot be read, with where the problem is so a technician can fix the file.
 * {@code row} is the 1-based line number in a CSV file (the header is row 1) or the 1-based
 * sample number in a JSON array; 0 means the problem is not tied to one row (a size limit, say).
 * {@code column} is the column name as written in the file, or {@code null}.
 */
public class TraceFormatException extends RuntimeException {

    private final long row;
    private final String column;

    public TraceFormatException(long row, String column, String message) {
        super(prefix(row, column) + message);
        this.row = row;
        this.column = column;
    }

    public long row() {
        return row;
    }

    public String column() {
        return column;
    }

    private static String prefix(long row, String column) {
        StringBuilder b = new StringBuilder();
        if (row > 0) {
            b.append("row ").append(row);
        }
        if (column != null) {
            b.append(b.length() > 0 ? ", " : "").append("column '").append(column).append('\'');
        }
        return b.length() > 0 ? b.append(": ").toString() : "";
    }
}
