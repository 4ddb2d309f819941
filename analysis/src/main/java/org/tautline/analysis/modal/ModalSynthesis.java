package org.tautline.analysis.modal;

import java.util.List;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/**
 * Builds FRFs from a modal model and measures how well a model reproduces a measured FRF.
 *
 * <p>The receptance of a set of viscously damped modes is the modal sum
 * H(w) = sum_r A_r/(w_r^2 - w^2 + 2 j zeta_r w_r w) (D. J. Ewins, Modal Testing: Theory, Practice and
 * Application, 2nd ed., Research Studies Press, 2000, ch. 2, from memory); mobility and accelerance
 * follow by multiplying by j w once or twice.
 */
public final class ModalSynthesis {
    private ModalSynthesis() {
    }

    /**
     * The receptance of the modes at the given lines.
     *
     * @param modes the modes, at least one
     * @param frequencyHz strictly increasing positive frequency lines, Hz
     * @return the receptance FRF, m/N
     */
    public static Frf receptance(List<Mode> modes, double[] frequencyHz) {
        return synthesize(modes, frequencyHz, FrfQuantity.RECEPTANCE);
    }

    /**
     * The FRF of the modes at the given lines, in the given quantity.
     *
     * @param modes the modes, at least one
     * @param frequencyHz strictly increasing positive frequency lines, Hz
     * @param quantity receptance, mobility or accelerance
     * @return the FRF
     */
    public static Frf synthesize(List<Mode> modes, double[] frequencyHz, FrfQuantity quantity) {
        if (modes == null || modes.isEmpty()) {
            throw new AnalysisException("modal synthesis needs at least one mode, got none");
        }
        if (frequencyHz == null) {
            throw new AnalysisException("modal synthesis needs frequency lines, got none");
        }
        if (quantity == null) {
            throw new AnalysisException("modal synthesis needs an FRF quantity: receptance, mobility or accelerance");
        }
        int n = frequencyHz.length;
        double[] re = new double[n];
        double[] im = new double[n];
        for (int i = 0; i < n; i++) {
            Complex sum = Complex.ZERO;
            for (Mode mode : modes) {
                sum = sum.add(mode.receptanceAt(frequencyHz[i]));
            }
            re[i] = sum.getReal();
            im[i] = sum.getImaginary();
        }
        return Frf.of(frequencyHz, re, im, FrfQuantity.RECEPTANCE).toQuantity(quantity);
    }

    /**
     * Normalised residual of a modal model against a measured FRF: ||H_meas - H_synth|| / ||H_meas||.
     *
     * <p>The norms are Euclidean over all lines of the measured FRF, with the model synthesised in
     * the measured FRF's quantity. 0 is a perfect fit; 1 is what a model of zero response scores.
     *
     * @param measured the measured FRF, not identically zero
     * @param modes the modal model, at least one mode
     * @return the normalised residual, dimensionless
     */
    public static double normalisedResidual(Frf measured, List<Mode> modes) {
        if (measured == null) {
            throw new AnalysisException("a fit-quality figure needs a measured FRF, got none");
        }
        Frf synthesised = synthesize(modes, measured.frequenciesHz(), measured.quantity());
        double residual = 0;
        double reference = 0;
        for (int i = 0; i < measured.size(); i++) {
            residual += sq(measured.value(i).subtract(synthesised.value(i)).norm());
            reference += sq(measured.magnitude(i));
        }
        if (!(reference > 0)) {
            throw new AnalysisException("a fit-quality figure needs a measured FRF that is not zero at every line, got "
                    + measured);
        }
        return Math.sqrt(residual / reference);
    }

    private static double sq(double x) {
        return x * x;
    }
}
