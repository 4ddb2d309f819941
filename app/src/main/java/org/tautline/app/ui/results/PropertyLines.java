package org.tautline.app.ui.results;

import java.util.ArrayList;
import java.util.List;

import org.tautline.analysis.format.QuantityFormat;
import org.tautline.analysis.format.TextStyle;
import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.LimitText;
import org.tautline.analysis.verdict.Measurement;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.ui.PlainWords;

/**
 * The properties and verdict of a result as plain text rows, every figure named for people and every value written by
 * the shared {@link QuantityFormat} (GUM 7.2.6 rounding, one ±, Unicode units). Free of Swing.
 */
final class PropertyLines {
    /** Verdict table column titles. */
    static final List<String> VERDICT_COLUMNS = List.of("Figure", "Limits", "Measured ± standard uncertainty",
            "Margin to the nearest limit", "Result");
    /** How the window writes numbers: every symbol in Unicode. */
    static final QuantityFormat FORMAT = new QuantityFormat(TextStyle.UNICODE);

    private PropertyLines() {
    }

    /**
     * A value with its standard uncertainty as the window shows it.
     *
     * @param value the value; NaN when not determined
     * @param u its standard uncertainty; NaN when not evaluated, 0 for a figure judged as it stands
     * @param unit the unit in the ASCII form figures use ({@code "N m^2"}), empty for none
     * @return the value and uncertainty rounded together (GUM 7.2.6); the value alone when the uncertainty is zero, so
     *         no "± 0" stands where no uncertainty was evaluated
     */
    static String shown(double value, double u, String unit) {
        return u == 0 ? FORMAT.value(value, unit) : FORMAT.withUncertainty(value, u, unit);
    }

    /**
     * @param result a qualification
     * @return label and value pairs: tension, bending stiffness, inharmonicity, the method, positions
     */
    static List<String[]> properties(QualificationResult result) {
        List<String[]> rows = new ArrayList<>();
        result.tension().ifPresentOrElse(t -> {
            rows.add(new String[] {"Tension", shown(t.tensionN(), t.tensionStdN(), Figure.TENSION.unit())});
            rows.add(new String[] {"Bending stiffness EI", shown(t.bendingStiffnessNm2(), t.bendingStiffnessStdNm2(),
                    Figure.BENDING_STIFFNESS.unit())});
            Measurement b = result.measurements().get(Figure.INHARMONICITY.key());
            rows.add(new String[] {"Inharmonicity B", b == null ? FORMAT.number(t.inharmonicityB())
                    : shown(b.value(), b.standardUncertainty(), "")});
            rows.add(new String[] {"Tension found by", t.method().label()});
        }, () -> rows.add(new String[] {"Tension", "not estimated: no harmonic was numbered"}));
        result.participation().ifPresent(p -> {
            rows.add(new String[] {"Stinger position", shown(p.forcingPositionM(), p.forcingPositionStdM(), "m")
                    + " (stated " + FORMAT.value(result.specimen().forcingPositionM(), "m") + ")"});
            rows.add(new String[] {"Sensor position", shown(p.sensorPositionM(), p.sensorPositionStdM(), "m")
                    + " (stated " + FORMAT.value(result.specimen().sensorPositionM(), "m") + ")"});
        });
        return rows;
    }

    /**
     * @param result a qualification
     * @return one row per limit of the verdict, empty without a verdict
     */
    static List<String[]> verdictRows(QualificationResult result) {
        List<String[]> rows = new ArrayList<>();
        result.verdict().ifPresent(v -> {
            for (LimitResult r : v.results()) {
                String unit = r.limit().unit();
                rows.add(new String[] {labelOf(r), bounds(r), shown(r.measuredValue(), r.standardUncertainty(), unit),
                    Double.isFinite(r.margin()) ? FORMAT.valueLike(r.margin(), r.expandedUncertainty(), unit) : "-",
                    r.outcome().label()});
            }
        });
        return rows;
    }

    /**
     * @param r the result of one limit
     * @return why it came out as it did, as the verdict says it: the figure's name, the value with its expanded
     *         uncertainty, the limits and the margin; a figure that was not measured says so, with the reason
     */
    static String reasonOf(LimitResult r) {
        return LimitText.reason(r, FORMAT);
    }

    /**
     * @param result a qualification
     * @return why the verdict is what it is, then the notes of the fit: the verdict's own sentences that are not about
     *         one limit (why a result cannot be trusted as a whole) first, then one sentence per limit in words, then
     *         the warnings of the modal fit and the tension estimate
     */
    static List<String> reasons(QualificationResult result) {
        List<String> lines = new ArrayList<>();
        result.verdict().ifPresent(v -> {
            lines.addAll(wholeResultReasons(result));
            v.results().forEach(r -> lines.add(reasonOf(r)));
        });
        result.modal().warnings().forEach(w -> lines.add(PlainWords.of(w)));
        result.tension().ifPresent(t -> t.warnings().forEach(w -> lines.add(PlainWords.of(w))));
        return lines;
    }

    /**
     * @param result a qualification
     * @return the verdict's sentences that are not the reason of one limit: why the result as a whole cannot be
     *         trusted, when that is so
     */
    static List<String> wholeResultReasons(QualificationResult result) {
        List<String> lines = new ArrayList<>();
        result.verdict().ifPresent(v -> {
            List<String> perLimit = v.results().stream().map(LimitResult::reason).toList();
            v.reasons().stream().filter(s -> !perLimit.contains(s)).map(PlainWords::of).forEach(lines::add);
        });
        return lines;
    }

    private static String labelOf(LimitResult r) {
        return Figure.byKey(r.limit().figureKey()).map(Figure::label).orElse(r.limit().name());
    }

    private static String bounds(LimitResult r) {
        String unit = r.limit().unit();
        boolean low = r.limit().hasLowerBound();
        boolean high = r.limit().hasUpperBound();
        return low && high ? FORMAT.number(r.limit().lowerBound()) + " to " + FORMAT.value(r.limit().upperBound(), unit)
                : low ? "at least " + FORMAT.value(r.limit().lowerBound(), unit)
                : "at most " + FORMAT.value(r.limit().upperBound(), unit);
    }
}
