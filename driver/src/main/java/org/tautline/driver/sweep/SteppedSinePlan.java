package org.tautline.driver.sweep;

import org.tautline.driver.RigException;

/**
 * A basic stepped-sine plan: log-spaced steps, a fixed settle time and a fixed integration span.
 *
 * <p>Settling: after each frequency step the transient of a mode decays as exp(-zeta w_n t), so
 * reaching -40 dB takes ln(100)/(2 pi zeta) cycles, about 180 cycles at zeta = 0.4 % (common
 * practice: dwell 5-7 time constants of the slowest nearby mode). Each step waits
 * max(settleCycles / f, minSettleS), then fits {@code integrationCycles} whole cycles.
 *
 * @param startHz first step, Hz
 * @param stopHz last step, Hz, above startHz
 * @param stepCount number of steps, 2 or more, log-spaced from start to stop inclusive
 * @param settleCycles drive cycles to wait after each step before integrating
 * @param minSettleS shortest settle time, s, whatever the frequency
 * @param integrationCycles whole drive cycles fitted at each step, 1 or more
 * @param driveAmplitudeV peak drive voltage, V
 * @param rampS time to ramp the drive up at the start and down at the end, s
 * @param harmonicOrder highest harmonic fitted for distortion, 1 (none) or more
 */
public record SteppedSinePlan(double startHz, double stopHz, int stepCount, double settleCycles, double minSettleS,
                              int integrationCycles, double driveAmplitudeV, double rampS, int harmonicOrder) {

    /** Checks the plan. */
    public SteppedSinePlan {
        requirePositive("startHz", startHz, "Hz");
        requirePositive("stopHz", stopHz, "Hz");
        if (!(stopHz > startHz)) {
            throw new RigException("sweep plan: stopHz (" + stopHz + " Hz) must be above startHz (" + startHz + " Hz)");
        }
        if (stepCount < 2) {
            throw new RigException("sweep plan: stepCount must be 2 or more, got " + stepCount);
        }
        if (!(settleCycles >= 0) || Double.isInfinite(settleCycles)) {
            throw new RigException("sweep plan: settleCycles must be zero or more, got " + settleCycles);
        }
        if (!(minSettleS >= 0) || Double.isInfinite(minSettleS)) {
            throw new RigException("sweep plan: minSettleS must be zero or more seconds, got " + minSettleS);
        }
        if (integrationCycles < 1) {
            throw new RigException("sweep plan: integrationCycles must be 1 or more, got " + integrationCycles);
        }
        requirePositive("driveAmplitudeV", driveAmplitudeV, "V");
        if (!(rampS >= 0) || Double.isInfinite(rampS)) {
            throw new RigException("sweep plan: rampS must be zero or more seconds, got " + rampS);
        }
        if (harmonicOrder < 1) {
            throw new RigException("sweep plan: harmonicOrder must be 1 or more, got " + harmonicOrder);
        }
    }

    private static void requirePositive(String name, double value, String unit) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new RigException("sweep plan: " + name + " must be a positive number of " + unit + ", got " + value);
        }
    }

    /**
     * The step frequencies, log-spaced, first and last exactly {@code startHz} and {@code stopHz}.
     *
     * @return a new array of {@code stepCount} increasing frequencies, Hz
     */
    public double[] frequenciesHz() {
        double[] f = new double[stepCount];
        double ratio = Math.log(stopHz / startHz);
        for (int i = 0; i < stepCount; i++) {
            f[i] = startHz * Math.exp(ratio * i / (stepCount - 1));
        }
        f[0] = startHz;
        f[stepCount - 1] = stopHz;
        return f;
    }

    /**
     * The settle time at one step frequency.
     *
     * @param frequencyHz step frequency, Hz
     * @return max(settleCycles / f, minSettleS), s
     */
    public double settleTimeS(double frequencyHz) {
        return Math.max(settleCycles / frequencyHz, minSettleS);
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
     * Rig time the plan will take on a rig with the given sample rate, ramps included.
     *
     * @param sampleRateHz acquisition sample rate, Hz
     * @return planned rig time, s
     */
    public double plannedRigTimeS(double sampleRateHz) {
        double total = 2 * rampS;
        for (double f : frequenciesHz()) {
            total += stepRigTimeS(f, sampleRateHz);
        }
        return total;
    }

    /**
     * Rig time of one step: settling plus integration, in whole samples.
     *
     * @param frequencyHz step frequency, Hz
     * @param sampleRateHz acquisition sample rate, Hz
     * @return s
     */
    public double stepRigTimeS(double frequencyHz, double sampleRateHz) {
        return (Math.ceil(settleTimeS(frequencyHz) * sampleRateHz) + integrationSamples(frequencyHz, sampleRateHz))
                / sampleRateHz;
    }

    /**
     * The plan in one line, for reports and file headers.
     *
     * @return for example "stepped sine 180.0 to 1500 Hz in 1061 log-spaced steps, settle 250.0 cycles (at least
     *         0.02000 s), integrate 100 cycles, drive 1.000 V peak, ramp 0.2000 s, harmonics to order 3"
     */
    public String describe() {
        return String.format(java.util.Locale.ROOT, "stepped sine %s to %s Hz in %d log-spaced steps, settle %s cycles"
                        + " (at least %s s), integrate %d cycles, drive %s V peak, ramp %s s, harmonics to order %d",
                fourDigits(startHz), fourDigits(stopHz), stepCount, fourDigits(settleCycles), fourDigits(minSettleS),
                integrationCycles, fourDigits(driveAmplitudeV), fourDigits(rampS), harmonicOrder);
    }

    private static String fourDigits(double v) {
        return String.format(java.util.Locale.ROOT, "%.4g", v);
    }
}
