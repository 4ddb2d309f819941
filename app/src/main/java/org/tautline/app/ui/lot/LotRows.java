package org.tautline.app.ui.lot;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.format.QuantityFormat;
import org.tautline.analysis.format.TextStyle;
import org.tautline.app.lot.FigureStatistics;

/** The rows of the lot statistics table, as text: the presenter of the lot screen, free of Swing. */
public final class LotRows {
    private static final QuantityFormat NUMBERS = new QuantityFormat(TextStyle.UNICODE);

    /** Column headings, with the unit column separate. */
    public static final List<String> COLUMNS = List.of("Figure", "Unit", "n", "Mean", "Std", "Min", "Max", "Lower limit",
            "Upper limit", "Cpk");

    private LotRows() {
    }

    /**
     * @param figures the lot's statistics, one per figure
     * @return one row per figure; a missing limit or a Cpk that cannot be computed shows as "-"
     */
    public static List<String[]> of(List<FigureStatistics> figures) {
        List<String[]> rows = new ArrayList<>();
        for (FigureStatistics f : figures) {
            rows.add(new String[] {Figure.labelFor(f.key()), Figure.unitLabel(f.unit()), Integer.toString(f.n()), number(f.mean()), number(f.std()),
                    number(f.min()), number(f.max()), number(f.lowerLimit()), number(f.upperLimit()), cpk(f.cpk())});
        }
        return rows;
    }

    /**
     * @param f one figure's statistics
     * @return a one-line summary of its control chart: centre, limits and the points outside them
     */
    public static String chartSummary(FigureStatistics f) {
        if (f.n() < 2) {
            return Figure.labelFor(f.key()) + ": one qualification so far; control limits need two or more";
        }
        List<Integer> out = f.chart().outOfControl();
        return String.format(Locale.ROOT, "%s: centre %s, control limits %s .. %s (mean ± 3 MR-bar/1.128); %s", Figure.labelFor(f.key()),
                number(f.chart().centre()), number(f.chart().lowerControlLimit()), number(f.chart().upperControlLimit()),
                out.isEmpty() ? "all " + f.n() + " points inside" : out.size() + " point(s) outside: number "
                        + out.stream().map(i -> Integer.toString(i + 1)).reduce((a, b) -> a + ", " + b).orElse(""));
    }

    /** Six significant digits, trailing zeros dropped, powers of ten as people write them; "-" for none. */
    private static String number(double v) {
        return Double.isNaN(v) ? "-" : NUMBERS.number(v);
    }

    private static String cpk(double v) {
        return Double.isNaN(v) ? "-" : String.format(Locale.ROOT, "%.2f", v);
    }
}
