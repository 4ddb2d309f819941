package org.tautline.driver.sweep;

import java.util.concurrent.atomic.AtomicReference;

import org.tautline.driver.spi.Exciter;

/**
 * Stops a running sweep from another thread: gently (ramp down before the next block) or at once.
 *
 * <p>The engine checks {@link #stopRequested()} before every block it reads. {@link #requestStop(String)} leaves
 * the rest to the engine, which ramps the drive down over the plan's ramp time and switches the output off.
 * {@link #stopNow(String)} is for an interrupt signal or a closing window: it also switches the output off at
 * once from the calling thread through {@link Exciter#switchOffNow()} where the rig allows it. Either way the
 * sweep ends as cancelled and keeps every completed step. Thread-safe.
 */
public final class SweepControl {
    private final AtomicReference<String> reason = new AtomicReference<>();
    private final AtomicReference<Exciter> running = new AtomicReference<>();

    /** @return a control nobody stops */
    public static SweepControl none() {
        return new SweepControl();
    }

    /**
     * Asks the sweep to ramp down and stop before its next block; the first reason given is kept.
     *
     * @param why what asked for it, in words, for the journal and the user ("stopped with the STOP button")
     */
    public void requestStop(String why) {
        reason.compareAndSet(null, why);
    }

    /**
     * Asks the sweep to stop and switches the output off at once where the rig can do that from this thread.
     *
     * @param why what asked for it, in words
     * @return true when the off command was issued from this thread, false when the engine will switch off at its
     *         next check (no sweep running, or a rig without an immediate path)
     */
    public boolean stopNow(String why) {
        requestStop(why);
        Exciter exciter = running.get();
        return exciter != null && exciter.switchOffNow();
    }

    /** @return true once a stop has been asked for */
    public boolean stopRequested() {
        return reason.get() != null;
    }

    /** @return why the stop was asked for, or null when it was not */
    public String reason() {
        return reason.get();
    }

    /** Called by the engine around a run, so that {@link #stopNow(String)} reaches the rig; null detaches. */
    void attach(Exciter exciter) {
        running.set(exciter);
    }
}
