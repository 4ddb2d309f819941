package org.tautline.app.ui.results;

import java.util.ArrayList;
import java.util.List;

import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.Measurement;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.ui.PlainWords;

/** The properties and verdict of a result as plain text rows, every figure named for people. Free of Swing. */
final class PropertyLines {
    /** Verdict table column titles. */
    static final List<String> VERDICT_COLUMNS = List.of("Figure", "Limits", "Measured ± standard uncertainty",
            "Margin to the nearest limit", "Result");

    private PropertyLines() {
    }

    /**
     * @param result a qualification
     * @return label and value pairs: tension, bending stiffness, inharmonicity, the method, positions
     */
    static List<String[]> properties(QualificationResult result) {
        List<String[]> rows = new ArrayList<>();
        result.tension().ifPresentOrElse(t -> {
            rows.add(new String[] {"Tension", Figures.plusMinus(t.tensionN(), t.tensionStdN(), "N")});
            rows.add(new String[] {"Bending stiffness EI", Figures.plusMinus(t.bendingStiffnessNm2(),
                    t.bendingStiffnessStdNm2(), Figure.unitLabel(Figure.BENDING_STIFFNESS.unit()))});
            Measurement b = result.measurements().get(Figure.INHARMONICITY.key());
            rows.add(new String[] {"Inharmonicity B", b == null ? Figures.plain(t.inharmonicityB())
                    : Figures.plusMinus(b.value(), b.standardUncertainty())});
            rows.add(new String[] {"Tension found by", t.method().label()});
        }, () -> rows.add(new String[] {"Tension", "not estimated: no harmonic was numbered"}));
        result.participation().ifPresent(p -> {
            rows.add(new String[] {"Stinger position", Figures.plusMinus(p.forcingPositionM(), p.forcingPositionStdM(), "m")
                    + " (stated " + Figures.plain(result.specimen().forcingPositionM()) + " m)"});
            rows.add(new String[] {"Sensor position", Figures.plusMinus(p.sensorPositionM(), p.sensorPositionStdM(), "m")
                    + " (stated " + Figures.plain(result.specimen().sensorPositionM()) + " m)"});
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
                String unit = unitOf(r);
                rows.add(new String[] {labelOf(r), bounds(r), Figures.plusMinus(r.measuredValue(), r.standardUncertainty(),
                    unit), Double.isFinite(r.margin()) ? withUnit(Figures.plain(r.margin()), unit) : "-",
                    r.outcome().label()});
            }
        });
        return rows;
    }

    /**
     * @param r the result of one limit
     * @return why it came out as it did, in words: the figure's name, the value with its expanded uncertainty and the
     *         limits; a figure that was not measured says so, with the reason the analysis gave
     */
    static String reasonOf(LimitResult r) {
        String label = labelOf(r);
        if (!Double.isFinite(r.measuredValue())) {
            int colon = r.reason().indexOf(": ");
            return label + ": not measured" + (colon < 0 ? "" : PlainWords.of(r.reason().substring(colon)));
        }
        String unit = unitOf(r);
        String value = r.standardUncertainty() > 0
                ? Figures.plusMinus(r.measuredValue(), r.expandedUncertainty(), unit) + " (k = 2)"
                : Figures.plusMinus(r.measuredValue(), r.standardUncertainty(), unit);
        String limits = (r.limit().hasLowerBound() && r.limit().hasUpperBound() ? "the limits " : "the limit of ")
                + bounds(r);
        return label + " " + value + switch (r.outcome()) {
            case PASS -> " lies within " + limits;
            case FAIL -> " lies outside " + limits;
            case NOT_DETERMINABLE -> Double.isFinite(r.margin())
                    ? " cannot be judged against " + limits + ": the uncertainty reaches across a limit"
                    : " cannot be judged against " + limits + ": it was measured in another unit";
        };
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

    private static String unitOf(LimitResult r) {
        return r.limit().unit().isBlank() ? "" : Figure.unitLabel(r.limit().unit());
    }

    private static String bounds(LimitResult r) {
        String unit = unitOf(r);
        boolean low = r.limit().hasLowerBound();
        boolean high = r.limit().hasUpperBound();
        String text = low && high ? Figures.plain(r.limit().lowerBound()) + " to " + Figures.plain(r.limit().upperBound())
                : low ? "at least " + Figures.plain(r.limit().lowerBound())
                : high ? "at most " + Figures.plain(r.limit().upperBound()) : "no bound";
        return withUnit(text, unit);
    }

    private static String withUnit(String text, String unit) {
        return unit.isEmpty() ? text : text + " " + unit;
    }
}
