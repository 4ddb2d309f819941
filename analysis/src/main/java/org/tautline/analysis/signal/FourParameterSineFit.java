package org.tautline.analysis.signal;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.CholeskyDecomposition;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.RealVector;
import org.tautline.analysis.AnalysisException;

/**
 * Four-parameter sine fit: amplitude, phase, offset and frequency.
 *
 * <p>Source: IEEE Std 1057-2017 (and IEEE Std 1241-2010), "four-parameter (general) sine fit":
 * starting from a frequency estimate w0, the model y = A cos wt + B sin wt + C is linearised in
 * w, adding the column t (-A sin wt + B cos wt) for the correction dw; the linear least-squares
 * problem is solved, w is updated and the step repeated until the correction is negligible. The
 * start must lie within a fraction of a bin (1/record length) of the true frequency, as the
 * standard notes; a three-parameter fit at a frequency from the spectrum peak is the usual start.
 * The frequency's standard error comes from the residual variance times (X^T X)^-1.
 *
 * @param phasor amplitude, phase (time origin at sample 0), offset at the refined frequency
 * @param frequencyStdHz standard error of the refined frequency, Hz
 * @param iterations linearised steps taken
 */
public record FourParameterSineFit(SinePhasor phasor, double frequencyStdHz, int iterations) {
    private static final int MAX_ITERATIONS = 50;
    private static final double RELATIVE_TOLERANCE = 1e-12;

    /**
     * Fits amplitude, phase, offset and frequency to one channel.
     *
     * @param samples the record
     * @param sampleRateHz sample rate, Hz
     * @param initialFrequencyHz starting estimate, Hz, within a fraction of 1/(record length) of the answer
     * @return the fit
     * @throws AnalysisException when the iteration does not settle (start too far off, or no sine in the record)
     */
    public static FourParameterSineFit fit(double[] samples, double sampleRateHz, double initialFrequencyHz) {
        SineFit.usableOrder(sampleRateHz, initialFrequencyHz, 1);
        int n = samples.length;
        if (n < 6) {
            throw new AnalysisException("four-parameter sine fit needs at least 6 samples, got " + n);
        }
        double durationS = n / sampleRateHz;
        double w = 2 * Math.PI * initialFrequencyHz;
        SinePhasor start = SineFit.threeParameter(samples, sampleRateHz, initialFrequencyHz);
        double a = start.amplitude() * Math.cos(start.phaseRad());
        double b = -start.amplitude() * Math.sin(start.phaseRad());
        for (int iteration = 1; iteration <= MAX_ITERATIONS; iteration++) {
            double[][] normal = new double[4][4];
            double[] rhs = new double[4];
            double yy = 0;
            double[] row = new double[4];
            for (int i = 0; i < n; i++) {
                double t = i / sampleRateHz;
                double c = Math.cos(w * t);
                double s = Math.sin(w * t);
                row[0] = c;
                row[1] = s;
                row[2] = 1.0;
                // Scaled by the record length so the columns are of one magnitude.
                row[3] = (t / durationS) * (-a * s + b * c);
                double y = samples[i];
                if (!Double.isFinite(y)) {
                    throw new AnalysisException("sample " + i + " is not finite: " + y);
                }
                for (int p = 0; p < 4; p++) {
                    rhs[p] += row[p] * y;
                    for (int q = p; q < 4; q++) {
                        normal[p][q] += row[p] * row[q];
                    }
                }
                yy += y * y;
            }
            for (int p = 0; p < 4; p++) {
                for (int q = 0; q < p; q++) {
                    normal[p][q] = normal[q][p];
                }
            }
            DecompositionSolver solver;
            try {
                solver = new CholeskyDecomposition(new Array2DRowRealMatrix(normal, false), 1e-14, 1e-14).getSolver();
            } catch (RuntimeException e) {
                throw new AnalysisException("four-parameter sine fit is ill-conditioned near " + w / (2 * Math.PI)
                        + " Hz: is there a sine in the record?", e);
            }
            RealVector xty = new ArrayRealVector(rhs, false);
            RealVector beta = solver.solve(xty);
            a = beta.getEntry(0);
            b = beta.getEntry(1);
            double dw = beta.getEntry(3) / durationS;
            w += dw;
            if (!(w > 0) || w / (2 * Math.PI) >= sampleRateHz / 2) {
                throw new AnalysisException("four-parameter sine fit left the band (0, " + sampleRateHz / 2
                        + " Hz) from a start of " + initialFrequencyHz + " Hz: start closer to the sine's frequency");
            }
            if (Math.abs(dw) <= RELATIVE_TOLERANCE * w) {
                double frequencyHz = w / (2 * Math.PI);
                SinePhasor phasor = SineFit.threeParameter(samples, sampleRateHz, frequencyHz);
                double rss = Math.max(0.0, yy - beta.dotProduct(xty));
                double variance = rss / (n - 4);
                double varW = variance * solver.getInverse().getEntry(3, 3) / (durationS * durationS);
                return new FourParameterSineFit(phasor, Math.sqrt(Math.max(0, varW)) / (2 * Math.PI), iteration);
            }
        }
        throw new AnalysisException("four-parameter sine fit did not settle within " + MAX_ITERATIONS
                + " steps from " + initialFrequencyHz + " Hz: start closer to the sine's frequency");
    }
}
