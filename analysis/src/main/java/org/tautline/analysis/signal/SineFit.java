package org.tautline.analysis.signal;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.CholeskyDecomposition;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.tautline.analysis.AnalysisException;

/**
 * Least-squares sine fitting at a known frequency, one channel or several at once.
 *
 * <p>Source: IEEE Std 1057-2017, "IEEE Standard for Digitizing Waveform Recorders", and IEEE Std
 * 1241-2010, "three-parameter (known frequency) sine fit": y = A cos wt + B sin wt + C solved by
 * linear least squares, amplitude sqrt(A^2 + B^2), phase atan2(-B, A). With harmonic order K > 1
 * the model adds A_k cos(k w t) + B_k sin(k w t) for k = 2..K (the same linear problem with more
 * columns), which gives the harmonic amplitudes for distortion. Standard errors follow from the
 * residual variance times (X^T X)^-1, propagated to amplitude and phase to first order. Channels
 * sampled together share the design matrix, so a multi-channel fit factors it once. For the
 * frequency-refining four-parameter fit see {@link FourParameterSineFit}.
 */
public final class SineFit {
    private SineFit() {
    }

    /**
     * Three-parameter fit (IEEE Std 1057) of one channel.
     *
     * @param samples the record
     * @param sampleRateHz sample rate, Hz
     * @param frequencyHz the known frequency, Hz
     * @return the fitted phasor
     */
    public static SinePhasor threeParameter(double[] samples, double sampleRateHz, double frequencyHz) {
        return fit(samples, sampleRateHz, frequencyHz, 1);
    }

    /**
     * Sine fit with harmonics 2..harmonicOrder at a known fundamental frequency.
     *
     * @param samples the record, at least 2 harmonicOrder + 2 samples
     * @param sampleRateHz sample rate, Hz
     * @param frequencyHz the known fundamental, Hz, below half the sample rate
     * @param harmonicOrder highest harmonic to fit (1 = three-parameter fit); harmonics at or above
     *                      half the sample rate are left out
     * @return the fitted phasor with harmonic amplitudes
     */
    public static SinePhasor fit(double[] samples, double sampleRateHz, double frequencyHz, int harmonicOrder) {
        return fitChannels(new double[][] {samples}, sampleRateHz, frequencyHz, harmonicOrder)[0];
    }

    /**
     * Fits every channel of a simultaneously sampled record at the same frequency.
     *
     * @param channels channels[c][i], all of the same length
     * @param sampleRateHz sample rate, Hz
     * @param frequencyHz the known fundamental, Hz, below half the sample rate
     * @param harmonicOrder highest harmonic to fit (1 = three-parameter fit)
     * @return one phasor per channel, sharing one time origin (sample 0)
     */
    public static SinePhasor[] fitChannels(double[][] channels, double sampleRateHz, double frequencyHz,
                                           int harmonicOrder) {
        if (channels.length == 0) {
            throw new AnalysisException("sine fit needs at least one channel, got none");
        }
        int n = channels[0].length;
        for (int c = 1; c < channels.length; c++) {
            if (channels[c].length != n) {
                throw new AnalysisException("sine fit channels must be of one length: channel 0 has " + n
                        + " samples, channel " + c + " has " + channels[c].length);
            }
        }
        int order = usableOrder(sampleRateHz, frequencyHz, harmonicOrder);
        int columns = 2 * order + 1;
        if (n < columns + 1) {
            throw new AnalysisException("sine fit needs at least " + (columns + 1) + " samples, got " + n);
        }
        double[][] normal = new double[columns][columns];
        double[][] rhs = new double[channels.length][columns];
        double[] yy = new double[channels.length];
        accumulate(channels, sampleRateHz, frequencyHz, order, normal, rhs, yy);
        DecompositionSolver solver = factor(normal, frequencyHz, n);
        RealMatrix inverse = solver.getInverse();
        SinePhasor[] result = new SinePhasor[channels.length];
        for (int c = 0; c < channels.length; c++) {
            RealVector xty = new ArrayRealVector(rhs[c], false);
            RealVector beta = solver.solve(xty);
            // Residual sum of squares = y'y - beta' X'y for the least-squares solution.
            double rss = Math.max(0.0, yy[c] - beta.dotProduct(xty));
            result[c] = phasor(beta, inverse, rss, n, columns, order, frequencyHz);
        }
        return result;
    }

    /**
     * The longest span of whole cycles that fits in the samples available.
     *
     * @param availableSamples samples there are
     * @param sampleRateHz sample rate, Hz
     * @param frequencyHz the fundamental, Hz
     * @return the sample count closest to the largest whole number of cycles that is not more than
     *         {@code availableSamples}; all of them when less than one cycle is available
     */
    public static int wholeCycleSamples(int availableSamples, double sampleRateHz, double frequencyHz) {
        long cycles = (long) Math.floor(availableSamples * frequencyHz / sampleRateHz);
        if (cycles < 1) {
            return availableSamples;
        }
        long samples = Math.round(cycles * sampleRateHz / frequencyHz);
        return (int) Math.min(samples, availableSamples);
    }

    static int usableOrder(double sampleRateHz, double frequencyHz, int harmonicOrder) {
        if (!(sampleRateHz > 0) || Double.isInfinite(sampleRateHz)) {
            throw new AnalysisException("sample rate must be positive and finite, got " + sampleRateHz + " Hz");
        }
        if (!(frequencyHz > 0) || !(frequencyHz < sampleRateHz / 2)) {
            throw new AnalysisException("sine-fit frequency must lie between 0 and half the sample rate ("
                    + sampleRateHz / 2 + " Hz), got " + frequencyHz + " Hz");
        }
        if (harmonicOrder < 1) {
            throw new AnalysisException("harmonic order must be 1 or more, got " + harmonicOrder);
        }
        int order = harmonicOrder;
        while (order > 1 && order * frequencyHz >= sampleRateHz / 2) {
            order--;
        }
        return order;
    }

    /** Sums X'X, X'y and y'y in one pass; cos and sin by rotation, re-anchored every 1024 samples. */
    private static void accumulate(double[][] channels, double sampleRateHz, double frequencyHz, int order,
                                   double[][] normal, double[][] rhs, double[] yy) {
        int columns = normal.length;
        int n = channels[0].length;
        double[] row = new double[columns];
        double dPhase = 2.0 * Math.PI * frequencyHz / sampleRateHz;
        double c1 = Math.cos(dPhase);
        double s1 = Math.sin(dPhase);
        double c = 1;
        double s = 0;
        for (int i = 0; i < n; i++) {
            if ((i & 1023) == 0) {
                c = Math.cos(i * dPhase);
                s = Math.sin(i * dPhase);
            }
            fillRow(row, c, s, order);
            for (int a = 0; a < columns; a++) {
                double ra = row[a];
                for (int b = a; b < columns; b++) {
                    normal[a][b] += ra * row[b];
                }
            }
            for (int ch = 0; ch < channels.length; ch++) {
                double y = channels[ch][i];
                if (!Double.isFinite(y)) {
                    throw new AnalysisException((channels.length > 1 ? "channel " + ch + ", " : "") + "sample " + i
                            + " is not finite: " + y);
                }
                double[] r = rhs[ch];
                for (int a = 0; a < columns; a++) {
                    r[a] += row[a] * y;
                }
                yy[ch] += y * y;
            }
            double cNext = c * c1 - s * s1;
            s = s * c1 + c * s1;
            c = cNext;
        }
        for (int a = 0; a < columns; a++) {
            for (int b = 0; b < a; b++) {
                normal[a][b] = normal[b][a];
            }
        }
    }

    private static DecompositionSolver factor(double[][] normal, double frequencyHz, int n) {
        RealMatrix xtx = new Array2DRowRealMatrix(normal, false);
        try {
            return new CholeskyDecomposition(xtx, 1e-14, 1e-14).getSolver();
        } catch (RuntimeException e) {
            throw new AnalysisException("sine fit is ill-conditioned at " + frequencyHz + " Hz over " + n
                    + " samples: record too short for the frequency", e);
        }
    }

    private static SinePhasor phasor(RealVector beta, RealMatrix inverse, double rss, int n, int columns, int order,
                                     double frequencyHz) {
        double residualVariance = rss / (n - columns);
        double a = beta.getEntry(0);
        double b = beta.getEntry(1);
        double amplitude = Math.hypot(a, b);
        double phase = Math.atan2(-b, a);
        double varA = residualVariance * inverse.getEntry(0, 0);
        double varB = residualVariance * inverse.getEntry(1, 1);
        double covAB = residualVariance * inverse.getEntry(0, 1);
        double amplitudeStd = 0;
        double phaseStd = 0;
        if (amplitude > 0) {
            amplitudeStd = Math.sqrt(Math.max(0, a * a * varA + b * b * varB + 2 * a * b * covAB)) / amplitude;
            phaseStd = Math.sqrt(Math.max(0, b * b * varA + a * a * varB - 2 * a * b * covAB)) / (amplitude * amplitude);
        }
        double[] harmonics = new double[order - 1];
        for (int k = 2; k <= order; k++) {
            harmonics[k - 2] = Math.hypot(beta.getEntry(2 * k - 2), beta.getEntry(2 * k - 1));
        }
        double offset = beta.getEntry(columns - 1);
        return new SinePhasor(frequencyHz, amplitude, phase, offset, harmonics, Math.sqrt(rss / n), amplitudeStd,
                phaseStd, n);
    }

    /** Columns: cos wt, sin wt, cos 2wt, sin 2wt, ..., 1. */
    private static void fillRow(double[] row, double c, double s, int order) {
        row[0] = c;
        row[1] = s;
        double ck = c;
        double sk = s;
        for (int k = 2; k <= order; k++) {
            double cNext = ck * c - sk * s;
            sk = sk * c + ck * s;
            ck = cNext;
            row[2 * k - 2] = ck;
            row[2 * k - 1] = sk;
        }
        row[row.length - 1] = 1.0;
    }
}
