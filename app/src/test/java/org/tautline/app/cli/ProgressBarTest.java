package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.ProgressListener;
import org.tautline.driver.sweep.SweepListener;
import org.tautline.driver.sweep.SweepProgress;

class ProgressBarTest {

    @Test
    void drawsTheBarTheStepTheFrequencyTheRigTimeAndTheEta() {
        SweepProgress p = new SweepProgress(25, 100, 440.0, 12.5, 30.0, 7.2, null);
        assertEquals("[########......................]  25%  step 25/100    440.00 Hz  rig   12.5 s  ETA    7 s",
                ProgressBar.line(p));
    }

    @Test
    void saysSoWhenTheEtaIsNotKnownYet() {
        SweepProgress p = new SweepProgress(0, 10, 100.0, 0.0, 5.0, Double.NaN, null);
        assertEquals("[..............................]   0%  step 0/10    100.00 Hz  rig    0.0 s  ETA    ? s",
                ProgressBar.line(p));
    }

    @Test
    void printsOneLinePerTenthWhenNotOnATerminal() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        SweepListener bar = new ProgressBar(new PrintStream(bytes, true, StandardCharsets.UTF_8), false).sweep();
        for (int i = 1; i <= 100; i++) {
            bar.onStep(new SweepProgress(i, 100, 100 + i, i, 100 - i, 1, null));
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
