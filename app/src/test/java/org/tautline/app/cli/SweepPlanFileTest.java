package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.AnalysisException;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.LevelMode;
import org.tautline.driver.sweep.SweepDirection;

/** The adaptive sweep plan file: the documented example reads back, and errors name file, field and expectation. */
class SweepPlanFileTest {
    private static final String EXAMPLE = """
            {
              "startHz": 150, "stopHz": 800,
              "levelMode": "force", "levels": [0.001, 0.002],
              "frequencyRelStd": 2e-5, "dampingRelStd": 0.02,
              "limits": {"driveV": 5, "forceN": 2, "responseAmplitude": 9e-4, "displacementM": 9e-4},
              "direction": "both",
              "timeBudgetS": 1800
            }
            """;

    @TempDir
    Path dir;

    private Path write(String json) throws IOException {
        Path file = dir.resolve("plan.json");
        Files.writeString(file, json);
        return file;
    }

    @Test
    void readsTheDocumentedExample() throws IOException {
        SweepPlan plan = SweepPlanFile.read(write(EXAMPLE));
        assertEquals(LevelMode.FORCE, plan.levelMode());
        assertEquals(List.of(0.001, 0.002), plan.levels());
        assertEquals(List.of(SweepDirection.UP, SweepDirection.DOWN), plan.directions());
        assertEquals(4, plan.passCount());
        assertEquals(5.0, plan.limits().driveV());
        assertEquals(35, plan.coarseStepCount());
        assertTrue(plan.adaptive());
        assertTrue(plan.settle().detects(), "detection unless a dwell is asked for");
    }

    @Test
    void aPlanWithoutRefinementIsAUniformSweep() throws IOException {
        SweepPlan plan = SweepPlanFile.read(write("""
                {"startHz": 150, "stopHz": 800, "levelMode": "drive", "levels": [1.0], "refine": false,
                 "coarseSteps": 400, "fixedDwellS": 0.5,
                 "limits": {"driveV": 2, "forceN": 2, "responseAmplitude": 9e-4, "displacementM": 9e-4}}
                """));
        assertFalse(plan.adaptive());
        assertEquals(400, plan.coarseStepCount());
        assertEquals(0.5, plan.settle().dwellS(150), 0.0);
    }

    @Test
    void refusesFieldsItDoesNotKnowAndTargetsWithoutRefinement() throws IOException {
        Path misspelt = write(EXAMPLE.replace("\"timeBudgetS\": 1800", "\"timeBudgetS\": 1800, \"coarseStep\": 50"));
        AnalysisException e = assertThrows(AnalysisException.class, () -> SweepPlanFile.read(misspelt));
        assertTrue(e.getMessage().startsWith(misspelt + ": field \"coarseStep\" is not one this file may hold; expected"
                + " only startHz, stopHz,"), e.getMessage());
        Path targets = write(EXAMPLE.replace("\"direction\": \"both\"", "\"direction\": \"both\", \"refine\": false"));
        e = assertThrows(AnalysisException.class, () -> SweepPlanFile.read(targets));
        assertEquals(targets + ": field \"frequencyRelStd\" is a refinement target, but \"refine\" is false; remove it,"
                + " or set \"refine\" to true", e.getMessage());
    }

    @Test
    void namesTheFileTheFieldAndWhatWasExpected() throws IOException {
        Path file = write(EXAMPLE.replace("\"direction\": \"both\"", "\"direction\": \"sideways\""));
        AnalysisException e = assertThrows(AnalysisException.class, () -> SweepPlanFile.read(file));
        assertEquals(file + ": field \"direction\" holds \"sideways\"; expected one of \"up\", \"down\", \"both\"",
                e.getMessage());

        Path missing = write(EXAMPLE.replace("\"forceN\": 2, ", ""));
        e = assertThrows(AnalysisException.class, () -> SweepPlanFile.read(missing));
        assertEquals(missing + ", limits: field \"forceN\" is missing; expected a number", e.getMessage());

        Path tooHigh = write(EXAMPLE.replace("[0.001, 0.002]", "[0.001, 3]"));
        e = assertThrows(AnalysisException.class, () -> SweepPlanFile.read(tooHigh));
        assertEquals(tooHigh + ": force level 3.0 N must be below limits.forceN 2.0 N", e.getMessage());

        Path steps = write(EXAMPLE.replace("\"timeBudgetS\": 1800", "\"timeBudgetS\": 1800, \"coarseSteps\": 2.5"));
        e = assertThrows(AnalysisException.class, () -> SweepPlanFile.read(steps));
        assertEquals(steps + ": field \"coarseSteps\" holds 2.5; expected a whole number", e.getMessage());
    }
}
