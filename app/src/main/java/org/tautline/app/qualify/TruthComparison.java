package org.tautline.app.qualify;

import java.util.Comparator;
import java.util.Optional;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.modal.Mode;
import org.tautline.driver.sim.SimulationTruth;
import org.tautline.driver.sim.TrueMode;

/** Pairs an estimated mode with the simulated mode it stands for: the nearest in frequency. */
public final class TruthComparison {
    private TruthComparison() {
    }

    /**
     * The true mode nearest in frequency to an estimate.
     *
     * @param truth the simulated truth
     * @param estimate a fitted mode
     * @return the nearest true mode, absent when the truth has none
     */
    public static Optional<TrueMode> nearest(SimulationTruth truth, Mode estimate) {
        return truth.modes().stream()
                .min(Comparator.comparingDouble(t -> Math.abs(t.mode().frequencyHz() - estimate.frequencyHz())));
    }

    /**
     * The sum of the true modal constants of both polarisations of one harmonic: what an estimator
     * that sees a closely spaced doublet as one mode measures.
     *
     * @param truth the simulated truth
     * @param harmonic harmonic number n
     * @return the sum, zero when the truth has no such harmonic
     */
    public static Complex doubletModalConstant(SimulationTruth truth, int harmonic) {
        Complex sum = Complex.ZERO;
        for (TrueMode t : truth.modes()) {
            if (t.harmonic() == harmonic) {
                sum = sum.add(t.mode().modalConstant());
            }
        }
        return sum;
    }

    /**
     * Relative frequency error of an estimate against its true mode.
     *
     * @param estimate the fitted mode
     * @param truth the true mode
     * @return (f_est - f_true) / f_true
     */
    public static double frequencyError(Mode estimate, TrueMode truth) {
        return estimate.frequencyHz() / truth.mode().frequencyHz() - 1.0;
    }
}
