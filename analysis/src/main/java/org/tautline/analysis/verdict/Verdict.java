package org.tautline.analysis.verdict;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.tautline.analysis.AnalysisException;

/**
 * The pass/fail verdict of a specimen against a specification, with one reason per limit.
 *
 * <p>Decision rule (guard band by the expanded uncertainty): for each limit the measured value v
 * with standard uncertainty u gives the expanded uncertainty U = k u with coverage factor k = 2
 * (JCGM 100:2008, "Evaluation of measurement data - Guide to the expression of uncertainty in
 * measurement", section 6, about 95 % coverage for a normal distribution). The limit is
 * <ul>
 *   <li>{@link Outcome#PASS} when the whole interval [v - U, v + U] lies inside the limits (bounds inclusive);</li>
 *   <li>{@link Outcome#FAIL} when the whole interval lies outside them;</li>
 *   <li>{@link Outcome#NOT_DETERMINABLE} when the interval straddles a bound, or the figure was not measured,
 *       or it was measured in another unit.</li>
 * </ul>
 * This is the conformity and non-conformity zone rule of ISO 14253-1:2017, "Geometrical product
 * specifications (GPS) - Inspection by measurement of workpieces and measuring equipment - Part 1:
 * Decision rules for verifying conformity or nonconformity with specifications" (from memory), with
 * the uncertainty range in between left undecided. The overall outcome is FAIL if any limit fails,
 * else NOT_DETERMINABLE if any limit is undecided, else PASS.
 *
 * @param outcome the overall outcome
 * @param results one result per limit, in the specification's order
 * @param reasons plain sentences for people: first why no verdict could be reached, when that is so (see
 *        {@link #undetermined(String)}), then one per limit in the order of {@code results}, each naming its figure
 *        by its label and rounding the value to its expanded uncertainty ({@link LimitText})
 */
public record Verdict(Outcome outcome, List<LimitResult> results, List<String> reasons) {

    /** The coverage factor k applied to the standard uncertainty: U = k u. */
    public static final double COVERAGE_FACTOR = 2.0;

    /** Copies the lists. */
    public Verdict {
        if (outcome == null) {
            throw new AnalysisException("a verdict needs an outcome, got none");
        }
        if (results == null || reasons == null) {
            throw new AnalysisException("a verdict needs its limit results and reasons, got none");
        }
        results = List.copyOf(results);
        reasons = List.copyOf(reasons);
    }

    /**
     * Checks measured figures against a specification.
     *
     * @param specification the limits
     * @param measurements measured figures by key (for example {@code "tensionN"}); figures the
     *                     specification does not mention are ignored
     * @return the verdict with one result and one reason per limit
     */
    public static Verdict evaluate(Specification specification, Map<String, Measurement> measurements) {
        return evaluate(specification, measurements, Map.of());
    }

    /**
     * Checks measured figures against a specification, saying why a figure that was not measured is missing.
     *
     * @param specification the limits
     * @param measurements measured figures by key; figures the specification does not mention are ignored
     * @param whyNotMeasured for figures that could not be measured here, why, in a plain clause (for example
     *        {@code "it needs the rig: ..."}); a missing figure with no entry is simply "not measured"
     * @return the verdict with one result and one reason per limit
     */
    public static Verdict evaluate(Specification specification, Map<String, Measurement> measurements,
                                   Map<String, String> whyNotMeasured) {
        if (specification == null) {
            throw new AnalysisException("a verdict needs a specification, got none");
        }
        if (measurements == null) {
            throw new AnalysisException("a verdict needs the measured figures (an empty map when none), got none");
        }
        List<LimitResult> results = new ArrayList<>();
        List<String> reasons = new ArrayList<>();
        boolean anyFail = false;
        boolean anyUndecided = false;
        for (Limit limit : specification.limits()) {
            LimitResult result = check(limit, measurements.get(limit.figureKey()), whyNotMeasured.get(limit.figureKey()));
            results.add(result);
            reasons.add(result.reason());
            anyFail |= result.outcome() == Outcome.FAIL;
            anyUndecided |= result.outcome() == Outcome.NOT_DETERMINABLE;
        }
        Outcome overall = anyFail ? Outcome.FAIL : anyUndecided ? Outcome.NOT_DETERMINABLE : Outcome.PASS;
        return new Verdict(overall, results, reasons);
    }

    /**
     * The verdict made NOT_DETERMINABLE whatever the figures say, because the measurement they come from cannot be
     * trusted to be complete (a sweep stopped before its end, a fit that could not explain the data). The limit
     * results stay as they are, for the record; the reason comes first.
     *
     * @param why what makes the measurement untrustworthy, in one plain sentence
     * @return the verdict
     */
    public Verdict undetermined(String why) {
        if (why == null || why.isBlank()) {
            throw new AnalysisException("a verdict made not determinable needs the reason, got none");
        }
        List<String> all = new ArrayList<>();
        all.add(why);
        all.addAll(reasons);
        return new Verdict(Outcome.NOT_DETERMINABLE, results, all);
    }

    private static LimitResult check(Limit limit, Measurement measurement, String whyNotMeasured) {
        if (measurement == null) {
            return new LimitResult(limit, Double.NaN, Double.NaN, Double.NaN, Outcome.NOT_DETERMINABLE,
                    LimitText.notMeasured(limit.figureKey(), whyNotMeasured));
        }
        double v = measurement.value();
        double u = measurement.standardUncertainty();
        if (!measurement.unit().equals(limit.unit())) {
            return new LimitResult(limit, v, u, Double.NaN, Outcome.NOT_DETERMINABLE,
                    LimitText.unitMismatch(limit, measurement.unit()));
        }
        double expanded = COVERAGE_FACTOR * u;
        double margin = limit.marginOf(v);
        Outcome outcome = margin >= expanded ? Outcome.PASS : margin < -expanded ? Outcome.FAIL : Outcome.NOT_DETERMINABLE;
        return new LimitResult(limit, v, u, margin, outcome,
                LimitText.judged(limit, v, u, margin, outcome, LimitText.UNICODE));
    }
}
