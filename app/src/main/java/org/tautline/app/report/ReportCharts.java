package org.tautline.app.report;

import java.awt.Color;
import java.util.List;
import java.util.Optional;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.specimen.ParticipationEntry;
import org.tautline.analysis.specimen.PatternFit;
import org.tautline.analysis.verdict.Figure;
import org.tautline.app.lot.IndividualsChart;
import org.tautline.app.qualify.QualificationResult;

/** The report's charts, in colours of the Okabe-Ito palette (Okabe and Ito, Color Universal Design, 2008). */
final class ReportCharts {
    static final Color BLUE = new Color(0x00, 0x72, 0xB2);
    static final Color VERMILION = new Color(0xD5, 0x5E, 0x00);
    static final Color GREEN = new Color(0x00, 0x9E, 0x73);
    static final Color ORANGE = new Color(0xE6, 0x9F, 0x00);

    private ReportCharts() {
    }

    static PdfChart frf(QualificationResult r) {
        Frf measured = r.receptance();
        Frf fitted = r.synthesized();
        return new PdfChart("Receptance magnitude |H| against frequency", "frequency (Hz)", "|H| (m/N)", true, List.of(
                new PdfChart.Series("measured", measured.frequenciesHz(), magnitudes(measured), BLUE, true, false),
                new PdfChart.Series("fitted modal model", fitted.frequenciesHz(), magnitudes(fitted), VERMILION, false, false)));
    }

    private static double[] magnitudes(Frf frf) {
        double[] out = new double[frf.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = frf.magnitude(i);
        }
        return out;
    }

    static Optional<PdfChart> participation(QualificationResult r) {
        if (r.participation().isEmpty()) {
            return Optional.empty();
        }
        PatternFit p = r.participation().get();
        List<ParticipationEntry> entries = p.entries();
        double[] n = new double[entries.size()];
        double[] measured = new double[n.length];
        double[] expected = new double[n.length];
        for (int i = 0; i < n.length; i++) {
            n[i] = entries.get(i).harmonic();
            measured[i] = entries.get(i).measuredModalConstant();
            expected[i] = entries.get(i).expectedModalConstant() * p.statedScale();
        }
        return Optional.of(new PdfChart("Modal constant by harmonic (expected scaled by the fitted common scale "
                + Figures.format(p.statedScale()) + ")", "harmonic n", "A (1/kg)", false, List.of(
                new PdfChart.Series("expected at the stated positions", n, expected, VERMILION, false, true),
                new PdfChart.Series("measured", n, measured, BLUE, true, false))));
    }

    static PdfChart control(String key, String unit, IndividualsChart chart) {
        int count = chart.values().size();
        double[] index = new double[count];
        double[] values = new double[count];
        for (int i = 0; i < count; i++) {
            index[i] = i + 1;
            values[i] = chart.values().get(i);
        }
        double[] ends = {1, Math.max(count, 2)};
        String label = Figure.labelFor(key);
        return new PdfChart("Individuals chart of " + label + ": mean and 3-sigma limits from the moving range",
                "qualification in the lot", label + (unit.isEmpty() ? "" : " (" + Figure.unitLabel(unit) + ")"), false,
                List.of(
                new PdfChart.Series("value", index, values, BLUE, true, false),
                new PdfChart.Series("", index, values, BLUE, false, false),
                new PdfChart.Series("mean", ends, new double[] {chart.centre(), chart.centre()}, GREEN, false, false),
                new PdfChart.Series("UCL", ends, new double[] {chart.upperControlLimit(), chart.upperControlLimit()},
                        VERMILION, false, true),
                new PdfChart.Series("LCL", ends, new double[] {chart.lowerControlLimit(), chart.lowerControlLimit()},
                        VERMILION, false, true)));
    }
}
