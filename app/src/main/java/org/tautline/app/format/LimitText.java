package org.tautline.app.format;

import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.verdict.Limit;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.Outcome;

/**
 * Why a limit passed, failed or could not be judged, in words for people: the figure by its name, the value with its
 * expanded uncertainty U (k = 2) rounded as GUM 7.2.6 asks, the bounds and the margin; never a figure's key.
 */
public final class LimitText {
    private LimitText() {
    }

    /**
     * @param result a judged limit
     * @param f how numbers are written
     * @return one sentence, without the figure's name in front
     */
    public static String reason(LimitResult result, QuantityFormat f) {
        Limit limit = result.limit();
        double value = result.measuredValue();
        double expanded = result.expandedUncertainty();
        if (!Double.isFinite(value) || !Double.isFinite(result.margin()) || Double.isNaN(expanded)) {
            return plain(result.reason(), limit.figureKey());
        }
        String unit = limit.unit();
        String stated = expanded > 0 ? f.withUncertainty(value, expanded, unit) + " (U, k = 2)" : f.value(value, unit);
        String margin = "margin " + f.valueLike(result.margin(), expanded, unit);
        String range = range(limit, f);
        if (result.outcome() == Outcome.PASS) {
            return stated + " meets " + range + ", " + margin;
        }
        if (result.outcome() == Outcome.FAIL) {
            return stated + " does not meet " + range + ", " + margin;
        }
        return stated + " cannot be judged against " + range + " (" + margin + "): the uncertainty is too large to decide";
    }

    /** A reason written by the analysis, with the figure's key replaced by its name. */
    static String plain(String reason, String key) {
        return reason.replace(key, Figure.labelFor(key));
    }

    private static String range(Limit limit, QuantityFormat f) {
        if (limit.hasLowerBound() && limit.hasUpperBound()) {
            return f.number(limit.lowerBound()) + " to " + f.value(limit.upperBound(), limit.unit());
        }
        if (limit.hasLowerBound()) {
            return "at least " + f.value(limit.lowerBound(), limit.unit());
        }
        return "at most " + f.value(limit.upperBound(), limit.unit());
    }
}
