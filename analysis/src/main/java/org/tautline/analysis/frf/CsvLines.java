package org.tautline.analysis.frf;

import java.io.IOException;
import java.io.Reader;

import org.tautline.analysis.AnalysisException;

/**
 * Reads a CSV text a line at a time, counting lines, without holding more than one line.
 *
 * <p>Lines end with {@code \n} or {@code \r\n} (RFC 4180 uses CRLF; we accept both, from memory of
 * RFC 4180, "Common Format and MIME Type for CSV Files", 2005); a UTF-8 byte-order mark before the
 * first line is dropped. Blank lines are allowed only at the end of the text. A line holding the
 * replacement character U+FFFD (what a UTF-8 decoder puts for bytes that are not UTF-8) is rejected,
 * as is a line longer than {@link #MAX_LINE_CHARS}.
 */
final class CsvLines {
    /** The longest line accepted, characters. */
    static final int MAX_LINE_CHARS = 1 << 20;

    private final Reader in;
    private final String name;
    private final char[] chars = new char[1 << 14];
    private final StringBuilder line = new StringBuilder(256);
    private int pos;
    private int end;
    private boolean eof;
    private boolean started;
    private long lineNumber;

    CsvLines(Reader in, String name) {
        this.in = in;
        this.name = name;
    }

    /** @return the display name of the text, for messages */
    String name() {
        return name;
    }

    /** @return the number of the line last returned (0 before the first) */
    long lineNumber() {
        return lineNumber;
    }

    /** @return a message prefix naming the line last returned: {@code rec.csv, line 7: } */
    String at() {
        return name + ", line " + lineNumber + ": ";
    }

    /** @return a message prefix naming the end of the text: {@code rec.csv, line 9 (end of file): } */
    String atEnd() {
        return name + ", line " + (lineNumber + 1) + " (end of file): ";
    }

    /**
     * The next line that is not blank.
     *
     * @return the line without its terminator, or null at the end of the text (after blank lines only)
     * @throws AnalysisException if blank lines come before more text
     */
    String nextContentLine() throws IOException {
        long firstBlank = -1;
        while (true) {
            String text = nextLine();
            if (text == null) {
                return null;
            }
            if (!CsvCells.isBlank(text)) {
                if (firstBlank >= 0) {
                    throw new AnalysisException(name + ", line " + firstBlank
                            + ": line is blank; blank lines are allowed only at the end of the file");
                }
                return text;
            }
            if (firstBlank < 0) {
                firstBlank = lineNumber;
            }
        }
    }

    private String nextLine() throws IOException {
        line.setLength(0);
        boolean any = false;
        while (true) {
            if (pos == end && !fill()) {
                if (!any) {
                    return null;
                }
                break;
            }
            any = true;
            int i = pos;
            while (i < end && chars[i] != '\n') {
                i++;
            }
            if (line.length() + (i - pos) > MAX_LINE_CHARS) {
                throw new AnalysisException(name + ", line " + (lineNumber + 1) + ": line is longer than " + MAX_LINE_CHARS
                        + " characters; expected lines of CSV text");
            }
            line.append(chars, pos, i - pos);
            if (i < end) {
                pos = i + 1;
                break;
            }
            pos = end;
        }
        lineNumber++;
        int length = line.length();
        if (length > 0 && line.charAt(length - 1) == '\r') {
            line.setLength(length - 1);
        }
        if (!started) {
            started = true;
            if (line.length() > 0 && line.charAt(0) == '\uFEFF') {
                line.deleteCharAt(0);
            }
        }
        String text = line.toString();
        if (text.indexOf('\uFFFD') >= 0) {
            throw new AnalysisException(at() + "line holds bytes that are not UTF-8 text (decoded as U+FFFD);"
                    + " expected UTF-8 text");
        }
        return text;
    }

    private boolean fill() throws IOException {
        if (eof) {
            return false;
        }
        int n = in.read(chars, 0, chars.length);
        while (n == 0) {
            n = in.read(chars, 0, chars.length);
        }
        if (n < 0) {
            eof = true;
            return false;
        }
        pos = 0;
        end = n;
        return true;
    }
}
