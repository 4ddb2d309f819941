package org.tautline.app.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;

import org.tautline.analysis.verdict.Figure;
import org.tautline.app.lot.FigureStatistics;

/** The lot section of the report: the statistics table and individuals charts of the main figures. */
final class LotPages {
    private static final float[] COLUMNS = {0, 140, 170, 225, 280, 335, 390, 445};
    /** The figures charted, when the lot has them. */
    private static final List<String> CHARTED = List.of(Figure.TENSION.key(), Figure.F1.key());

    private LotPages() {
    }

    static void write(PageWriter w, String lotName, List<FigureStatistics> lot) {
        w.keep(60 + 11 * lot.size());
        int count = lot.stream().mapToInt(FigureStatistics::n).max().orElse(0);
        w.heading("Lot " + lotName + ": " + count + (count == 1 ? " qualification" : " qualifications"));
        w.line("Std is the sample standard deviation; Cpk = min(USL - mean, mean - LSL) / (3 std) against the"
                + " specification's limits (Montgomery, Introduction to Statistical Quality Control).", 8);
        w.row(new String[] {"figure", "n", "mean", "std", "min", "max", "Cpk", "unit"}, COLUMNS, true);
        for (FigureStatistics s : lot) {
            w.row(new String[] {Figure.labelFor(s.key()), Integer.toString(s.n()), ReportText.FORMAT.number(s.mean()), ReportText.FORMAT.number(s.std()),
                    ReportText.FORMAT.number(s.min()), ReportText.FORMAT.number(s.max()), ReportText.FORMAT.number(s.cpk()),
                    s.unit().isEmpty() ? "none" : ReportText.FORMAT.unit(s.unit())}, COLUMNS, false);
        }
        for (FigureStatistics s : lot) {
            if (CHARTED.contains(s.key()) && s.n() > 1) {
                w.gap(6);
                w.keep(190);
                try {
                    ReportCharts.control(s.key(), s.unit(), s.chart()).draw(w, 170);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
                w.line(String.format(java.util.Locale.ROOT, "mean %s, average moving range %s, upper control limit %s, lower control limit %s%s",
                        ReportText.FORMAT.number(s.chart().centre()), ReportText.FORMAT.number(s.chart().averageMovingRange()),
                        ReportText.FORMAT.number(s.chart().upperControlLimit()), ReportText.FORMAT.number(s.chart().lowerControlLimit()),
                        s.chart().outOfControl().isEmpty() ? "; no point outside the limits"
                                : "; outside the limits: qualification " + s.chart().outOfControl().stream()
                                .map(i -> Integer.toString(i + 1)).toList()), 8);
            }
        }
    }
}
