package org.tautline.analysis.frf;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.AnalysisException;

class FrfCsvWriterTest {
    @TempDir
    Path dir;

    @Test
    void roundTripsEveryBitAndTheMetadata() throws IOException {
        Random random = new Random(20240611L);
        int n = 50;
        double[] f = new double[n];
        double[] re = new double[n];
        double[] im = new double[n];
        double[] coh = new double[n];
        double[] q = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = 100 * Math.pow(1.002, i) + random.nextDouble() * 1e-3;
            re[i] = random.nextGaussian() * 1e-5;
            im[i] = random.nextGaussian() * 1e-7;
            coh[i] = random.nextDouble();
            q[i] = random.nextDouble() * 1e-3;
        }
        Frf frf = Frf.of(f, re, im, FrfQuantity.MOBILITY).withCoherence(coh).withQuality(q);
        Map<String, String> metadata = new LinkedHashMap<>();
        metadata.put("specimen", "wire 17");
        metadata.put("sensor", "x = 0.25 m");
        Path file = dir.resolve("frf.csv");
        Files.writeString(file, "old contents");
        FrfCsvWriter.write(frf, metadata, file);

        String text = Files.readString(file, StandardCharsets.UTF_8);
        assertFalse(text.contains("\r"), "lines end with \\n only");
        List<String> lines = List.of(text.split("\n", -1));
        assertEquals("", lines.get(lines.size() - 1), "file ends with a line break");
        assertEquals(List.of("# quantity: mobility", "# units: m/(N s)", "# specimen: wire 17",
                "# sensor: x = 0.25 m", "frequency_hz,real,imag,coherence,quality"), lines.subList(0, 5));
        // Parse back with Double.parseDouble: Double.toString round-trips exactly (Java SE API specification).
        List<double[]> columns = new ArrayList<>();
        for (int c = 0; c < 5; c++) {
            columns.add(new double[n]);
        }
        for (int i = 0; i < n; i++) {
            String[] cells = lines.get(5 + i).split(",");
            assertEquals(5, cells.length, "cells on data line " + i);
            for (int c = 0; c < 5; c++) {
                columns.get(c)[i] = Double.parseDouble(cells[c]);
            }
        }
        assertEquals(5 + n + 1, lines.size(), "metadata, header, one line per frequency line, final break");
        assertArrayEquals(f, columns.get(0), 0.0, "frequency round trip");
        assertArrayEquals(re, columns.get(1), 0.0, "real round trip");
        assertArrayEquals(im, columns.get(2), 0.0, "imag round trip");
        assertArrayEquals(coh, columns.get(3), 0.0, "coherence round trip");
        assertArrayEquals(q, columns.get(4), 0.0, "quality round trip");
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(file), files.toList(), "no temporary file left behind");
        }
    }

    @Test
    void leavesOutAbsentColumns() {
        Frf frf = Frf.of(new double[] {10, 20}, new double[] {1e-6, -2.5e-7}, new double[] {0, 3}, FrfQuantity.RECEPTANCE);
        assertEquals("# quantity: receptance\n# units: m/N\nfrequency_hz,real,imag\n10.0,1.0E-6,0.0\n20.0,-2.5E-7,3.0\n",
                FrfCsvWriter.format(frf, Map.of()));
    }

    @Test
    void writesVarianceAfterQualityAndOnlyTheColumnsPresent() {
        Frf frf = Frf.of(new double[] {10, 20}, new double[] {1e-6, -2.5e-7}, new double[] {0, 3}, FrfQuantity.ACCELERANCE)
                .withVariance(new double[] {4e-14, 0.0});
        assertEquals("# quantity: accelerance\n# units: m/(N s^2)\nfrequency_hz,real,imag,variance\n"
                + "10.0,1.0E-6,0.0,4.0E-14\n20.0,-2.5E-7,3.0,0.0\n", FrfCsvWriter.format(frf, Map.of()));
        Frf all = frf.withQuality(new double[] {0.5, 0.25}).withCoherence(new double[] {1.0, 0.75});
        assertEquals("# quantity: accelerance\n# units: m/(N s^2)\nfrequency_hz,real,imag,coherence,quality,variance\n"
                + "10.0,1.0E-6,0.0,1.0,0.5,4.0E-14\n20.0,-2.5E-7,3.0,0.75,0.25,0.0\n", FrfCsvWriter.format(all, Map.of()));
    }

    @Test
    void rejectsMetadataThatWouldBreakTheLayout() {
        Frf frf = Frf.of(new double[] {10}, new double[] {1}, new double[] {0}, FrfQuantity.RECEPTANCE);
        assertEquals("FRF CSV metadata key 'units' is reserved: the writer sets it from the FRF itself",
                assertThrows(AnalysisException.class, () -> FrfCsvWriter.format(frf, Map.of("units", "mm"))).getMessage());
        assertEquals("FRF CSV metadata key 'a:b' must not contain ':' or a line break",
                assertThrows(AnalysisException.class, () -> FrfCsvWriter.format(frf, Map.of("a:b", "c"))).getMessage());
        assertEquals("FRF CSV metadata value for 'note' must be one line of text, got a line break",
                assertThrows(AnalysisException.class, () -> FrfCsvWriter.format(frf, Map.of("note", "a\nb"))).getMessage());
    }
}
