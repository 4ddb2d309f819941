package org.tautline.driver.sweep;

import org.tautline.driver.spi.SampleBlock;

/**
 * Where a sweep records its progress as it goes, so that an interrupted sweep can be continued.
 *
 * <p>The engine calls {@link #stepCompleted(CompletedStep, SampleBlock)} after each step's fit and before it
 * commands the next step, and {@link #sweepEnded(SweepStatus, String)} once the output is off. An
 * implementation that stores steps makes each one durable before returning; if it cannot, it throws an
 * unchecked exception, and the engine treats that as a fault: the step is not counted and the sweep stops
 * with the output off. Steps taken over from an earlier session are not recorded again.
 */
public interface SweepJournal {

    /** A journal that records nothing. */
    SweepJournal NONE = new SweepJournal() {
        @Override
        public void stepCompleted(CompletedStep step, SampleBlock samples) {
            // Nothing is recorded.
        }

        @Override
        public void sweepEnded(SweepStatus status, String reason) {
            // Nothing is recorded.
        }
    };

    /**
     * @param step a step that was just completed; durable when this returns
     * @param samples the integration samples the step's fits were made on, both channels
     */
    void stepCompleted(CompletedStep step, SampleBlock samples);

    /**
     * @param status how the sweep session ended
     * @param reason why, in a sentence (for a fault, the fault's message)
     */
    void sweepEnded(SweepStatus status, String reason);
}
