package org.tautline.driver.sweep;

/** Receives the progress of an adaptive sweep, on the sweep's own thread; a Swing user hands events on with invokeLater. */
@FunctionalInterface
public interface SweepEventListener {

    /** A listener that ignores every event. */
    SweepEventListener NONE = event -> { };

    /** @param event what just happened */
    void onEvent(SweepEvent event);

    /**
     * A listener that passes completed steps on to a stepped-sine progress listener (a progress bar).
     *
     * @param listener the stepped-sine listener
     * @return the adapter
     */
    static SweepEventListener completedSteps(SweepListener listener) {
        return event -> {
            if (event.completed()) {
                listener.onStep(event.toProgress());
            }
        };
    }
}
