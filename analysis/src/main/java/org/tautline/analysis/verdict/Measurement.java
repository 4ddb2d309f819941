package org.tautline.analysis.verdict;

import org.tautline.analysis.AnalysisException;

/**
 * A measured figure with its standard uncertainty.
 *
 * @param value the measured value, in {@code unit}
 * @param standardUncertainty the standard uncertainty u (one standard deviation), zero or positive, in {@code unit}
 * @param unit the unit, for example {@code "N"}; empty for a dimensionless figure
 */
public record Measurement(double value, double standardUncertainty, String unit) {

    /** Checks that the value is finite, the uncertainty zero or positive and finite, and a unit is given. */
    public Measurement {
        if (!Double.isFinite(value)) {
            throw new AnalysisException("a measured value must be a finite number, got " + value);
        }
        if (!(standardUncertainty >= 0) || Double.isInfinite(standardUncertainty)) {
            throw new AnalysisException("a standard uncertainty must be zero or a positive finite number, got "
                    + standardUncertainty);
        }
        if (unit == null) {
            throw new AnalysisException("a measured value needs a unit (empty for a dimensionless figure), got none");
        }
    }
}
