package org.tautline.driver.sweep;

import java.util.List;

import org.tautline.driver.RigException;
import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;

/**
 * The one stepped-sine sweep engine: runs any {@link SweepPlan} on any rig, uniform or adaptive, and continues
 * an interrupted one from its completed steps.
 *
 * <p>Before the first excitation the whole plan is checked against the rig ({@link #check(SweepPlan)}): the
 * channels, the drive limit, every frequency below half the sample rate. Each pass then ramps the drive up,
 * measures the steps its planner asks for (a {@link StepExecutor} settles, holds the level and fits each one,
 * checking every block against the safety limits), and ramps down and switches off. A step whose samples
 * were lost on the link ({@link org.tautline.driver.RigDataLostException}) is measured again; it is never
 * recorded half-done.
 *
 * <p>How it stops: after the last pass, on a stop request and at a safety limit the drive ramps down over the
 * plan's ramp time and the output is switched off (a ramp that fails still ends with the output off); on a
 * fault (any other exception from the rig, the fit, the journal or the listener) the output is switched off at
 * once with no ramp. The step in progress is discarded, the journal records how the sweep ended, and the
 * result keeps every completed step. The output is off whenever this engine returns or throws.
 */
public final class SweepEngine {
    /** Times one step is measured again after lost samples before the sweep stops with a fault. */
    static final int MAX_STEP_REPEATS = 3;

    private final Rig rig;

    /** @param rig the rig; channel 0 force, channel 1 the response */
    public SweepEngine(Rig rig) {
        this.rig = rig;
    }

    /**
     * Checks the whole plan against this rig before anything is excited.
     *
     * @param plan the plan
     * @return what channel 1 measures: displacement, velocity or acceleration
     * @throws RigException saying what does not fit and what would
     */
    public String check(SweepPlan plan) {
        String quantity = checkChannels(rig.acquisition().channels());
        Exciter exciter = rig.exciter();
        if (plan.limits().driveV() > exciter.maxAmplitudeV()) {
            throw new RigException("sweep plan: the drive limit " + plan.limits().driveV()
                    + " V is above the exciter's limit of " + exciter.maxAmplitudeV() + " V; lower limits.driveV");
        }
        double nyquistHz = rig.acquisition().sampleRateHz() / 2;
        if (!(plan.stopHz() < nyquistHz)) {
            throw new RigException("sweep plan: stopHz " + number(plan.stopHz()) + " Hz is not below half the rig's"
                    + " sample rate (" + number(nyquistHz) + " Hz), so the rig can neither drive nor measure it; lower"
                    + " stopHz");
        }
        return quantity;
    }

    /**
     * Runs the plan from its first step.
     *
     * @param plan what to run
     * @param listener progress events
     * @param control stop requests, checked before every block
     * @param journal receives every completed step and how the sweep ended
     * @return every pass and how the sweep ended; the output is off
     * @throws RigException when the rig cannot run the plan (nothing was excited)
     */
    public SweepResult run(SweepPlan plan, SweepEventListener listener, SweepControl control, SweepJournal journal) {
        return resume(plan, List.of(), listener, control, journal);
    }

    /**
     * Continues a sweep from its completed steps: the plan is run again, the recorded steps are taken in place of
     * measuring them while they match what the plan asks for, and the first missing step and all after it are
     * measured. A resumed sweep makes the same decisions as an uninterrupted one up to its last recorded step.
     *
     * @param plan the plan the steps were recorded under
     * @param recorded the completed steps of the earlier sessions, in order (from a result or a journal)
     * @param listener progress events, the recorded steps reported as completed first
     * @param control stop requests
     * @param journal receives the new steps (the recorded ones are not recorded again) and how the sweep ended
     * @return the whole sweep: the recorded steps, then the new ones
     * @throws RigException when the rig cannot run the plan, or the recorded steps do not belong to it
     */
    public SweepResult resume(SweepPlan plan, List<CompletedStep> recorded, SweepEventListener listener,
                              SweepControl control, SweepJournal journal) {
        String quantity = check(plan);
        for (int i = 0; i < recorded.size(); i++) {
            if (recorded.get(i).index() != i) {
                throw new RigException("the recorded steps are not in order: step " + (i + 1) + " is recorded as step "
                        + (recorded.get(i).index() + 1));
            }
        }
        Exciter exciter = rig.exciter();
        EngineRun run = new EngineRun(rig, plan, quantity, recorded, listener, control, journal);
        SweepStatus status;
        String reason;
        boolean off = false;
        control.attach(exciter);
        try {
            run.runPasses();
            status = SweepStatus.COMPLETED;
            reason = "all " + plan.passCount() + " pass(es) completed, " + run.stepCount() + " steps";
            off = true;
        } catch (SweepStop stop) {
            status = stop.limit ? SweepStatus.LIMIT : SweepStatus.CANCELLED;
            reason = stop.getMessage();
            try {
                switchOff(exciter, plan.rampS());
            } catch (RuntimeException offFault) {
                status = SweepStatus.FAULT;
                reason = reason + "; switching the output off failed: " + message(offFault);
            }
            off = true;
        } catch (RuntimeException fault) {
            status = SweepStatus.FAULT;
            reason = message(fault);
            try {
                exciter.setOutputEnabled(false);
            } catch (RuntimeException offFault) {
                reason = reason + "; switching the output off failed: " + message(offFault);
            }
            off = true;
        } finally {
            if (!off) {
                exciter.setOutputEnabled(false);
            }
            control.attach(null);
        }
        run.endPass(status == SweepStatus.COMPLETED ? null : reason);
        try {
            journal.sweepEnded(status, reason);
        } catch (RuntimeException journalFault) {
            status = SweepStatus.FAULT;
            reason = reason + "; the journal could not record the end of the sweep: " + message(journalFault);
        }
        return new SweepResult(plan, quantity, run.steps(), run.passes(), status, reason, run.sweepTimeS());
    }

    /** @return the number in at most 6 significant digits, without trailing zeros */
    static String number(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(6)).stripTrailingZeros().toPlainString();
    }

    static String message(RuntimeException e) {
        return e.getMessage() == null ? "an unexpected internal error that gave no description" : e.getMessage();
    }

    /**
     * Checks that the rig measures force on channel 0 and a motion on channel 1.
     *
     * @param channels the rig's channels
     * @return what channel 1 measures
     */
    static String checkChannels(List<ChannelInfo> channels) {
        if (channels.size() < 2) {
            throw new RigException("the rig offers " + channels.size()
                    + " channel(s); a sweep needs channel 0 = force and channel 1 = response");
        }
        if (!"force".equals(channels.get(0).quantity())) {
            throw new RigException("rig channel 0 ('" + channels.get(0).name() + "') measures " + channels.get(0).quantity()
                    + "; a sweep needs force on channel 0");
        }
        String response = channels.get(1).quantity();
        if (!List.of("displacement", "velocity", "acceleration").contains(response)) {
            throw new RigException("rig channel 1 ('" + channels.get(1).name() + "') measures " + response
                    + "; a sweep needs displacement, velocity or acceleration on channel 1");
        }
        return response;
    }

    /** Ramps the drive down and switches the output off; a failed ramp still ends with the output off. */
    static void switchOff(Exciter exciter, double rampS) {
        try {
            if (exciter.isOutputEnabled()) {
                exciter.rampTo(0.0, rampS);
            }
        } catch (RuntimeException rampFault) {
            // The output is switched off below in any case; the ramp is a courtesy to the specimen.
        } finally {
            exciter.setOutputEnabled(false);
        }
    }
}
