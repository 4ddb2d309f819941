package org.tautline.app.lot;

import java.util.List;

/**
 * An individuals (X) control chart: the values, their mean and the 3-sigma limits from the average moving range.
 *
 * <p>sigma = MR-bar / d2 with d2 = 1.128 for moving ranges of two, so the limits are mean +/- 2.66 MR-bar;
 * Montgomery, Introduction to Statistical Quality Control, 6th ed. 2009, sec. 6.4 (from memory).
 * With one value the limits are NaN.
 *
 * @param values the values in register order
 * @param centre the mean
 * @param averageMovingRange the mean of |x_i - x_(i-1)|, NaN for one value
 * @param lowerControlLimit centre - 3 MR-bar / d2
 * @param upperControlLimit centre + 3 MR-bar / d2
 */
public record IndividualsChart(List<Double> values, double centre, double averageMovingRange,
                               double lowerControlLimit, double upperControlLimit) {
    /** d2 for subgroups of two (Montgomery, appendix table VI, from memory). */
    public static final double D2 = 1.128;

    /** Copies the values. */
    public IndividualsChart {
        values = List.copyOf(values);
    }

    /**
     * Builds the chart.
     *
     * @param values the values in order, at least one
     * @return the chart
     */
    public static IndividualsChart of(List<Double> values) {
        double origin = values.get(0);
        double sum = 0;
        for (double v : values) {
            sum += v - origin;
        }
        double centre = origin + sum / values.size();
        double mr = Double.NaN;
        if (values.size() > 1) {
            double ranges = 0;
            for (int i = 1; i < values.size(); i++) {
                ranges += Math.abs(values.get(i) - values.get(i - 1));
            }
            mr = ranges / (values.size() - 1);
        }
        double halfWidth = 3 * mr / D2;
        return new IndividualsChart(values, centre, mr, centre - halfWidth, centre + halfWidth);
    }

    /** @return the indexes (from 0) of values outside the control limits */
    public List<Integer> outOfControl() {
        java.util.ArrayList<Integer> out = new java.util.ArrayList<>();
        for (int i = 0; i < values.size(); i++) {
            if (values.get(i) > upperControlLimit || values.get(i) < lowerControlLimit) {
                out.add(i);
            }
        }
        return List.copyOf(out);
    }
}
