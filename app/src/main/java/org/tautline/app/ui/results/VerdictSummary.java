package org.tautline.app.ui.results;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.Outcome;
import org.tautline.analysis.verdict.Verdict;
import org.tautline.app.qualify.QualificationResult;

/**
 * What the verdict banner says: the outcome in words and the first reason for it. Free of Swing.
 *
 * @param outcome the overall outcome, empty when the setup gave no specification to judge against
 * @param headline the outcome in capitals, for example "NOT DETERMINABLE", or "NO VERDICT"
 * @param firstReason the one sentence that matters most: the first limit that failed, the first reason a result
 *        cannot be judged, or that every limit was met
 */
record VerdictSummary(Optional<Outcome> outcome, String headline, String firstReason) {

    /**
     * @param result a qualification
     * @return its verdict in a headline and a sentence
     */
    static VerdictSummary of(QualificationResult result) {
        if (result.verdict().isEmpty()) {
            return new VerdictSummary(Optional.empty(), "NO VERDICT",
                    "The setup gives no specification limits, so nothing was judged.");
        }
        Verdict v = result.verdict().get();
        return new VerdictSummary(Optional.of(v.outcome()), v.outcome().label().toUpperCase(Locale.ROOT),
                firstReason(result, v));
    }

    private static String firstReason(QualificationResult result, Verdict v) {
        List<LimitResult> results = v.results();
        switch (v.outcome()) {
            case FAIL:
                return sentence(results.stream().filter(r -> r.outcome() == Outcome.FAIL).findFirst()
                        .map(PropertyLines::reasonOf).orElse("a limit is not met"));
            case NOT_DETERMINABLE:
                List<String> whole = PropertyLines.wholeResultReasons(result);
                if (!whole.isEmpty()) {
                    return sentence(whole.get(0));
                }
                return sentence(results.stream().filter(r -> r.outcome() == Outcome.NOT_DETERMINABLE).findFirst()
                        .map(PropertyLines::reasonOf).orElse("a limit could not be judged"));
            default:
                return results.size() == 1 ? "The one limit is met with its expanded uncertainty (k = 2)."
                        : "All " + results.size() + " limits are met with their expanded uncertainty (k = 2).";
        }
    }

    private static String sentence(String text) {
        String t = text.strip();
        if (t.isEmpty()) {
            return t;
        }
        t = Character.toUpperCase(t.charAt(0)) + t.substring(1);
        return t.endsWith(".") ? t : t + ".";
    }
}
