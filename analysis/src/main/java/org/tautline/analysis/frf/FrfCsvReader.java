package org.tautline.analysis.frf;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.tautline.analysis.AnalysisException;

/**
 * Reads an FRF from the CSV text that {@link FrfCsvWriter} writes, strictly.
 *
 * <p>Layout: metadata lines {@code # key: value} (at least {@code # quantity: receptance},
 * {@code mobility} or {@code accelerance}; {@code # units: ...} may follow and must then be the
 * quantity's SI units), then the header {@code frequency_hz,real,imag} followed by any of
 * {@code coherence}, {@code quality} and {@code variance} in any order, then one line per frequency
 * line with strictly increasing positive frequencies. Lines end with {@code \n} or {@code \r\n}; a
 * UTF-8 byte-order mark and blank lines at the end are accepted; spaces and tabs around cells are
 * dropped. Anything else is an {@link AnalysisException} whose message starts with the file's
 * display name and the line, for example
 * {@code frf.csv, line 7: column 'real' holds 'abc', expected a number}.
 */
public final class FrfCsvReader {
    private static final String REQUIRED = "frequency_hz,real,imag";
    private static final String EXPECTED_HEADER = "the header " + REQUIRED + "[,coherence][,quality][,variance]";
    private static final List<String> OPTIONAL = List.of("coherence", "quality", "variance");

    private FrfCsvReader() {
    }

    /**
     * An FRF read from a file together with the file's other metadata.
     *
     * @param frf the FRF
     * @param metadata the {@code # key: value} pairs in file order, except {@code quantity} and
     *                 {@code units} (which the FRF itself carries); unmodifiable
     */
    public record Contents(Frf frf, Map<String, String> metadata) {
        /**
         * Checks and copies the parts.
         *
         * @param frf the FRF
         * @param metadata the metadata, copied in iteration order
         */
        public Contents {
            if (frf == null || metadata == null) {
                throw new AnalysisException("FRF file contents need an FRF and a metadata map, got "
                        + (frf == null ? "no FRF" : "no metadata map"));
            }
            metadata = Collections.unmodifiableMap(new LinkedHashMap<>(metadata));
        }
    }

    /**
     * Reads an FRF CSV file, using its file name in messages.
     *
     * @param file the file, UTF-8 text
     * @return the FRF and its metadata
     * @throws IOException if the file cannot be read
     * @throws AnalysisException if the content is malformed
     */
    public static Contents read(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            return read(in, displayName(file));
        }
    }

    /** @return the file name of a path (the whole path when it has none), for messages */
    static String displayName(Path file) {
        Path name = file.getFileName();
        return name == null ? file.toString() : name.toString();
    }

    /**
     * Reads FRF CSV text from a byte stream decoded as UTF-8; the stream is not closed.
     *
     * <p>Bytes that are not UTF-8 are decoded as U+FFFD and then reported with their line.
     *
     * @param in the bytes
     * @param displayName how messages name the source, for example {@code frf.csv}
     * @return the FRF and its metadata
     * @throws IOException if the stream cannot be read
     * @throws AnalysisException if the content is malformed
     */
    public static Contents read(InputStream in, String displayName) throws IOException {
        return read(new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8)), displayName);
    }

    /**
     * Reads FRF CSV text from characters; the reader is not closed.
     *
     * @param in the text
     * @param displayName how messages name the source, for example {@code frf.csv}
     * @return the FRF and its metadata
     * @throws IOException if the reader fails
     * @throws AnalysisException if the content is malformed
     */
    public static Contents read(Reader in, String displayName) throws IOException {
        CsvLines lines = new CsvLines(in, displayName);
        CsvPreamble preamble = CsvPreamble.read(lines, EXPECTED_HEADER);
        FrfQuantity quantity = quantity(preamble, lines);
        List<String> columns = columns(preamble.header(), lines);
        int width = columns.size();
        String expectedCells = "expected " + width + " (" + String.join(",", columns) + ")";
        List<CsvDoubles> values = new ArrayList<>(width);
        for (int c = 0; c < width; c++) {
            values.add(new CsvDoubles());
        }
        CsvDoubles frequency = values.get(0);
        String line;
        while ((line = lines.nextContentLine()) != null) {
            String[] cells = CsvCells.splitRow(line, width, expectedCells, lines);
            double[] row = new double[width];
            for (int c = 0; c < width; c++) {
                row[c] = CsvCells.number(cells[c], columns.get(c), lines);
            }
            checkFrequency(row[0], frequency, lines);
            for (int c = 3; c < width; c++) {
                checkExtra(columns.get(c), row[c], lines);
            }
            for (int c = 0; c < width; c++) {
                values.get(c).add(row[c]);
            }
        }
        if (frequency.size() == 0) {
            throw new AnalysisException(lines.atEnd() + "no frequency lines after the header; expected at least one");
        }
        Frf frf = Frf.of(frequency.toArray(), values.get(1).toArray(), values.get(2).toArray(), quantity);
        for (int c = 3; c < width; c++) {
            double[] column = values.get(c).toArray();
            switch (columns.get(c)) {
                case "coherence":
                    frf = frf.withCoherence(column);
                    break;
                case "quality":
                    frf = frf.withQuality(column);
                    break;
                default:
                    frf = frf.withVariance(column);
                    break;
            }
        }
        Map<String, String> metadata = new LinkedHashMap<>(preamble.values());
        metadata.remove("quantity");
        metadata.remove("units");
        return new Contents(frf, metadata);
    }

    private static FrfQuantity quantity(CsvPreamble preamble, CsvLines lines) {
        String name = preamble.values().get("quantity");
        if (name == null) {
            throw new AnalysisException(lines.at() + "no quantity given before the header; expected a line"
                    + " '# quantity: receptance', '# quantity: mobility' or '# quantity: accelerance'");
        }
        FrfQuantity quantity = null;
        for (FrfQuantity candidate : FrfQuantity.values()) {
            if (candidate.name().toLowerCase(Locale.ROOT).equals(name)) {
                quantity = candidate;
            }
        }
        if (quantity == null) {
            throw new AnalysisException(lines.name() + ", line " + preamble.lineOf("quantity") + ": quantity "
                    + CsvCells.quoted(name) + " is unknown; expected receptance, mobility or accelerance");
        }
        String units = preamble.values().get("units");
        if (units != null && !units.equals(quantity.siUnits())) {
            throw new AnalysisException(lines.name() + ", line " + preamble.lineOf("units") + ": units "
                    + CsvCells.quoted(units) + " do not match the quantity " + name + "; expected '"
                    + quantity.siUnits() + "'");
        }
        return quantity;
    }

    private static List<String> columns(String header, CsvLines lines) {
        String[] cells = CsvCells.split(header);
        if (cells.length < 3 || !cells[0].equals("frequency_hz") || !cells[1].equals("real") || !cells[2].equals("imag")) {
            throw new AnalysisException(lines.at() + "header " + CsvCells.quoted(header) + " does not start with "
                    + REQUIRED + "; expected " + EXPECTED_HEADER);
        }
        List<String> columns = new ArrayList<>(List.of(cells));
        for (int c = 3; c < cells.length; c++) {
            if (!OPTIONAL.contains(cells[c])) {
                throw new AnalysisException(lines.at() + "column " + CsvCells.quoted(cells[c])
                        + " is unknown; expected coherence, quality or variance after " + REQUIRED);
            }
            if (columns.subList(3, c).contains(cells[c])) {
                throw new AnalysisException(lines.at() + "column '" + cells[c]
                        + "' appears twice in the header; expected each column once");
            }
        }
        return List.copyOf(columns);
    }

    private static void checkFrequency(double hz, CsvDoubles before, CsvLines lines) {
        if (!(hz > 0)) {
            throw new AnalysisException(lines.at() + "frequency " + hz + " Hz is not positive; expected a frequency above 0 Hz");
        }
        if (before.size() > 0 && !(hz > before.last())) {
            throw new AnalysisException(lines.at() + "frequency " + hz + " Hz does not increase on the line before ("
                    + before.last() + " Hz); frequency lines must increase strictly");
        }
    }

    private static void checkExtra(String column, double value, CsvLines lines) {
        if (column.equals("coherence")) {
            if (!(value >= 0 && value <= 1)) {
                throw new AnalysisException(lines.at() + "coherence " + value
                        + " lies outside 0..1; expected a coherence from 0 to 1");
            }
        } else if (!(value >= 0)) {
            throw new AnalysisException(lines.at() + column + " " + value + " is negative; expected zero or more");
        }
    }
}
