package org.tautline.driver.sweep;

/** Receives sweep progress; called on the sweep's own thread after every step. */
@FunctionalInterface
public interface SweepListener {

    /** A listener that ignores progress. */
    SweepListener NONE = progress -> { };

    /** @param progress where the sweep is now */
    void onStep(SweepProgress progress);
}
