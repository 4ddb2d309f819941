package org.tautline.analysis.modal;

import java.util.Arrays;
import java.util.List;

import org.tautline.analysis.AnalysisException;

/**
 * Settings of an LSFD modal-constant estimate; immutable, each {@code withXxx} returns a new instance.
 *
 * <p>Settings and defaults:
 * <ul>
 * <li>{@code realModes} (boolean, default false): true fits one real modal constant per mode
 *     (proportional damping, real mode shapes); false fits a complex modal constant (two real unknowns).</li>
 * <li>{@code upperResidual} (boolean, default false): fit a complex constant UR for modes above the band.</li>
 * <li>{@code lowerResidual} (boolean, default false): fit a complex mass-like term -LR/w^2 for modes below it.</li>
 * <li>{@code fromHz}, {@code toHz} (Hz, default 0 and +infinity): the band of lines used, inclusive.</li>
 * <li>{@code weights} (one relative weight per FRF line, default none): when absent, lines are weighted
 *     by 1/variance if the FRF carries its variance, else uniformly.</li>
 * <li>{@code outsideBandPoles} (poles, default none): fixed poles outside the band, each with a fitted complex
 *     coefficient, standing for modes just beyond the band's edges (see {@link ResidualTerms}).</li>
 * </ul>
 */
public final class LsfdOptions {
    private static final LsfdOptions DEFAULTS = new LsfdOptions(false, false, false, 0, Double.POSITIVE_INFINITY, null,
            List.of());

    private final boolean realModes;
    private final boolean upperResidual;
    private final boolean lowerResidual;
    private final double fromHz;
    private final double toHz;
    private final double[] weights;
    private final List<Pole> outsideBandPoles;

    private LsfdOptions(boolean realModes, boolean upperResidual, boolean lowerResidual, double fromHz, double toHz,
                        double[] weights, List<Pole> outsideBandPoles) {
        this.outsideBandPoles = List.copyOf(outsideBandPoles);
        this.realModes = realModes;
        this.upperResidual = upperResidual;
        this.lowerResidual = lowerResidual;
        this.fromHz = fromHz;
        this.toHz = toHz;
        this.weights = weights;
    }

    /** @return complex modes, no residual terms, every line, automatic weights */
    public static LsfdOptions defaults() {
        return DEFAULTS;
    }

    /**
     * @param real true for one real modal constant per mode, false for complex
     * @return new options
     */
    public LsfdOptions withRealModes(boolean real) {
        return new LsfdOptions(real, upperResidual, lowerResidual, fromHz, toHz, weights, outsideBandPoles);
    }

    /**
     * @param fit true to fit the upper residual UR
     * @return new options
     */
    public LsfdOptions withUpperResidual(boolean fit) {
        return new LsfdOptions(realModes, fit, lowerResidual, fromHz, toHz, weights, outsideBandPoles);
    }

    /**
     * @param fit true to fit the lower residual LR
     * @return new options
     */
    public LsfdOptions withLowerResidual(boolean fit) {
        return new LsfdOptions(realModes, upperResidual, fit, fromHz, toHz, weights, outsideBandPoles);
    }

    /**
     * @param bandFromHz lowest line used, Hz, zero or more
     * @param bandToHz highest line used, Hz, above bandFromHz
     * @return new options
     */
    public LsfdOptions withBandHz(double bandFromHz, double bandToHz) {
        checkBand(bandFromHz, bandToHz);
        return new LsfdOptions(realModes, upperResidual, lowerResidual, bandFromHz, bandToHz, weights, outsideBandPoles);
    }

    /**
     * @param lineWeights one relative weight per FRF line, zero or more (copied), or null for automatic weights
     * @return new options
     */
    public LsfdOptions withWeights(double[] lineWeights) {
        return new LsfdOptions(realModes, upperResidual, lowerResidual, fromHz, toHz,
                lineWeights == null ? null : lineWeights.clone(), outsideBandPoles);
    }

    /**
     * @param poles fixed poles outside the band whose coefficients are fitted (copied), possibly none
     * @return new options
     */
    public LsfdOptions withOutsideBandPoles(List<Pole> poles) {
        return new LsfdOptions(realModes, upperResidual, lowerResidual, fromHz, toHz, weights, poles);
    }

    static void checkBand(double bandFromHz, double bandToHz) {
        if (!(bandFromHz >= 0) || !(bandToHz > bandFromHz)) {
            throw new AnalysisException("a fitting band needs 0 <= fromHz < toHz, got " + bandFromHz + ".." + bandToHz + " Hz");
        }
    }

    /** @return true for real modal constants */
    public boolean realModes() {
        return realModes;
    }

    /** @return true when UR is fitted */
    public boolean upperResidual() {
        return upperResidual;
    }

    /** @return true when LR is fitted */
    public boolean lowerResidual() {
        return lowerResidual;
    }

    /** @return lowest line used, Hz */
    public double fromHz() {
        return fromHz;
    }

    /** @return highest line used, Hz */
    public double toHz() {
        return toHz;
    }

    /** @return the fixed poles outside the band, possibly none */
    public List<Pole> outsideBandPoles() {
        return outsideBandPoles;
    }

    /** @return a copy of the relative weights, or null for automatic weights */
    public double[] weights() {
        return weights == null ? null : weights.clone();
    }

    @Override
    public String toString() {
        return "LsfdOptions[realModes=" + realModes + ", upperResidual=" + upperResidual + ", lowerResidual="
                + lowerResidual + ", band=" + fromHz + ".." + toHz + " Hz, weights="
                + (weights == null ? "automatic" : Arrays.toString(weights)) + ", outsideBandPoles=" + outsideBandPoles
                + "]";
    }
}
