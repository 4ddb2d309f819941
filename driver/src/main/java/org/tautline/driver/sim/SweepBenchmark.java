package org.tautline.driver.sim;

import java.util.ArrayList;
import java.util.List;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.ModalEstimator;
import java.util.Optional;

import org.tautline.driver.sweep.LevelMode;
import org.tautline.driver.sweep.Refinement;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SettleRule;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepDirection;
import org.tautline.driver.sweep.SweepEngine;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepJournal;
import org.tautline.driver.sweep.SweepPass;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepResult;

/**
 * Rig time of the adaptive sweep against a uniform log-spaced stepped sine tuned to the same accuracy, and a lower bound.
 *
 * <p>The specimen is the demo wire with its two polarisations at one frequency (a single mode per
 * harmonic), 5 harmonics and the damping of a bare steel wire, zeta about 0.1 % (the example;
 * steel wire in air is 0.01-0.1 %, common practice), swept 150-800 Hz at 0.3 V: three modes. Accuracy is the
 * largest true error over the seven modes, from {@link SimulationTruth}: |f - f_true|/f_true and
 * |zeta - zeta_true|/zeta_true. The goal is the accuracy the adaptive sweep reached (its plan asks for
 * standard errors of 2e-5 in f and 2 % in zeta). The uniform sweep is the plain
 * {@link SweepEngine} on a uniform plan with a fixed settle time; its step count and settle time are searched
 * (settle 0.5, 1.5 and 4.6 tau of the slowest mode; steps 300, 600, ... doubling; a pair skipped when its
 * planned time cannot beat the best so far or exceeds {@value #SEARCH_CAP} times the adaptive rig time)
 * and the cheapest pair whose local modal fits meet the goal is reported. The lower bound
 * is the adaptive sweep's own steps, each charged only 4.6 tau of the nearest true mode (the settle time
 * to 1 %, common practice), with no integration and no ramps.
 */
public final class SweepBenchmark {
    /** Band of the benchmark, Hz. */
    public static final double LOW_HZ = 150.0;
    /** Band of the benchmark, Hz. */
    public static final double HIGH_HZ = 800.0;
    private static final double FREQUENCY_STD_TARGET = 2e-5;
    private static final double DAMPING_STD_TARGET = 0.02;
    private static final int INTEGRATION_CYCLES = 100;
    /** Peak drive, V: low enough that the lightly damped wire stays well inside the sensor's 1 mm full scale. */
    private static final double DRIVE_V = 0.3;
    private static final int[] STEP_LADDER = {300, 600, 1200, 2400, 4800, 9600};
    private static final double[] SETTLE_TAUS = {0.5, 1.5, 4.6};
    /** The search tries no uniform sweep planned to take more than this multiple of the adaptive rig time. */
    private static final double SEARCH_CAP = 40.0;

    private SweepBenchmark() {
    }

    /**
     * The figures.
     *
     * @param adaptiveRigTimeS rig time of the adaptive sweep, s
     * @param uniformRigTimeS rig time of the cheapest uniform sweep meeting the goal, s; when none within the
     *        search did, the rig time of the longest one tried (so the true figure is larger)
     * @param uniformReachedGoal true when a uniform sweep within the search met the goal
     * @param lowerBoundRigTimeS the settle-time lower bound, s
     * @param uniformToAdaptive uniform / adaptive rig time (a lower limit when {@code uniformReachedGoal} is false)
     * @param adaptiveToLowerBound adaptive rig time / lower bound
     * @param adaptiveSteps steps of the adaptive sweep
     * @param uniformSteps steps of the chosen uniform sweep
     * @param uniformSettleS fixed settle time of the chosen uniform sweep, s
     * @param frequencyGoal relative f error the uniform sweep must reach: the adaptive sweep's
     * @param dampingGoal relative zeta error the uniform sweep must reach: the adaptive sweep's
     * @param adaptiveFrequencyError largest relative f error reached by the adaptive sweep
     * @param adaptiveDampingError largest relative zeta error reached by the adaptive sweep
     * @param uniformFrequencyError largest relative f error reached by the chosen uniform sweep
     * @param uniformDampingError largest relative zeta error reached by the chosen uniform sweep
     * @param uniformLongestFailedRigTimeS rig time of the longest uniform sweep tried that missed the goal, s
     * @param uniformTrials uniform sweeps tried in the search
     * @param wallTimeS wall time of the whole benchmark, s
     */
    public record Figures(double adaptiveRigTimeS, double uniformRigTimeS, boolean uniformReachedGoal,
                          double lowerBoundRigTimeS,
                          double uniformToAdaptive, double adaptiveToLowerBound, int adaptiveSteps, int uniformSteps,
                          double uniformSettleS, double frequencyGoal, double dampingGoal,
                          double adaptiveFrequencyError, double adaptiveDampingError, double uniformFrequencyError,
                          double uniformDampingError, double uniformLongestFailedRigTimeS, int uniformTrials,
                          double wallTimeS) {
    }

    /** @return the benchmark's specimen: the demo wire, one frequency per harmonic, 5 harmonics, zeta about 0.1 % */
    public static SimulationConfig specimen() {
        SimulationConfig demo = SimulationConfigs.demoWire();
        SimulatedSpecimen s = demo.specimen();
        return demo.withSpecimen(new SimulatedSpecimen(s.lengthM(), s.linearDensityKgPerM(), s.tensionN(),
                s.bendingStiffnessNm2(), s.ends(), 5, DampingModel.of(0.0008, 0.0002, 100.0, 0.00005, 1000.0), 0.0,
                s.polarisationAngleRad(),
                s.geometricNonlinearity(), s.axialStiffnessN()));
    }

    /** @return the adaptive plan the benchmark runs */
    public static SweepPlan plan() {
        return new SweepPlan(LOW_HZ, HIGH_HZ, 30, SettleRule.detected(0.01), INTEGRATION_CYCLES, LevelMode.DRIVE,
                List.of(DRIVE_V), LIMITS, SweepDirection.UP,
                Optional.of(new Refinement(FREQUENCY_STD_TARGET, DAMPING_STD_TARGET, 1800.0)), 0.001, 0.01, DRIVE_V,
                20.0, 0.1, 1);
    }

    private static final SafetyLimits LIMITS = new SafetyLimits(5.0, 4.0, 9e-4, 9e-4);

    /** @return the figures */
    public static Figures run() {
        long t0 = System.nanoTime();
        SimulationConfig config = specimen();
        List<TrueMode> truth = modesInBand(SimulationTruth.of(config));
        SweepPlan plan = plan();
        SweepResult adaptive = new SweepEngine(new SimulatedRig(config)).run(plan, SweepEventListener.NONE,
                SweepControl.none(), SweepJournal.NONE);
        SweepPass pass = adaptive.passes().get(0);
        double[] adaptiveError = errors(pass.modes(), truth);
        double fGoal = adaptiveError[0];
        double zGoal = adaptiveError[1];
        double capS = SEARCH_CAP * adaptive.rigTimeS();
        double lowerBound = 0;
        for (SweepPoint p : pass.points()) {
            lowerBound += Math.log(100.0) * tauOfNearest(truth, p.frequencyHz());
        }
        double slowestTauS = 0;
        for (TrueMode m : truth) {
            slowestTauS = Math.max(slowestTauS, tau(m));
        }
        double bestTime = Double.NaN;
        int bestSteps = 0;
        double bestSettle = Double.NaN;
        double[] bestError = {Double.NaN, Double.NaN};
        int trials = 0;
        double longestFailed = 0;
        for (double settleTaus : SETTLE_TAUS) {
            double settleS = settleTaus * slowestTauS;
            for (int steps : STEP_LADDER) {
                SweepPlan uniform = SweepPlan.uniform(LOW_HZ, HIGH_HZ, steps, 0.0, settleS, INTEGRATION_CYCLES,
                        DRIVE_V, plan.rampS(), 1, LIMITS);
                double planned = uniform.expectedRigTimeS(config.sampleRateHz());
                if (planned >= bestTime || planned > capS) {
                    break;
                }
                trials++;
                SweepResult record = new SweepEngine(new SimulatedRig(config)).run(uniform, SweepEventListener.NONE,
                        SweepControl.none(), SweepJournal.NONE);
                double[] e = errors(localFits(record.toFrf(), truth), truth);
                if (e[0] <= fGoal && e[1] <= zGoal) {
                    bestTime = record.rigTimeS();
                    bestSteps = steps;
                    bestSettle = settleS;
                    bestError = e;
                    break;
                }
                longestFailed = Math.max(longestFailed, record.rigTimeS());
            }
        }
        boolean reached = !Double.isNaN(bestTime);
        double uniformS = reached ? bestTime : longestFailed;
        return new Figures(adaptive.rigTimeS(), uniformS, reached, lowerBound, uniformS / adaptive.rigTimeS(),
                adaptive.rigTimeS() / lowerBound, pass.points().size(), bestSteps, bestSettle, fGoal, zGoal,
                adaptiveError[0], adaptiveError[1], bestError[0], bestError[1], longestFailed, trials,
                (System.nanoTime() - t0) * 1e-9);
    }

    /**
     * Local fits of a uniform sweep, one per true mode: the band is +-3 half-power bandwidths around the largest
     * response within 3 % of the true frequency. The truth only places the bands, which helps the uniform
     * sweep (its figures are, if anything, optimistic); the fit is the same estimator the adaptive engine uses.
     */
    private static List<FittedMode> localFits(Frf frf, List<TrueMode> truth) {
        List<FittedMode> fits = new ArrayList<>();
        for (TrueMode t : truth) {
            double ft = t.mode().frequencyHz();
            int peak = -1;
            for (int i = 0; i < frf.size(); i++) {
                double f = frf.frequencyHz(i);
                if (Math.abs(f / ft - 1) <= 0.03 && (peak < 0 || frf.magnitude(i) > frf.magnitude(peak))) {
                    peak = i;
                }
            }
            if (peak < 0) {
                continue;
            }
            double fp = frf.frequencyHz(peak);
            double halfWidth = 3 * 2 * t.mode().dampingRatio() * ft;
            try {
                FittedMode nearest = null;
                for (FittedMode m : ModalEstimator.defaults().withBand(fp - halfWidth, fp + halfWidth).estimate(frf)
                        .modes()) {
                    if (nearest == null || Math.abs(m.mode().frequencyHz() - fp) < Math.abs(nearest.mode().frequencyHz() - fp)) {
                        nearest = m;
                    }
                }
                if (nearest != null) {
                    fits.add(nearest);
                }
            } catch (AnalysisException e) {
                // Too few lines in the band: this uniform sweep cannot resolve the mode; it counts as missed.
            }
        }
        return fits;
    }

    /** One true mode per harmonic in the band (the benchmark specimen's polarisations share a frequency). */
    private static List<TrueMode> modesInBand(SimulationTruth truth) {
        List<TrueMode> modes = new ArrayList<>();
        for (TrueMode m : truth.modes()) {
            double f = m.mode().frequencyHz();
            if (m.polarisation() == 1 && f > LOW_HZ && f < HIGH_HZ) {
                modes.add(m);
            }
        }
        return modes;
    }

    private static double tau(TrueMode m) {
        return 1.0 / (m.mode().dampingRatio() * m.mode().angularFrequencyRadPerS());
    }

    private static double tauOfNearest(List<TrueMode> truth, double f) {
        TrueMode nearest = truth.get(0);
        for (TrueMode m : truth) {
            if (Math.abs(Math.log(m.mode().frequencyHz() / f)) < Math.abs(Math.log(nearest.mode().frequencyHz() / f))) {
                nearest = m;
            }
        }
        return tau(nearest);
    }

    /** Largest relative f and zeta errors over the true modes; infinite when a mode was not found within 2 bandwidths. */
    static double[] errors(List<FittedMode> fitted, List<TrueMode> truth) {
        double fError = 0;
        double zError = 0;
        for (TrueMode t : truth) {
            double ft = t.mode().frequencyHz();
            double zt = t.mode().dampingRatio();
            FittedMode best = null;
            for (FittedMode m : fitted) {
                if (best == null || Math.abs(m.mode().frequencyHz() - ft) < Math.abs(best.mode().frequencyHz() - ft)) {
                    best = m;
                }
            }
            if (best == null || Math.abs(best.mode().frequencyHz() - ft) > 4 * zt * ft) {
                return new double[] {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
            }
            fError = Math.max(fError, Math.abs(best.mode().frequencyHz() - ft) / ft);
            zError = Math.max(zError, Math.abs(best.mode().dampingRatio() - zt) / zt);
        }
        return new double[] {fError, zError};
    }
}
