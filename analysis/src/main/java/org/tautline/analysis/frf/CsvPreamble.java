package org.tautline.analysis.frf;

import java.io.IOException;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tautline.analysis.AnalysisException;

/**
 * The metadata lines ({@code # key: value}) at the top of one of our CSV files and the header line
 * after them.
 */
final class CsvPreamble {
    private final Map<String, String> values;
    private final Map<String, Long> lineOf;
    private final String header;

    private CsvPreamble(Map<String, String> values, Map<String, Long> lineOf, String header) {
        this.values = values;
        this.lineOf = lineOf;
        this.header = header;
    }

    /**
     * Reads metadata lines up to and including the header.
     *
     * @param lines the line source, at the start of the text
     * @param expectedHeader what the header should look like, for messages
     * @return the metadata and the header
     * @throws AnalysisException for an empty file, a malformed or repeated key, or no header
     */
    static CsvPreamble read(CsvLines lines, String expectedHeader) throws IOException {
        Map<String, String> values = new LinkedHashMap<>();
        Map<String, Long> lineOf = new LinkedHashMap<>();
        while (true) {
            String line = lines.nextContentLine();
            if (line == null) {
                if (lineOf.isEmpty()) {
                    throw new AnalysisException(lines.name() + ", line 1: file is empty; expected " + expectedHeader);
                }
                throw new AnalysisException(lines.atEnd() + "file ends before the header; expected " + expectedHeader);
            }
            String text = line.strip();
            if (!text.startsWith("#")) {
                return new CsvPreamble(Collections.unmodifiableMap(values), Collections.unmodifiableMap(lineOf), line);
            }
            int colon = text.indexOf(':');
            String key = colon < 0 ? "" : text.substring(1, colon).strip();
            if (key.isEmpty()) {
                throw new AnalysisException(lines.at() + "metadata line " + CsvCells.quoted(text)
                        + " is not of the form '# key: value'; expected '# key: value' lines before the header");
            }
            Long first = lineOf.get(key);
            if (first != null) {
                throw new AnalysisException(lines.at() + "metadata key " + CsvCells.quoted(key)
                        + " appears again (first on line " + first + "); expected each key once");
            }
            values.put(key, text.substring(colon + 1).strip());
            lineOf.put(key, lines.lineNumber());
        }
    }

    /** @return the metadata in file order (unmodifiable) */
    Map<String, String> values() {
        return values;
    }

    /** @return the line number of a key, or -1 when absent */
    long lineOf(String key) {
        Long line = lineOf.get(key);
        return line == null ? -1 : line;
    }

    /** @return the header line as read */
    String header() {
        return header;
    }
}
