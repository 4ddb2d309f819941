package org.tautline.analysis.modal;

import org.tautline.analysis.AnalysisException;

/**
 * One pole on a stabilisation chart: the model order it came from and how it compares with the previous order.
 *
 * @param order the denominator degree of the LSCF model that produced the pole
 * @param pole the pole
 * @param stabilityClass its agreement with the previous order's poles
 */
public record StabilisationPoint(int order, Pole pole, StabilityClass stabilityClass) {

    /** Checks the values. */
    public StabilisationPoint {
        if (order < 1 || pole == null || stabilityClass == null) {
            throw new AnalysisException("a stabilisation point needs an order of at least 1, a pole and a class, got order "
                    + order + ", pole " + pole + ", class " + stabilityClass);
        }
    }

    /** @return the pole's undamped natural frequency, Hz */
    public double frequencyHz() {
        return pole.frequencyHz();
    }

    /** @return the pole's damping ratio */
    public double dampingRatio() {
        return pole.dampingRatio();
    }
}
