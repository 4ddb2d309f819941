package org.tautline.app.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.specimen.LinearityResult;

/** The level check read back from a run's result.json, in the words the run stated it (invented files). */
class LevelCheckFileTest {
    private static final String SHIFT = "{\"harmonic\": 1, \"firstFrequencyHz\": 225.553, \"secondFrequencyHz\": 225.557,"
            + " \"relativeShift\": 1.96e-5, \"relativeShiftStd\": 1.3e-6, \"predictedRelativeShift\": 1.62e-5,"
            + " \"significant\": false}";

    @Test
    void theRunsOwnWordsAreKeptAndSayWhereTheyWereRead(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("result.json");
        Files.writeString(file, "{\"linearity\": {\"linear\": true, \"findings\": [\"linear at the test level\","
                + " \"the prediction counts one polarisation of harmonic 1\"], \"shifts\": [" + SHIFT + "]}}");
        LinearityResult read = LevelCheckFile.read(file).orElseThrow();
        assertEquals(List.of("linear at the test level (recorded in result.json)",
                "the prediction counts one polarisation of harmonic 1"), read.findings());
        assertEquals(1.62e-5, read.shifts().get(0).predictedRelativeShift(), 0.0);
    }

    @Test
    void aFileWrittenBeforeTheWordsWereRecordedStillSaysWhetherTheSpecimenWasLinear(@TempDir Path dir)
            throws Exception {
        Path file = dir.resolve("result.json");
        Files.writeString(file, "{\"linearity\": {\"linear\": false, \"shifts\": [" + SHIFT + "]}}");
        assertEquals(List.of("level check at two drive levels (recorded in result.json): not linear"),
                LevelCheckFile.read(file).orElseThrow().findings());
    }

    @Test
    void findingsThatAreNotTextsAreRefusedNamingThePlace(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("result.json");
        Files.writeString(file, "{\"linearity\": {\"linear\": true, \"findings\": [\"linear\", 3], \"shifts\": []}}");
        AnalysisException e = assertThrows(AnalysisException.class, () -> LevelCheckFile.read(file));
        assertEquals(file + ", linearity, findings[1] holds 3; expected text", e.getMessage());
    }
}
