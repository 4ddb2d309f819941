package org.tautline.analysis.frf;

import java.util.Locale;

import org.tautline.analysis.AnalysisException;

/**
 * Splits CSV lines into cells and reads numbers from them, strictly.
 *
 * <p>Cells are separated by commas and never quoted (our files hold numbers and plain names only,
 * so the quoting of RFC 4180 is not needed and a double quote is rejected where a name is read);
 * spaces and tabs around a cell are dropped. A number is a plain decimal such as {@code -1.25e-3}:
 * hexadecimal forms, type suffixes ({@code 1d}, {@code 2f}), NaN and infinity are refused.
 */
final class CsvCells {
    private static final int MAX_QUOTED_CHARS = 40;

    private CsvCells() {
    }

    /** @return true when the line holds nothing but spaces and tabs */
    static boolean isBlank(String line) {
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (c != ' ' && c != '\t') {
                return false;
            }
        }
        return true;
    }

    /** @return the cells of the line, each without surrounding spaces and tabs */
    static String[] split(String line) {
        int count = 1;
        for (int i = 0; i < line.length(); i++) {
            if (line.charAt(i) == ',') {
                count++;
            }
        }
        String[] cells = new String[count];
        int start = 0;
        for (int c = 0; c < count; c++) {
            int comma = line.indexOf(',', start);
            int stop = comma < 0 ? line.length() : comma;
            cells[c] = trim(line, start, stop);
            start = stop + 1;
        }
        return cells;
    }

    /**
     * Splits a data line and checks its cell count.
     *
     * @param line the line
     * @param width the cells expected
     * @param expected what was expected, for the message: {@code expected 3 (frequency_hz,real,imag)}
     * @param lines the line source, for the message prefix
     * @return the cells
     * @throws AnalysisException for a metadata line after the header or a wrong cell count
     */
    static String[] splitRow(String line, int width, String expected, CsvLines lines) {
        if (line.strip().startsWith("#")) {
            throw new AnalysisException(lines.at() + "metadata line " + quoted(line.strip())
                    + " comes after the header; expected metadata lines only before the header");
        }
        String[] cells = split(line);
        if (cells.length != width) {
            throw new AnalysisException(lines.at() + "found " + cells.length + (cells.length == 1 ? " cell, " : " cells, ")
                    + expected);
        }
        return cells;
    }

    private static String trim(String line, int start, int stop) {
        int a = start;
        int b = stop;
        while (a < b && (line.charAt(a) == ' ' || line.charAt(a) == '\t')) {
            a++;
        }
        while (b > a && (line.charAt(b - 1) == ' ' || line.charAt(b - 1) == '\t')) {
            b--;
        }
        return line.substring(a, b);
    }

    /**
     * Reads a finite decimal number from a cell.
     *
     * @param cell the trimmed cell
     * @param column the column's name, for the message
     * @param lines the line source, for the message prefix
     * @return the number
     * @throws AnalysisException quoting the cell and naming the column
     */
    static double number(String cell, String column, CsvLines lines) {
        if (isDecimal(cell)) {
            double value = Double.parseDouble(cell);
            if (Double.isFinite(value)) {
                return value;
            }
        }
        throw new AnalysisException(lines.at() + "column " + quoted(column) + " holds " + quoted(cell) + ", "
                + expectation(cell));
    }

    /**
     * What a cell that is not a finite decimal number should have been.
     *
     * @param cell the trimmed cell, not a finite decimal
     * @return {@code expected a number}, or {@code expected a finite number (not NaN or infinity)}
     */
    static String expectation(String cell) {
        return isNanOrInfinity(cell) || isDecimal(cell) ? "expected a finite number (not NaN or infinity)"
                : "expected a number";
    }

    /** @return the cell as a double if it is a finite decimal, NaN otherwise */
    static double finiteOrNaN(String cell) {
        if (!isDecimal(cell)) {
            return Double.NaN;
        }
        double value = Double.parseDouble(cell);
        return Double.isFinite(value) ? value : Double.NaN;
    }

    /**
     * Quotes text for a message.
     *
     * @param text the text
     * @return the text in single quotes, cut to a readable length, with control and line-separator
     *         characters shown as \\uhhhh (four hex digits)
     */
    static String quoted(String text) {
        StringBuilder out = new StringBuilder(Math.min(text.length(), MAX_QUOTED_CHARS) + 8).append('\'');
        int shown = Math.min(text.length(), MAX_QUOTED_CHARS);
        for (int i = 0; i < shown; i++) {
            char c = text.charAt(i);
            if (isControl(c)) {
                out.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
            } else {
                out.append(c);
            }
        }
        if (shown < text.length()) {
            out.append("...");
        }
        return out.append('\'').toString();
    }

    /** @return true when the text holds a control or line-separator character */
    static boolean hasControl(String text) {
        for (int i = 0; i < text.length(); i++) {
            if (isControl(text.charAt(i))) {
                return true;
            }
        }
        return false;
    }

    private static boolean isControl(char c) {
        return Character.isISOControl(c) || c == '\u2028' || c == '\u2029';
    }

    private static boolean isNanOrInfinity(String cell) {
        String word = cell.toLowerCase(Locale.ROOT);
        if (word.startsWith("+") || word.startsWith("-")) {
            word = word.substring(1);
        }
        return word.equals("nan") || word.equals("inf") || word.equals("infinity");
    }

    /** @return true for {@code [+-]? (digits [. digits?] | . digits) ([eE] [+-]? digits)?} */
    static boolean isDecimal(String cell) {
        int n = cell.length();
        int i = 0;
        if (i < n && (cell.charAt(i) == '+' || cell.charAt(i) == '-')) {
            i++;
        }
        int digits = 0;
        while (i < n && isDigit(cell.charAt(i))) {
            i++;
            digits++;
        }
        if (i < n && cell.charAt(i) == '.') {
            i++;
            while (i < n && isDigit(cell.charAt(i))) {
                i++;
                digits++;
            }
        }
        if (digits == 0) {
            return false;
        }
        if (i < n && (cell.charAt(i) == 'e' || cell.charAt(i) == 'E')) {
            i++;
            if (i < n && (cell.charAt(i) == '+' || cell.charAt(i) == '-')) {
                i++;
            }
            int exponentDigits = 0;
            while (i < n && isDigit(cell.charAt(i))) {
                i++;
                exponentDigits++;
            }
            if (exponentDigits == 0) {
                return false;
            }
        }
        return i == n;
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }
}
