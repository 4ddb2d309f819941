package org.tautline.driver.journal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepResult;

/** A sweep process killed with SIGKILL mid-sweep is resumed from its journal to the uninterrupted result. */
class KillResumeTest {
    private Process child;

    @AfterEach
    void stopChild() throws InterruptedException {
        if (child != null && child.isAlive()) {
            child.destroyForcibly();
            child.waitFor(10, TimeUnit.SECONDS);
        }
    }

    @Test
    void aKilledSweepResumesToTheUninterruptedResult(@TempDir Path dir) throws Exception {
        Path file = JournalFixtures.journal(dir);
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        child = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"), LongSweepMain.class.getName(),
                file.toString()).redirectError(ProcessBuilder.Redirect.DISCARD).start();
        int seen = 0;
        try (BufferedReader out = new BufferedReader(new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8))) {
            String line;
            while (seen < 4 && (line = out.readLine()) != null) {
                if (line.startsWith("journaled ")) {
                    seen = Integer.parseInt(line.substring("journaled ".length()));
                }
            }
            child.destroyForcibly();
            assertTrue(child.waitFor(30, TimeUnit.SECONDS), "the child is gone");
        }
        assertEquals(4, seen, "the child journaled four steps before it was killed");
        assertTrue(child.exitValue() != 0, "killed, not finished: exit " + child.exitValue());

        JournalContents killed = JournalReader.read(file);
        int kept = killed.steps().size();
        assertTrue(kept >= 4 && kept < 40, "steps journaled before the kill: " + kept);
        assertEquals(Optional.empty(), killed.lastStatus(), "a killed sweep leaves no END record");

        SweepResult resumed = JournaledSweep.resume(RigDrivers.load(List.of()), file, Map.of(), n -> { },
                SweepEventListener.NONE, SweepControl.none(), Clock.systemUTC());
        SweepResult expected = SweepResumeTest.uninterrupted(LongSweepMain.PLAN);
        SweepResumeTest.assertSameSweep(expected, resumed);
        JournalContents after = JournalReader.read(file);
        assertEquals(40, after.steps().size());
        assertEquals(2, after.sessions().size());
        assertFalse(after.sessions().get(0).status().isPresent(), "the killed session has no END");
        assertEquals(List.of(kept, 40 - kept), after.sessions().stream().map(JournalSession::stepCount).toList());
    }
}
