package org.tautline.app.lot;

/**
 * One figure of one qualification as the lot register keeps it.
 *
 * @param key the figure key, for example {@code tensionN}
 * @param value the measured value, in {@code unit}
 * @param standardUncertainty its standard uncertainty, in {@code unit}
 * @param unit the unit, empty for a dimensionless figure
 * @param lowerLimit the specification's lower limit for this figure, NaN for none
 * @param upperLimit the specification's upper limit for this figure, NaN for none
 */
public record LotFigure(String key, double value, double standardUncertainty, String unit, double lowerLimit,
                        double upperLimit) {
}
