package org.tautline.analysis.signal;

import org.hipparchus.complex.Complex;

/**
 * The result of a sine fit to one channel: y(t) ~ amplitude cos(2 pi f t + phase) + offset + harmonics.
 *
 * <p>Time t = i / sampleRate with i the sample's index inside the fitted record, so phasors of
 * channels fitted over the same samples share one time origin and their ratio is an FRF value.
 *
 * @param frequencyHz the fitted frequency, Hz
 * @param amplitude fundamental amplitude (peak), in the channel's units
 * @param phaseRad fundamental phase, rad, atan2(-B, A) for y = A cos wt + B sin wt
 * @param offset fitted constant, in the channel's units
 * @param harmonicAmplitudes peak amplitudes of harmonics 2..order (index 0 is harmonic 2); empty for a three-parameter fit
 * @param residualRms RMS of what the model leaves, in the channel's units
 * @param amplitudeStd standard error of the amplitude from the residual variance
 * @param phaseStdRad standard error of the phase, rad
 * @param sampleCount samples fitted
 */
public record SinePhasor(double frequencyHz, double amplitude, double phaseRad, double offset,
                         double[] harmonicAmplitudes, double residualRms, double amplitudeStd, double phaseStdRad,
                         int sampleCount) {

    /** Copies the harmonic amplitudes so the record stays immutable. */
    public SinePhasor {
        harmonicAmplitudes = harmonicAmplitudes.clone();
    }

    /** @return a copy of the harmonic amplitudes, harmonic 2 first */
    @Override
    public double[] harmonicAmplitudes() {
        return harmonicAmplitudes.clone();
    }

    /**
     * Value equality, the harmonic amplitudes compared element by element (a record compares arrays by identity).
     *
     * @param other another object
     * @return true when every field is equal
     */
    @Override
    public boolean equals(Object other) {
        return other instanceof SinePhasor p && Double.compare(frequencyHz, p.frequencyHz) == 0
                && Double.compare(amplitude, p.amplitude) == 0 && Double.compare(phaseRad, p.phaseRad) == 0
                && Double.compare(offset, p.offset) == 0 && java.util.Arrays.equals(harmonicAmplitudes, p.harmonicAmplitudes)
                && Double.compare(residualRms, p.residualRms) == 0 && Double.compare(amplitudeStd, p.amplitudeStd) == 0
                && Double.compare(phaseStdRad, p.phaseStdRad) == 0 && sampleCount == p.sampleCount;
    }

    /** @return a hash consistent with {@link #equals(Object)} */
    @Override
    public int hashCode() {
        return java.util.Objects.hash(frequencyHz, amplitude, phaseRad, offset, java.util.Arrays.hashCode(harmonicAmplitudes),
                residualRms, amplitudeStd, phaseStdRad, sampleCount);
    }

    /** @return the complex phasor amplitude e^{j phase} (so y = Re(phasor e^{j w t}) + offset) */
    public Complex phasor() {
        return new Complex(amplitude * Math.cos(phaseRad), amplitude * Math.sin(phaseRad));
    }

    /**
     * Total harmonic distortion: sqrt(sum of harmonic amplitudes squared) / fundamental amplitude.
     *
     * @return THD as a ratio (0.01 = 1 %), 0 when no harmonics were fitted
     */
    public double totalHarmonicDistortion() {
        double sum = 0;
        for (double h : harmonicAmplitudes) {
            sum += h * h;
        }
        return amplitude > 0 ? Math.sqrt(sum) / amplitude : 0.0;
    }

    /** @return residual RMS relative to the fundamental's RMS (amplitude/sqrt 2); a fit-quality figure */
    public double relativeResidual() {
        return amplitude > 0 ? residualRms / (amplitude / Math.sqrt(2.0)) : Double.POSITIVE_INFINITY;
    }
}
