package org.tautline.analysis.modal;

import org.tautline.analysis.AnalysisException;

/**
 * Settings of a modal refinement; immutable, each {@code withXxx} returns a new instance.
 *
 * <p>Settings and defaults:
 * <ul>
 * <li>{@code realModes} (boolean, default false): real modal constants (3 unknowns a mode) or complex (4).</li>
 * <li>{@code upperResidual}, {@code lowerResidual} (boolean, default false): fit UR and LR, each complex.</li>
 * <li>{@code fromHz}, {@code toHz} (Hz, default 0 and +infinity): the band of lines used, inclusive.</li>
 * <li>{@code weights} (one relative weight per FRF line, default none): when absent, lines are weighted
 *     by 1/variance if the FRF carries its variance, else uniformly.</li>
 * <li>{@code maxIterations} (count, default 200): Levenberg-Marquardt iterations before giving up.</li>
 * </ul>
 */
public final class ModalRefinementOptions {
    private static final ModalRefinementOptions DEFAULTS = new ModalRefinementOptions(LsfdOptions.defaults(), 200);

    private final LsfdOptions lines;
    private final int maxIterations;

    private ModalRefinementOptions(LsfdOptions lines, int maxIterations) {
        this.lines = lines;
        this.maxIterations = maxIterations;
    }

    /** @return complex modes, no residual terms, every line, automatic weights, 200 iterations */
    public static ModalRefinementOptions defaults() {
        return DEFAULTS;
    }

    /**
     * The same mode form, residual terms, band and weights as an LSFD estimate, 200 iterations.
     *
     * @param lsfd the LSFD options
     * @return new options
     */
    public static ModalRefinementOptions of(LsfdOptions lsfd) {
        if (lsfd == null) {
            throw new AnalysisException("modal refinement options need LSFD options, got none");
        }
        return new ModalRefinementOptions(lsfd, DEFAULTS.maxIterations);
    }

    /**
     * @param real true for real modal constants
     * @return new options
     */
    public ModalRefinementOptions withRealModes(boolean real) {
        return new ModalRefinementOptions(lines.withRealModes(real), maxIterations);
    }

    /**
     * @param fit true to fit UR
     * @return new options
     */
    public ModalRefinementOptions withUpperResidual(boolean fit) {
        return new ModalRefinementOptions(lines.withUpperResidual(fit), maxIterations);
    }

    /**
     * @param fit true to fit LR
     * @return new options
     */
    public ModalRefinementOptions withLowerResidual(boolean fit) {
        return new ModalRefinementOptions(lines.withLowerResidual(fit), maxIterations);
    }

    /**
     * @param bandFromHz lowest line used, Hz
     * @param bandToHz highest line used, Hz
     * @return new options
     */
    public ModalRefinementOptions withBandHz(double bandFromHz, double bandToHz) {
        return new ModalRefinementOptions(lines.withBandHz(bandFromHz, bandToHz), maxIterations);
    }

    /**
     * @param lineWeights one relative weight per FRF line (copied), or null for automatic weights
     * @return new options
     */
    public ModalRefinementOptions withWeights(double[] lineWeights) {
        return new ModalRefinementOptions(lines.withWeights(lineWeights), maxIterations);
    }

    /**
     * @param iterations at least 1
     * @return new options
     */
    public ModalRefinementOptions withMaxIterations(int iterations) {
        if (iterations < 1) {
            throw new AnalysisException("modal refinement maxIterations must be at least 1, got " + iterations);
        }
        return new ModalRefinementOptions(lines, iterations);
    }

    /** @return the mode form, residual terms, band and weights as LSFD options */
    public LsfdOptions lines() {
        return lines;
    }

    /** @return true for real modal constants */
    public boolean realModes() {
        return lines.realModes();
    }

    /** @return true when UR is fitted */
    public boolean upperResidual() {
        return lines.upperResidual();
    }

    /** @return true when LR is fitted */
    public boolean lowerResidual() {
        return lines.lowerResidual();
    }

    /** @return the iteration limit */
    public int maxIterations() {
        return maxIterations;
    }

    @Override
    public String toString() {
        return "ModalRefinementOptions[" + lines + ", maxIterations=" + maxIterations + "]";
    }
}
