package org.tautline.driver.sweep;

import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.DoubleSupplier;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.signal.SineFit;
import org.tautline.analysis.signal.SinePhasor;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/**
 * Measures one step: change frequency, settle (detected or a fixed dwell), hold the level, fit.
 *
 * <p>Every block read, settling or integrating, is checked against the plan's safety limits before anything
 * else is done with it, and a stop request is seen before every block; either ends the step with a
 * {@link SweepStop} that the engine turns into a ramp-down. Drive changes are ramps at the plan's rate, never
 * steps.
 */
final class StepExecutor {
    /** Most drive corrections per step before the level control gives up and warns. */
    static final int MAX_LEVEL_CORRECTIONS = 6;
    /** Samples per block while dwelling a fixed time, so that limits and stops are seen often. */
    static final int DWELL_BLOCK_SAMPLES = 4096;

    private final Rig rig;
    private final SweepPlan plan;
    private final String responseQuantity;
    private final SweepControl control;
    private final double fs;
    private double driveV;

    StepExecutor(Rig rig, SweepPlan plan, String responseQuantity, SweepControl control) {
        this.rig = rig;
        this.plan = plan;
        this.responseQuantity = responseQuantity;
        this.control = control;
        this.fs = rig.acquisition().sampleRateHz();
    }

    /** @return the drive now commanded, V */
    double driveV() {
        return driveV;
    }

    /** @param v the drive a step taken over from an earlier session ended at, V */
    void assumeDriveV(double v) {
        driveV = v;
    }

    /**
     * Measures the step.
     *
     * @param f the step frequency, Hz
     * @param tauS time constant of the slowest mode near f, s
     * @param controller the force control, or null under drive control
     * @param sweepClock the sweep's rig time now, s
     * @param settleEvents told SETTLING at the start and the final settle state before integrating
     * @return what the step gave
     */
    StepOutcome run(double f, double tauS, LevelController controller, DoubleSupplier sweepClock,
                    Consumer<SettleState> settleEvents) {
        Exciter exciter = rig.exciter();
        Acquisition acquisition = rig.acquisition();
        double settleStartS = acquisition.rigTimeS();
        exciter.setSine(f, driveV);
        settleEvents.accept(SettleState.SETTLING);
        String warning = null;
        SettleState state;
        int corrections = 0;
        while (true) {
            Settled settled = settle(f, tauS, controller != null);
            state = settled.state;
            if (controller == null || controller.within(settled.forceN)) {
                break;
            }
            double next = controller.nextDriveV(driveV, settled.forceN);
            if (corrections >= MAX_LEVEL_CORRECTIONS || (controller.atLimit(driveV) && next >= driveV)) {
                warning = String.format(Locale.ROOT, "force level not reached at %.2f Hz: %.4g N of %.4g N%s", f,
                        settled.forceN, controller.targetN(), controller.atLimit(driveV)
                                ? " with the drive at its limit " + controller.maxDriveV() + " V" : "");
                break;
            }
            rampDrive(next);
            corrections++;
        }
        settleEvents.accept(state);
        double settleS = acquisition.rigTimeS() - settleStartS;
        SampleBlock block = checkedRead(plan.integrationSamples(f, fs), f);
        StepFit fit = StepFit.of(block, f, driveV, plan.harmonicOrder(), fs, sweepClock.getAsDouble());
        return new StepOutcome(fit, block, state, settleS, Optional.ofNullable(warning));
    }

    /** Ramps the drive to a new amplitude at the plan's rate (never a step). */
    void rampDrive(double targetV) {
        rampDrive(targetV, 0.0);
    }

    /**
     * Ramps the drive to a new amplitude, no faster than the plan's rate and over at least a given time.
     *
     * @param targetV new peak drive, V (capped at the drive limit)
     * @param minDurationS shortest ramp, s
     */
    void rampDrive(double targetV, double minDurationS) {
        double target = Math.min(targetV, plan.limits().driveV());
        rig.exciter().rampTo(target, Math.max(minDurationS, Math.abs(target - driveV) / plan.driveRateVPerS()));
        driveV = target;
    }

    private record Settled(SettleState state, double forceN) {
    }

    private Settled settle(double f, double tauS, boolean needForce) {
        if (!plan.settle().detects()) {
            return dwell(f, tauS, needForce);
        }
        int blockSamples = detectionBlockSamples(f, tauS);
        double blockS = blockSamples / fs;
        SettleDetector detector = new SettleDetector(plan.settle().tolerance(), tauS, blockS);
        double forceN = Double.NaN;
        while (!detector.done()) {
            SampleBlock block = checkedRead(blockSamples, f);
            SinePhasor[] fit = SineFit.fitChannels(new double[][] {block.samples()[0], block.samples()[1]}, fs, f, 1);
            forceN = fit[0].amplitude();
            if (!(forceN > 0)) {
                detector.feed(Complex.ZERO, 0.0, blockS);
                continue;
            }
            Complex h = fit[1].phasor().divide(fit[0].phasor());
            double relStd = Math.hypot(fit[0].amplitudeStd() / forceN,
                    fit[1].amplitude() > 0 ? fit[1].amplitudeStd() / fit[1].amplitude() : 0.0);
            detector.feed(h, relStd * h.norm(), blockS);
        }
        return new Settled(detector.state(), forceN);
    }

    /**
     * A fixed dwell, read in short blocks; under force control the dwell ends with one detection-length block
     * (the dwell is lengthened to hold it) whose fit gives the force.
     */
    private Settled dwell(double f, double tauS, boolean needForce) {
        long remaining = (long) Math.ceil(plan.settle().dwellS(f) * fs);
        int tail = needForce ? detectionBlockSamples(f, tauS) : 0;
        remaining = Math.max(0, remaining - tail);
        while (remaining > 0) {
            int n = (int) Math.min(remaining, DWELL_BLOCK_SAMPLES);
            checkedRead(n, f);
            remaining -= n;
        }
        if (!needForce) {
            return new Settled(SettleState.FIXED_DWELL, Double.NaN);
        }
        SampleBlock last = checkedRead(tail, f);
        return new Settled(SettleState.FIXED_DWELL, SineFit.threeParameter(last.samples()[0], fs, f).amplitude());
    }

    private int detectionBlockSamples(double f, double tauS) {
        return (int) Math.max(16, Math.round(SettleDetector.blockCycles(tauS, f) * fs / f));
    }

    /**
     * Reads one block after checking for a stop, checks it against the limits before anything else, and discards it
     * when a stop came, or the output went off, while it was read.
     */
    SampleBlock checkedRead(int samples, double f) {
        String stop = control.reason();
        if (stop != null) {
            throw new SweepStop(false, String.format(Locale.ROOT, "%s during the step at %.2f Hz", stop, f));
        }
        SampleBlock block = rig.acquisition().read(samples);
        Optional<String> trip = plan.limits().check(block.samples(), responseQuantity, f);
        if (trip.isPresent()) {
            throw new SweepStop(true, trip.get());
        }
        // A stop that came during the read may have switched the output off part way through it (an emergency
        // stop does so at once): such a block is never used.
        stop = control.reason();
        if (stop != null) {
            throw new SweepStop(false, String.format(Locale.ROOT, "%s during the step at %.2f Hz", stop, f));
        }
        if (!rig.exciter().isOutputEnabled()) {
            throw new RigException(String.format(Locale.ROOT, "the rig's output went off during the step at %.2f Hz"
                    + " without being asked to; the step is discarded", f));
        }
        return block;
    }
}
