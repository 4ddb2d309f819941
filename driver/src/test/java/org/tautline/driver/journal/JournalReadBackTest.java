package org.tautline.driver.journal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.signal.SineFit;
import org.tautline.analysis.signal.SinePhasor;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEngine;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepResult;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepStatus;

/** A journal reads back bit for bit, and up to its last valid record when cut or damaged anywhere. */
class JournalReadBackTest {

    private static SweepResult sweepWithJournal(Path file, boolean samples) {
        try (Rig rig = JournalFixtures.cleanRig();
             JournalWriter writer = JournalWriter.create(file, JournalFixtures.header(rig, samples), JournalFixtures.CLOCK)) {
            return new SweepEngine(rig).run(JournalFixtures.PLAN, SweepEventListener.NONE, SweepControl.none(), writer);
        }
    }

    private static List<SweepPoint> points(JournalContents contents) {
        return contents.steps().stream().map(JournalStep::point).toList();
    }

    @Test
    void readsBackEveryStepBitForBit(@TempDir Path dir) {
        Path file = JournalFixtures.journal(dir);
        SweepResult run = sweepWithJournal(file, false);
        JournalContents back = JournalReader.read(file);
        assertEquals(Optional.empty(), back.warning());
        assertEquals(run.points(), points(back), "points rebuilt from the recorded fits are identical");
        assertEquals(run.steps(), back.completedSteps(), "steps read back equal the steps run, pass and phase included");
        assertTrue(back.finished());
        assertEquals("sim", back.header().driver());
        assertEquals(Map.of("scenario", "demo-wire-clean", "seed", "none"), back.header().options());
        assertEquals(JournalFixtures.PLAN, back.header().plan());
        assertEquals(JournalFixtures.CLOCK.instant(), back.header().startedAt());
        assertEquals("displacement", back.header().channels().get(1).quantity());
        assertEquals(1, back.sessions().size());
        assertEquals(Optional.of(SweepStatus.COMPLETED), back.lastStatus());
        assertEquals("all 1 pass(es) completed, 13 steps", back.sessions().get(0).reason());
        assertEquals(back.fileBytes(), back.validBytes());
    }

    @Test
    void keptSamplesReadBackAndRefitToTheRecordedPhasors(@TempDir Path dir) {
        Path file = JournalFixtures.journal(dir);
        sweepWithJournal(file, true);
        JournalContents back = JournalReader.read(file);
        assertTrue(Files.exists(dir.resolve(JournaledSweep.SAMPLES_FILE)));
        for (JournalStep step : back.steps()) {
            double[][] samples = back.samples(step);
            assertEquals(JournalFixtures.PLAN.integrationSamples(step.frequencyHz(), 20000), samples[0].length);
            SinePhasor[] refit = SineFit.fitChannels(samples, 20000, step.frequencyHz(), JournalFixtures.PLAN.harmonicOrder());
            assertEquals(step.force().phasor(), refit[0].phasor(), "force of step " + step.index());
            assertEquals(step.response().phasor(), refit[1].phasor(), "response of step " + step.index());
        }
    }

    @Test
    void damagedSamplesFailTheirCrc(@TempDir Path dir) throws IOException {
        Path file = JournalFixtures.journal(dir);
        sweepWithJournal(file, true);
        Path side = dir.resolve(JournaledSweep.SAMPLES_FILE);
        byte[] bytes = Files.readAllBytes(side);
        JournalContents back = JournalReader.read(file);
        JournalStep third = back.steps().get(2);
        bytes[(int) third.samplesOffset() + 5] ^= 0x10;
        Files.write(side, bytes);
        RigException e = assertThrows(RigException.class, () -> back.samples(third));
        assertEquals("samples file " + side + ": the samples of step 3 at byte " + third.samplesOffset()
                + " fail their CRC check (" + third.samplesCrc() + " recorded)", e.getMessage());
    }

    /** Every byte offset of the last STEP and of the END record: what a power loss at that byte would leave. */
    @Test
    void readsUpToTheLastWholeRecordWhereverTheFileIsCut(@TempDir Path dir) throws IOException {
        Path file = JournalFixtures.journal(dir);
        SweepResult run = sweepWithJournal(file, false);
        byte[] whole = Files.readAllBytes(file);
        List<Integer> starts = lineStarts(whole);
        int endStart = starts.get(starts.size() - 1);
        int lastStepStart = starts.get(starts.size() - 2);
        Path cut = dir.resolve("cut");
        for (int length = lastStepStart; length <= whole.length; length++) {
            Files.write(cut, Arrays.copyOf(whole, length));
            JournalContents back = JournalReader.read(cut);
            int expectedSteps = length < endStart ? 12 : 13;
            int expectedValid = length == whole.length ? length : length < endStart ? lastStepStart : endStart;
            assertEquals(expectedSteps, back.steps().size(), "steps kept when cut at byte " + length);
            assertEquals(run.points().subList(0, expectedSteps), points(back), "cut at byte " + length);
            assertEquals(expectedValid, back.validBytes(), "valid length when cut at byte " + length);
            if (length == expectedValid) {
                assertEquals(Optional.empty(), back.warning(), "a cut between records leaves nothing to warn about");
            } else {
                assertEquals(Optional.of("journal " + cut + ": read up to byte " + expectedValid + " of " + length
                        + "; the record starting there is incomplete (the writer stopped mid-record: a power loss or a"
                        + " killed process), so it and anything after it are ignored (" + expectedSteps
                        + " completed step(s) kept)"), back.warning());
            }
            assertEquals(length == whole.length ? Optional.of(SweepStatus.COMPLETED) : Optional.empty(), back.lastStatus());
        }
    }

    @Test
    void stopsAtADamagedRecordAndKeepsTheOnesBefore(@TempDir Path dir) throws IOException {
        Path file = JournalFixtures.journal(dir);
        sweepWithJournal(file, false);
        byte[] bytes = Files.readAllBytes(file);
        int fifthStep = lineStarts(bytes).get(5);
        bytes[fifthStep + 30] ^= 0x01;
        Files.write(file, bytes);
        JournalContents back = JournalReader.read(file);
        assertEquals(4, back.steps().size());
        assertEquals(Optional.of("journal " + file + ": read up to byte " + fifthStep + " of " + bytes.length
                + "; the record starting there is damaged (its CRC does not match), so it and anything after it are"
                + " ignored (4 completed step(s) kept)"), back.warning());
    }

    @Test
    void aJournalCutInsideItsHeaderCannotBeRead(@TempDir Path dir) throws IOException {
        Path file = JournalFixtures.journal(dir);
        sweepWithJournal(file, false);
        byte[] bytes = Files.readAllBytes(file);
        Files.write(file, Arrays.copyOf(bytes, 40));
        RigException e = assertThrows(RigException.class, () -> JournalReader.read(file));
        assertEquals("journal " + file + " has no complete header record (40 bytes): the sweep stopped before it"
                + " started; run it again", e.getMessage());
    }

    @Test
    void aHeaderWithAFlippedBitIsReportedAsDamaged(@TempDir Path dir) throws IOException {
        Path file = JournalFixtures.journal(dir);
        sweepWithJournal(file, false);
        byte[] bytes = Files.readAllBytes(file);
        bytes[20] ^= 0x02;
        Files.write(file, bytes);
        RigException e = assertThrows(RigException.class, () -> JournalReader.read(file));
        assertEquals("journal " + file + ": the header record (line 1) is damaged: its CRC does not match its contents,"
                + " so the journal cannot be trusted; keep the file for inspection and run the sweep again into a new"
                + " folder", e.getMessage());
    }

    @Test
    void aJournalWithWindowsLineEndsReadsBackTheSame(@TempDir Path dir) throws IOException {
        Path file = JournalFixtures.journal(dir);
        SweepResult run = sweepWithJournal(file, false);
        String text = Files.readString(file, StandardCharsets.US_ASCII);
        Path crlf = dir.resolve("crlf");
        Files.writeString(crlf, text.replace("\n", "\r\n"), StandardCharsets.US_ASCII);
        JournalContents back = JournalReader.read(crlf);
        assertEquals(Optional.empty(), back.warning());
        assertEquals(run.points(), points(back));
    }

    @Test
    void aValidRecordOutOfPlanOrderIsAFormatError(@TempDir Path dir) throws IOException {
        Path file = JournalFixtures.journal(dir);
        sweepWithJournal(file, false);
        List<String> lines = Files.readAllLines(file, StandardCharsets.US_ASCII);
        Files.write(file, List.of(lines.get(0), lines.get(2)), StandardCharsets.US_ASCII);
        RigException e = assertThrows(RigException.class, () -> JournalReader.read(file));
        assertEquals("journal " + file + ": the record at byte " + (lines.get(0).length() + 1) + " does not fit: STEP"
                + " index 1 where index 0 was expected (steps are recorded in order)", e.getMessage());
    }

    @Test
    void valuesWithSpacesEqualsSignsAndAccentsRoundTrip() {
        Map<String, String> fields = new LinkedHashMap<>();
        fields.put("identity", "Rig Co. = bench 2, Zürich 100%\nline two");
        fields.put("empty", "");
        JournalLine line = new JournalLine("END", fields);
        byte[] encoded = line.encode();
        String text = new String(encoded, StandardCharsets.US_ASCII);
        assertEquals("END identity=Rig%20Co.%20%3D%20bench%202,%20Z%C3%BCrich%20100%25%0Aline%20two empty= crc=",
                text.substring(0, text.length() - 9), "percent-encoded, one line");
        assertEquals(line, JournalLine.decode(Arrays.copyOf(encoded, encoded.length - 1)));
    }

    @Test
    void theLineCrcIsTheStandardCrc32() {
        // Check value of CRC-32/ISO-HDLC for the ASCII string "123456789" is CBF43926 (Williams,
        // "A Painless Guide to CRC Error Detection Algorithms", 1993, from memory; the catalogue's check value).
        assertEquals("CBF43926", JournalLine.crcHex("123456789".getBytes(StandardCharsets.US_ASCII)));
        byte[] line = new JournalLine("END", Map.of("status", "completed")).encode();
        assertArrayEquals("END status=completed crc=".getBytes(StandardCharsets.US_ASCII),
                Arrays.copyOf(line, 25));
        assertNull(JournalLine.decode(Arrays.copyOf(line, line.length - 2)), "a cut CRC never decodes");
    }

    static List<Integer> lineStarts(byte[] bytes) {
        List<Integer> starts = new java.util.ArrayList<>(List.of(0));
        for (int i = 0; i < bytes.length - 1; i++) {
            if (bytes[i] == '\n') {
                starts.add(i + 1);
            }
        }
        return starts;
    }
}
