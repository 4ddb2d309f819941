package org.tautline.app.ui.results;

import java.util.List;
import java.util.Optional;
import java.util.Random;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Limit;
import org.tautline.analysis.verdict.Specification;
import org.tautline.app.qualify.Qualification;
import org.tautline.app.qualify.QualificationResult;

/**
 * An invented pinned stiff wire whose receptance is written down from textbook formulas, qualified for the tests.
 *
 * <p>Frequencies: stiff string with pinned ends, f_n = n f0 sqrt(1 + B n^2), f0 = sqrt(T/mu)/(2L),
 * B = pi^2 EI/(T L^2) (H. Fletcher, JASA 36:203, 1964, from memory). Receptance: point force on a
 * string, H = sum (2/(mu L)) sin(n pi x_f/L) sin(n pi x_s/L)/(w_n^2 - w^2 + 2 j zeta w_n w) (modal
 * superposition with mass-normalised modes, a standard result). Noise: 0.2 % of |H| per line with a fixed seed.
 */
public final class SyntheticWire {
    public static final double LENGTH_M = 0.60;
    public static final double DENSITY_KG_PER_M = 2.0e-3;
    public static final double TENSION_N = 150.0;
    public static final double BENDING_NM2 = 6.14e-4;
    public static final double FORCING_M = 0.07;
    public static final double SENSOR_M = 0.43;
    public static final double DAMPING = 0.004;
    public static final int MODES_IN_BAND = 4;

    private SyntheticWire() {
    }

    public static double frequencyHz(int n) {
        double f0 = Math.sqrt(TENSION_N / DENSITY_KG_PER_M) / (2 * LENGTH_M);
        double b = Math.PI * Math.PI * BENDING_NM2 / (TENSION_N * LENGTH_M * LENGTH_M);
        return n * f0 * Math.sqrt(1 + b * n * n);
    }

    public static double modalConstant(int n) {
        return 2 / (DENSITY_KG_PER_M * LENGTH_M) * Math.sin(n * Math.PI * FORCING_M / LENGTH_M)
                * Math.sin(n * Math.PI * SENSOR_M / LENGTH_M);
    }

    public static Frf receptance() {
        int lines = 900;
        double low = 160;
        double high = 1000;
        double[] f = new double[lines];
        double[] re = new double[lines];
        double[] im = new double[lines];
        Random noise = new Random(42);
        for (int i = 0; i < lines; i++) {
            f[i] = low * Math.pow(high / low, i / (lines - 1.0));
            double w = 2 * Math.PI * f[i];
            Complex h = Complex.ZERO;
            for (int n = 1; n <= 7; n++) {
                double wn = 2 * Math.PI * frequencyHz(n);
                h = h.add(new Complex(modalConstant(n)).divide(new Complex(wn * wn - w * w, 2 * DAMPING * wn * w)));
            }
            double sigma = 0.002 * h.norm();
            re[i] = h.getReal() + sigma * noise.nextGaussian();
            im[i] = h.getImaginary() + sigma * noise.nextGaussian();
        }
        return Frf.of(f, re, im, FrfQuantity.RECEPTANCE);
    }

    public static Specimen specimen() {
        return new Specimen("SYNTH-1 (invented)", LENGTH_M, DENSITY_KG_PER_M, 0.01 * DENSITY_KG_PER_M, BENDING_NM2,
                0.1 * BENDING_NM2, EndCondition.PINNED, FORCING_M, SENSOR_M, TENSION_N, 0.0, 0.0, 39000.0, Optional.empty());
    }

    public static Specification specification() {
        return new Specification("invented test limits", List.of(
                Limit.between("tension", "tensionN", "N", 140.0, 160.0),
                Limit.between("fundamental frequency", "f1Hz", "Hz", 200.0, 260.0)));
    }

    public static QualificationResult qualified() {
        return Qualification.analyse(specimen(), receptance(), Optional.empty(), ModalEstimator.defaults(),
                Optional.of(specification()), System.nanoTime());
    }
}
