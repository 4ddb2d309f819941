package org.tautline.driver.sweep;

import java.util.List;
import java.util.OptionalDouble;

import org.tautline.analysis.modal.FittedMode;

/** The planner of a uniform plan: the coarse steps in the pass's direction, and nothing else. */
final class UniformPlanner implements StepPlanner {
    private final SweepPlan plan;
    private final double[] frequencies;

    UniformPlanner(SweepPlan plan, SweepDirection direction) {
        this.plan = plan;
        this.frequencies = AdaptivePlanner.ordered(plan.coarseFrequenciesHz(), direction);
    }

    @Override
    public OptionalDouble next(List<SweepPoint> points, double elapsedS) {
        return points.size() < frequencies.length ? OptionalDouble.of(frequencies[points.size()]) : OptionalDouble.empty();
    }

    @Override
    public StepPhase phase() {
        return StepPhase.COARSE;
    }

    @Override
    public double tauS(double frequencyHz) {
        return 1.0 / (plan.initialDampingRatio() * 2 * Math.PI * frequencyHz);
    }

    @Override
    public int plannedSteps(int done) {
        return frequencies.length;
    }

    @Override
    public double remainingRigTimeS(int done, double sampleRateHz) {
        double toGo = plan.rampS();
        for (int i = done; i < frequencies.length; i++) {
            toGo += plan.expectedStepRigTimeS(frequencies[i], sampleRateHz);
        }
        return toGo;
    }

    @Override
    public List<FittedMode> modes() {
        return List.of();
    }

    @Override
    public boolean targetsMet() {
        return true;
    }

    @Override
    public List<String> warnings() {
        return List.of();
    }
}
