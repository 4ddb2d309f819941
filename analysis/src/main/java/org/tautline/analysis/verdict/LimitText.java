package org.tautline.analysis.verdict;

import org.tautline.analysis.format.QuantityFormat;
import org.tautline.analysis.format.TextStyle;

/**
 * Why a limit passed, failed or could not be judged, in one sentence for people: the figure by its name
 * ({@link Figure#labelFor(String)}), the value with its expanded uncertainty U (k = 2) rounded as GUM 7.2.6 asks
 * ({@link QuantityFormat}), the bounds and the margin written plainly in the limit's unit; never a figure's key.
 *
 * <p>{@link Verdict} writes its reasons with these sentences in Unicode; {@link #reason(LimitResult, QuantityFormat)}
 * writes the same sentence in the symbols another output can show ({@code +/-} and {@code m^2} under {@code LANG=C}).
 */
public final class LimitText {
    /** The style of the reasons a verdict keeps: every symbol in Unicode. */
    static final QuantityFormat UNICODE = new QuantityFormat(TextStyle.UNICODE);

    private LimitText() {
    }

    /**
     * The reason of a judged limit in the symbols an output can show.
     *
     * @param result a judged limit
     * @param f how numbers and units are written
     * @return one sentence, starting with the figure's name
     */
    public static String reason(LimitResult result, QuantityFormat f) {
        if (!Double.isFinite(result.measuredValue()) || !Double.isFinite(result.margin())
                || !(result.standardUncertainty() >= 0)) {
            // Not measured, or measured in another unit: the verdict's own sentence holds no number to round.
            return f.inStyle(result.reason());
        }
        return judged(result.limit(), result.measuredValue(), result.standardUncertainty(), result.margin(),
                result.outcome(), f);
    }

    /**
     * @param limit the limit
     * @param value the measured value, finite, in the limit's unit
     * @param u its standard uncertainty, 0 or more
     * @param margin the signed distance to the nearest bound, positive inside
     * @param outcome how it was judged
     * @param f how numbers and units are written
     * @return for example "tension = (151.2 ± 0.8) N (k = 2) meets the limits 140 to 160 N (margin 8.8 N)"
     */
    static String judged(Limit limit, double value, double u, double margin, Outcome outcome, QuantityFormat f) {
        String unit = limit.unit();
        double expanded = Verdict.COVERAGE_FACTOR * u;
        String stated = Figure.labelFor(limit.figureKey()) + " = "
                + (expanded > 0 ? f.withUncertainty(value, expanded, unit) + " (k = 2)" : f.value(value, unit));
        String marginText = " (margin " + f.valueLike(margin, expanded, unit) + ")";
        return switch (outcome) {
            case PASS -> stated + " meets " + bounds(limit, f) + marginText;
            case FAIL -> stated + " does not meet " + bounds(limit, f) + marginText;
            case NOT_DETERMINABLE -> stated + " cannot be judged against " + bounds(limit, f) + marginText
                    + ": the uncertainty reaches across a limit";
        };
    }

    /**
     * @param figureKey the key of the figure that has no value
     * @param why why it could not be measured here, in a plain clause; null when no reason is known
     * @return for example "no measured value for shift of f1 between test levels: the level check needs the rig"
     */
    static String notMeasured(String figureKey, String why) {
        return "no measured value for " + Figure.labelFor(figureKey) + (why == null || why.isBlank() ? "" : ": " + why);
    }

    /**
     * @param limit the limit
     * @param measuredUnit the unit the figure was measured in
     * @return for example "tension was measured in kN, but the limit 'tension' is in N: the two cannot be compared"
     */
    static String unitMismatch(Limit limit, String measuredUnit) {
        return Figure.labelFor(limit.figureKey()) + " was measured " + unitWords(measuredUnit) + ", but the limit '"
                + limit.name() + "' is " + unitWords(limit.unit()) + ": the two cannot be compared";
    }

    private static String unitWords(String unit) {
        return unit == null || unit.isBlank() ? "without a unit" : "in " + UNICODE.unit(unit);
    }

    private static String bounds(Limit limit, QuantityFormat f) {
        if (limit.hasLowerBound() && limit.hasUpperBound()) {
            return "the limits " + f.number(limit.lowerBound()) + " to " + f.value(limit.upperBound(), limit.unit());
        }
        if (limit.hasLowerBound()) {
            return "the lower limit " + f.value(limit.lowerBound(), limit.unit());
        }
        return "the upper limit " + f.value(limit.upperBound(), limit.unit());
    }
}
