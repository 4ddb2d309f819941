package org.tautline.analysis.frf;

import java.util.Arrays;
import java.util.Optional;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;

/**
 * An immutable frequency-response function: response per unit force at a set of frequency lines.
 *
 * <p>Lines are strictly increasing and may be non-uniform (stepped sine). Values are complex with
 * e^{j w t} time dependence. Optional per-line coherence (0..1), a per-line quality figure (the
 * relative residual of the sine fits, smaller is better) and the per-line variance of the
 * estimate travel with the values; {@code withXxx} methods return a new FRF with one added.
 */
public final class Frf {
    private final double[] frequencyHz;
    private final double[] real;
    private final double[] imag;
    private final double[] coherence;
    private final double[] quality;
    private final double[] variance;
    private final FrfQuantity quantity;

    private Frf(double[] frequencyHz, double[] real, double[] imag, double[] coherence, double[] quality,
                double[] variance, FrfQuantity quantity) {
        this.frequencyHz = frequencyHz;
        this.real = real;
        this.imag = imag;
        this.coherence = coherence;
        this.quality = quality;
        this.variance = variance;
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
        if (quantity == null) {
            throw new AnalysisException("FRF quantity is missing: expected receptance, mobility or accelerance");
        }
        if (frequencyHz == null) {
            throw new AnalysisException("FRF frequency lines are missing");
        }
        int n = frequencyHz.length;
        checkLength("real", real, n);
        checkLength("imag", imag, n);
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
        }
        return new Frf(frequencyHz.clone(), real.clone(), imag.clone(), null, null, null, quantity);
    }

    /**
     * The same FRF with per-line coherence.
     *
     * @param coherence one value in 0..1 per line (copied)
     * @return a new FRF
     */
    public Frf withCoherence(double[] coherence) {
        checkLength("coherence", coherence, size());
        for (int i = 0; i < coherence.length; i++) {
            if (!(coherence[i] >= 0 && coherence[i] <= 1)) {
                throw new AnalysisException("coherence at line " + i + " (" + frequencyHz[i] + " Hz) must lie in 0..1, got "
                        + coherence[i]);
            }
        }
        return new Frf(frequencyHz, real, imag, coherence.clone(), quality, variance, quantity);
    }

    /**
     * The same FRF with a per-line quality figure.
     *
     * @param quality one relative fit residual per line, zero or more (0 = perfect) (copied)
     * @return a new FRF
     */
    public Frf withQuality(double[] quality) {
        checkNonNegative("quality", quality);
        return new Frf(frequencyHz, real, imag, coherence, quality.clone(), variance, quantity);
    }

    /**
     * The same FRF with the per-line variance of the estimate.
     *
     * @param variance one value per line: E|H_est - H|^2, in the quantity's SI units squared (copied)
     * @return a new FRF
     */
    public Frf withVariance(double[] variance) {
        checkNonNegative("variance", variance);
        return new Frf(frequencyHz, real, imag, coherence, quality, variance.clone(), quantity);
    }

    private void checkNonNegative(String name, double[] values) {
        checkLength(name, values, size());
        for (int i = 0; i < values.length; i++) {
            if (!(values[i] >= 0) || Double.isInfinite(values[i])) {
                throw new AnalysisException(name + " at line " + i + " (" + frequencyHz[i]
                        + " Hz) must be zero or positive and finite, got " + values[i]);
            }
        }
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

    /**
     * @param line 0-based line index
     * @return the frequency of that line, Hz
     */
    public double frequencyHz(int line) {
        return frequencyHz[line];
    }

    /**
     * @param line 0-based line index
     * @return the complex value of that line
     */
    public Complex value(int line) {
        return new Complex(real[line], imag[line]);
    }

    /**
     * @param line 0-based line index
     * @return |H| at that line
     */
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

    /** @return a copy of the per-line variance E|H_est - H|^2, if present */
    public Optional<double[]> variance() {
        return Optional.ofNullable(variance).map(double[]::clone);
    }

    /**
     * The lines from lowHz to highHz (both included), with their coherence, quality and variance when present.
     *
     * @param lowHz lowest frequency kept, Hz
     * @param highHz highest frequency kept, Hz
     * @return a new FRF
     * @throws AnalysisException when no line lies in the band
     */
    public Frf withinBand(double lowHz, double highHz) {
        int from = 0;
        while (from < size() && frequencyHz[from] < lowHz) {
            from++;
        }
        int to = from;
        while (to < size() && frequencyHz[to] <= highHz) {
            to++;
        }
        if (to == from) {
            throw new AnalysisException("the band " + lowHz + " to " + highHz + " Hz holds no line of " + this);
        }
        return new Frf(Arrays.copyOfRange(frequencyHz, from, to), Arrays.copyOfRange(real, from, to),
                Arrays.copyOfRange(imag, from, to), part(coherence, from, to), part(quality, from, to),
                part(variance, from, to), quantity);
    }

    private static double[] part(double[] values, int from, int to) {
        return values == null ? null : Arrays.copyOfRange(values, from, to);
    }

    /**
     * Converts to another quantity: each time derivative multiplies by j w (variances by w^2).
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
        double[] var = variance == null ? null : new double[n];
        for (int i = 0; i < n; i++) {
            Complex jw = new Complex(0, 2.0 * Math.PI * frequencyHz[i]);
            Complex factor = order >= 0 ? jw.pow(order) : jw.pow(-order).reciprocal();
            Complex v = value(i).multiply(factor);
            re[i] = v.getReal();
            im[i] = v.getImaginary();
            if (var != null) {
                double gain = factor.norm();
                var[i] = variance[i] * gain * gain;
            }
        }
        return new Frf(frequencyHz, re, im, coherence, quality, var, target);
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
                && Arrays.equals(quality, that.quality) && Arrays.equals(variance, that.variance);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(frequencyHz) + Arrays.hashCode(real) + 7 * Arrays.hashCode(imag) + quantity.hashCode();
    }
}
