package dev.positioner.trace;

import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;

/**
 * Reads lines from a {@link Reader} through one fixed buffer, counting characters against a
 * ceiling and refusing over-long lines. {@link java.io.BufferedReader#readLine()} would grow a
 * line without bound, so one hostile line could exhaust memory; this cannot.
 */
final class LineSource {

    private final Reader in;
    private final long maxChars;
    private final int maxLineChars;
    private final char[] buf = new char[1 << 16];
    private final StringBuilder line;
    private int pos;
    private int len;
    private long charsRead;
    private long lineNumber;
    private boolean eof;

    LineSource(Reader in, long maxChars, int maxLineChars) {
        this.in = in;
        this.maxChars = maxChars;
        this.maxLineChars = maxLineChars;
        this.line = new StringBuilder(Math.min(maxLineChars, 256));
    }

    /** Number of the line last returned, 1-based. */
    long lineNumber() {
        return lineNumber;
    }

    /** The next line without its terminator (\n, \r\n or \r), or {@code null} at the end. */
    String next() {
        line.setLength(0);
        boolean any = false;
        while (true) {
            if (pos == len && !fill()) {
                if (!any) {
                    return null;
                }
                break;
            }
            any = true;
            // scan the buffer for the terminator and copy the run in one go
            int start = pos;
            while (pos < len && buf[pos] != '\n' && buf[pos] != '\r') {
                pos++;
            }
            if (line.length() + (pos - start) > maxLineChars) {
                throw new TraceFormatException(lineNumber + 1, null, "line longer than "
                        + maxLineChars + " characters; is this a trace file?");
            }
            if (pos == len) {
                line.append(buf, start, pos - start); // line continues in the next fill
                continue;
            }
            char c = buf[pos++];
            lineNumber++;
            if (c == '\r') {
                if (pos == len) {
                    line.append(buf, start, pos - 1 - start);
                    fill();
                    if (pos < len && buf[pos] == '\n') {
                        pos++;
                    }
                    return line.toString();
                }
                if (buf[pos] == '\n') {
                    pos++;
                }
                return finish(start, pos - (buf[pos - 1] == '\n' ? 2 : 1));
            }
            return finish(start, pos - 1);
        }
        lineNumber++;
        return line.toString();
    }

    private String finish(int start, int end) {
        if (line.length() == 0) {
            return new String(buf, start, end - start);
        }
        line.append(buf, start, end - start);
        return line.toString();
    }

    private boolean fill() {
        if (eof) {
            return false;
        }
        try {
            int n = in.read(buf, 0, buf.length);
            if (n <= 0) {
                eof = true;
                return false;
            }
            charsRead += n;
            if (charsRead > maxChars) {
                throw new TraceFormatException(lineNumber + 1, null, "trace larger than "
                        + maxChars + " bytes; split it or decimate it before upload");
            }
            pos = 0;
            len = n;
            return true;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
