package org.tautline.driver.sweep;

/**
 * Where a sweep records its progress as it goes, so that an interrupted sweep can be resumed.
 *
 * <p>The runner calls {@link #stepCompleted(CompletedStep)} after each step's fit and before it
 * commands the next step, and {@link #sweepEnded(SweepStatus, String)} once the output is off. An
 * implementation that stores steps makes each one durable before returning; if it cannot, it throws
 * an unchecked exception, and the runner treats that as a fault: the step is not counted and the
 * sweep stops with the output off.
 */
public interface SweepJournal {

    /** A journal that records nothing. */
    SweepJournal NONE = new SweepJournal() {
        @Override
        public void stepCompleted(CompletedStep step) {
            // Nothing is recorded.
        }

        @Override
        public void sweepEnded(SweepStatus status, String reason) {
            // Nothing is recorded.
        }
    };

    /** @param step a step that was just completed; durable when this returns */
    void stepCompleted(CompletedStep step);

    /**
     * @param status how the sweep session ended
     * @param reason why, in a sentence (for a fault, the fault's message)
     */
    void sweepEnded(SweepStatus status, String reason);
}
