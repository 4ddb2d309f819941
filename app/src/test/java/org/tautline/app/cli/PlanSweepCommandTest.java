package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.tautline.driver.journal.JournalContents;
import org.tautline.driver.journal.JournalReader;
import org.tautline.driver.sweep.SweepStatus;
import org.junit.jupiter.api.io.TempDir;

/** {@code tautline sweep --plan}: cautions first, then the adaptive run, its journal and FRF. */
class PlanSweepCommandTest {
    @TempDir
    Path dir;

    @Test
    void runsAPlanOnTheSimulatedRigBehindTheCautions() throws IOException {
        Path plan = dir.resolve("plan.json");
        Files.writeString(plan, """
                {"startHz": 200, "stopHz": 260, "levelMode": "drive", "levels": [0.5],
                 "frequencyRelStd": 1e-4, "dampingRelStd": 0.05,
                 "limits": {"driveV": 5, "forceN": 4, "responseAmplitude": 9e-4, "displacementM": 9e-4},
                 "timeBudgetS": 120, "coarseSteps": 9}
                """);
        Path run = dir.resolve("run");
        CliRun r = CliRun.of("sweep", "--rig", "sim", "--plan", plan.toString(), "--out", run.toString(), "--json",
                "--no-progress");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.err().startsWith("SAFETY - before any excitation:"), "cautions before excitation: " + r.err());
        JsonNode node = ResultJson.MAPPER.readTree(r.out());
        assertEquals("completed", node.get("status").asText());
        JsonNode pass = node.get("passes").get(0);
        assertTrue(pass.get("modes").size() >= 1, "the first mode (228 Hz) was refined: " + pass);
        assertTrue(Files.exists(Path.of(pass.get("frf").asText())));
        JournalContents journal = JournalReader.read(run.resolve(SweepCommand.JOURNAL));
        assertEquals(pass.get("steps").asInt(), journal.steps().size(), "every step journaled, in the one journal format");
        assertTrue(journal.header().plan().adaptive(), "the journal records the whole plan");
        assertEquals(Optional.of(SweepStatus.COMPLETED), journal.lastStatus());
    }
}
