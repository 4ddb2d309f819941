package org.tautline.app.report;

import java.awt.Color;
import java.util.List;
import java.util.Optional;

import org.tautline.analysis.format.QuantityFormat;
import org.tautline.analysis.format.TextStyle;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.ParticipationEntry;
import org.tautline.analysis.specimen.PatternFit;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.specimen.TensionEstimate;
import org.tautline.analysis.verdict.Figure;
import org.tautline.app.lot.IndividualsChart;
import org.tautline.app.qualify.QualificationResult;

/** The report's charts, in colours of the Okabe-Ito palette (Okabe and Ito, Color Universal Design, 2008). */
final class ReportCharts {
    static final Color BLUE = new Color(0x00, 0x72, 0xB2);
    static final Color VERMILION = new Color(0xD5, 0x5E, 0x00);
    static final Color GREEN = new Color(0x00, 0x9E, 0x73);
    static final Color ORANGE = new Color(0xE6, 0x9F, 0x00);
    static final Color GREY = new Color(0x99, 0x99, 0x99);

    private static final QuantityFormat FORMAT = new QuantityFormat(TextStyle.forStandardPdfFonts());

    private ReportCharts() {
    }

    /** The phase of the measured and fitted FRF, degrees, from atan2(imaginary, real) (-180 to 180). */
    static PdfChart phase(QualificationResult r) {
        Frf measured = r.receptance();
        Frf fitted = r.synthesized();
        return new PdfChart("Receptance phase against frequency", "frequency (Hz)", "phase (degrees)", false, List.of(
                new PdfChart.Series("measured", measured.frequenciesHz(), phases(measured), BLUE, true, false),
                new PdfChart.Series("fitted modal model", fitted.frequenciesHz(), phases(fitted), VERMILION, false, false)));
    }

    /**
     * The quality of each FRF line: its coherence (0 to 1) when the FRF carries one, otherwise the stepped sine's
     * relative fit residual (log scale); empty when it carries neither.
     */
    static Optional<PdfChart> lineQuality(QualificationResult r) {
        Frf measured = r.receptance();
        if (measured.coherence().isPresent()) {
            return Optional.of(new PdfChart("Coherence of each FRF line (1 is a wholly linear, noise-free line)",
                    "frequency (Hz)", "coherence", false, List.of(new PdfChart.Series("coherence",
                    measured.frequenciesHz(), measured.coherence().get(), GREEN, true, false))));
        }
        return measured.quality().map(q -> new PdfChart("Quality of each FRF line: relative residual of the sine fits"
                + " (smaller is better)", "frequency (Hz)", "relative residual", true, List.of(new PdfChart.Series(
                "larger of the force and response residuals", measured.frequenciesHz(), q, GREEN, true, false))));
    }

    /**
     * The harmonic series as f_n/n against n², with the model of the fitted tension and inharmonicity: pinned ends
     * f_n/n = f0 sqrt(1 + B n²) (Fletcher, JASA 36:203, 1964), clamped ends the same times
     * (1 + 2 sqrt(B)/pi + 4B/pi²) (Fletcher 1964), with f0 = sqrt(T/mu)/(2L) (Mersenne). Error bars are one standard
     * error of f_n, divided by n.
     */
    static Optional<PdfChart> harmonicSeries(QualificationResult r) {
        List<QualifiedMode> numbered = r.modes().stream().filter(m -> m.harmonic() > 0).toList();
        if (numbered.isEmpty() || r.tension().isEmpty()) {
            return Optional.empty();
        }
        TensionEstimate t = r.tension().get();
        Specimen s = r.specimen();
        int highest = 1;
        for (QualifiedMode m : numbered) {
            highest = Math.max(highest, m.harmonic());
        }
        double f0 = Math.sqrt(t.tensionN() / s.linearDensityKgPerM()) / (2 * s.lengthM());
        double b = t.inharmonicityB();
        int points = 60;
        double[] lineX = new double[points];
        double[] lineY = new double[points];
        for (int i = 0; i < points; i++) {
            double n2 = 1 + (highest * (double) highest - 1) * i / (points - 1.0);
            lineX[i] = n2;
            double clamped = s.ends() == EndCondition.CLAMPED
                    ? 1 + 2 * Math.sqrt(Math.max(b, 0)) / Math.PI + 4 * b / (Math.PI * Math.PI) : 1;
            lineY[i] = f0 * Math.sqrt(1 + b * n2) * clamped;
        }
        double bStd = Optional.ofNullable(r.measurements().get(Figure.INHARMONICITY.key()))
                .map(m -> m.standardUncertainty()).orElse(Double.NaN);
        String model = "model: T " + FORMAT.withUncertainty(t.tensionN(), t.tensionStdN(), "N") + ", B "
                + FORMAT.withUncertainty(b, bStd, "");
        return Optional.of(new PdfChart("Harmonic series: f_n / n against n² (with bending stiffness, f_n / n rises with n²)",
                "n²", "f_n / n (Hz)", false, List.of(
                new PdfChart.Series(model, lineX, lineY, VERMILION, false, false),
                series("first polarisation, with standard errors", numbered, 1, BLUE),
                series("second polarisation", numbered, 2, GREY))));
    }

    /** The points (n², f_n/n) of one polarisation, error bars one standard error of f_n over n. */
    private static PdfChart.Series series(String name, List<QualifiedMode> numbered, int polarisation, Color colour) {
        List<QualifiedMode> these = numbered.stream().filter(m -> Math.max(m.polarisation(), 1) == polarisation).toList();
        double[] x = new double[these.size()];
        double[] y = new double[x.length];
        double[] e = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            int n = these.get(i).harmonic();
            x[i] = (double) n * n;
            y[i] = these.get(i).mode().frequencyHz() / n;
            e[i] = these.get(i).fitted().frequencyStdHz() / n;
        }
        return new PdfChart.Series(these.isEmpty() ? "" : name, x, y, colour, true, false, e);
    }

    private static double[] phases(Frf frf) {
        double[] out = new double[frf.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = Math.toDegrees(Math.atan2(frf.imaginaryParts()[i], frf.realParts()[i]));
        }
        return out;
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
        double[] errors = new double[n.length];
        for (int i = 0; i < n.length; i++) {
            n[i] = entries.get(i).harmonic();
            measured[i] = entries.get(i).measuredModalConstant();
            errors[i] = entries.get(i).measuredStd();
            expected[i] = entries.get(i).expectedModalConstant() * p.statedScale();
        }
        return Optional.of(new PdfChart("Modal constant by harmonic (expected scaled by the fitted common scale "
                + FORMAT.number(p.statedScale()) + ")", "harmonic n", "modal constant A (1/kg)", false, List.of(
                new PdfChart.Series("expected at the stated positions", n, expected, VERMILION, false, true),
                new PdfChart.Series("measured, with standard errors", n, measured, BLUE, true, false, errors))));
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
                new PdfChart.Series("upper control limit", ends, new double[] {chart.upperControlLimit(), chart.upperControlLimit()},
                        VERMILION, false, true),
                new PdfChart.Series("lower control limit", ends, new double[] {chart.lowerControlLimit(), chart.lowerControlLimit()},
                        VERMILION, false, true)));
    }
}
