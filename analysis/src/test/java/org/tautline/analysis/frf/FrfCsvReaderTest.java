package org.tautline.analysis.frf;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.AnalysisException;

class FrfCsvReaderTest {
    private static final String HEAD = "# quantity: receptance\n# units: m/N\n";

    @TempDir
    Path dir;

    static FrfCsvReader.Contents read(String text) throws IOException {
        return FrfCsvReader.read(new StringReader(text), "frf.csv");
    }

    static String error(String text) {
        return assertThrows(AnalysisException.class, () -> read(text)).getMessage();
    }

    private static Frf randomFrf(Random random, int n, FrfQuantity quantity, boolean coherence, boolean quality,
                                 boolean variance) {
        double[] f = new double[n];
        double[] re = new double[n];
        double[] im = new double[n];
        double[] coh = new double[n];
        double[] q = new double[n];
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = 20 * Math.pow(1.01, i) + random.nextDouble() * 1e-4;
            re[i] = random.nextGaussian() * 1e-5;
            im[i] = random.nextGaussian() * 1e-7;
            coh[i] = random.nextDouble();
            q[i] = random.nextDouble() * 1e-3;
            v[i] = random.nextDouble() * 1e-14;
        }
        Frf frf = Frf.of(f, re, im, quantity);
        frf = coherence ? frf.withCoherence(coh) : frf;
        frf = quality ? frf.withQuality(q) : frf;
        return variance ? frf.withVariance(v) : frf;
    }

    @Test
    void roundTripsEveryColumnCombinationExactlyThroughTheWriter() throws IOException {
        Random random = new Random(7321L);
        FrfQuantity[] quantities = FrfQuantity.values();
        for (int mask = 0; mask < 8; mask++) {
            Frf frf = randomFrf(random, 40, quantities[mask % 3], (mask & 1) != 0, (mask & 2) != 0, (mask & 4) != 0);
            Map<String, String> metadata = new LinkedHashMap<>();
            metadata.put("specimen", "wire " + mask);
            metadata.put("drive", "0.5 V");
            Path file = dir.resolve("frf" + mask + ".csv");
            FrfCsvWriter.write(frf, metadata, file);
            FrfCsvReader.Contents contents = FrfCsvReader.read(file);
            // Frf.equals compares every array bit for bit, including absent optional columns.
            assertEquals(frf, contents.frf(), "columns mask " + mask);
            assertEquals(List.copyOf(metadata.entrySet()), List.copyOf(contents.metadata().entrySet()),
                    "metadata in file order, without quantity and units");
        }
    }

    @Test
    void readsOptionalColumnsInAnyOrderWithCrLfBomWhitespaceAndTrailingBlankLines() throws IOException {
        String text = "\uFEFF# quantity: mobility\r\n#units:m/(N s)\r\n# note : a: b\r\n"
                + " frequency_hz , real,imag,variance,coherence\t\r\n"
                + "10, 1.5e-3 ,-2,0.25,1\r\n"
                + "20.5,+.5,3E2,0,0.0\r\n\r\n  \r\n";
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        FrfCsvReader.Contents contents = FrfCsvReader.read(new ByteArrayInputStream(bytes), "frf.csv");
        Frf frf = contents.frf();
        assertEquals(FrfQuantity.MOBILITY, frf.quantity());
        assertArrayEquals(new double[] {10, 20.5}, frf.frequenciesHz(), 0);
        assertArrayEquals(new double[] {1.5e-3, 0.5}, frf.realParts(), 0);
        assertArrayEquals(new double[] {-2, 300}, frf.imaginaryParts(), 0);
        assertArrayEquals(new double[] {0.25, 0}, frf.variance().orElseThrow(), 0);
        assertArrayEquals(new double[] {1, 0}, frf.coherence().orElseThrow(), 0);
        assertFalse(frf.quality().isPresent(), "no quality column");
        assertEquals(Map.of("note", "a: b"), contents.metadata(), "the value runs from the first ':' to the end");
    }

    @Test
    void acceptsAFileWithoutUnitsOrFinalLineBreak() throws IOException {
        Frf frf = read("# quantity: accelerance\nfrequency_hz,real,imag\n5,1,2").frf();
        assertEquals(FrfQuantity.ACCELERANCE, frf.quantity());
        assertEquals(1, frf.size());
    }

    @Test
    void rejectsAnEmptyFileOrOneWithoutAHeader() {
        String expected = "expected the header frequency_hz,real,imag[,coherence][,quality][,variance]";
        assertEquals("frf.csv, line 1: file is empty; " + expected, error(""));
        assertEquals("frf.csv, line 1: file is empty; " + expected, error("\n \n"));
        assertEquals("frf.csv, line 3 (end of file): file ends before the header; " + expected, error(HEAD));
        assertEquals("frf.csv, line 3: header '10,1,2' does not start with frequency_hz,real,imag; " + expected,
                error(HEAD + "10,1,2\n"));
        assertEquals("frf.csv, line 4 (end of file): no frequency lines after the header; expected at least one",
                error(HEAD + "frequency_hz,real,imag\n"));
    }

    @Test
    void rejectsUnknownOrRepeatedColumns() {
        assertEquals("frf.csv, line 3: column 'phase' is unknown; expected coherence, quality or variance after"
                + " frequency_hz,real,imag", error(HEAD + "frequency_hz,real,imag,phase\n1,2,3,4\n"));
        assertEquals("frf.csv, line 3: column 'quality' appears twice in the header; expected each column once",
                error(HEAD + "frequency_hz,real,imag,quality,coherence,quality\n1,2,3,4,0,6\n"));
    }

    @Test
    void rejectsAWrongCellCountNamingLineFoundAndExpected() {
        assertEquals("frf.csv, line 5: found 3 cells, expected 4 (frequency_hz,real,imag,coherence)",
                error(HEAD + "frequency_hz,real,imag,coherence\n1,2,3,0.5\n2,3,4\n"));
        assertEquals("frf.csv, line 4: found 5 cells, expected 3 (frequency_hz,real,imag)",
                error(HEAD + "frequency_hz,real,imag\n1,2,3,,\n"));
        assertEquals("frf.csv, line 4: found 1 cell, expected 3 (frequency_hz,real,imag)",
                error(HEAD + "frequency_hz,real,imag\n1\n"));
    }

    @Test
    void rejectsCellsThatAreNotFiniteDecimalNumbers() {
        String header = HEAD + "frequency_hz,real,imag\n";
        assertEquals("frf.csv, line 4: column 'real' holds 'abc', expected a number", error(header + "1,abc,3\n"));
        assertEquals("frf.csv, line 4: column 'imag' holds '', expected a number", error(header + "1,2,\n"));
        assertEquals("frf.csv, line 4: column 'imag' holds '0x1p3', expected a number", error(header + "1,2,0x1p3\n"));
        assertEquals("frf.csv, line 4: column 'frequency_hz' holds '1d', expected a number", error(header + "1d,2,3\n"));
        assertEquals("frf.csv, line 4: column 'real' holds 'NaN', expected a finite number (not NaN or infinity)",
                error(header + "1,NaN,3\n"));
        assertEquals("frf.csv, line 4: column 'imag' holds '-Infinity', expected a finite number (not NaN or infinity)",
                error(header + "1,2,-Infinity\n"));
        assertEquals("frf.csv, line 4: column 'imag' holds '1e999', expected a finite number (not NaN or infinity)",
                error(header + "1,2,1e999\n"));
    }

    @Test
    void rejectsFrequenciesThatAreNotPositiveOrDoNotIncrease() {
        String header = HEAD + "frequency_hz,real,imag\n";
        assertEquals("frf.csv, line 6: frequency 120.5 Hz does not increase on the line before (120.5 Hz);"
                + " frequency lines must increase strictly", error(header + "100,0,0\n120.5,1,1\n120.5,1,1\n"));
        assertEquals("frf.csv, line 5: frequency 99.0 Hz does not increase on the line before (100.0 Hz);"
                + " frequency lines must increase strictly", error(header + "100,0,0\n99,1,1\n"));
        assertEquals("frf.csv, line 4: frequency 0.0 Hz is not positive; expected a frequency above 0 Hz",
                error(header + "0,0,0\n"));
        assertEquals("frf.csv, line 4: frequency -5.0 Hz is not positive; expected a frequency above 0 Hz",
                error(header + "-5,0,0\n"));
    }

    @Test
    void rejectsAMissingUnknownOrMismatchedQuantity() {
        assertEquals("frf.csv, line 2: no quantity given before the header; expected a line '# quantity: receptance',"
                + " '# quantity: mobility' or '# quantity: accelerance'", error("# units: m/N\nfrequency_hz,real,imag\n1,2,3\n"));
        assertEquals("frf.csv, line 1: quantity 'compliance' is unknown; expected receptance, mobility or accelerance",
                error("# quantity: compliance\nfrequency_hz,real,imag\n1,2,3\n"));
        assertEquals("frf.csv, line 1: units 'mm/N' do not match the quantity receptance; expected 'm/N'",
                error("# units: mm/N\n# quantity: receptance\nfrequency_hz,real,imag\n1,2,3\n"));
        assertEquals("frf.csv, line 2: units 'm/N' do not match the quantity mobility; expected 'm/(N s)'",
                error("# quantity: mobility\n# units: m/N\nfrequency_hz,real,imag\n1,2,3\n"));
    }

    @Test
    void rejectsCoherenceOutsideTheUnitIntervalAndNegativeQualityOrVariance() {
        assertEquals("frf.csv, line 5: coherence 1.0000001 lies outside 0..1; expected a coherence from 0 to 1",
                error(HEAD + "frequency_hz,real,imag,coherence\n1,2,3,1\n2,2,3,1.0000001\n"));
        assertEquals("frf.csv, line 4: coherence -0.5 lies outside 0..1; expected a coherence from 0 to 1",
                error(HEAD + "frequency_hz,real,imag,coherence\n1,2,3,-0.5\n"));
        assertEquals("frf.csv, line 4: variance -1.0E-12 is negative; expected zero or more",
                error(HEAD + "frequency_hz,real,imag,variance\n1,2,3,-1e-12\n"));
        assertEquals("frf.csv, line 4: quality -0.25 is negative; expected zero or more",
                error(HEAD + "frequency_hz,real,imag,variance,quality\n1,2,3,0,-0.25\n"));
    }

    @Test
    void rejectsMalformedMetadataBlankLinesInsideAndBytesThatAreNotUtf8() throws IOException {
        assertEquals("frf.csv, line 2: metadata line '# hello' is not of the form '# key: value'; expected"
                + " '# key: value' lines before the header", error("# quantity: receptance\n# hello\n"));
        assertEquals("frf.csv, line 3: metadata key 'quantity' appears again (first on line 1); expected each key once",
                error(HEAD + "# quantity: mobility\n"));
        assertEquals("frf.csv, line 4: line is blank; blank lines are allowed only at the end of the file",
                error(HEAD + "frequency_hz,real,imag\n\n1,2,3\n"));
        assertEquals("frf.csv, line 5: metadata line '# late: comment' comes after the header; expected metadata lines"
                + " only before the header",
                error(HEAD + "frequency_hz,real,imag\n1,2,3\n# late: comment\n"));
        byte[] bytes = (HEAD + "frequency_hz,real,imag\n1,2,3\n2,\u00ff,3\n").getBytes(StandardCharsets.ISO_8859_1);
        assertEquals("frf.csv, line 5: line holds bytes that are not UTF-8 text (decoded as U+FFFD); expected UTF-8 text",
                assertThrows(AnalysisException.class,
                        () -> FrfCsvReader.read(new ByteArrayInputStream(bytes), "frf.csv")).getMessage());
    }

    @Test
    void quotesLongOrControlCellsReadably() {
        String cell = "x".repeat(50);
        assertEquals("frf.csv, line 4: column 'real' holds '" + "x".repeat(40) + "...', expected a number",
                error(HEAD + "frequency_hz,real,imag\n1," + cell + ",3\n"));
        assertEquals("frf.csv, line 4: column 'real' holds '1\\u00002', expected a number",
                error(HEAD + "frequency_hz,real,imag\n1,1\u00002,3\n"));
    }
}
