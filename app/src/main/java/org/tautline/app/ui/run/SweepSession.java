package org.tautline.app.ui.run;

import java.util.Optional;
import java.util.concurrent.atomic.AtomicReference;

import org.tautline.driver.spi.Rig;
import org.tautline.driver.sweep.SteppedSinePlan;
import org.tautline.driver.sweep.SteppedSineRunner;
import org.tautline.driver.sweep.SweepJournal;
import org.tautline.driver.sweep.SweepListener;
import org.tautline.driver.sweep.SweepRecord;

/**
 * One sweep on a connected rig that can be paused, resumed and cancelled. Free of Swing.
 *
 * <p>Pause and cancel both ask the runner to ramp the drive down and stop; a pause keeps the
 * completed steps so that {@link #resume} goes on with {@link SteppedSineRunner#continueFrom}, a
 * cancel forgets them. {@link #run} and {@link #resume} block: call them off the event thread.
 */
public final class SweepSession {
    /** Why a running sweep was asked to stop. */
    public enum StopRequest {
        /** Not asked. */
        NONE,
        /** Ramp down, keep the completed steps to resume. */
        PAUSE,
        /** Ramp down and forget the steps. */
        CANCEL
    }

    /** Where the session is. */
    public enum State {
        /** Nothing run yet, or cancelled. */
        READY,
        /** A sweep is running. */
        RUNNING,
        /** Stopped with steps kept; can resume. */
        PAUSED,
        /** Every step done. */
        COMPLETE
    }

    private final SteppedSineRunner runner;
    private final SteppedSinePlan plan;
    private final AtomicReference<StopRequest> stop = new AtomicReference<>(StopRequest.NONE);
    private volatile State state = State.READY;
    private volatile SweepRecord partial;

    /**
     * @param rig the connected rig (force on channel 0, response on channel 1)
     * @param plan the sweep
     */
    public SweepSession(Rig rig, SteppedSinePlan plan) {
        this.runner = new SteppedSineRunner(rig);
        this.plan = plan;
    }

    /** @return where the session is */
    public State state() {
        return state;
    }

    /** @return the steps completed before the last pause, if paused */
    public Optional<SweepRecord> partial() {
        return state == State.PAUSED ? Optional.ofNullable(partial) : Optional.empty();
    }

    /**
     * Asks a running sweep to stop; it ramps down at its next check.
     *
     * @param request pause (keep steps) or cancel (forget them)
     */
    public void requestStop(StopRequest request) {
        stop.set(request);
    }

    /** @return what stop has been asked for, if any */
    public StopRequest stopRequested() {
        return stop.get();
    }

    /**
     * Runs the plan from its first step.
     *
     * @param listener progress after every step
     * @return the sweep: complete, or the steps before a pause or cancel
     */
    public SweepRecord run(SweepListener listener) {
        stop.set(StopRequest.NONE);
        state = State.RUNNING;
        return finish(() -> runner.run(plan, listener, this::stopAsked, SweepJournal.NONE));
    }

    /**
     * Goes on after a pause from the first step not done.
     *
     * @param listener progress after every step, counting the earlier steps as done
     * @return the whole sweep so far
     * @throws IllegalStateException when the session is not paused
     */
    public SweepRecord resume(SweepListener listener) {
        if (state != State.PAUSED || partial == null) {
            throw new IllegalStateException("the sweep can only resume after a pause; it is " + state);
        }
        SweepRecord before = partial;
        stop.set(StopRequest.NONE);
        state = State.RUNNING;
        return finish(() -> runner.continueFrom(before, listener, this::stopAsked, SweepJournal.NONE));
    }

    private boolean stopAsked() {
        return stop.get() != StopRequest.NONE;
    }

    private SweepRecord finish(java.util.function.Supplier<SweepRecord> sweep) {
        try {
            SweepRecord record = sweep.get();
            if (record.completed()) {
                state = State.COMPLETE;
                partial = null;
            } else if (stop.get() == StopRequest.PAUSE) {
                state = State.PAUSED;
                partial = record;
            } else {
                state = State.READY;
                partial = null;
            }
            return record;
        } catch (RuntimeException e) {
            state = State.READY;
            partial = null;
            throw e;
        }
    }
}
