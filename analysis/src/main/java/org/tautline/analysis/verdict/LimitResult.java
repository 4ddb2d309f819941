package org.tautline.analysis.verdict;

/**
 * The outcome of checking one measured figure against one limit.
 *
 * @param limit the limit checked
 * @param measuredValue the measured value, in the limit's unit; NaN when the figure was not measured
 * @param standardUncertainty the standard uncertainty u of the value; NaN when not measured
 * @param margin signed distance from the value to the nearest bound, positive inside, in the limit's unit;
 *               NaN when not measured
 * @param outcome pass, fail or not determinable
 * @param reason one plain sentence saying why
 */
public record LimitResult(Limit limit, double measuredValue, double standardUncertainty, double margin,
                          Outcome outcome, String reason) {

    /** @return the expanded uncertainty U = 2 u used by the decision rule; NaN when not measured */
    public double expandedUncertainty() {
        return Verdict.COVERAGE_FACTOR * standardUncertainty;
    }
}
