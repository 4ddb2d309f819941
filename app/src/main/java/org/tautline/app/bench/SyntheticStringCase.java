package org.tautline.app.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.ModalSynthesis;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.StringPhysics;

/**
 * A random stiff-string FRF with known modes and noise, for the modal benchmark (invented data).
 *
 * <p>Five harmonics of a pinned stiff string (Fletcher's frequencies) forced and sensed at random
 * points away from nodes; three to five of them appear as polarisation doublets split by two to
 * four half-power bandwidths, so there are 8 to 10 modes. Damping per harmonic is log-uniform from
 * 0.05 % to 2 %, but never so low that the half-power band holds fewer than 1.5 lines (on
 * uniform lines the lowest harmonics cannot then reach 0.05 %). Circular complex Gaussian noise of
 * variance s^2 per line is added, with s^2 set so the weakest mode's peak has the drawn SNR
 * (|H_peak|^2 / s^2, 30 to 50 dB); the FRF carries that variance per line.
 *
 * @param truth the true modes, increasing in frequency
 * @param frf the noisy FRF (receptance) with per-line variance
 * @param noiseVariance s^2 per line, (m/N)^2
 * @param snrDb the drawn SNR of the weakest mode, dB
 * @param steppedSine true for log-spaced (stepped-sine) lines, false for uniform lines
 */
public record SyntheticStringCase(List<Mode> truth, Frf frf, double noiseVariance, double snrDb, boolean steppedSine) {
    /** Lines per FRF. */
    public static final int LINES = 4000;
    private static final double LENGTH_M = 0.6;
    private static final double MU_KG_PER_M = 1.0e-3;

    /**
     * Draws one case.
     *
     * @param random the random source (seeded by the caller)
     * @param steppedSine log-spaced lines when true, uniform when false
     * @return the case
     */
    public static SyntheticStringCase draw(SplittableRandom random, boolean steppedSine) {
        double f0 = 80 + 170 * random.nextDouble();
        double b = Math.exp(Math.log(1e-4) + (Math.log(1e-3) - Math.log(1e-4)) * random.nextDouble());
        double xf = LENGTH_M * (0.07 + 0.12 * random.nextDouble());
        double xs = LENGTH_M * (0.57 + 0.2 * random.nextDouble());
        double angle = Math.toRadians(20 + 25 * random.nextDouble());
        int harmonics = 5;
        double lowHz = 0.85 * f0;
        // Room above the last harmonic for its doublet partner (up to 4 x 2 x 2 % = 16 % higher).
        double highHz = 1.25 * StringPhysics.stiffStringFrequencyHz(harmonics, f0, b, EndCondition.PINNED);
        double[] f = lines(lowHz, highHz, steppedSine);
        int doublets = 3 + random.nextInt(3);
        List<Mode> modes = new ArrayList<>();
        for (int n = 1; n <= harmonics; n++) {
            double fn = StringPhysics.stiffStringFrequencyHz(n, f0, b, EndCondition.PINNED);
            double spacing = localSpacing(f, fn);
            double zetaFloor = Math.max(5e-4, 1.5 * spacing / (2 * fn));
            double zeta = Math.exp(Math.log(zetaFloor) + (Math.log(0.02) - Math.log(zetaFloor)) * random.nextDouble());
            double a = StringPhysics.modeShape(n, xf, LENGTH_M, MU_KG_PER_M) * StringPhysics.modeShape(n, xs, LENGTH_M, MU_KG_PER_M);
            boolean doublet = n <= doublets;
            double share = doublet ? Math.cos(angle) * Math.cos(angle) : 1.0;
            modes.add(new Mode(fn, zeta, new Complex(a * share)));
            if (doublet) {
                double split = (2 + 2 * random.nextDouble()) * 2 * zeta;
                modes.add(new Mode(fn * (1 + split), zeta, new Complex(a * (1 - share))));
            }
        }
        modes.sort(java.util.Comparator.comparingDouble(Mode::frequencyHz));
        double weakestPeak = Double.POSITIVE_INFINITY;
        for (Mode m : modes) {
            double wn = m.angularFrequencyRadPerS();
            weakestPeak = Math.min(weakestPeak, m.modalConstant().norm() / (2 * m.dampingRatio() * wn * wn));
        }
        double snrDb = 30 + 20 * random.nextDouble();
        double variance = weakestPeak * weakestPeak / Math.pow(10, snrDb / 10);
        Frf clean = ModalSynthesis.receptance(modes, f);
        double[] re = clean.realParts();
        double[] im = clean.imaginaryParts();
        double perPart = Math.sqrt(variance / 2);
        double[] varianceArray = new double[f.length];
        for (int i = 0; i < f.length; i++) {
            re[i] += perPart * random.nextGaussian();
            im[i] += perPart * random.nextGaussian();
            varianceArray[i] = variance;
        }
        Frf noisy = Frf.of(f, re, im, FrfQuantity.RECEPTANCE).withVariance(varianceArray);
        return new SyntheticStringCase(List.copyOf(modes), noisy, variance, snrDb, steppedSine);
    }

    private static double[] lines(double lowHz, double highHz, boolean logSpaced) {
        double[] f = new double[LINES];
        for (int i = 0; i < LINES; i++) {
            double t = (double) i / (LINES - 1);
            f[i] = logSpaced ? lowHz * Math.exp(Math.log(highHz / lowHz) * t) : lowHz + (highHz - lowHz) * t;
        }
        return f;
    }

    private static double localSpacing(double[] f, double frequencyHz) {
        int i = 1;
        while (i < f.length - 1 && f[i] < frequencyHz) {
            i++;
        }
        return f[i] - f[i - 1];
    }
}
