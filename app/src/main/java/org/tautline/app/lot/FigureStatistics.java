package org.tautline.app.lot;

import java.util.List;

/**
 * Statistics of one figure over a lot, with the process capability against the specification.
 *
 * <p>Std is the sample standard deviation (n - 1). Cpk = min(USL - mean, mean - LSL) / (3 s), with only
 * the bounds the specification gives (one bound gives Cpu or Cpl alone); Montgomery, Introduction to
 * Statistical Quality Control, 6th ed. 2009, sec. 8.2 (from memory). Cpk is NaN with fewer than two
 * values, no bound or zero spread.
 *
 * @param key the figure key
 * @param unit its unit
 * @param n how many qualifications gave the figure
 * @param mean the mean
 * @param std the sample standard deviation, NaN for n &lt; 2
 * @param min the smallest value
 * @param max the largest value
 * @param lowerLimit the lower specification limit, NaN for none
 * @param upperLimit the upper specification limit, NaN for none
 * @param cpk the process capability index, NaN when it cannot be computed
 * @param chart the individuals chart of the values in register order
 */
public record FigureStatistics(String key, String unit, int n, double mean, double std, double min, double max,
                               double lowerLimit, double upperLimit, double cpk, IndividualsChart chart) {

    /**
     * Computes the statistics.
     *
     * @param key the figure key
     * @param unit its unit
     * @param values the values in register order, at least one
     * @param lowerLimit the lower specification limit, NaN for none
     * @param upperLimit the upper specification limit, NaN for none
     * @return the statistics
     */
    public static FigureStatistics of(String key, String unit, List<Double> values, double lowerLimit, double upperLimit) {
        if (values.isEmpty()) {
            throw new IllegalArgumentException("figure " + key + ": statistics need at least one value, got none");
        }
        int n = values.size();
        // Sums of differences from the first value: identical values give exactly their value and a zero spread.
        double origin = values.get(0);
        double sum = 0;
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            sum += v - origin;
            min = Math.min(min, v);
            max = Math.max(max, v);
        }
        double meanOffset = sum / n;
        double mean = origin + meanOffset;
        double std = Double.NaN;
        if (n > 1) {
            double squares = 0;
            for (double v : values) {
                double d = (v - origin) - meanOffset;
                squares += d * d;
            }
            std = Math.sqrt(squares / (n - 1));
        }
        return new FigureStatistics(key, unit, n, mean, std, min, max, lowerLimit, upperLimit,
                cpk(mean, std, lowerLimit, upperLimit), IndividualsChart.of(values));
    }

    /**
     * Process capability index.
     *
     * @param mean process mean
     * @param std process standard deviation
     * @param lowerLimit lower specification limit, NaN for none
     * @param upperLimit upper specification limit, NaN for none
     * @return Cpk, NaN without a bound or a positive finite spread
     */
    public static double cpk(double mean, double std, double lowerLimit, double upperLimit) {
        if (!(std > 0) || (Double.isNaN(lowerLimit) && Double.isNaN(upperLimit))) {
            return Double.NaN;
        }
        double upper = Double.isNaN(upperLimit) ? Double.POSITIVE_INFINITY : (upperLimit - mean) / (3 * std);
        double lower = Double.isNaN(lowerLimit) ? Double.POSITIVE_INFINITY : (mean - lowerLimit) / (3 * std);
        return Math.min(upper, lower);
    }
}
