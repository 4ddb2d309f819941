package org.tautline.analysis.frf;

import java.util.Arrays;
import java.util.Optional;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;

/**
 * An immutable frequency-response function: response per unit force at a set of frequency lines.
 *
 * <p>Lines are strictly increasing and may be non-uniform (stepped sine). Values are complex with
 * e^{j w t} time dependence. Optional per-line coherence (0..1) and per-line quality figure (the
 * relative residual of the sine fits, smaller is better) travel with the values.
 */
public final class Frf {
    private final double[] frequencyHz;
    private final double[] real;
    private final double[] imag;
    private final double[] coherence;
    private final double[] quality;
    private final FrfQuantity quantity;

    private Frf(double[] frequencyHz, double[] real, double[] imag, double[] coherence, double[] quality,
                FrfQuantity quantity) {
        this.frequencyHz = frequencyHz;
        this.real = real;
        this.imag = imag;
        this.coherence = coherence;
        this.quality = quality;
        this.quantity = quantity;
    }

    /**
     * Builds an FRF, copying the arrays.
     *
     * @param frequencyHz strictly increasing positive frequency lines, Hz
     * @param real real parts, in the quantity's SI units
     * @param imag imaginary parts, in the quantity's SI units
     * @param quantity what the FRF relates
     * @return the FRF
     * @throws AnalysisException if lengths differ, a value is not finite, or frequencies do not increase
     */
    public static Frf of(double[] frequencyHz, double[] real, double[] imag, FrfQuantity quantity) {
        return of(frequencyHz, real, imag, null, null, quantity);
    }

    /**
     * Builds an FRF with optional per-line figures, copying the arrays.
     *
     * @param frequencyHz strictly increasing positive frequency lines, Hz
     * @param real real parts
     * @param imag imaginary parts
     * @param coherence per-line coherence 0..1, or null
     * @param quality per-line relative fit residual (0 = perfect), or null
     * @param quantity what the FRF relates
     * @return the FRF
     */
    public static Frf of(double[] frequencyHz, double[] real, double[] imag, double[] coherence, double[] quality,
                         FrfQuantity quantity) {
        if (quantity == null) {
            throw new AnalysisException("FRF quantity is missing: expected receptance, mobility or accelerance");
        }
        int n = frequencyHz.length;
        checkLength("real", real, n);
        checkLength("imag", imag, n);
        if (coherence != null) {
            checkLength("coherence", coherence, n);
        }
        if (quality != null) {
            checkLength("quality", quality, n);
        }
        if (n == 0) {
            throw new AnalysisException("an FRF needs at least one frequency line, got none");
        }
        for (int i = 0; i < n; i++) {
            if (!(frequencyHz[i] > 0) || Double.isInfinite(frequencyHz[i])) {
                throw new AnalysisException("frequency line " + i + " must be positive and finite, got " + frequencyHz[i] + " Hz");
            }
            if (i > 0 && !(frequencyHz[i] > frequencyHz[i - 1])) {
                throw new AnalysisException("frequency lines must increase strictly: line " + i + " is " + frequencyHz[i]
                        + " Hz after " + frequencyHz[i - 1] + " Hz");
            }
            if (!Double.isFinite(real[i]) || !Double.isFinite(imag[i])) {
                throw new AnalysisException("FRF value at line " + i + " (" + frequencyHz[i] + " Hz) is not finite: "
                        + real[i] + " + j" + imag[i]);
            }
            if (coherence != null && !(coherence[i] >= 0 && coherence[i] <= 1)) {
                throw new AnalysisException("coherence at line " + i + " must lie in 0..1, got " + coherence[i]);
            }
            if (quality != null && (!(quality[i] >= 0) || Double.isInfinite(quality[i]))) {
                throw new AnalysisException("quality at line " + i + " must be zero or positive and finite, got " + quality[i]);
            }
        }
        return new Frf(frequencyHz.clone(), real.clone(), imag.clone(),
                coherence == null ? null : coherence.clone(), quality == null ? null : quality.clone(), quantity);
    }

    private static void checkLength(String name, double[] values, int expected) {
        if (values == null || values.length != expected) {
            throw new AnalysisException("FRF " + name + " must have " + expected + " values (one per frequency line), got "
                    + (values == null ? "none" : values.length));
        }
    }

    /** @return the number of frequency lines */
    public int size() {
        return frequencyHz.length;
    }

    /** @return what the FRF relates */
    public FrfQuantity quantity() {
        return quantity;
    }

    /** @param line 0-based line index @return the frequency of that line, Hz */
    public double frequencyHz(int line) {
        return frequencyHz[line];
    }

    /** @param line 0-based line index @return the complex value of that line */
    public Complex value(int line) {
        return new Complex(real[line], imag[line]);
    }

    /** @param line 0-based line index @return |H| at that line */
    public double magnitude(int line) {
        return Math.hypot(real[line], imag[line]);
    }

    /** @return a copy of the frequency lines, Hz */
    public double[] frequenciesHz() {
        return frequencyHz.clone();
    }

    /** @return a copy of the real parts */
    public double[] realParts() {
        return real.clone();
    }

    /** @return a copy of the imaginary parts */
    public double[] imaginaryParts() {
        return imag.clone();
    }

    /** @return a copy of the per-line coherence, if present */
    public Optional<double[]> coherence() {
        return Optional.ofNullable(coherence).map(double[]::clone);
    }

    /** @return a copy of the per-line quality figure (relative fit residual), if present */
    public Optional<double[]> quality() {
        return Optional.ofNullable(quality).map(double[]::clone);
    }

    /**
     * Converts to another quantity: each time derivative multiplies by j w.
     *
     * @param target the quantity wanted
     * @return this FRF expressed as the target quantity (this instance when it already is)
     */
    public Frf toQuantity(FrfQuantity target) {
        if (target == quantity) {
            return this;
        }
        int order = target.derivativeOrder() - quantity.derivativeOrder();
        int n = size();
        double[] re = new double[n];
        double[] im = new double[n];
        for (int i = 0; i < n; i++) {
            Complex jw = new Complex(0, 2.0 * Math.PI * frequencyHz[i]);
            Complex factor = order >= 0 ? jw.pow(order) : jw.pow(-order).reciprocal();
            Complex v = value(i).multiply(factor);
            re[i] = v.getReal();
            im[i] = v.getImaginary();
        }
        return new Frf(frequencyHz, re, im, coherence, quality, target);
    }

    @Override
    public String toString() {
        return "Frf[" + quantity + ", " + size() + " lines, " + frequencyHz[0] + ".." + frequencyHz[size() - 1] + " Hz]";
    }

    @Override
    public boolean equals(Object other) {
        if (!(other instanceof Frf)) {
            return false;
        }
        Frf that = (Frf) other;
        return quantity == that.quantity && Arrays.equals(frequencyHz, that.frequencyHz) && Arrays.equals(real, that.real)
                && Arrays.equals(imag, that.imag) && Arrays.equals(coherence, that.coherence)
                && Arrays.equals(quality, that.quality);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(frequencyHz) + Arrays.hashCode(real) + 7 * Arrays.hashCode(imag) + quantity.hashCode();
    }
}
