package org.tautline.app.bench;

import java.util.List;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.modal.Mode;

/**
 * One named, seeded case of the modal benchmark suite: an invented stiff-string point-force FRF with its truth.
 *
 * <p>The FRF is the exact modal sum of {@code modes} (viscous modes, Ewins, Modal Testing, 2nd ed. 2000, ch. 2,
 * from memory) in the case's quantity, plus circular complex Gaussian noise of variance s^2 = E|e|^2 per line
 * (each part N(0, s^2/2)), s^2 recorded as the FRF's per-line variance. The fit is asked for modes between
 * {@code fitLowHz} and {@code fitHighHz}; the true modes there are the ones it should find. All data are invented.
 *
 * @param name a plain-words name, unique in the suite
 * @param description what the case holds and how it was made, in words
 * @param seed the seed of its random draws (geometry, damping spread, noise)
 * @param modes every true mode of the model, increasing in frequency, in band or not
 * @param frf the noisy FRF with its per-line variance
 * @param grid the lines and what they are
 * @param noiseStd s, the noise standard deviation per line in the FRF's own units
 * @param fitLowHz lowest frequency the fit is asked for, Hz
 * @param fitHighHz highest frequency the fit is asked for, Hz
 * @param subBand true when the fit is asked for a band narrower than the FRF
 * @param claim what the name promises, for checking the case against its truth
 */
public record ModalCase(String name, String description, long seed, List<Mode> modes, Frf frf, ModalCaseGrid grid,
                        double noiseStd, double fitLowHz, double fitHighHz, boolean subBand, Claim claim) {

    /**
     * What a case's name promises; NaN or empty where the name promises nothing of the kind.
     *
     * @param dampingRatio the nominal damping ratio of the doublets' lower modes
     * @param splitBandwidths the doublets' split, (f_upper - f_lower)/(2 zeta_lower f_lower)
     * @param weakModePeaksToNoise for each weak mode, its peak over the noise standard deviation
     * @param weakModesHz the weak modes' natural frequencies, Hz
     */
    public record Claim(double dampingRatio, double splitBandwidths, double[] weakModePeaksToNoise,
                        double[] weakModesHz) {
        /** Copies the arrays. */
        public Claim {
            weakModePeaksToNoise = weakModePeaksToNoise.clone();
            weakModesHz = weakModesHz.clone();
        }

        @Override
        public double[] weakModePeaksToNoise() {
            return weakModePeaksToNoise.clone();
        }

        @Override
        public double[] weakModesHz() {
            return weakModesHz.clone();
        }

        static Claim doublets(double dampingRatio, double splitBandwidths) {
            return new Claim(dampingRatio, splitBandwidths, new double[0], new double[0]);
        }

        static Claim weakModes(double[] peaksToNoise, double[] frequenciesHz) {
            return new Claim(Double.NaN, Double.NaN, peaksToNoise, frequenciesHz);
        }

        static Claim none() {
            return new Claim(Double.NaN, Double.NaN, new double[0], new double[0]);
        }
    }

    /** Copies the list. */
    public ModalCase {
        modes = List.copyOf(modes);
    }

    /** @return the true modes the fit should find: those inside the fit band */
    public List<Mode> modesInBand() {
        return modes.stream().filter(m -> m.frequencyHz() >= fitLowHz && m.frequencyHz() <= fitHighHz).toList();
    }

    /** @return the FRF's quantity */
    public FrfQuantity quantity() {
        return frf.quantity();
    }

    /** @return the estimator the benchmark runs: the default fit, limited to the band when it is a sub-band */
    public ModalEstimator estimator() {
        return subBand ? ModalEstimator.defaults().withBand(fitLowHz, fitHighHz) : ModalEstimator.defaults();
    }

    /**
     * A mode's own peak over the noise: |A| w_n^d/(2 zeta w_n^2) / s, d the quantity's derivative order.
     *
     * @param mode the mode
     * @param quantity the FRF's quantity
     * @param noiseStd s in that quantity's units
     * @return the ratio
     */
    static double peakToNoise(Mode mode, FrfQuantity quantity, double noiseStd) {
        return ownPeak(mode, quantity) / noiseStd;
    }

    /**
     * A mode's own contribution at its natural frequency, in the quantity's units.
     *
     * @param mode the mode
     * @param quantity the quantity
     * @return |A| w_n^d/(2 zeta w_n^2)
     */
    static double ownPeak(Mode mode, FrfQuantity quantity) {
        double wn = mode.angularFrequencyRadPerS();
        return mode.modalConstant().norm() * Math.pow(wn, quantity.derivativeOrder()) / (2 * mode.dampingRatio() * wn * wn);
    }
}
