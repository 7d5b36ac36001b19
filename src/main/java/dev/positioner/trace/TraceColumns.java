package dev.positioner.trace;

import java.util.Locale;
import java.util.Map;

/**
 * Maps a CSV header onto the roles the analysers need. Names are matched after lower-casing,
 * dropping a bracketed unit ("position (%)") and turning other punctuation into underscores, so
 * common historian headings work without a mapping step. Unknown columns are ignored.
 */
final class TraceColumns {

    enum Role { TIME, INPUT, POSITION, CONTROLLER_OUTPUT, PROCESS_VALUE }

    private static final Map<String, Role> ALIASES = Map.ofEntries(
            Map.entry("t", Role.TIME), Map.entry("time", Role.TIME),
            Map.entry("time_s", Role.TIME), Map.entry("seconds", Role.TIME),
            Map.entry("timestamp", Role.TIME), Map.entry("datetime", Role.TIME),
            Map.entry("input", Role.INPUT), Map.entry("input_signal", Role.INPUT),
            Map.entry("signal", Role.INPUT), Map.entry("setpoint", Role.INPUT),
            Map.entry("sp", Role.INPUT), Map.entry("demand", Role.INPUT),
            Map.entry("command", Role.INPUT),
            Map.entry("position", Role.POSITION), Map.entry("pos", Role.POSITION),
            Map.entry("travel", Role.POSITION), Map.entry("valve_position", Role.POSITION),
            Map.entry("stem_position", Role.POSITION), Map.entry("feedback", Role.POSITION),
            Map.entry("controller_output", Role.CONTROLLER_OUTPUT),
            Map.entry("co", Role.CONTROLLER_OUTPUT), Map.entry("op", Role.CONTROLLER_OUTPUT),
            Map.entry("output", Role.CONTROLLER_OUTPUT), Map.entry("mv", Role.CONTROLLER_OUTPUT),
            Map.entry("process_value", Role.PROCESS_VALUE), Map.entry("pv", Role.PROCESS_VALUE),
            Map.entry("process_variable", Role.PROCESS_VALUE));

    /** Column index of each role, -1 when absent. */
    final int[] index = {-1, -1, -1, -1, -1};
    /** Header names as written, for error messages. */
    final String[] names;
    final char delimiter;

    private TraceColumns(String[] names, char delimiter) {
        this.names = names;
        this.delimiter = delimiter;
    }

    int of(Role r) {
        return index[r.ordinal()];
    }

    String name(Role r) {
        return names[index[r.ordinal()]];
    }

    static TraceColumns parse(String header, long row) {
        if (!header.isEmpty() && header.charAt(0) == '\uFEFF') {
            header = header.substring(1);
        }
        char delimiter = header.indexOf(',') >= 0 ? ','
                : header.indexOf(';') >= 0 ? ';' : header.indexOf('\t') >= 0 ? '\t' : ',';
        String[] cells = header.split(java.util.regex.Pattern.quote(String.valueOf(delimiter)), -1);
        for (int i = 0; i < cells.length; i++) {
            cells[i] = unquote(cells[i].trim());
        }
        TraceColumns cols = new TraceColumns(cells, delimiter);
        for (int i = 0; i < cells.length; i++) {
            Role role = ALIASES.get(normalise(cells[i]));
            if (role == null) {
                continue;
            }
            int prev = cols.index[role.ordinal()];
            if (prev >= 0) {
                throw new TraceFormatException(row, cells[i], "columns '" + cells[prev] + "' and '"
                        + cells[i] + "' both read as " + label(role) + "; keep one");
            }
            cols.index[role.ordinal()] = i;
        }
        if (cols.of(Role.TIME) < 0 && cells.length > 0 && looksNumeric(cells[0])) {
            throw new TraceFormatException(row, null, "no header row: the first line must name "
                    + "the columns, e.g. t,input,position[,controller_output]");
        }
        for (Role required : new Role[] {Role.TIME, Role.INPUT, Role.POSITION}) {
            if (cols.of(required) < 0) {
                throw new TraceFormatException(row, null, "header has no " + label(required)
                        + " column (found: " + String.join(", ", cells) + "); expected "
                        + "t or time, input, position");
            }
        }
        return cols;
    }

    static String label(Role r) {
        return r.name().toLowerCase(Locale.ROOT);
    }

    static String unquote(String s) {
        return s.length() >= 2 && s.charAt(0) == '"' && s.charAt(s.length() - 1) == '"'
                ? s.substring(1, s.length() - 1).trim() : s;
    }

    private static String normalise(String name) {
        String n = name.toLowerCase(Locale.ROOT).replaceAll("[(\\[].*?[)\\]]", " ")
                .replaceAll("[^a-z0-9]+", "_");
        return n.replaceAll("^_+|_+$", "");
    }

    private static boolean looksNumeric(String s) {
        try {
            Double.parseDouble(s);
            return true;
        } catch (NumberFormatException e) {
            return false;
        }
    }
}
