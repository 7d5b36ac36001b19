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
            char c = buf[pos++];
            any = true;
            if (c == '\n') {
                break;
            }
            if (c == '\r') {
                if (pos == len) {
                    fill();
                }
                if (pos < len && buf[pos] == '\n') {
                    pos++;
                }
                break;
            }
            if (line.length() >= maxLineChars) {
                throw new TraceFormatException(lineNumber + 1, null, "line longer than "
                        + maxLineChars + " characters; is this a trace file?");
            }
            line.append(c);
        }
        lineNumber++;
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
