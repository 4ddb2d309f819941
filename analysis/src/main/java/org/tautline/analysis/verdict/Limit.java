package org.tautline.analysis.verdict;

import org.tautline.analysis.AnalysisException;

/**
 * One acceptance limit on one measured figure, with a lower bound, an upper bound, or both.
 *
 * <p>A missing bound is {@code Double.NaN}. Bounds are inclusive: a value equal to a bound lies inside.
 *
 * @param name what the limit is called in the specification, for example {@code "tension"}
 * @param figureKey the key of the measured figure it applies to, for example {@code "tensionN"} or {@code "f1Hz"}
 * @param unit the unit of the bounds and of the figure, for example {@code "N"}; empty for a dimensionless figure
 * @param lowerBound the smallest acceptable value, or NaN for none
 * @param upperBound the largest acceptable value, or NaN for none
 */
public record Limit(String name, String figureKey, String unit, double lowerBound, double upperBound) {

    /** Checks that the limit has a name, a key, a unit, at least one bound, and lower below upper. */
    public Limit {
        if (name == null || name.isBlank()) {
            throw new AnalysisException("a limit needs a name, got " + (name == null ? "none" : "a blank name"));
        }
        if (figureKey == null || figureKey.isBlank()) {
            throw new AnalysisException("limit '" + name + "' needs the key of the figure it applies to, for example tensionN");
        }
        if (unit == null) {
            throw new AnalysisException("limit '" + name + "' needs a unit (empty for a dimensionless figure), got none");
        }
        if (Double.isInfinite(lowerBound) || Double.isInfinite(upperBound)) {
            throw new AnalysisException("limit '" + name + "' bounds must be finite numbers or NaN for no bound, got "
                    + lowerBound + " .. " + upperBound);
        }
        if (Double.isNaN(lowerBound) && Double.isNaN(upperBound)) {
            throw new AnalysisException("limit '" + name + "' needs a lower or an upper bound, got neither");
        }
        if (!Double.isNaN(lowerBound) && !Double.isNaN(upperBound) && !(lowerBound < upperBound)) {
            throw new AnalysisException("limit '" + name + "' lower bound " + lowerBound + " " + unit
                    + " must be below its upper bound " + upperBound + " " + unit);
        }
    }

    /**
     * A two-sided limit.
     *
     * @param name limit name
     * @param figureKey measured figure key
     * @param unit unit of the bounds
     * @param lowerBound smallest acceptable value
     * @param upperBound largest acceptable value
     * @return the limit
     */
    public static Limit between(String name, String figureKey, String unit, double lowerBound, double upperBound) {
        return new Limit(name, figureKey, unit, lowerBound, upperBound);
    }

    /**
     * A lower limit only.
     *
     * @param name limit name
     * @param figureKey measured figure key
     * @param unit unit of the bound
     * @param lowerBound smallest acceptable value
     * @return the limit
     */
    public static Limit atLeast(String name, String figureKey, String unit, double lowerBound) {
        return new Limit(name, figureKey, unit, lowerBound, Double.NaN);
    }

    /**
     * An upper limit only.
     *
     * @param name limit name
     * @param figureKey measured figure key
     * @param unit unit of the bound
     * @param upperBound largest acceptable value
     * @return the limit
     */
    public static Limit atMost(String name, String figureKey, String unit, double upperBound) {
        return new Limit(name, figureKey, unit, Double.NaN, upperBound);
    }

    /** @return true when the limit has a lower bound */
    public boolean hasLowerBound() {
        return !Double.isNaN(lowerBound);
    }

    /** @return true when the limit has an upper bound */
    public boolean hasUpperBound() {
        return !Double.isNaN(upperBound);
    }

    /**
     * Signed distance from a value to the nearest bound, positive inside, in the limit's unit.
     *
     * @param value the value
     * @return the margin: value - lower or upper - value, whichever is smaller, over the bounds present
     */
    public double marginOf(double value) {
        double margin = Double.POSITIVE_INFINITY;
        if (hasLowerBound()) {
            margin = Math.min(margin, value - lowerBound);
        }
        if (hasUpperBound()) {
            margin = Math.min(margin, upperBound - value);
        }
        return margin;
    }
}
