package org.tautline.driver.sweep;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.TreeSet;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.FittedMode;

/**
 * The planner of an adaptive plan: the coarse steps, a search for every resonance by the phase, then each band of
 * resonances found, refined in turn.
 *
 * <p>The coarse pass is log-spaced and stays coarse in flat regions. Its spacing cannot be tied to bandwidths not
 * yet known, so a sharp mode may fall between two steps and show no peak; the {@link PhaseSearch} then splits every
 * interval over which the phase falls fast until the steps resolve each fall. Each band where the phase falls is
 * filled and refined by a {@link ResonanceTracker} (all its modes together: a close pair of modes is fitted as a
 * pair) in the pass's direction, so that successive steps are small and settle fast, until the local modal fit's
 * standard errors meet the plan's targets or the pass's time budget runs out. A step disturbed by ringing from the
 * step before ({@link StepGrid}), or standing alone far off a local fit ({@link FitResiduals}), is left out of the
 * search and the fits and measured again beside. No step lies outside the plan's band. Every decision is a function of the points shown and the elapsed time, so a pass continued from its recorded
 * steps decides as the pass that recorded them.
 */
final class AdaptivePlanner implements StepPlanner {
    /** A band counts as near a step within this many of its half-power bandwidths. */
    static final double NEAR_BANDWIDTHS = 20.0;
    /** Most rounds of the phase search: each halves the flagged intervals, so this reaches 1/4096 of the coarse. */
    static final int MAX_SEARCH_ROUNDS = 12;
    /** Steps a band's refinement is expected to take, for progress estimates. */
    private static final int EXPECTED_STEPS_PER_BAND = 50;

    private final SweepPlan plan;
    private final Refinement targets;
    private final SweepDirection direction;
    private final String responseQuantity;
    private final ArrayDeque<Double> pending = new ArrayDeque<>();
    private final List<ResonanceTracker> trackers = new ArrayList<>();
    private final ArrayDeque<ResonanceTracker> queue = new ArrayDeque<>();
    private final List<FittedMode> modes = new ArrayList<>();
    private final List<String> warnings = new ArrayList<>();
    private final Set<Double> rejectedHz = new TreeSet<>();
    private boolean coarseIssued;
    private List<double[]> windows;
    private int window;
    private boolean searched;
    private int searchRounds;
    private ResonanceTracker active;
    private boolean finished;
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
        boolean overBudget = elapsedS >= targets.timeBudgetS();
        if (!pending.isEmpty() && !(phase != StepPhase.COARSE && overBudget)) {
            return OptionalDouble.of(pending.poll());
        }
        pending.clear();
        List<SweepPoint> usable = StepGrid.reliable(points, rejectedHz);
        Frf frf = SweepPass.frfOf(usable, responseQuantity);
        if (windows == null) {
            windows = new ArrayList<>(PhaseSearch.windows(frf, plan.startHz(), plan.stopHz()));
            if (direction == SweepDirection.DOWN) {
                Collections.reverse(windows);
            }
        }
        while (true) {
            if (active != null) {
                OptionalDouble step = refine(active, usable, points, elapsedS);
                if (step.isPresent()) {
                    return step;
                }
                active = queue.poll();
                continue;
            }
            if (window >= windows.size()) {
                if (!finished) {
                    finished = true;
                    noteDisturbed(points);
                }
                return OptionalDouble.empty();
            }
            double[] w = windows.get(window);
            if (!searched) {
                double[] splits = PhaseSearch.splits(frf, w[0], w[1], plan.initialDampingRatio());
                if (splits.length > 0 && searchRounds < MAX_SEARCH_ROUNDS && !overBudget) {
                    searchRounds++;
                    phase = StepPhase.LOCATE;
                    queueSteps(splits, points);
                    if (!pending.isEmpty()) {
                        return OptionalDouble.of(pending.poll());
                    }
                }
                if (splits.length > 0) {
                    allMet = false;
                    warnings.add(String.format(Locale.ROOT, "the search for resonances stopped (%s) with the phase"
                            + " still falling fast from %.2f to %.2f Hz: a mode there may be missed",
                            overBudget ? "time budget used up" : "after " + MAX_SEARCH_ROUNDS + " rounds", splits[0],
                            splits[splits.length - 1]));
                }
                searched = true;
                List<ResonanceTracker> found = new ArrayList<>();
                for (PhaseSearch.Region region : PhaseSearch.regions(frf, w[0], w[1], plan.initialDampingRatio())) {
                    found.add(new ResonanceTracker(region, plan.startHz(), plan.stopHz(), plan.initialDampingRatio()));
                }
                trackers.addAll(found);
                if (direction == SweepDirection.DOWN) {
                    Collections.reverse(found);
                }
                queue.addAll(found);
                active = queue.poll();
                continue;
            }
            window++;
            searched = false;
            searchRounds = 0;
        }
    }

    /** The next step of a band's refinement, or none when the band is done (its modes then reported). */
    private OptionalDouble refine(ResonanceTracker tracker, List<SweepPoint> usable, List<SweepPoint> points,
                                  double elapsedS) {
        if (awaitingUpdate) {
            met = update(tracker, usable);
            awaitingUpdate = false;
        }
        if (!met && !tracker.exhausted() && elapsedS < targets.timeBudgetS()) {
            boolean located = tracker.located();
            phase = located ? StepPhase.REFINE : StepPhase.LOCATE;
            for (double f : ordered(inBand(tracker.nextBatch(points, rejectedHz)), direction)) {
                pending.add(f);
            }
            if (!pending.isEmpty()) {
                awaitingUpdate = true;
                return OptionalDouble.of(pending.poll());
            }
            if (!located) {
                // Nothing new to measure and still no fit: one more fit, with a wider band, before giving up.
                met = update(tracker, usable);
            }
        }
        finish(tracker, elapsedS);
        met = false;
        return OptionalDouble.empty();
    }

    /** Fits a band and takes over the steps its fits rejected. */
    private boolean update(ResonanceTracker tracker, List<SweepPoint> usable) {
        boolean done = tracker.update(usable, responseQuantity, targets.frequencyRelStd(), targets.dampingRelStd());
        rejectedHz.addAll(tracker.rejectedHz());
        return done;
    }

    /**
     * Queues search steps, each moved off a disturbed step it would land on by 1/32 of a bandwidth at the initial
     * damping: the search splits no interval narrower than 1/8 of one, so the step stays clear of both ends.
     */
    private void queueSteps(double[] steps, List<SweepPoint> points) {
        List<Double> batch = new ArrayList<>();
        for (double f : steps) {
            StepGrid.add(batch, points, rejectedHz, f, plan.initialDampingRatio() * f / 32);
        }
        for (double f : ordered(inBand(StepGrid.sorted(batch)), direction)) {
            pending.add(f);
        }
    }

    private void noteDisturbed(List<SweepPoint> points) {
        boolean[] disturbed = StepGrid.disturbed(points, rejectedHz);
        List<String> at = new ArrayList<>();
        for (int i = 0; i < disturbed.length; i++) {
            if (disturbed[i]) {
                at.add(String.format(Locale.ROOT, "%.2f", points.get(i).frequencyHz()));
            }
        }
        if (!at.isEmpty()) {
            warnings.add(String.format(Locale.ROOT, "%d step(s) were disturbed (by ringing left from a strong response"
                    + " at the step before, or standing alone far off the local fit) and were left out of the search"
                    + " for resonances and of the local fits, and measured again beside: at %s Hz", at.size(),
                    String.join(", ", at)));
        }
    }

    private void finish(ResonanceTracker tracker, double elapsedS) {
        String budget = elapsedS >= targets.timeBudgetS() ? " (time budget used up)" : "";
        PhaseSearch.Region region = tracker.region();
        if (!tracker.located()) {
            allMet = false;
            warnings.add(String.format(Locale.ROOT, "no mode could be fitted where the phase falls by %.0f degrees"
                    + " from %.2f to %.2f Hz, so a resonance there is not reported%s%s", region.turnDegrees(),
                    region.lowHz(), region.highHz(), budget,
                    tracker.lastFitProblem().isEmpty() ? "" : ": " + tracker.lastFitProblem()));
            return;
        }
        for (FittedMode m : tracker.undetermined()) {
            allMet = false;
            warnings.add(String.format(Locale.ROOT, "a possible mode at %.2f Hz is not reported: the steps do not"
                    + " determine it (frequency standard error %.2g Hz, damping standard error %.0f %%)",
                    m.mode().frequencyHz(), m.frequencyStdHz(), 100 * m.dampingRatioStd() / m.mode().dampingRatio()));
        }
        for (FittedMode m : tracker.fit()) {
            if (duplicate(m)) {
                continue;
            }
            modes.add(m);
            if (!ResonanceTracker.meets(m, targets.frequencyRelStd(), targets.dampingRelStd())) {
                allMet = false;
                warnings.add(String.format(Locale.ROOT, "accuracy targets not met for the mode at %.2f Hz: standard"
                        + " errors %.2g of the frequency and %.2g of the damping (relative), targets %.2g and %.2g%s",
                        m.mode().frequencyHz(), m.frequencyStdHz() / m.mode().frequencyHz(),
                        m.dampingRatioStd() / m.mode().dampingRatio(), targets.frequencyRelStd(),
                        targets.dampingRelStd(), budget));
            }
        }
        modes.sort(Comparator.comparingDouble(m -> m.mode().frequencyHz()));
    }

    /** @return true when a mode within a quarter of its bandwidth is already reported (two bands fitted one mode) */
    private boolean duplicate(FittedMode m) {
        double quarter = 0.5 * m.mode().dampingRatio() * m.mode().frequencyHz();
        return modes.stream().anyMatch(o -> Math.abs(o.mode().frequencyHz() - m.mode().frequencyHz()) <= quarter);
    }

    private double[] inBand(double[] frequencies) {
        return Arrays.stream(frequencies).filter(f -> f >= plan.startHz() && f <= plan.stopHz()).toArray();
    }

    @Override
    public StepPhase phase() {
        return phase;
    }

    /** Time constant of the slowest band near f: fitted or estimated, else the plan's initial damping at f. */
    @Override
    public double tauS(double frequencyHz) {
        double tau = 1.0 / (plan.initialDampingRatio() * 2 * Math.PI * frequencyHz);
        boolean near = false;
        double slowest = 0;
        for (ResonanceTracker t : trackers) {
            if (t.near(frequencyHz, NEAR_BANDWIDTHS)) {
                slowest = Math.max(slowest, t.tauS());
                near = true;
            }
        }
        return near ? slowest : tau;
    }

    @Override
    public int plannedSteps(int done) {
        int bands = windows == null ? 0 : Math.max(trackers.size(), windows.size());
        int expected = plan.coarseStepCount() + bands * EXPECTED_STEPS_PER_BAND;
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
        return allMet && finished;
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
