package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.hipparchus.complex.Complex;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;

/**
 * Pole estimation from one FRF by the least-squares complex frequency-domain (LSCF) estimator.
 *
 * <p>Source: P. Guillaume, P. Verboven, S. Vanlanduit, H. Van der Auweraer and B. Peeters, "A
 * poly-reference implementation of the least-squares complex frequency-domain estimator",
 * IMAC-XXI, 2003, and B. Peeters, H. Van der Auweraer, P. Guillaume and J. Leuridan, Shock and
 * Vibration 11:395-409, 2004 (both from memory), here in their single-input single-output form.
 *
 * <p>The FRF lines inside the band [bandLowHz, bandHighHz] (any spacing) are fitted by a
 * common-denominator rational model H(w) = N(Omega)/D(Omega) in the z-domain basis
 * Omega = exp(-j w Ts), with N and D of degree n (the order) and real coefficients. The sampling
 * interval is Ts = 1/(2 bandHighHz), so the band maps onto the upper half of the unit circle up to
 * Omega = -1 and no pole below bandHighHz is aliased. The linearised equation error
 * c_k (N(Omega_k) - H_k D(Omega_k)), with per-line weights c_k, is minimised in the least-squares
 * sense. Eliminating the numerator gives the reduced normal equations
 * M = T - S^T R^-1 S (the published 2 Re sum is a constant factor that does not move the
 * minimum), and the denominator is found with its highest coefficient fixed to 1: M_11 a = -m_12
 * for the remaining n coefficients. Because the blocks are Toeplitz the sums are formed once for
 * the highest order and shared by every lower order (see {@code LscfSums}).
 *
 * <p>The poles are the roots Omega_r of D, found as companion-matrix eigenvalues, mapped back by
 * lambda = -ln(Omega_r)/Ts: a stable pole (Re lambda &lt; 0) has |Omega_r| &gt; 1. Of each
 * conjugate pair only the root with Im(lambda) &gt; 0 is returned; real roots are skipped because a
 * {@link Pole} describes an oscillating mode. Stable and unstable poles are both returned; telling
 * physical from mathematical poles is the work of {@link StabilisationChart} and
 * {@link ModeSelection}. The FRF may be a receptance, mobility or accelerance: the poles do not
 * depend on the quantity. Immutable and safe to share between threads.
 */
public final class Lscf {
    private final double bandLowHz;
    private final double bandHighHz;
    private final double samplingIntervalS;
    private final int lineCount;
    private final LscfSums sums;

    /**
     * Prepares the estimator for orders up to {@code maxOrder} on the lines of one band.
     *
     * @param frf the measured FRF, lines in any spacing
     * @param bandLowHz lower edge of the band, Hz, zero or more
     * @param bandHighHz upper edge of the band, Hz, above the lower edge
     * @param weightsOrNull one weight c_k &gt;= 0 per FRF line (for example 1/sqrt(variance), see
     *     {@link #inverseStdWeights(Frf)}), or null for uniform weights; lines outside the band are ignored
     * @param maxOrder the highest denominator degree that {@link #poles(int)} will be asked for, at least 1
     * @throws AnalysisException if the band is not valid, holds fewer than maxOrder + 1 lines, or
     *     the response (times the weights) is zero at every line in the band
     */
    public Lscf(Frf frf, double bandLowHz, double bandHighHz, double[] weightsOrNull, int maxOrder) {
        if (frf == null) {
            throw new AnalysisException("the pole search needs an FRF, got none");
        }
        if (!(bandLowHz >= 0) || !(bandHighHz > bandLowHz) || Double.isInfinite(bandHighHz)) {
            throw new AnalysisException("the pole search needs a band from 0 Hz or more up to a higher finite frequency, got "
                    + bandLowHz + " .. " + bandHighHz + " Hz");
        }
        if (maxOrder < 1) {
            throw new AnalysisException("the pole search needs a highest model order of at least 1, got " + maxOrder);
        }
        if (weightsOrNull != null && weightsOrNull.length != frf.size()) {
            throw new AnalysisException("the pole search needs one weight per FRF line (" + frf.size() + "), got "
                    + weightsOrNull.length);
        }
        double[] f = frf.frequenciesHz();
        double[] re = frf.realParts();
        double[] im = frf.imaginaryParts();
        int first = 0;
        while (first < f.length && f[first] < bandLowHz) {
            first++;
        }
        int end = first;
        while (end < f.length && f[end] <= bandHighHz) {
            end++;
        }
        int count = end - first;
        if (count == 0) {
            throw new AnalysisException("the pole search band " + bandLowHz + " .. " + bandHighHz
                    + " Hz holds no line of the FRF, whose lines span " + f[0] + " .. " + f[f.length - 1] + " Hz");
        }
        if (count < minimumLines(maxOrder)) {
            throw tooFewLines(maxOrder, bandLowHz, bandHighHz, count);
        }
        this.bandLowHz = bandLowHz;
        this.bandHighHz = bandHighHz;
        this.samplingIntervalS = 1 / (2 * bandHighHz);
        this.lineCount = count;
        double[] theta = new double[count];
        double[] bandRe = new double[count];
        double[] bandIm = new double[count];
        double[] weightSquared = new double[count];
        double weightTotal = 0;
        double energy = 0;
        for (int i = 0; i < count; i++) {
            int line = first + i;
            double c = weightsOrNull == null ? 1 : weightsOrNull[line];
            if (!(c >= 0) || Double.isInfinite(c)) {
                throw new AnalysisException("the pole search weight at line " + line + " (" + f[line]
                        + " Hz) must be zero or positive and finite, got " + c);
            }
            theta[i] = 2 * Math.PI * f[line] * samplingIntervalS;
            bandRe[i] = re[line];
            bandIm[i] = im[line];
            weightSquared[i] = c * c;
            weightTotal += c * c;
            energy += c * c * (re[line] * re[line] + im[line] * im[line]);
        }
        if (!(energy > 0)) {
            throw new AnalysisException("the pole search found a zero response (or zero weights) at every one of the " + count
                    + " lines in the band " + bandLowHz + " .. " + bandHighHz + " Hz: there is nothing to fit");
        }
        this.sums = LscfSums.of(theta, bandRe, bandIm, weightSquared, Math.sqrt(energy / weightTotal), maxOrder);
    }

    /**
     * The smallest number of lines in the band for a given order.
     *
     * <p>The model has 2n + 1 free real coefficients and each line gives two real equations, so
     * n + 1 lines are needed; more lines than that are needed for the fit to mean anything.
     *
     * @param order denominator degree n
     * @return n + 1
     */
    public static int minimumLines(int order) {
        return order + 1;
    }

    /**
     * Weights c_k = 1/sqrt(variance_k) from the FRF's per-line variance.
     *
     * @param frf an FRF that carries a variance, positive at every line
     * @return one weight per line, in 1/(the FRF's units)
     */
    public static double[] inverseStdWeights(Frf frf) {
        double[] variance = frf.variance().orElseThrow(() -> new AnalysisException(
                "weighting the pole search by the noise needs an FRF that carries a per-line variance, got none"));
        double[] weights = new double[variance.length];
        for (int i = 0; i < variance.length; i++) {
            if (!(variance[i] > 0)) {
                throw new AnalysisException("weighting the pole search by the noise needs a positive variance at every line, line " + i
                        + " (" + frf.frequencyHz(i) + " Hz) has " + variance[i]);
            }
            weights[i] = 1 / Math.sqrt(variance[i]);
        }
        return weights;
    }

    /**
     * The poles of the model of one order, stable and unstable, in increasing frequency.
     *
     * <p>Returns no poles when the response in the band is explained by the numerator alone (a flat
     * response: the reduced normal matrix is zero to rounding), since the data then say nothing
     * about a denominator.
     *
     * @param order denominator degree n, 1 .. maxOrder
     * @return the poles with Im(lambda) &gt; 0; at most n/2 of them
     * @throws AnalysisException if the order is out of range, the normal equations are singular or the roots of the
     *     denominator cannot be computed
     */
    public List<Pole> poles(int order) {
        if (order < 1 || order > sums.maxOrder()) {
            throw new AnalysisException("the pole search's model order must lie in 1 .. " + sums.maxOrder()
                    + " (the highest order this estimator was built for), got " + order);
        }
        double[] denominator = denominator(order);
        if (denominator == null) {
            return List.of();
        }
        List<Complex> roots;
        try {
            roots = LscfRoots.ofMonic(denominator);
        } catch (AnalysisException e) {
            throw new AnalysisException("the pole search of model order " + order + " on the " + lineCount + " lines of the band "
                    + bandLowHz + " .. " + bandHighHz + " Hz has no poles: " + e.getMessage(), e);
        }
        List<Pole> poles = new ArrayList<>();
        for (Complex root : roots) {
            Complex lambda = LscfZDomain.lambdaOf(root, samplingIntervalS);
            if (lambda.getImaginary() > 0 && Double.isFinite(lambda.getReal()) && Double.isFinite(lambda.getImaginary())) {
                poles.add(new Pole(lambda.getReal(), lambda.getImaginary()));
            }
        }
        poles.sort(Comparator.comparingDouble(Pole::imag));
        return List.copyOf(poles);
    }

    /** The denominator coefficients a_0 .. a_{n-1} with a_n = 1, or null for a flat response. */
    private double[] denominator(int order) {
        RealMatrix r = new Array2DRowRealMatrix(sums.r(order), false);
        RealMatrix s = new Array2DRowRealMatrix(sums.s(order), false);
        RealMatrix t = new Array2DRowRealMatrix(sums.t(order), false);
        try {
            RealMatrix m = t.subtract(s.transpose().multiply(new QRDecomposition(r).getSolver().solve(s)));
            double largest = 0;
            for (int i = 0; i <= order; i++) {
                for (int j = 0; j <= order; j++) {
                    largest = Math.max(largest, Math.abs(m.getEntry(i, j)));
                }
            }
            // T has unit diagonal after scaling; a reduced matrix at rounding level means N alone fits H.
            if (largest <= 1e-12) {
                return null;
            }
            RealMatrix m11 = m.getSubMatrix(0, order - 1, 0, order - 1);
            m11 = m11.add(m11.transpose()).scalarMultiply(0.5);
            RealVector rhs = new ArrayRealVector(order);
            for (int i = 0; i < order; i++) {
                rhs.setEntry(i, -0.5 * (m.getEntry(i, order) + m.getEntry(order, i)));
            }
            return new QRDecomposition(m11).getSolver().solve(rhs).toArray();
        } catch (MathRuntimeException e) {
            throw new AnalysisException("the pole search's normal equations of model order " + order + " are singular on the "
                    + lineCount + " lines of the band " + bandLowHz + " .. " + bandHighHz
                    + " Hz: lower the order or widen the band", e);
        }
    }

    private static AnalysisException tooFewLines(int order, double lowHz, double highHz, int count) {
        return new AnalysisException("the pole search of model order " + order + " needs at least " + minimumLines(order)
                + " frequency lines in the band " + lowHz + " .. " + highHz + " Hz, got " + count);
    }

    /** @return lower band edge, Hz */
    public double bandLowHz() {
        return bandLowHz;
    }

    /** @return upper band edge, Hz */
    public double bandHighHz() {
        return bandHighHz;
    }

    /** @return the z-domain sampling interval Ts = 1/(2 bandHighHz), s */
    public double samplingIntervalS() {
        return samplingIntervalS;
    }

    /** @return the number of FRF lines inside the band */
    public int lineCount() {
        return lineCount;
    }

    /** @return the highest order this estimator serves */
    public int maxOrder() {
        return sums.maxOrder();
    }
}
