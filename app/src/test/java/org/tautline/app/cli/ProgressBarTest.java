package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
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
}
