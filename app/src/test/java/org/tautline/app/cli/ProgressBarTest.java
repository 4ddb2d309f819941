package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.ProgressListener;
import org.tautline.driver.sweep.SettleState;
import org.tautline.driver.sweep.StepPhase;
import org.tautline.driver.sweep.SweepDirection;
import org.tautline.driver.sweep.SweepEvent;
import org.tautline.driver.sweep.SweepEventListener;

class ProgressBarTest {

    private static SweepEvent step(int pass, int passes, int done, int planned, double f, double rigS) {
        return new SweepEvent(pass, passes, 1.0, SweepDirection.UP, StepPhase.COARSE, done, planned, f,
                SettleState.FIXED_DWELL, rigS, 100 - rigS, true, null);
    }

    @Test
    void drawsTheBarTheStepTheFrequencyTheRigTimeAndTheEta() {
        assertEquals("[########......................]  25%  step 25/100    440.00 Hz  rig   12.5 s  ETA    7 s",
                ProgressBar.line(step(0, 1, 25, 100, 440.0, 12.5), 7.2));
    }

    @Test
    void namesThePassWhenThePlanHasSeveral() {
        assertEquals("[###################...........]  63%  pass 2/2  step 25/100    440.00 Hz  rig   12.5 s  ETA    7 s",
                ProgressBar.line(step(1, 2, 25, 100, 440.0, 12.5), 7.2));
    }

    @Test
    void saysSoWhenTheEtaIsNotKnownYet() {
        assertEquals("[..............................]   0%  step 0/10    100.00 Hz  rig    0.0 s  ETA    ? s",
                ProgressBar.line(step(0, 1, 0, 10, 100.0, 0.0), Double.NaN));
    }

    @Test
    void printsOneLinePerTenthWhenNotOnATerminal() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        SweepEventListener bar = new ProgressBar(new PrintStream(bytes, true, StandardCharsets.UTF_8), false).sweep();
        for (int i = 1; i <= 100; i++) {
            bar.onEvent(step(0, 1, i, 100, 100 + i, i));
        }
        // The first step, one line as each tenth from 10 % to 90 % is passed, and the last step.
        long lines = bytes.toString(StandardCharsets.UTF_8).lines().count();
        assertEquals(11, lines);
    }

    @Test
    void drawsTheEndOfAFileJobOnceEvenWhenToldTwice() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        ProgressListener frames = new ProgressBar(new PrintStream(bytes, true, StandardCharsets.UTF_8), false)
                .frames("rec.wav");
        frames.progress(500_000, 1_000_000);
        frames.progress(1_000_000, 1_000_000);
        frames.progress(1_000_000, 1_000_000);
        List<String> lines = bytes.toString(StandardCharsets.UTF_8).lines().toList();
        assertEquals(2, lines.size(), lines.toString());
        assertTrue(lines.get(1).startsWith("[##############################] 100%  rec.wav  1.00 of 1.00 M frames  ETA"),
                lines.get(1));
    }
}
