package org.tautline.driver.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.tautline.driver.RigDataLostException;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;

/**
 * One run of the {@link SweepEngine}: the passes, the steps taken over from earlier sessions and the sweep clock.
 *
 * <p>The sweep clock counts rig seconds from the start of the sweep across sessions: the rig's own clock from
 * the start of a fresh run, and from the last recorded step for a continued one (whose ramp-up is left out, so
 * that its times are those an uninterrupted sweep would have had). A pass's elapsed time, which its planner's
 * time budget is measured in, runs from the previous pass's last step (or the sweep's start) to the pass's
 * last completed step, so recorded and fresh steps give the planner the same figures.
 */
final class EngineRun {
    private final Rig rig;
    private final SweepPlan plan;
    private final String quantity;
    private final List<CompletedStep> recorded;
    private final SweepEventListener listener;
    private final SweepJournal journal;
    private final SweepControl control;
    private final StepExecutor executor;
    private final double fs;
    private final List<CompletedStep> steps = new ArrayList<>();
    private final List<SweepPass> passes = new ArrayList<>();
    private boolean live;
    private boolean outputOn;
    private double offsetS;
    private double originS;
    private double lastStepTimeS;
    private PassState pass;

    EngineRun(Rig rig, SweepPlan plan, String quantity, List<CompletedStep> recorded, SweepEventListener listener,
              SweepControl control, SweepJournal journal) {
        this.rig = rig;
        this.plan = plan;
        this.quantity = quantity;
        this.recorded = List.copyOf(recorded);
        this.listener = listener;
        this.journal = journal;
        this.control = control;
        this.executor = new StepExecutor(rig, plan, quantity, control);
        this.fs = rig.acquisition().sampleRateHz();
        this.originS = rig.acquisition().rigTimeS();
    }

    /** The state of the pass being run, kept so that a stopped pass can still be reported. */
    private static final class PassState {
        final int index;
        final StepPlanner planner;
        final LevelController controller;
        final double startS;
        final List<SweepPoint> points = new ArrayList<>();
        final List<String> warnings = new ArrayList<>();
        final LevelShortfalls shortfalls;
        double settleS;
        int repeatedSteps;

        PassState(int index, StepPlanner planner, LevelController controller, double startS, double driveLimitV) {
            this.index = index;
            this.planner = planner;
            this.controller = controller;
            this.startS = startS;
            this.shortfalls = controller == null ? null : new LevelShortfalls(controller.targetN(), driveLimitV);
        }
    }

    List<CompletedStep> steps() {
        return steps;
    }

    List<SweepPass> passes() {
        return passes;
    }

    int stepCount() {
        return steps.size();
    }

    /** @return the sweep clock now, s: the rig's clock once live, the last recorded step's time before */
    double sweepTimeS() {
        if (!live) {
            return lastStepTimeS;
        }
        try {
            return offsetS + rig.acquisition().rigTimeS() - originS;
        } catch (RuntimeException clockLost) {
            // A rig whose clock cannot be read after a fault: the sweep ends at its last completed step.
            return lastStepTimeS;
        }
    }

    void runPasses() {
        for (int p = 0; p < plan.passCount(); p++) {
            double level = plan.passLevel(p);
            SweepDirection direction = plan.passDirection(p);
            StepPlanner planner = plan.adaptive() ? new AdaptivePlanner(plan, direction, quantity)
                    : new UniformPlanner(plan, direction);
            LevelController controller = plan.levelMode() == LevelMode.FORCE
                    ? new LevelController(level, plan.levelTolerance(), plan.limits().driveV()) : null;
            pass = new PassState(p, planner, controller, lastStepTimeS, plan.limits().driveV());
            runPass();
            endPass(null);
        }
    }

    private void runPass() {
        while (true) {
            double elapsedS = pass.points.isEmpty() ? 0.0 : lastStepTimeS - pass.startS;
            OptionalDouble next = pass.planner.next(pass.points, elapsedS);
            if (next.isEmpty()) {
                break;
            }
            double f = next.getAsDouble();
            int index = steps.size();
            if (index < recorded.size()) {
                takeOver(recorded.get(index), f);
            } else {
                measure(index, f);
            }
        }
        if (outputOn) {
            executor.rampDrive(0.0, plan.rampS());
            rig.exciter().setOutputEnabled(false);
            outputOn = false;
        }
    }

    /** Takes a recorded step in place of measuring it, after checking that it is the one the plan asks for. */
    private void takeOver(CompletedStep step, double f) {
        if (step.pass() != pass.index || step.point().frequencyHz() != f) {
            throw new RigException(String.format(Locale.ROOT, "the recorded steps do not belong to this plan: step %d"
                            + " was recorded at %.6f Hz in pass %d, where the plan now asks for %.6f Hz in pass %d",
                    step.index() + 1, step.point().frequencyHz(), step.pass() + 1, f, pass.index + 1));
        }
        executor.assumeDriveV(step.point().driveAmplitudeV());
        add(step);
    }

    private void measure(int index, double f) {
        if (!outputOn) {
            startOutput(f);
        }
        StepPhase phase = pass.planner.phase();
        double tauS = pass.planner.tauS(f);
        int planned = pass.planner.plannedSteps(pass.points.size());
        double remainingS = remainingRigTimeS();
        StepOutcome outcome = null;
        for (int attempt = 1; outcome == null; attempt++) {
            try {
                outcome = executor.run(f, tauS, pass.controller, this::sweepTimeS, state -> listener.onEvent(
                        event(phase, planned, f, state, remainingS, false, null)));
            } catch (RigDataLostException lost) {
                if (attempt > SweepEngine.MAX_STEP_REPEATS) {
                    throw new RigException(String.format(Locale.ROOT, "samples were lost %d times in a row at %.2f Hz,"
                            + " so the step could not be measured: %s", attempt, f, lost.getMessage()), lost);
                }
                pass.repeatedSteps++;
            }
        }
        CompletedStep step = new CompletedStep(index, pass.index, phase, outcome.fit().point(), outcome.fit().force(),
                outcome.fit().response(), outcome.settleState(), outcome.settleS(), outcome.warning());
        journal.stepCompleted(step, outcome.samples());
        add(step);
    }

    /** Switches the output on at the step's frequency and ramps up to the pass's drive. */
    private void startOutput(double f) {
        String stop = control.reason();
        if (stop != null) {
            // A stop asked for while the output is off (before the sweep, between passes, during an analysis between
            // two sweeps) excites nothing: without this the drive would go on and ramp up before the first block's check.
            throw new SweepStop(false, String.format(Locale.ROOT, "%s before the output was switched on at %.2f Hz",
                    stop, f));
        }
        Exciter exciter = rig.exciter();
        boolean resumedMidPass = !live && !pass.points.isEmpty();
        double startV = !pass.points.isEmpty() ? executor.driveV()
                : plan.levelMode() == LevelMode.FORCE ? plan.initialDriveV() : plan.passLevel(pass.index);
        exciter.setSine(f, 0.0);
        exciter.setOutputEnabled(true);
        outputOn = true;
        executor.assumeDriveV(0.0);
        String late = control.reason();
        if (late != null) {
            // A stop that came while the output was being switched on: the amplitude is still zero, so off at once
            // rather than after a ramp up and a block.
            exciter.setOutputEnabled(false);
            outputOn = false;
            throw new SweepStop(false, String.format(Locale.ROOT, "%s as the output was switched on at %.2f Hz, before"
                    + " any drive", late, f));
        }
        executor.rampDrive(startV, plan.rampS());
        if (!live) {
            live = true;
            if (!recorded.isEmpty()) {
                offsetS = lastStepTimeS;
                originS = rig.acquisition().rigTimeS();
            }
        }
        if (resumedMidPass) {
            pass.warnings.add(String.format(Locale.ROOT, "continued at %.2f Hz after an interruption", f));
        }
    }

    private void add(CompletedStep step) {
        steps.add(step);
        pass.points.add(step.point());
        pass.settleS += step.settleS();
        lastStepTimeS = step.point().rigTimeS();
        if (pass.shortfalls != null) {
            pass.shortfalls.add(step.point(), step.warning().isPresent());
        }
        if (step.settleState() == SettleState.TIMED_OUT) {
            pass.warnings.add(String.format(Locale.ROOT, "settling timed out at %.2f Hz", step.point().frequencyHz()));
        }
        int done = pass.points.size();
        listener.onEvent(event(step.phase(), pass.planner.plannedSteps(done), step.point().frequencyHz(),
                step.settleState(), remainingRigTimeS(), true, step.point()));
    }

    private SweepEvent event(StepPhase phase, int planned, double f, SettleState state, double remainingS,
                             boolean completed, SweepPoint point) {
        return new SweepEvent(pass.index, plan.passCount(), plan.passLevel(pass.index), plan.passDirection(pass.index),
                phase, pass.points.size(), planned, f, state, completed ? lastStepTimeS : sweepTimeS(), remainingS,
                completed, point);
    }

    private double remainingRigTimeS() {
        double laterPasses = (plan.passCount() - pass.index - 1) * plan.expectedRigTimeS(fs) / plan.passCount();
        return pass.planner.remainingRigTimeS(pass.points.size(), fs) + laterPasses;
    }

    /**
     * Reports the pass in progress, if any, as it stands.
     *
     * @param stopReason why the sweep stopped before the pass's end, or null when it ran to its end
     */
    void endPass(String stopReason) {
        if (pass == null) {
            return;
        }
        List<String> warnings = new ArrayList<>(pass.warnings);
        if (pass.shortfalls != null) {
            warnings.addAll(pass.shortfalls.warnings());
        }
        warnings.addAll(pass.planner.warnings());
        if (pass.repeatedSteps > 0) {
            warnings.add(pass.repeatedSteps + " step(s) measured again after samples were lost on the link");
        }
        if (stopReason != null) {
            warnings.add("stopped: " + stopReason);
        }
        passes.add(new SweepPass(pass.index, plan.passLevel(pass.index), plan.passDirection(pass.index), pass.points,
                quantity, sweepTimeS() - pass.startS, pass.settleS, pass.planner.modes(),
                stopReason == null && pass.planner.targetsMet(), stopReason == null, warnings));
        pass = null;
    }
}
