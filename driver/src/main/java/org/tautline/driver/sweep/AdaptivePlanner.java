package org.tautline.driver.sweep;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.tautline.analysis.modal.FittedMode;

/**
 * The planner of an adaptive plan: the coarse steps, then each resonance they show, refined in turn.
 *
 * <p>The coarse pass is log-spaced and stays coarse in flat regions; each peak it shows is then located and
 * refined by a {@link ResonanceTracker} with spacing tied to its half-power bandwidth, in the pass's direction
 * so that successive steps are small and settle fast, until the local modal fit's standard errors meet the
 * plan's targets or the pass's time budget runs out. No step lies outside the plan's band.
 */
final class AdaptivePlanner implements StepPlanner {
    /** A mode counts as near a step within this many of its half-power bandwidths. */
    static final double NEAR_BANDWIDTHS = 20.0;
    /** Steps a refinement is expected to take, for progress estimates. */
    private static final int EXPECTED_STEPS_PER_RESONANCE = 30;

    private final SweepPlan plan;
    private final Refinement targets;
    private final SweepDirection direction;
    private final String responseQuantity;
    private final ArrayDeque<Double> pending = new ArrayDeque<>();
    private final List<ResonanceTracker> trackers = new ArrayList<>();
    private final List<ResonanceTracker> order = new ArrayList<>();
    private final List<FittedMode> modes = new ArrayList<>();
    private final List<String> warnings = new ArrayList<>();
    private boolean coarseIssued;
    private boolean refining;
    private int current;
    private boolean awaitingUpdate;
    private boolean met;
    private boolean allMet = true;
    private StepPhase phase = StepPhase.COARSE;

    AdaptivePlanner(SweepPlan plan, SweepDirection direction, String responseQuantity) {
        this.plan = plan;
        this.targets = plan.refinement().orElseThrow();
        this.direction = direction;
        this.responseQuantity = responseQuantity;
    }

    @Override
    public OptionalDouble next(List<SweepPoint> points, double elapsedS) {
        if (!coarseIssued) {
            coarseIssued = true;
            for (double f : ordered(plan.coarseFrequenciesHz(), direction)) {
                pending.add(f);
            }
        }
        if (!pending.isEmpty() && !(refining && elapsedS >= targets.timeBudgetS())) {
            return OptionalDouble.of(pending.poll());
        }
        pending.clear();
        if (!refining) {
            startRefining(points);
        }
        while (current < order.size()) {
            ResonanceTracker tracker = order.get(current);
            if (awaitingUpdate) {
                met = tracker.update(SweepPass.frfOf(points, responseQuantity), targets.frequencyRelStd(),
                        targets.dampingRelStd());
                awaitingUpdate = false;
            }
            if (!met && !tracker.exhausted() && elapsedS < targets.timeBudgetS()) {
                phase = tracker.located() ? StepPhase.REFINE : StepPhase.LOCATE;
                for (double f : ordered(inBand(tracker.nextBatch(points)), direction)) {
                    pending.add(f);
                }
                awaitingUpdate = true;
                if (!pending.isEmpty()) {
                    return OptionalDouble.of(pending.poll());
                }
                continue;
            }
            finish(tracker, elapsedS);
            current++;
            met = false;
        }
        return OptionalDouble.empty();
    }

    private void startRefining(List<SweepPoint> points) {
        refining = true;
        for (double guess : ResonanceTracker.coarsePeaksHz(SweepPass.frfOf(points, responseQuantity))) {
            trackers.add(new ResonanceTracker(guess, plan.initialDampingRatio()));
        }
        order.addAll(trackers);
        if (direction == SweepDirection.DOWN) {
            Collections.reverse(order);
        }
    }

    private void finish(ResonanceTracker tracker, double elapsedS) {
        tracker.fit().ifPresent(modes::add);
        if (!met) {
            allMet = false;
            warnings.add(String.format(Locale.ROOT, "accuracy targets not met for the resonance near %.2f Hz%s",
                    tracker.frequencyHz(), elapsedS >= targets.timeBudgetS() ? " (time budget used up)"
                            : tracker.lastFitProblem().isEmpty() ? "" : ": " + tracker.lastFitProblem()));
        }
    }

    private double[] inBand(double[] frequencies) {
        return Arrays.stream(frequencies).filter(f -> f >= plan.startHz() && f <= plan.stopHz()).toArray();
    }

    @Override
    public StepPhase phase() {
        return refining ? phase : StepPhase.COARSE;
    }

    /** Time constant of the slowest mode near f: refined or located ones, else the plan's initial damping at f. */
    @Override
    public double tauS(double frequencyHz) {
        double tau = 1.0 / (plan.initialDampingRatio() * 2 * Math.PI * frequencyHz);
        boolean near = false;
        double nearest = 0;
        for (ResonanceTracker t : trackers) {
            if (Math.abs(frequencyHz - t.frequencyHz()) <= NEAR_BANDWIDTHS * 2 * t.dampingRatio() * t.frequencyHz()) {
                nearest = near ? Math.max(nearest, t.tauS()) : t.tauS();
                near = true;
            }
        }
        return near ? nearest : tau;
    }

    @Override
    public int plannedSteps(int done) {
        int expected = plan.coarseStepCount() + (refining ? trackers.size() : 0) * EXPECTED_STEPS_PER_RESONANCE;
        return Math.max(done + pending.size(), expected);
    }

    @Override
    public double remainingRigTimeS(int done, double sampleRateHz) {
        double f = 0.5 * (plan.startHz() + plan.stopHz());
        double perStep = plan.expectedStepRigTimeS(f, sampleRateHz);
        return Math.max(0, plannedSteps(done) - done) * perStep + plan.rampS();
    }

    @Override
    public List<FittedMode> modes() {
        return List.copyOf(modes);
    }

    @Override
    public boolean targetsMet() {
        return allMet && current >= order.size() && refining;
    }

    @Override
    public List<String> warnings() {
        return List.copyOf(warnings);
    }

    /**
     * @param increasing frequencies, any order
     * @param direction the pass's direction
     * @return the frequencies sorted increasing for UP, decreasing for DOWN
     */
    static double[] ordered(double[] increasing, SweepDirection direction) {
        double[] f = increasing.clone();
        Arrays.sort(f);
        if (direction == SweepDirection.DOWN) {
            for (int i = 0; i < f.length / 2; i++) {
                double t = f[i];
                f[i] = f[f.length - 1 - i];
                f[f.length - 1 - i] = t;
            }
        }
        return f;
    }
}
