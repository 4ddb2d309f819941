package org.tautline.app.ui.results;

import java.util.ArrayList;
import java.util.List;

import org.tautline.analysis.verdict.LimitResult;
import org.tautline.app.qualify.QualificationResult;

/** The properties and verdict of a result as plain text rows. Free of Swing. */
final class PropertyLines {
    /** Verdict table column titles. */
    static final List<String> VERDICT_COLUMNS = List.of("Limit", "Bounds", "Measured ± std", "Margin", "Result");

    private PropertyLines() {
    }

    /**
     * @param result a qualification
     * @return label and value pairs: tension, bending stiffness, inharmonicity, positions
     */
    static List<String[]> properties(QualificationResult result) {
        List<String[]> rows = new ArrayList<>();
        result.tension().ifPresentOrElse(t -> {
            rows.add(new String[] {"Tension", Figures.plusMinus(t.tensionN(), t.tensionStdN(), "N")});
            rows.add(new String[] {"Bending stiffness EI", Figures.plusMinus(t.bendingStiffnessNm2(),
                    t.bendingStiffnessStdNm2(), "N m²")});
            rows.add(new String[] {"Inharmonicity B", Figures.plain(t.inharmonicityB())});
            rows.add(new String[] {"Tension method", t.method().toString()});
        }, () -> rows.add(new String[] {"Tension", "not estimated: no harmonic was numbered"}));
        result.participation().ifPresent(p -> {
            rows.add(new String[] {"Forcing position", Figures.plusMinus(p.forcingPositionM(), p.forcingPositionStdM(), "m")
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
                String unit = r.limit().unit();
                String bounds = (r.limit().hasLowerBound() ? Figures.plain(r.limit().lowerBound()) : "")
                        + " .. " + (r.limit().hasUpperBound() ? Figures.plain(r.limit().upperBound()) : "")
                        + (unit.isEmpty() ? "" : " " + unit);
                rows.add(new String[] {r.limit().name(), bounds, Figures.plusMinus(r.measuredValue(), r.standardUncertainty()),
                    Figures.plain(r.margin()), r.outcome().toString()});
            }
        });
        return rows;
    }

    /**
     * @param result a qualification
     * @return the verdict's reasons, then the fit's warnings
     */
    static List<String> reasons(QualificationResult result) {
        List<String> lines = new ArrayList<>();
        result.verdict().ifPresent(v -> lines.addAll(v.reasons()));
        lines.addAll(result.modal().warnings());
        result.tension().ifPresent(t -> lines.addAll(t.warnings()));
        return lines;
    }
}
