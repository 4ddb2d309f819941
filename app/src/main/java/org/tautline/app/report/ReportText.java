package org.tautline.app.report;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;

import org.tautline.analysis.format.QuantityFormat;
import org.tautline.analysis.format.Rounded;
import org.tautline.analysis.format.TextStyle;
import org.tautline.analysis.verdict.Figure;

/** How the report writes numbers, dates and missing facts: one format for every page (GUM 7.2.6 rounding). */
final class ReportText {
    /** What the report prints for a traceability fact nobody gave. */
    static final String NOT_GIVEN = "not given";
    /** What the report prints as the uncertainty of a quality figure, which is judged as it stands. */
    static final String NOT_APPLICABLE = "not applicable";
    /** The report's fonts (standard 14, WinAnsi) show "±" and "²" but no superscript minus. */
    static final QuantityFormat FORMAT = new QuantityFormat(TextStyle.forStandardPdfFonts());
    static final DateTimeFormatter DATE_TIME = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'")
            .withZone(ZoneOffset.UTC);

    private ReportText() {
    }

    /**
     * A value and its standard uncertainty as two table cells, rounded together (GUM 7.2.6).
     *
     * @param value the value; NaN when not determined
     * @param u its standard uncertainty; NaN when not evaluated
     * @return the value's cell and the uncertainty's cell
     */
    static String[] pair(double value, double u) {
        if (!Double.isFinite(value)) {
            return new String[] {FORMAT.number(value), Double.isNaN(u) ? QuantityFormat.NOT_EVALUATED : "-"};
        }
        if (Double.isNaN(u)) {
            return new String[] {FORMAT.number(value), QuantityFormat.NOT_EVALUATED};
        }
        if (u == 0 || Double.isInfinite(u)) {
            return new String[] {FORMAT.number(value), FORMAT.number(u)};
        }
        Rounded r = FORMAT.round(value, u);
        return new String[] {FORMAT.valueCell(r), FORMAT.uncertaintyCell(r)};
    }

    /**
     * A number rounded to the decimal place of an uncertainty (a margin beside its U), or to six digits without one.
     *
     * @param value the number
     * @param u the uncertainty it is shown beside
     * @return the text
     */
    static String like(double value, double u) {
        return FORMAT.valueLike(value, u, "");
    }

    /**
     * @param key a figure key
     * @return true for a quality figure that has no uncertainty by its nature (its Figure says "none: ...")
     */
    static boolean judgedAsItStands(String key) {
        return Figure.byKey(key).map(f -> f.uncertainty().startsWith("none")).orElse(false);
    }

    /** @return a bound, or "none" for NaN (no bound) */
    static String bound(double value) {
        return Double.isNaN(value) ? "none" : FORMAT.number(value);
    }

    static String dateTime(Instant t) {
        return DATE_TIME.format(t);
    }
}
