package org.tautline.driver.sweep;

/** Receives the progress of a sweep, on the sweep's own thread; a Swing user hands events on with invokeLater. */
@FunctionalInterface
public interface SweepEventListener {

    /** A listener that ignores every event. */
    SweepEventListener NONE = event -> { };

    /** @param event what just happened */
    void onEvent(SweepEvent event);
}
