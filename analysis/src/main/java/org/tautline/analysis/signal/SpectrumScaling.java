package org.tautline.analysis.signal;

/**
 * How a Welch estimate is scaled: as a density per hertz or as a power spectrum.
 *
 * <p>With X[k] the DFT of the windowed segment, S1 = sum w and S2 = sum w^2 (G. Heinzel,
 * A. Ruediger and R. Schilling, "Spectrum and spectral density estimation by the Discrete Fourier
 * transform (DFT)", 2002, eqs. for PSD and PS; P. D. Welch, IEEE Trans. AU-15:70, 1967, from
 * memory), the one-sided estimates are doubled at every line except DC and, for even N, Nyquist.
 * Cross spectra use conj(X) Y in place of |X|^2.
 */
public enum SpectrumScaling {
    /** Density, units^2/Hz: G[k] = c |X[k]|^2 / (fs S2), c = 2 except at DC and Nyquist where c = 1. */
    DENSITY,
    /** Power spectrum, units^2 (rms^2 of a sine on a line): G[k] = c |X[k]|^2 / S1^2, c as for density. */
    SPECTRUM;

    /**
     * The factor applied to |X|^2 at the interior lines (already doubled).
     *
     * @param sampleRateHz sample rate, Hz
     * @param window the segment window
     * @return 2 / (fs S2) for density, 2 / S1^2 for spectrum
     */
    double oneSidedFactor(double sampleRateHz, Window window) {
        if (this == DENSITY) {
            return 2.0 / (sampleRateHz * window.sumOfSquares());
        }
        double s1 = window.sum();
        return 2.0 / (s1 * s1);
    }
}
