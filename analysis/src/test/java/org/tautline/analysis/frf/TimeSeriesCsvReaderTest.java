package org.tautline.analysis.frf;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.AnalysisException;

class TimeSeriesCsvReaderTest {
    @TempDir
    Path dir;

    static TimeSeriesCsvReader open(String text) throws IOException {
        return TimeSeriesCsvReader.open(new StringReader(text), "rec.csv");
    }

    static String error(String text) {
        return assertThrows(AnalysisException.class, () -> {
            try (TimeSeriesCsvReader reader = open(text)) {
                Sources.readAll(reader, 7);
            }
        }).getMessage();
    }

    @Test
    void readsATimeColumnAndFindsTheSampleRateFromIt() throws IOException {
        try (TimeSeriesCsvReader reader = open("# rig: bench 2\ntime_s,force,accel\n0,1.5,-2\n0.0005,2.5,-3\n0.001,3.5,-4\n")) {
            assertEquals(2000.0, reader.sampleRateHz(), 2000.0 * 1e-12);
            assertEquals(List.of("force", "accel"), reader.channelNames());
            assertEquals(-1, reader.frameCount());
            assertEquals(Map.of("rig", "bench 2"), reader.metadata());
            assertEquals(1, reader.channelIndex("accel"));
            double[][] samples = Sources.readAll(reader, 4096);
            assertArrayEquals(new double[] {1.5, 2.5, 3.5}, samples[0], 0);
            assertArrayEquals(new double[] {-2, -3, -4}, samples[1], 0);
            assertEquals("rec.csv, line 5", reader.position());
        }
    }

    @Test
    void readsChannelsOnlyWithASampleRateLine() throws IOException {
        String text = "\uFEFF# sample_rate_hz: 20000\r\nforce , accel\r\n1,2\r\n3 ,\t4\r\n\r\n";
        Path file = dir.resolve("rec.csv");
        Files.write(file, text.getBytes(StandardCharsets.UTF_8));
        try (TimeSeriesCsvReader reader = TimeSeriesCsvReader.open(file)) {
            assertEquals(20000.0, reader.sampleRateHz());
            assertEquals(List.of("force", "accel"), reader.channelNames());
            double[][] samples = Sources.readAll(reader, 1);
            assertArrayEquals(new double[][] {{1, 3}, {2, 4}}, samples);
        }
        try (TimeSeriesCsvReader reader = open("# sample_rate_hz: 100\nforce\n")) {
            assertEquals(-1, reader.read(new double[1][5], 5), "a header without frames is an empty recording");
        }
    }

    @Test
    void streamsTheSameSamplesForAnyReadBlockSize() throws IOException {
        Random random = new Random(90210L);
        int frames = 5003;
        double rate = 25600;
        double[][] expected = new double[2][frames];
        StringBuilder text = new StringBuilder("time_s,force,response\n");
        for (int i = 0; i < frames; i++) {
            expected[0][i] = random.nextGaussian();
            expected[1][i] = random.nextGaussian() * 1e-3;
            text.append(i / rate).append(',').append(expected[0][i]).append(',').append(expected[1][i]).append('\n');
        }
        for (int block : new int[] {1, 3, 4096}) {
            try (TimeSeriesCsvReader reader = open(text.toString())) {
                assertEquals(rate, reader.sampleRateHz(), rate * 1e-9);
                double[][] got = Sources.readAll(reader, block);
                assertArrayEquals(expected[0], got[0], 0, "force, block " + block);
                assertArrayEquals(expected[1], got[1], 0, "response, block " + block);
            }
        }
    }

    @Test
    void deliversTheFramesBeforeAMalformedLineThenThrows() throws IOException {
        try (TimeSeriesCsvReader reader = open("# sample_rate_hz: 10\nforce\n1\n2\nabc\n4\n")) {
            double[][] buffer = new double[1][10];
            assertEquals(2, reader.read(buffer, 10));
            assertArrayEquals(new double[] {1, 2}, java.util.Arrays.copyOf(buffer[0], 2), 0);
            String expected = "rec.csv, line 5: column 'force' holds 'abc', expected a number";
            assertEquals(expected, assertThrows(AnalysisException.class, () -> reader.read(buffer, 10)).getMessage());
            assertEquals(expected, assertThrows(AnalysisException.class, () -> reader.read(buffer, 10)).getMessage());
        }
    }

    @Test
    void rejectsAnEmptyFileAMissingHeaderAndAMissingSampleRate() {
        String expected = "expected the header time_s,<channel>,... or a '# sample_rate_hz: ...' line and a header of"
                + " channel names";
        assertEquals("rec.csv, line 1: file is empty; " + expected, error(""));
        assertEquals("rec.csv, line 2 (end of file): file ends before the header; " + expected,
                error("# sample_rate_hz: 100\n"));
        assertEquals("rec.csv, line 1: header 'force,accel' has no time_s column and no '# sample_rate_hz: ...' line"
                + " came before it; " + expected, error("force,accel\n1,2\n"));
        assertEquals("rec.csv, line 2: channel name '0.5' is a number (is the header missing?); expected distinct"
                + " channel names in the header", error("# sample_rate_hz: 100\n0.5,1.5\n"));
        assertEquals("rec.csv, line 2: the header has a time_s column and line 1 gives '# sample_rate_hz'; expected"
                + " one of them, not both", error("# sample_rate_hz: 100\ntime_s,force\n0,1\n"));
    }

    @Test
    void rejectsBadChannelNames() {
        assertEquals("rec.csv, line 1: header 'time_s' names no channels; expected at least one channel name",
                error("time_s\n0\n1\n"));
        assertEquals("rec.csv, line 1: channel name 'force' appears twice; expected distinct channel names in the"
                + " header", error("time_s,force,force\n"));
        assertEquals("rec.csv, line 1: channel name '' is empty; expected distinct channel names in the header",
                error("time_s,force,\n"));
        assertEquals("rec.csv, line 2: channel name 'time_s' is time_s, which may only be the first column; expected"
                + " distinct channel names in the header", error("# sample_rate_hz: 5\nforce,time_s\n"));
    }

    @Test
    void rejectsSampleRatesThatAreNotPositive() {
        assertEquals("rec.csv, line 1: sample rate 0.0 Hz is not positive; expected a sample rate above 0 Hz",
                error("# sample_rate_hz: 0\nforce\n1\n"));
        assertEquals("rec.csv, line 1: sample rate -20.0 Hz is not positive; expected a sample rate above 0 Hz",
                error("# sample_rate_hz: -20\nforce\n1\n"));
        assertEquals("rec.csv, line 1: sample_rate_hz holds 'fast', expected a number",
                error("# sample_rate_hz: fast\nforce\n1\n"));
        assertEquals("rec.csv, line 1: sample_rate_hz holds 'Infinity', expected a finite number (not NaN or infinity)",
                error("# sample_rate_hz: Infinity\nforce\n1\n"));
        assertEquals("rec.csv, line 3: time 0.0 s does not increase on the line before (0.0 s), so the sample rate"
                + " would be zero or negative; expected times that increase by one sample period per line",
                error("time_s,force\n0,1\n0,2\n"));
        assertEquals("rec.csv, line 3: time -1.0 s does not increase on the line before (0.0 s), so the sample rate"
                + " would be zero or negative; expected times that increase by one sample period per line",
                error("time_s,force\n0,1\n-1,2\n"));
        assertEquals("rec.csv, line 3 (end of file): found 1 frame; expected at least two lines to find the sample"
                + " rate from the time column", error("time_s,force\n0,1\n"));
        assertEquals("rec.csv, line 3: time step 4.9E-324 s gives a sample rate of Infinity Hz; expected a finite"
                + " positive sample rate", error("time_s,force\n0,1\n4.9e-324,2\n"));
    }

    @Test
    void rejectsNonUniformTimesAtTheLineWhereTheyDepart() {
        // Steps of 1/1024 s are exact in binary, so the message shows them without rounding.
        assertEquals("rec.csv, line 5: time step 0.0029296875 s differs from the first step 9.765625E-4 s by more"
                + " than a relative 1e-6; expected uniformly sampled times",
                error("time_s,force\n0,1\n0.0009765625,2\n0.001953125,3\n0.0048828125,4\n"));
        assertThrows(AnalysisException.class, () -> Sources.readAll(open("time_s,force\n0,1\n0.001,2\n0.0020000015,3\n"), 4),
                "a relative 1.5e-6 departure is refused");
        try (TimeSeriesCsvReader reader = open("time_s,force\n0,1\n0.001,2\n0.0020000009,3\n")) {
            assertEquals(3, Sources.readAll(reader, 4)[0].length, "a relative 0.9e-6 departure is accepted");
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }

    @Test
    void rejectsWrongCellCountsAndNonFiniteValues() {
        assertEquals("rec.csv, line 4: found 2 cells, expected 3 (time_s,force,accel)",
                error("time_s,force,accel\n0,1,2\n1,2,3\n2,3\n"));
        assertEquals("rec.csv, line 3: column 'accel' holds 'nan', expected a finite number (not NaN or infinity)",
                error("# sample_rate_hz: 10\nforce,accel\n1,nan\n"));
        assertEquals("rec.csv, line 4: line is blank; blank lines are allowed only at the end of the file",
                error("# sample_rate_hz: 10\nforce\n1\n\n2\n"));
    }
}
