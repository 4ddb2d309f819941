package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.TreeSet;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/** Test-data builders for the LSCF, stabilisation and mode-selection tests: lines, modal models, noise. */
final class LscfTestData {
    private LscfTestData() {
    }

    /** @return n uniformly spaced lines from low to high inclusive, Hz */
    static double[] uniformLines(double lowHz, double highHz, int n) {
        double[] f = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = lowHz + (highHz - lowHz) * i / (n - 1);
        }
        return f;
    }

    /** @return n logarithmically spaced lines from low to high inclusive, Hz */
    static double[] logLines(double lowHz, double highHz, int n) {
        double[] f = new double[n];
        double ratio = Math.log(highHz / lowHz);
        for (int i = 0; i < n; i++) {
            f[i] = lowHz * Math.exp(ratio * i / (n - 1));
        }
        f[n - 1] = highHz;
        return f;
    }

    /**
     * Stepped-sine style lines: a coarse log-spaced sweep plus a dense run across each resonance.
     *
     * <p>Dwelling more finely inside each half-power band is common stepped-sine practice.
     *
     * @param lowHz first line, Hz
     * @param highHz last line, Hz
     * @param coarse number of coarse log-spaced lines
     * @param modes the modes to refine around
     * @param perMode lines placed uniformly over +-3 half-power bandwidths of each mode
     * @return strictly increasing lines, Hz
     */
    static double[] steppedSineLines(double lowHz, double highHz, int coarse, List<Mode> modes, int perMode) {
        TreeSet<Double> lines = new TreeSet<>();
        for (double f : logLines(lowHz, highHz, coarse)) {
            lines.add(f);
        }
        for (Mode mode : modes) {
            double halfWidth = 3 * 2 * mode.dampingRatio() * mode.frequencyHz();
            for (double f : uniformLines(mode.frequencyHz() - halfWidth, mode.frequencyHz() + halfWidth, perMode)) {
                lines.add(f);
            }
        }
        // Merge lines closer than a part in 1e9 so the set stays strictly increasing.
        List<Double> kept = new ArrayList<>();
        for (double f : lines) {
            if (kept.isEmpty() || f - kept.get(kept.size() - 1) > 1e-9 * f) {
                kept.add(f);
            }
        }
        return kept.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** @return one mode at 100 Hz, 1 % damping */
    static List<Mode> oneMode() {
        return List.of(new Mode(100, 0.01, new Complex(4e3, 0)));
    }

    /** @return three well separated modes with mixed-sign real modal constants, 0.5 .. 2 % damping */
    static List<Mode> threeModes() {
        return List.of(
                new Mode(120, 0.005, new Complex(3e3, 0)),
                new Mode(260, 0.01, new Complex(-5e3, 0)),
                new Mode(410, 0.02, new Complex(8e3, 0)));
    }

    /**
     * Eight modes, two of them split by exactly one half-power bandwidth: f2 = f1 (1 + 2 zeta).
     *
     * @return the modes in increasing frequency
     */
    static List<Mode> eightModes() {
        double zetaPair = 0.004;
        double pairLow = 300;
        return List.of(
                new Mode(110, 0.006, new Complex(2e3, 0)),
                new Mode(205, 0.008, new Complex(-3e3, 0)),
                new Mode(pairLow, zetaPair, new Complex(3e3, 0)),
                new Mode(pairLow * (1 + 2 * zetaPair), zetaPair, new Complex(2e3, 0)),
                new Mode(430, 0.01, new Complex(6e3, 0)),
                new Mode(560, 0.005, new Complex(-4e3, 200)),
                new Mode(700, 0.012, new Complex(9e3, 0)),
                new Mode(850, 0.015, new Complex(-1.2e4, 0)));
    }

    /**
     * Eight modes of a stiff steel string with one polarisation doublet.
     *
     * <p>Frequencies follow the pinned stiff string f_n = n f0 sqrt(1 + B n^2) (N. H. Fletcher, JASA
     * 36:203, 1964, from memory) with the check case f0 = 142.389 Hz, B = 1.9379e-4 of the test
     * sheet; modal constants follow the point-force receptance of a string,
     * (2/(mu L)) sin(n pi x_f/L) sin(n pi x_r/L) with mu = 6.1654e-3 kg/m, L = 1 m, x_f = 0.137 m,
     * x_r = 0.291 m. Damping runs from 0.05 % to 2 %. The second mode appears twice: its second
     * polarisation sits about three half-power bandwidths higher (f (1 + 6 zeta)) with a smaller
     * constant, as a sensor at an angle to the polarisation planes sees it.
     *
     * @return the modes in increasing frequency
     */
    static List<Mode> stiffStringModes() {
        double f0 = 142.389;
        double b = 1.9379e-4;
        double mu = 6.1654e-3;
        double xf = 0.137;
        double xr = 0.291;
        double[] zeta = {0.0005, 0.002, 0.001, 0.004, 0.008, 0.012, 0.02};
        List<Mode> modes = new ArrayList<>();
        for (int n = 1; n <= 7; n++) {
            double f = n * f0 * Math.sqrt(1 + b * n * n);
            double a = 2 / mu * Math.sin(n * Math.PI * xf) * Math.sin(n * Math.PI * xr);
            modes.add(new Mode(f, zeta[n - 1], new Complex(a, 0)));
            if (n == 2) {
                modes.add(new Mode(f * (1 + 3 * 2 * zeta[n - 1]), zeta[n - 1], new Complex(0.4 * a, 0)));
            }
        }
        return List.copyOf(modes);
    }

    /** @return the FRF of the modes with circular complex noise of std noiseRelative |H_k| per line, seeded */
    static Frf withRelativeNoise(Frf clean, double noiseRelative, long seed) {
        Random random = new Random(seed);
        int n = clean.size();
        double[] re = new double[n];
        double[] im = new double[n];
        double[] variance = new double[n];
        for (int i = 0; i < n; i++) {
            double sigma = noiseRelative * clean.magnitude(i);
            // Circular complex Gaussian: each part has variance sigma^2 / 2.
            re[i] = clean.value(i).getReal() + sigma / Math.sqrt(2) * random.nextGaussian();
            im[i] = clean.value(i).getImaginary() + sigma / Math.sqrt(2) * random.nextGaussian();
            variance[i] = sigma * sigma;
        }
        return Frf.of(clean.frequenciesHz(), re, im, clean.quantity()).withVariance(variance);
    }

    /** @return pure circular complex noise of unit variance on the lines, seeded */
    static Frf pureNoise(double[] frequencyHz, long seed) {
        Random random = new Random(seed);
        double[] re = new double[frequencyHz.length];
        double[] im = new double[frequencyHz.length];
        for (int i = 0; i < frequencyHz.length; i++) {
            re[i] = random.nextGaussian() / Math.sqrt(2);
            im[i] = random.nextGaussian() / Math.sqrt(2);
        }
        return Frf.of(frequencyHz, re, im, FrfQuantity.RECEPTANCE);
    }

    /** @return a constant FRF on the lines */
    static Frf flat(double[] frequencyHz, double value) {
        double[] re = new double[frequencyHz.length];
        Arrays.fill(re, value);
        return Frf.of(frequencyHz, re, new double[frequencyHz.length], FrfQuantity.RECEPTANCE);
    }

    /** @return the relative frequency error |f - f_true|/f_true */
    static double frequencyError(Pole estimate, Mode truth) {
        return Math.abs(estimate.frequencyHz() - truth.frequencyHz()) / truth.frequencyHz();
    }

    /** @return the relative damping error |zeta - zeta_true|/zeta_true */
    static double dampingError(Pole estimate, Mode truth) {
        return Math.abs(estimate.dampingRatio() - truth.dampingRatio()) / truth.dampingRatio();
    }

    /** @return the estimated pole closest to the true mode in frequency */
    static Pole nearest(List<Pole> poles, Mode truth) {
        Pole best = null;
        for (Pole p : poles) {
            if (best == null || frequencyError(p, truth) < frequencyError(best, truth)) {
                best = p;
            }
        }
        return best;
    }
}
