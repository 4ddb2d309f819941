package org.tautline.driver.sweep;

/** What a step was for: the coarse steps of a pass, locating a peak, or refining a resonance. */
public enum StepPhase {
    /** One of the pass's log-spaced steps (every step of a uniform plan). */
    COARSE("coarse"),
    /** Placing a peak the coarse steps showed. */
    LOCATE("locating a peak"),
    /** Refining a located resonance until its fit meets the targets. */
    REFINE("refining");

    private final String label;

    StepPhase(String label) {
        this.label = label;
    }

    /** @return the phase in words, for progress lines */
    public String label() {
        return label;
    }
}
