package org.tautline.driver.sweep;

import java.util.ArrayList;
import java.util.List;

import org.tautline.driver.spi.SampleBlock;

/** A journal that keeps what it is told, in memory. */
final class RecordingJournal implements SweepJournal {
    final List<CompletedStep> steps = new ArrayList<>();
    final List<SweepStatus> endings = new ArrayList<>();
    final List<String> reasons = new ArrayList<>();

    @Override
    public void stepCompleted(CompletedStep step, SampleBlock samples) {
        steps.add(step);
    }

    @Override
    public void sweepEnded(SweepStatus status, String reason) {
        endings.add(status);
        reasons.add(reason);
    }
}
