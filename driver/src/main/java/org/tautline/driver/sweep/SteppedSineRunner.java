package org.tautline.driver.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.BooleanSupplier;

import org.tautline.driver.RigException;
import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/**
 * Runs a stepped-sine sweep on a rig: at each step, settle, then fit force and response.
 *
 * <p>At each step the drive is set (phase-continuous), the rig settles for the plan's settle time,
 * then a whole number of cycles of force (channel 0) and response (channel 1) are fitted by the
 * three-parameter sine fit of IEEE Std 1057 with harmonics for distortion; the FRF value is the
 * ratio of the response and force phasors. Each completed step goes to the {@link SweepJournal}
 * before the next step is commanded.
 *
 * <p>How it stops: on completion or cancel the drive ramps down and the output is switched off; a
 * cancel discards the step in progress. On a fault (any exception from the rig, the fit, the journal
 * or the listener) the output is switched off at once with no ramp (the link may be the thing that
 * failed), the step in progress is discarded (never retried: a half-settled step would not match an
 * uninterrupted run), the fault is recorded in the journal, and a {@link SweepFaultException} keeping
 * the completed steps is thrown. The runner always leaves the output off, whatever happens.
 */
public final class SteppedSineRunner {
    /** Settle samples are read in chunks of this many so that a cancel is seen quickly. */
    private static final int SETTLE_CHUNK_SAMPLES = 4096;

    private final Rig rig;

    /** @param rig the rig to drive; channel 0 must be force and channel 1 the response */
    public SteppedSineRunner(Rig rig) {
        this.rig = rig;
    }

    /**
     * Runs the plan without a journal.
     *
     * @param plan what to run
     * @param listener progress after every step
     * @param cancelRequested polled between chunks; true stops the sweep after ramping down
     * @return the completed steps; {@code completed} is false after a cancel
     * @throws RigException when the rig cannot run the plan ({@link #check(SteppedSinePlan)}), or a
     *         {@link SweepFaultException} on a fault, after the output has been switched off
     */
    public SweepRecord run(SteppedSinePlan plan, SweepListener listener, BooleanSupplier cancelRequested) {
        return run(plan, listener, cancelRequested, SweepJournal.NONE);
    }

    /**
     * Runs the plan, recording every completed step in a journal.
     *
     * @param plan what to run
     * @param listener progress after every step
     * @param cancelRequested polled between chunks; true stops the sweep after ramping down
     * @param journal receives every completed step and how the sweep ended
     * @return the completed steps; {@code completed} is false after a cancel
     * @throws RigException when the rig cannot run the plan, or a {@link SweepFaultException} on a fault
     */
    public SweepRecord run(SteppedSinePlan plan, SweepListener listener, BooleanSupplier cancelRequested,
                           SweepJournal journal) {
        String quantity = check(plan);
        return sweep(new SweepRecord(plan, quantity, List.of(), 0.0, false), listener, cancelRequested, journal);
    }

    /**
     * Runs the steps of a plan that an interrupted sweep did not complete, after the ones it did.
     *
     * <p>The drive ramps up at the first step still to do. Points of the new steps carry rig times
     * that go on from the last completed step's, leaving out the ramp-up of the resumed session, so
     * a resumed sweep's rig times are those an uninterrupted sweep would have had.
     *
     * @param partial the sweep so far: its plan and the completed steps, in order
     * @param listener progress after every step, counting the earlier steps as done
     * @param cancelRequested polled between chunks
     * @param journal receives every new step and how the sweep ended
     * @return the whole sweep: the earlier steps, then the new ones
     * @throws RigException when the partial record does not fit its plan or this rig, or a {@link SweepFaultException}
     */
    public SweepRecord continueFrom(SweepRecord partial, SweepListener listener, BooleanSupplier cancelRequested,
                                    SweepJournal journal) {
        String quantity = check(partial.plan());
        if (!quantity.equals(partial.responseQuantity())) {
            throw new RigException("the sweep so far measured " + partial.responseQuantity() + " but this rig's channel 1"
                    + " measures " + quantity + "; resume on the rig the sweep was started on");
        }
        double[] f = partial.plan().frequenciesHz();
        if (partial.points().size() > f.length) {
            throw new RigException("the sweep so far has " + partial.points().size() + " steps but its plan only "
                    + f.length);
        }
        for (int i = 0; i < partial.points().size(); i++) {
            if (partial.points().get(i).frequencyHz() != f[i]) {
                throw new RigException("step " + (i + 1) + " of the sweep so far is at " + partial.points().get(i).frequencyHz()
                        + " Hz but the plan puts it at " + f[i] + " Hz; the steps do not belong to this plan");
            }
        }
        return sweep(partial, listener, cancelRequested, journal);
    }

    /**
     * Checks that this rig can run the plan: force on channel 0, a motion on channel 1, the drive within the limit.
     *
     * @param plan the plan
     * @return what channel 1 measures: displacement, velocity or acceleration
     * @throws RigException saying what does not fit
     */
    public String check(SteppedSinePlan plan) {
        String responseQuantity = checkChannels(rig.acquisition().channels());
        Exciter exciter = rig.exciter();
        if (plan.driveAmplitudeV() > exciter.maxAmplitudeV()) {
            throw new RigException("sweep plan: drive amplitude " + plan.driveAmplitudeV() + " V is above the exciter's limit of "
                    + exciter.maxAmplitudeV() + " V");
        }
        return responseQuantity;
    }

    private SweepRecord sweep(SweepRecord before, SweepListener listener, BooleanSupplier cancelRequested,
                              SweepJournal journal) {
        SteppedSinePlan plan = before.plan();
        Acquisition acquisition = rig.acquisition();
        Exciter exciter = rig.exciter();
        double fs = acquisition.sampleRateHz();
        double[] frequencies = plan.frequenciesHz();
        double[] remainingAfterStepS = remainingRigTimeAfterEachStep(plan, frequencies, fs);
        List<SweepPoint> points = new ArrayList<>(before.points());
        int firstStep = points.size();
        double offsetS = firstStep == 0 ? 0.0 : points.get(firstStep - 1).rigTimeS();
        double originS = acquisition.rigTimeS();
        long startWallNs = System.nanoTime();
        try {
            if (firstStep < frequencies.length) {
                exciter.setSine(frequencies[firstStep], 0.0);
                exciter.setOutputEnabled(true);
                exciter.rampTo(plan.driveAmplitudeV(), plan.rampS());
            }
            if (firstStep > 0) {
                originS = acquisition.rigTimeS();
            }
            for (int step = firstStep; step < frequencies.length; step++) {
                double f = frequencies[step];
                exciter.setSine(f, plan.driveAmplitudeV());
                if (!settle(acquisition, plan.settleTimeS(f), cancelRequested)) {
                    break;
                }
                SampleBlock block = acquisition.read(plan.integrationSamples(f, fs));
                double rigSoFar = offsetS + acquisition.rigTimeS() - originS;
                CompletedStep done = StepFit.fit(step, block, f, plan, fs, rigSoFar);
                journal.stepCompleted(done);
                points.add(done.point());
                double sessionRigS = acquisition.rigTimeS() - originS;
                double wallSoFar = (System.nanoTime() - startWallNs) * 1e-9;
                double remainingRig = remainingAfterStepS[step];
                double remainingWall = sessionRigS > 0 ? wallSoFar / sessionRigS * remainingRig : Double.NaN;
                listener.onStep(new SweepProgress(step + 1, frequencies.length, f, rigSoFar, remainingRig, remainingWall,
                        done.point()));
                if (cancelRequested.getAsBoolean()) {
                    break;
                }
            }
        } catch (RuntimeException fault) {
            throw stopOnFault(fault, before, points, "at step " + (points.size() + 1) + " of "
                    + frequencies.length + " (" + hz(frequencies[Math.min(points.size(), frequencies.length - 1)]) + ")",
                    journal);
        }
        try {
            switchOff(exciter, plan.rampS());
        } catch (RuntimeException fault) {
            throw stopOnFault(fault, before, points, "while switching the output off after step "
                    + points.size(), journal);
        }
        boolean completed = points.size() == frequencies.length;
        SweepRecord record = new SweepRecord(plan, before.responseQuantity(), points,
                offsetS + acquisition.rigTimeS() - originS, completed);
        journal.sweepEnded(completed ? SweepStatus.COMPLETED : SweepStatus.CANCELLED, completed
                ? "all " + frequencies.length + " steps completed"
                : "cancelled after " + points.size() + " of " + frequencies.length + " steps");
        return record;
    }

    /** Switches the output off at once, records the fault, and builds the exception to throw. */
    private SweepFaultException stopOnFault(RuntimeException fault, SweepRecord before, List<SweepPoint> points,
                                            String where, SweepJournal journal) {
        try {
            rig.exciter().setOutputEnabled(false);
        } catch (RuntimeException offFault) {
            fault.addSuppressed(offFault);
        }
        String cause = fault.getMessage() == null ? fault.getClass().getName() : fault.getMessage();
        try {
            journal.sweepEnded(SweepStatus.FAULT, cause);
        } catch (RuntimeException journalFault) {
            fault.addSuppressed(journalFault);
        }
        // The rig clock may be unreadable after a fault: the partial record ends at its last completed step.
        double rigTimeS = points.isEmpty() ? 0.0 : points.get(points.size() - 1).rigTimeS();
        SweepRecord partial = new SweepRecord(before.plan(), before.responseQuantity(), points, rigTimeS, false);
        return new SweepFaultException("sweep stopped by a fault " + where + "; the output is off and the "
                + points.size() + " completed step(s) are kept: " + cause, partial, fault);
    }

    private static String hz(double f) {
        return String.format(Locale.ROOT, "%.2f Hz", f);
    }

    /** Planned rig time still to go after each step: the later steps and the final ramp, s. */
    private static double[] remainingRigTimeAfterEachStep(SteppedSinePlan plan, double[] frequencies, double fs) {
        double[] remaining = new double[frequencies.length];
        double toGo = plan.rampS();
        for (int i = frequencies.length - 1; i >= 0; i--) {
            remaining[i] = toGo;
            toGo += plan.stepRigTimeS(frequencies[i], fs);
        }
        return remaining;
    }

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

    /** Reads and discards the settle span; returns false if a cancel arrived. */
    private static boolean settle(Acquisition acquisition, double settleS, BooleanSupplier cancelRequested) {
        long remaining = (long) Math.ceil(settleS * acquisition.sampleRateHz());
        while (remaining > 0) {
            if (cancelRequested.getAsBoolean()) {
                return false;
            }
            int chunk = (int) Math.min(remaining, SETTLE_CHUNK_SAMPLES);
            acquisition.read(chunk);
            remaining -= chunk;
        }
        return !cancelRequested.getAsBoolean();
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
