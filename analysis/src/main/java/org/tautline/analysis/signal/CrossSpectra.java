package org.tautline.analysis.signal;

import java.util.List;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;

/**
 * Immutable averaged one-sided auto and cross spectra of a set of channels, from a Welch estimate.
 *
 * <p>Line k is at k fs / N, k = 0..N/2 (N the segment length). With X_a the DFT of the windowed
 * segment of channel a, the cross spectrum is G_ab = c conj(X_a) X_b averaged over segments, c the
 * {@link SpectrumScaling} factor, so G_ba = conj(G_ab), G_aa is real, and H1 = G_xy / G_xx for
 * x = force and y = response (J. S. Bendat and A. G. Piersol, Random Data, 4th ed., Wiley 2010,
 * ch. 5 and 9, from memory). Channels are addressed by their 0-based position in the estimate
 * (not in the recording).
 */
public final class CrossSpectra {
    private final WelchSettings settings;
    private final double sampleRateHz;
    private final List<String> channelNames;
    private final int averageCount;
    private final long framesUsed;
    private final double[][] auto;
    private final double[][] crossRe;
    private final double[][] crossIm;

    /** Takes ownership of the arrays; cross arrays are indexed by {@link #pairIndex(int, int, int)}. */
    CrossSpectra(WelchSettings settings, double sampleRateHz, List<String> channelNames, int averageCount, long framesUsed,
                 double[][] auto, double[][] crossRe, double[][] crossIm) {
        this.settings = settings;
        this.sampleRateHz = sampleRateHz;
        this.channelNames = List.copyOf(channelNames);
        this.averageCount = averageCount;
        this.framesUsed = framesUsed;
        this.auto = auto;
        this.crossRe = crossRe;
        this.crossIm = crossIm;
    }

    /** The slot of the pair a < b among the C (C - 1) / 2 cross spectra. */
    static int pairIndex(int a, int b, int channels) {
        return a * channels - a * (a + 1) / 2 + (b - a - 1);
    }

    /** @return the settings of the estimate */
    public WelchSettings settings() {
        return settings;
    }

    /** @return sample rate of the recording, Hz */
    public double sampleRateHz() {
        return sampleRateHz;
    }

    /** @return names of the estimated channels, in position order */
    public List<String> channelNames() {
        return channelNames;
    }

    /** @return number of estimated channels */
    public int channelCount() {
        return channelNames.size();
    }

    /** @return number of segments averaged, n_d */
    public int averageCount() {
        return averageCount;
    }

    /** @return frames of the recording covered by the averaged segments */
    public long framesUsed() {
        return framesUsed;
    }

    /**
     * The equivalent number of independent averages, smaller than {@link #averageCount()} when segments overlap.
     *
     * <p>P. D. Welch, IEEE Trans. AU-15:70, 1967 (from memory): for Gaussian noise the variance of
     * the averaged auto spectrum is that of K independent periodograms times
     * 1 + 2 sum_{j=1}^{K-1} (1 - j/K) rho(j), with rho(j) = (sum_n w[n] w[n + jD])^2 / S2^2 and D the
     * hop; this returns K divided by that factor (K for no overlap; about K / 1.056 for Hann at 50 %).
     *
     * @return the equivalent number of independent averages
     */
    public double effectiveAverageCount() {
        double[] w = settings.windowSamples().samples();
        int n = w.length;
        int hop = settings.hopFrames();
        double s2 = 0;
        for (double v : w) {
            s2 += v * v;
        }
        double factor = 1;
        for (int j = 1; j < averageCount && (long) j * hop < n; j++) {
            double c = 0;
            for (int i = 0; i + j * hop < n; i++) {
                c += w[i] * w[i + j * hop];
            }
            double rho = (c / s2) * (c / s2);
            factor += 2.0 * (1.0 - (double) j / averageCount) * rho;
        }
        return averageCount / factor;
    }

    /** @return number of one-sided lines, N/2 + 1 */
    public int lineCount() {
        return auto[0].length;
    }

    /** @return the line frequencies k fs / N, k = 0..N/2, Hz */
    public double[] frequenciesHz() {
        double[] f = new double[lineCount()];
        for (int k = 0; k < f.length; k++) {
            f[k] = k * sampleRateHz / settings.segmentLength();
        }
        return f;
    }

    /**
     * The averaged one-sided auto spectrum G_aa.
     *
     * @param a channel position in the estimate
     * @return a copy, one real value per line, units^2/Hz (density) or units^2 (spectrum)
     */
    public double[] auto(int a) {
        check(a);
        return auto[a].clone();
    }

    /**
     * Real parts of the averaged one-sided cross spectrum G_ab = c conj(X_a) X_b.
     *
     * @param a first channel position (conjugated)
     * @param b second channel position
     * @return a copy, one value per line (for a = b the auto spectrum)
     */
    public double[] crossReal(int a, int b) {
        check(a);
        check(b);
        if (a == b) {
            return auto[a].clone();
        }
        return a < b ? crossRe[pairIndex(a, b, channelCount())].clone() : crossRe[pairIndex(b, a, channelCount())].clone();
    }

    /**
     * Imaginary parts of the averaged one-sided cross spectrum G_ab = c conj(X_a) X_b.
     *
     * @param a first channel position (conjugated)
     * @param b second channel position
     * @return a copy, one value per line (zeros for a = b; G_ba = conj(G_ab))
     */
    public double[] crossImag(int a, int b) {
        check(a);
        check(b);
        if (a == b) {
            return new double[lineCount()];
        }
        if (a < b) {
            return crossIm[pairIndex(a, b, channelCount())].clone();
        }
        double[] im = crossIm[pairIndex(b, a, channelCount())].clone();
        for (int k = 0; k < im.length; k++) {
            im[k] = -im[k];
        }
        return im;
    }

    /**
     * The averaged one-sided cross spectrum G_ab as complex values.
     *
     * @param a first channel position (conjugated)
     * @param b second channel position
     * @return one value per line
     */
    public Complex[] cross(int a, int b) {
        double[] re = crossReal(a, b);
        double[] im = crossImag(a, b);
        Complex[] out = new Complex[re.length];
        for (int k = 0; k < re.length; k++) {
            out[k] = new Complex(re[k], im[k]);
        }
        return out;
    }

    private void check(int position) {
        if (position < 0 || position >= channelCount()) {
            throw new AnalysisException("channel position " + position + " is not in the estimate: expected 0.."
                    + (channelCount() - 1) + " for the channels " + channelNames);
        }
    }

    @Override
    public String toString() {
        return "CrossSpectra[" + channelNames + ", " + lineCount() + " lines, " + averageCount + " averages, "
                + settings + "]";
    }
}
