package org.tautline.driver.sweep;

import java.util.List;

import org.tautline.driver.RigException;

/**
 * What an adaptive stepped-sine sweep should do; the JSON form is described in driver/SWEEP_PLAN.md.
 *
 * @param startHz lowest frequency, Hz
 * @param stopHz highest frequency, Hz, above startHz
 * @param levelMode whether the levels are forces (closed loop) or drive voltages (open loop)
 * @param levels one or more levels, N or V by {@code levelMode}; the whole sweep runs once per level
 * @param frequencyRelStd target standard error of each natural frequency, relative (1e-5 = 10 ppm)
 * @param dampingRelStd target standard error of each damping ratio, relative (0.02 = 2 %)
 * @param limits the safety limits
 * @param direction order of the steps in each pass
 * @param timeBudgetS the most rig time one level and direction may take, s; refinement stops there
 * @param coarseStepCount log-spaced steps of the first pass, 3 or more
 * @param initialDampingRatio damping assumed before any has been measured (a conservative, low value)
 * @param settleTolerance relative size of the remaining transient accepted as steady state (0.01 = 1 %, 4.6 tau)
 * @param integrationCycles whole drive cycles fitted at each step after settling, 1 or more
 * @param fixedDwellS a fixed settle time per step, s, instead of detection; 0 for detection (the normal case)
 * @param levelTolerance relative force error accepted by the level control (0.01 = 1 %)
 * @param initialDriveV drive of the first step under force control, V; the drive level itself under drive control
 * @param driveRateVPerS highest rate of change of the drive amplitude, V/s
 * @param rampS ramp time at the start and the end (and on any stop), s
 * @param harmonicOrder highest harmonic fitted for distortion, 1 or more
 */
public record AdaptiveSweepPlan(double startHz, double stopHz, LevelMode levelMode, List<Double> levels,
                                double frequencyRelStd, double dampingRelStd, SafetyLimits limits,
                                SweepDirection direction, double timeBudgetS, int coarseStepCount,
                                double initialDampingRatio, double settleTolerance, int integrationCycles,
                                double fixedDwellS, double levelTolerance, double initialDriveV, double driveRateVPerS,
                                double rampS, int harmonicOrder) {

    /** Checks every field; messages name the JSON field and what was expected. */
    public AdaptiveSweepPlan {
        positive("startHz", startHz);
        positive("stopHz", stopHz);
        if (!(stopHz > startHz)) {
            throw new RigException("sweep plan: stopHz (" + stopHz + ") must be above startHz (" + startHz + ")");
        }
        if (levelMode == null || limits == null || direction == null || levels == null) {
            throw new RigException("sweep plan: levelMode, levels, limits and direction are all required");
        }
        levels = List.copyOf(levels);
        if (levels.isEmpty()) {
            throw new RigException("sweep plan: levels must hold one or more levels");
        }
        for (double level : levels) {
            positive("levels[]", level);
            if (levelMode == LevelMode.DRIVE && level > limits.driveV()) {
                throw new RigException("sweep plan: drive level " + level + " V is above limits.driveV "
                        + limits.driveV() + " V");
            }
            if (levelMode == LevelMode.FORCE && !(level < limits.forceN())) {
                throw new RigException("sweep plan: force level " + level + " N must be below limits.forceN "
                        + limits.forceN() + " N");
            }
        }
        positive("frequencyRelStd", frequencyRelStd);
        positive("dampingRelStd", dampingRelStd);
        positive("timeBudgetS", timeBudgetS);
        if (coarseStepCount < 3) {
            throw new RigException("sweep plan: coarseStepCount must be 3 or more, got " + coarseStepCount);
        }
        if (!(initialDampingRatio > 0 && initialDampingRatio < 0.5)) {
            throw new RigException("sweep plan: initialDampingRatio must lie in (0, 0.5), got " + initialDampingRatio);
        }
        if (!(settleTolerance > 0 && settleTolerance < 0.5)) {
            throw new RigException("sweep plan: settleTolerance must lie in (0, 0.5), got " + settleTolerance);
        }
        if (integrationCycles < 1) {
            throw new RigException("sweep plan: integrationCycles must be 1 or more, got " + integrationCycles);
        }
        if (!(fixedDwellS >= 0) || Double.isInfinite(fixedDwellS)) {
            throw new RigException("sweep plan: fixedDwellS must be 0 (detection) or a positive number of s, got "
                    + fixedDwellS);
        }
        if (!(levelTolerance > 0 && levelTolerance < 0.5)) {
            throw new RigException("sweep plan: levelTolerance must lie in (0, 0.5), got " + levelTolerance);
        }
        positive("initialDriveV", initialDriveV);
        if (initialDriveV > limits.driveV()) {
            throw new RigException("sweep plan: initialDriveV " + initialDriveV + " V is above limits.driveV "
                    + limits.driveV() + " V");
        }
        positive("driveRateVPerS", driveRateVPerS);
        if (!(rampS >= 0) || Double.isInfinite(rampS)) {
            throw new RigException("sweep plan: rampS must be zero or more seconds, got " + rampS);
        }
        if (harmonicOrder < 1) {
            throw new RigException("sweep plan: harmonicOrder must be 1 or more, got " + harmonicOrder);
        }
    }

    private static void positive(String field, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new RigException("sweep plan: " + field + " must be a positive finite number, got " + value);
        }
    }

    /** @return the directions to run, in order: one, or up then down */
    public List<SweepDirection> passes() {
        return direction == SweepDirection.BOTH ? List.of(SweepDirection.UP, SweepDirection.DOWN) : List.of(direction);
    }

    /** @return the coarse pass: {@code coarseStepCount} log-spaced frequencies, increasing, Hz */
    public double[] coarseFrequenciesHz() {
        double[] f = new double[coarseStepCount];
        for (int i = 0; i < coarseStepCount; i++) {
            f[i] = startHz * Math.pow(stopHz / startHz, (double) i / (coarseStepCount - 1));
        }
        f[coarseStepCount - 1] = stopHz;
        return f;
    }

    /** @param fixedDwell fixed settle time per step, s @return a copy that dwells instead of detecting */
    public AdaptiveSweepPlan withFixedDwellS(double fixedDwell) {
        return new AdaptiveSweepPlan(startHz, stopHz, levelMode, levels, frequencyRelStd, dampingRelStd, limits,
                direction, timeBudgetS, coarseStepCount, initialDampingRatio, settleTolerance, integrationCycles,
                fixedDwell, levelTolerance, initialDriveV, driveRateVPerS, rampS, harmonicOrder);
    }

    /** @param newLimits safety limits @return a copy with those limits */
    public AdaptiveSweepPlan withLimits(SafetyLimits newLimits) {
        return new AdaptiveSweepPlan(startHz, stopHz, levelMode, levels, frequencyRelStd, dampingRelStd, newLimits,
                direction, timeBudgetS, coarseStepCount, initialDampingRatio, settleTolerance, integrationCycles,
                fixedDwellS, levelTolerance, initialDriveV, driveRateVPerS, rampS, harmonicOrder);
    }
}
