package org.tautline.app.ui.run;

import java.util.List;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicReference;

import org.tautline.driver.RigException;
import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEngine;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepJournal;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepResult;

/**
 * One sweep plan run on a rig, that can be paused (or stopped, or cut short by a fault) and resumed. Free of Swing.
 *
 * <p>A pause and the STOP control both ask the engine to ramp the drive down and stop, keeping the completed
 * steps; a fault or a safety limit keeps them too. {@link #resume} then continues them with
 * {@link SweepEngine#resume} on the rig connected now, which may have come back on another port: its identity,
 * sample rate and channels must be those the steps were measured with. A cancel forgets the steps. {@link #run}
 * and {@link #resume} block: call them off the event thread.
 */
public final class SweepSession {
    /** Why a running sweep was asked to stop. */
    public enum StopRequest {
        /** Not asked. */
        NONE,
        /** Ramp down, keep the completed steps to resume (Pause, STOP). */
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
        /** Stopped before the end with the steps kept (a pause, the STOP control, a fault, a limit): can resume. */
        PAUSED,
        /** Every step done. */
        COMPLETE
    }

    /** What the recorded steps were measured with: a resume must be on the same rig. */
    private record RigRecord(String identity, double sampleRateHz, List<ChannelInfo> channels) {
        static RigRecord of(Rig rig) {
            return new RigRecord(rig.identity(), rig.acquisition().sampleRateHz(), rig.acquisition().channels());
        }
    }

    private final SweepPlan plan;
    private final AtomicReference<StopRequest> stop = new AtomicReference<>(StopRequest.NONE);
    private final AtomicReference<SweepControl> control = new AtomicReference<>(new SweepControl());
    private volatile State state = State.READY;
    private volatile SweepResult partial;
    private volatile RigRecord recordedOn;

    /** @param plan the sweep */
    public SweepSession(SweepPlan plan) {
        this.plan = plan;
    }

    /** @return the plan */
    public SweepPlan plan() {
        return plan;
    }

    /** @return where the session is */
    public State state() {
        return state;
    }

    /** @return the sweep so far when paused (its steps are kept to resume) */
    public Optional<SweepResult> partial() {
        return state == State.PAUSED ? Optional.ofNullable(partial) : Optional.empty();
    }

    /**
     * Asks a running sweep to stop; it ramps down before its next block.
     *
     * @param request pause (keep steps) or cancel (forget them)
     * @param why what asked for it, in words, for the result's reason
     */
    public void requestStop(StopRequest request, String why) {
        stop.set(request);
        control.get().requestStop(why);
    }

    /** @return the stop control of the current (or last) run, for more sweeps that belong to it (the level check) */
    public SweepControl control() {
        return control.get();
    }

    /** @return what stop has been asked for, if any */
    public StopRequest stopRequested() {
        return stop.get();
    }

    /**
     * Runs the plan from its first step.
     *
     * @param rig the connected rig (force on channel 0, response on channel 1)
     * @param listener progress events
     * @return the sweep: complete, or the steps before a stop
     */
    public SweepResult run(Rig rig, SweepEventListener listener) {
        recordedOn = RigRecord.of(rig);
        return finish(List.of(), rig, listener);
    }

    /**
     * Goes on after a pause, a stop or a fault from the first step not done.
     *
     * @param rig the connected rig: the one the steps were measured on, perhaps on another port
     * @param listener progress events, the kept steps reported first
     * @return the whole sweep so far
     * @throws IllegalStateException when the session is not paused
     * @throws RigException when the rig is not the one the steps were measured on
     */
    public SweepResult resume(Rig rig, SweepEventListener listener) {
        SweepResult before = partial;
        if (state != State.PAUSED || before == null) {
            throw new IllegalStateException("the sweep can only resume after a pause; it is " + state);
        }
        RigRecord now = RigRecord.of(rig);
        if (!now.identity().equals(recordedOn.identity())) {
            throw new RigException("the kept steps were measured on '" + recordedOn.identity() + "' but the rig now"
                    + " connected answers '" + now.identity() + "'; a sweep can only be resumed on the rig it started on");
        }
        if (now.sampleRateHz() != recordedOn.sampleRateHz() || !now.channels().equals(recordedOn.channels())) {
            throw new RigException("the rig '" + now.identity() + "' now samples at " + now.sampleRateHz() + " Hz with "
                    + now.channels() + " but the kept steps were measured at " + recordedOn.sampleRateHz() + " Hz with "
                    + recordedOn.channels());
        }
        return finish(before.steps(), rig, listener);
    }

    private SweepResult finish(List<org.tautline.driver.sweep.CompletedStep> recorded, Rig rig,
                               SweepEventListener listener) {
        stop.set(StopRequest.NONE);
        SweepControl fresh = new SweepControl();
        control.set(fresh);
        state = State.RUNNING;
        try {
            SweepResult result = new SweepEngine(rig).resume(plan, recorded, listener, fresh, SweepJournal.NONE);
            if (result.completed()) {
                state = State.COMPLETE;
                partial = null;
            } else if (stop.get() == StopRequest.CANCEL) {
                state = State.READY;
                partial = null;
            } else {
                state = State.PAUSED;
                partial = result;
            }
            return result;
        } catch (RuntimeException e) {
            // Nothing was excited (the plan does not fit the rig): what was kept before stays kept.
            state = recorded.isEmpty() ? State.READY : State.PAUSED;
            throw e;
        }
    }
}
