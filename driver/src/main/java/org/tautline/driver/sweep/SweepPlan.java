package org.tautline.driver.sweep;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

import org.tautline.driver.RigException;

/**
 * What a stepped-sine sweep should do: the one plan every sweep runs, uniform or adaptive.
 *
 * <p>Each level and direction is one pass. A pass measures {@code coarseStepCount} log-spaced steps from
 * {@code startHz} to {@code stopHz}; with a {@link Refinement} it then refines every resonance those steps
 * show (an adaptive plan), without one it ends there (a uniform plan). The safety limits are part of every
 * plan and are checked on every block read. The JSON form is described in driver/SWEEP_PLAN.md.
 *
 * @param startHz lowest frequency, Hz
 * @param stopHz highest frequency, Hz, above startHz; no step of any pass lies outside the band
 * @param coarseStepCount log-spaced steps of each pass before any refinement, 2 or more
 * @param settle how each step waits for steady state
 * @param integrationCycles whole drive cycles fitted at each step after settling, 1 or more
 * @param levelMode whether the levels are forces (closed loop) or drive voltages (open loop)
 * @param levels one or more levels, N or V by {@code levelMode}; the passes run once per level
 * @param limits the safety limits
 * @param direction order of the steps in each pass; {@code BOTH} runs each level up, then down
 * @param refinement the accuracy targets of an adaptive plan; empty for a uniform plan
 * @param initialDampingRatio damping assumed before any is measured (low, so that settling is conservative)
 * @param levelTolerance relative force error accepted by the level control (0.01 = 1 %)
 * @param initialDriveV drive of the first step under force control, V
 * @param driveRateVPerS highest rate of change of the drive amplitude, V/s
 * @param rampS ramp time at the start and end of each pass, and on any stop, s
 * @param harmonicOrder highest harmonic fitted for distortion, 1 or more
 */
public record SweepPlan(double startHz, double stopHz, int coarseStepCount, SettleRule settle, int integrationCycles,
                        LevelMode levelMode, List<Double> levels, SafetyLimits limits, SweepDirection direction,
                        Optional<Refinement> refinement, double initialDampingRatio, double levelTolerance,
                        double initialDriveV, double driveRateVPerS, double rampS, int harmonicOrder) {
    /** Damping assumed before any is measured, unless a plan says otherwise. */
    public static final double DEFAULT_INITIAL_DAMPING = 0.002;
    /** Fastest drive change, V/s, unless a plan says otherwise. */
    public static final double DEFAULT_DRIVE_RATE_V_PER_S = 20.0;

    /** Checks every field; messages name the JSON field and what was expected. */
    public SweepPlan {
        positive("startHz", startHz);
        positive("stopHz", stopHz);
        if (!(stopHz > startHz)) {
            throw new RigException("sweep plan: stopHz (" + stopHz + " Hz) must be above startHz (" + startHz + " Hz)");
        }
        if (coarseStepCount < 2) {
            throw new RigException("sweep plan: the step count must be 2 or more, got " + coarseStepCount);
        }
        if (settle == null || levelMode == null || limits == null || direction == null || levels == null
                || refinement == null) {
            throw new RigException("sweep plan: the settle rule, levelMode, levels, limits, direction and refinement"
                    + " (empty for a uniform sweep) are all required");
        }
        if (integrationCycles < 1) {
            throw new RigException("sweep plan: integrationCycles must be 1 or more, got " + integrationCycles);
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
        if (!(initialDampingRatio > 0 && initialDampingRatio < 0.5)) {
            throw new RigException("sweep plan: initialDampingRatio must lie in (0, 0.5), got " + initialDampingRatio);
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

    /**
     * A uniform plan: one drive level, log-spaced steps, a fixed dwell, no refinement.
     *
     * @param startHz first step, Hz
     * @param stopHz last step, Hz
     * @param stepCount steps, 2 or more
     * @param settleCycles drive cycles to wait after each step
     * @param minSettleS shortest wait, s
     * @param integrationCycles whole cycles fitted per step
     * @param driveV peak drive, V
     * @param rampS ramp time, s
     * @param harmonicOrder highest harmonic fitted
     * @param limits the safety limits; the drive must not exceed {@code limits.driveV()}
     * @return the plan
     */
    public static SweepPlan uniform(double startHz, double stopHz, int stepCount, double settleCycles, double minSettleS,
                                    int integrationCycles, double driveV, double rampS, int harmonicOrder,
                                    SafetyLimits limits) {
        return new SweepPlan(startHz, stopHz, stepCount, SettleRule.fixed(settleCycles, minSettleS), integrationCycles,
                LevelMode.DRIVE, List.of(driveV), limits, SweepDirection.UP, Optional.empty(), DEFAULT_INITIAL_DAMPING,
                0.01, Math.min(driveV, limits.driveV()), DEFAULT_DRIVE_RATE_V_PER_S, rampS, harmonicOrder);
    }

    static void positive(String field, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new RigException("sweep plan: " + field + " must be a positive finite number, got " + value);
        }
    }

    /** @return true when the plan refines resonances after its coarse steps */
    public boolean adaptive() {
        return refinement.isPresent();
    }

    /** @return the directions to run at each level, in order: one, or up then down */
    public List<SweepDirection> directions() {
        return direction == SweepDirection.BOTH ? List.of(SweepDirection.UP, SweepDirection.DOWN) : List.of(direction);
    }

    /** @return the number of passes: levels times directions */
    public int passCount() {
        return levels.size() * directions().size();
    }

    /**
     * @param pass pass index, 0 first
     * @return the level of that pass, N or V
     */
    public double passLevel(int pass) {
        return levels.get(pass / directions().size());
    }

    /**
     * @param pass pass index, 0 first
     * @return the direction of that pass
     */
    public SweepDirection passDirection(int pass) {
        return directions().get(pass % directions().size());
    }

    /** @return the coarse steps of a pass: {@code coarseStepCount} log-spaced frequencies, increasing, Hz */
    public double[] coarseFrequenciesHz() {
        double[] f = new double[coarseStepCount];
        double ratio = Math.log(stopHz / startHz);
        for (int i = 0; i < coarseStepCount; i++) {
            f[i] = startHz * Math.exp(ratio * i / (coarseStepCount - 1));
        }
        f[0] = startHz;
        f[coarseStepCount - 1] = stopHz;
        return f;
    }

    /**
     * Samples to fit at one step: the sample count closest to {@code integrationCycles} whole cycles.
     *
     * @param frequencyHz step frequency, Hz
     * @param sampleRateHz acquisition sample rate, Hz
     * @return samples per channel, at least 16
     */
    public int integrationSamples(double frequencyHz, double sampleRateHz) {
        return (int) Math.max(16, Math.round(integrationCycles * sampleRateHz / frequencyHz));
    }

    /**
     * Rig time one coarse step is expected to take: the fixed dwell, or 4.6 time constants at the initial damping
     * under detection, plus the integration.
     *
     * @param frequencyHz step frequency, Hz
     * @param sampleRateHz sample rate, Hz
     * @return s
     */
    public double expectedStepRigTimeS(double frequencyHz, double sampleRateHz) {
        double settleS = settle.detects()
                ? Math.log(1 / settle.tolerance()) / (initialDampingRatio * 2 * Math.PI * frequencyHz)
                : Math.ceil(settle.dwellS(frequencyHz) * sampleRateHz) / sampleRateHz;
        return settleS + integrationSamples(frequencyHz, sampleRateHz) / sampleRateHz;
    }

    /**
     * Rig time the coarse steps of every pass are expected to take, ramps included; an adaptive plan adds its
     * refinement, at most its time budget per pass.
     *
     * @param sampleRateHz sample rate, Hz
     * @return s
     */
    public double expectedRigTimeS(double sampleRateHz) {
        double pass = 2 * rampS;
        for (double f : coarseFrequenciesHz()) {
            pass += expectedStepRigTimeS(f, sampleRateHz);
        }
        return passCount() * pass;
    }

    /**
     * The plan in one line, for reports and file headers.
     *
     * @return for example "stepped sine 180 to 1500 Hz in 1061 log-spaced steps, settle 250 cycles (at least 0.02 s),
     *         integrate 100 cycles, drive 1 V peak, ramp 0.2 s, harmonics to order 3; limits ..."
     */
    public String describe() {
        String unit = levelMode == LevelMode.FORCE ? "N" : "V";
        String levelText = levels.stream().map(SweepPlan::fourDigits).collect(Collectors.joining(", "))
                + " " + unit + " peak";
        return String.format(Locale.ROOT, "%s %s to %s Hz in %d log-spaced steps%s, %s, integrate %d cycles, %s %s,"
                        + " ramp %s s, harmonics to order %d; limits: %s",
                adaptive() ? "adaptive stepped sine" : "stepped sine", fourDigits(startHz), fourDigits(stopHz),
                coarseStepCount, refinement.map(r -> " then " + r.describe()).orElse("")
                        + (direction == SweepDirection.UP ? "" : ", " + direction.label()),
                settle.describe(), integrationCycles, levelMode == LevelMode.FORCE ? "force" : "drive", levelText,
                fourDigits(rampS), harmonicOrder, limits.describe());
    }

    private static String fourDigits(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
