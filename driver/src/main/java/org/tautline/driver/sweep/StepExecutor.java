package org.tautline.driver.sweep;

import java.util.Locale;
import java.util.Optional;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.signal.SineFit;
import org.tautline.analysis.signal.SinePhasor;
import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/**
 * Runs one step of an adaptive sweep: change frequency, settle (detected or a fixed dwell), hold the level, fit.
 *
 * <p>Every block read, settling or integrating, is checked against the safety limits before anything
 * else is done with it, and a cancel is seen before every block; either stops the step with a
 * {@link SweepStop} that the runner turns into a ramp-down. Drive changes are ramps at the plan's
 * rate, never steps.
 */
final class StepExecutor {
    /** Most drive corrections per step before the level control gives up and warns. */
    static final int MAX_LEVEL_CORRECTIONS = 6;

    private final Rig rig;
    private final AdaptiveSweepPlan plan;
    private final String responseQuantity;
    private final BooleanSupplier cancelRequested;
    private final double fs;
    private double driveV;

    StepExecutor(Rig rig, AdaptiveSweepPlan plan, String responseQuantity, BooleanSupplier cancelRequested,
                 double startDriveV) {
        this.rig = rig;
        this.plan = plan;
        this.responseQuantity = responseQuantity;
        this.cancelRequested = cancelRequested;
        this.fs = rig.acquisition().sampleRateHz();
        this.driveV = startDriveV;
    }

    /** @return the drive now commanded, V */
    double driveV() {
        return driveV;
    }

    /**
     * Runs the step.
     *
     * @param index the step's place in the sweep
     * @param f the step frequency, Hz
     * @param tauS time constant of the slowest mode near f, s
     * @param controller the force control, or null under drive control
     * @param rigOriginS rig time the sweep's times count from, s
     * @param settleEvents told SETTLING at the start and the final settle state before integrating
     * @return what the step gave
     */
    StepOutcome run(int index, double f, double tauS, LevelController controller, double rigOriginS,
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
            Settled settled = settle(f, tauS);
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
        int samples = (int) Math.max(16, Math.round(plan.integrationCycles() * fs / f));
        SampleBlock block = checkedRead(samples, f);
        CompletedStep step = StepFit.fit(index, block, f, driveV, plan.harmonicOrder(), fs,
                acquisition.rigTimeS() - rigOriginS);
        return new StepOutcome(step, state, settleS, Optional.ofNullable(warning));
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

    private Settled settle(double f, double tauS) {
        int cycles = SettleDetector.blockCycles(tauS, f);
        int blockSamples = (int) Math.max(16, Math.round(cycles * fs / f));
        double blockS = blockSamples / fs;
        if (plan.fixedDwellS() > 0) {
            long remaining = Math.max(1, Math.round(plan.fixedDwellS() * fs));
            double forceN = Double.NaN;
            while (remaining > 0) {
                int n = (int) Math.min(remaining, blockSamples);
                SampleBlock block = checkedRead(n, f);
                remaining -= n;
                if (remaining == 0) {
                    forceN = SineFit.threeParameter(block.samples()[0], fs, f).amplitude();
                }
            }
            return new Settled(SettleState.FIXED_DWELL, forceN);
        }
        SettleDetector detector = new SettleDetector(plan.settleTolerance(), tauS, blockS);
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

    private SampleBlock checkedRead(int samples, double f) {
        if (cancelRequested.getAsBoolean()) {
            throw new SweepStop(false, String.format(Locale.ROOT, "cancelled during the step at %.2f Hz", f));
        }
        SampleBlock block = rig.acquisition().read(samples);
        Optional<String> trip = plan.limits().check(block.samples(), responseQuantity, f);
        if (trip.isPresent()) {
            throw new SweepStop(true, trip.get());
        }
        return block;
    }
}
