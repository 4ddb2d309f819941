package org.tautline.driver.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.BooleanSupplier;

import org.tautline.analysis.modal.FittedMode;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;

/**
 * Runs an {@link AdaptiveSweepPlan}: a coarse pass, then refinement of each resonance found, per level and direction.
 *
 * <p>Each step settles by {@link SettleDetector} (or the plan's fixed dwell), holds the force by
 * {@link LevelController} under force control, and is fitted over whole cycles. The coarse pass is log-spaced
 * and stays coarse in flat regions; each peak it shows is then located and refined by a
 * {@link ResonanceTracker} with spacing tied to its half-power bandwidth, in the pass's direction so
 * successive steps are small and settle fast, until the local modal fit's standard errors meet the plan's
 * targets or the pass's time budget runs out.
 *
 * <p>How it stops: after the last pass the drive ramps down over the plan's ramp time and the output is
 * switched off. A safety limit, a cancel, a link fault or a fault of the engine does the same: the
 * drive is ramped down (a ramp that itself fails still ends with the output off, never a step to zero
 * commanded on purpose), the output is switched off, the reason goes to the journal, and the result
 * keeps every step done, with status LIMIT, CANCELLED or FAULT.
 */
public final class AdaptiveSweepRunner {
    /** A mode counts as near a step within this many of its half-power bandwidths. */
    static final double NEAR_BANDWIDTHS = 20.0;

    private final Rig rig;

    /** @param rig the rig; channel 0 force, channel 1 the response */
    public AdaptiveSweepRunner(Rig rig) {
        this.rig = rig;
    }

    /**
     * Runs the plan.
     *
     * @param plan what to run
     * @param listener progress events
     * @param cancelRequested polled before every block
     * @param journal receives every completed step and how the sweep ended
     * @return the passes and how the sweep ended; the output is off
     * @throws RigException when the rig cannot run the plan (nothing was excited)
     */
    public AdaptiveSweepResult run(AdaptiveSweepPlan plan, SweepEventListener listener, BooleanSupplier cancelRequested,
                                   SweepJournal journal) {
        String quantity = SteppedSineRunner.checkChannels(rig.acquisition().channels());
        Exciter exciter = rig.exciter();
        if (plan.limits().driveV() > exciter.maxAmplitudeV()) {
            throw new RigException("sweep plan: limits.driveV " + plan.limits().driveV()
                    + " V is above the exciter's limit of " + exciter.maxAmplitudeV() + " V");
        }
        double originS = rig.acquisition().rigTimeS();
        List<AdaptivePass> passes = new ArrayList<>();
        PassRun current = null;
        SweepStatus status = SweepStatus.COMPLETED;
        String reason;
        try {
            for (double level : plan.levels()) {
                for (SweepDirection direction : plan.passes()) {
                    int stepsSoFar = passes.stream().mapToInt(p -> p.points().size()).sum();
                    current = new PassRun(plan, level, direction, quantity, listener, cancelRequested, journal,
                            stepsSoFar);
                    passes.add(current.run());
                    current = null;
                }
            }
            reason = "all " + passes.size() + " pass(es) completed";
        } catch (SweepStop stop) {
            status = stop.limit ? SweepStatus.LIMIT : SweepStatus.CANCELLED;
            reason = stop.getMessage();
        } catch (RuntimeException fault) {
            status = SweepStatus.FAULT;
            reason = "fault: " + (fault.getMessage() == null ? fault.getClass().getName() : fault.getMessage());
        }
        if (current != null) {
            passes.add(current.partial(reason));
        }
        try {
            SteppedSineRunner.switchOff(exciter, plan.rampS());
        } catch (RuntimeException offFault) {
            status = SweepStatus.FAULT;
            reason = reason + "; switching the output off failed: " + offFault.getMessage();
        }
        journal.sweepEnded(status, reason);
        return new AdaptiveSweepResult(passes, status, reason, rig.acquisition().rigTimeS() - originS);
    }

    /** The state of one pass while it runs. */
    private final class PassRun {
        private final AdaptiveSweepPlan plan;
        private final double level;
        private final SweepDirection direction;
        private final String quantity;
        private final SweepEventListener listener;
        private final SweepJournal journal;
        private final StepExecutor executor;
        private final LevelController controller;
        private final double originS;
        private final List<SweepPoint> points = new ArrayList<>();
        private final List<ResonanceTracker> trackers = new ArrayList<>();
        private final List<String> warnings = new ArrayList<>();
        private double settleS;
        private int plannedSteps;
        private final int firstIndex;
        private String phase = "coarse";

        PassRun(AdaptiveSweepPlan plan, double level, SweepDirection direction, String quantity,
                SweepEventListener listener, BooleanSupplier cancel, SweepJournal journal, int firstIndex) {
            this.firstIndex = firstIndex;
            this.plan = plan;
            this.level = level;
            this.direction = direction;
            this.quantity = quantity;
            this.listener = listener;
            this.journal = journal;
            boolean force = plan.levelMode() == LevelMode.FORCE;
            this.controller = force ? new LevelController(level, plan.levelTolerance(), plan.limits().driveV()) : null;
            this.executor = new StepExecutor(rig, plan, quantity, cancel, 0.0);
            this.originS = rig.acquisition().rigTimeS();
        }

        AdaptivePass run() {
            double[] coarse = ordered(plan.coarseFrequenciesHz());
            plannedSteps = coarse.length;
            Exciter exciter = rig.exciter();
            exciter.setSine(coarse[0], 0.0);
            exciter.setOutputEnabled(true);
            executor.rampDrive(controller == null ? level : plan.initialDriveV(), plan.rampS());
            for (double f : coarse) {
                step(f);
            }
            phase = "refine";
            for (double guess : ResonanceTracker.coarsePeaksHz(SweepRecord.frfOf(points, quantity))) {
                trackers.add(new ResonanceTracker(guess, plan.initialDampingRatio()));
            }
            List<ResonanceTracker> order = new ArrayList<>(trackers);
            if (direction == SweepDirection.DOWN) {
                java.util.Collections.reverse(order);
            }
            plannedSteps += order.size() * 30;
            List<FittedMode> modes = new ArrayList<>();
            boolean allMet = true;
            for (ResonanceTracker tracker : order) {
                boolean met = false;
                while (!met && !tracker.exhausted() && elapsedS() < plan.timeBudgetS()) {
                    for (double f : ordered(tracker.nextBatch(points))) {
                        if (elapsedS() >= plan.timeBudgetS()) {
                            break;
                        }
                        step(f);
                    }
                    met = tracker.update(SweepRecord.frfOf(points, quantity), plan.frequencyRelStd(),
                            plan.dampingRelStd());
                }
                tracker.fit().ifPresent(modes::add);
                if (!met) {
                    allMet = false;
                    warnings.add(String.format(Locale.ROOT, "accuracy targets not met for the resonance near %.2f Hz%s",
                            tracker.frequencyHz(), elapsedS() >= plan.timeBudgetS() ? " (time budget used up)"
                                    : tracker.lastFitProblem().isEmpty() ? "" : ": " + tracker.lastFitProblem()));
                }
            }
            executor.rampDrive(0.0, plan.rampS());
            rig.exciter().setOutputEnabled(false);
            return finish(modes, allMet);
        }

        AdaptivePass partial(String reason) {
            warnings.add("stopped: " + reason);
            return finish(List.of(), false);
        }

        private AdaptivePass finish(List<FittedMode> modes, boolean met) {
            return new AdaptivePass(level, direction, points, quantity, elapsedS(), settleS, modes, met, warnings);
        }

        private double elapsedS() {
            return rig.acquisition().rigTimeS() - originS;
        }

        private double[] ordered(double[] increasing) {
            double[] f = increasing.clone();
            java.util.Arrays.sort(f);
            if (direction == SweepDirection.DOWN) {
                for (int i = 0; i < f.length / 2; i++) {
                    double t = f[i];
                    f[i] = f[f.length - 1 - i];
                    f[f.length - 1 - i] = t;
                }
            }
            return f;
        }

        /** Time constant of the slowest mode near f: refined or located ones, else the plan's initial damping at f. */
        private double tauS(double f) {
            double tau = 1.0 / (plan.initialDampingRatio() * 2 * Math.PI * f);
            boolean near = false;
            double nearest = 0;
            for (ResonanceTracker t : trackers) {
                if (Math.abs(f - t.frequencyHz()) <= NEAR_BANDWIDTHS * 2 * t.dampingRatio() * t.frequencyHz()) {
                    nearest = near ? Math.max(nearest, t.tauS()) : t.tauS();
                    near = true;
                }
            }
            return near ? nearest : tau;
        }

        private void step(double f) {
            double tau = tauS(f);
            int index = points.size();
            double etaS = Math.max(0, plannedSteps - index) * (Math.log(1 / plan.settleTolerance()) * tau
                    + plan.integrationCycles() / f);
            StepOutcome outcome = executor.run(firstIndex + index, f, tau, controller, originS,
                    state -> listener.onEvent(new SweepEvent(phase, level, direction, index, plannedSteps, f, state,
                            elapsedS(), etaS, false, null)));
            journal.stepCompleted(outcome.step());
            points.add(outcome.step().point());
            settleS += outcome.settleS();
            outcome.warning().ifPresent(warnings::add);
            if (outcome.settleState() == SettleState.TIMED_OUT) {
                warnings.add(String.format(Locale.ROOT, "settling timed out at %.2f Hz", f));
            }
            listener.onEvent(new SweepEvent(phase, level, direction, index + 1, plannedSteps, f,
                    outcome.settleState(), elapsedS(), etaS, true, outcome.step().point()));
        }
    }
}
