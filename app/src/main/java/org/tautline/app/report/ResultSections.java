package org.tautline.app.report;

import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.format.QuantityFormat;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.specimen.AbsentHarmonic;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.specimen.TensionEstimate;
import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.verdict.Measurement;
import org.tautline.app.qualify.QualificationResult;

/** The report's sections on the specimen, the rig record, the modes, the properties and every figure. */
final class ResultSections {
    private static final float[] MODE_COLUMNS = {0, 25, 55, 125, 185, 260, 320, 410};
    private static final float[] FIGURE_COLUMNS = {0, 210, 300, 400};
    private static final QuantityFormat F = ReportText.FORMAT;

    private ResultSections() {
    }

    static Section specimen(Specimen s) {
        return new Section("Specimen as stated").line(String.format(Locale.ROOT, "Identifier %s; span %s, %s ends; linear density %s;"
                        + " bending stiffness %s; axial stiffness %s; nominal tension %s.", s.id(), F.value(s.lengthM(), "m"),
                s.ends().label(), F.withUncertainty(s.linearDensityKgPerM(), s.linearDensityStdKgPerM(), "kg/m"),
                F.withUncertainty(s.bendingStiffnessNm2(), s.bendingStiffnessStdNm2(), "N m^2"),
                F.value(s.axialStiffnessN(), "N"), F.value(s.nominalTensionN(), "N")), 9)
                .line(String.format(Locale.ROOT, "Setup: stinger at %s, sensor at %s, sensor axis %s from the drive direction, belt"
                                + " speed %s.", F.value(s.forcingPositionM(), "m"), F.value(s.sensorPositionM(), "m"),
                        F.value(Math.toDegrees(s.sensorAngleRad()), "°"), F.value(s.beltSpeedMPerS(), "m/s")), 9);
    }

    static Section rigRecord(RunDirectory run) {
        Section s = new Section("Rig, sensors, calibration and sweep plan as the FRF file records them");
        if (run.metadata().isEmpty()) {
            s.line("The run's FRF file records no rig, sensor or plan details.", 9);
        }
        run.metadata().forEach((key, value) -> s.line(key + ": " + value, 9));
        run.recordedSweep().ifPresent(line -> s.line(line, 9));
        return s;
    }

    static Section modes(QualificationResult r, String source) {
        Section s = new Section("Modes (estimate and standard error)");
        if (!source.isEmpty()) {
            s.line(source, 8);
        }
        s.row(new String[] {"n", "pol.", "f (Hz)", "u (Hz)", "damping ratio", "u", "A (1/kg)", "u (1/kg)"}, MODE_COLUMNS,
                true);
        for (QualifiedMode m : r.modes()) {
            FittedMode f = m.fitted();
            Mode e = f.mode();
            String[] freq = ReportText.pair(e.frequencyHz(), f.frequencyStdHz());
            String[] zeta = ReportText.pair(e.dampingRatio(), f.dampingRatioStd());
            String[] a = ReportText.pair(e.modalConstant().getReal(), f.modalConstantStd().getReal());
            s.row(new String[] {m.harmonic() > 0 ? Integer.toString(m.harmonic()) : "?",
                    m.polarisation() > 0 ? Integer.toString(m.polarisation()) : "-", freq[0], freq[1], zeta[0], zeta[1],
                    a[0], a[1]}, MODE_COLUMNS, false);
        }
        if (r.modes().isEmpty()) {
            s.line("No mode was found in the band.", 9);
        }
        s.line("n is the harmonic number (? when a mode could not be numbered), pol. the polarisation of a doublet;"
                + " A is the real part of the modal constant; u is one standard error. Values are rounded to their"
                + " uncertainty (GUM 7.2.6); 12.3e-6 means 12.3 millionths (0.0000123).", 7);
        for (AbsentHarmonic a : r.harmonics().absent()) {
            s.line(String.format(Locale.ROOT, "Harmonic %d (about %s) absent: %s", a.harmonic(), F.value(a.expectedFrequencyHz(), "Hz"),
                    a.explanation()), 8);
        }
        r.modal().quality().ifPresent(q -> s.line(String.format(Locale.ROOT, "Fit over %s to %s: normalised residual %s,"
                        + " correlation %s.", F.value(r.modal().bandLowHz(), "Hz"), F.value(r.modal().bandHighHz(), "Hz"),
                F.number(q.normalisedResidual()), F.number(q.correlation())), 8));
        var res = r.modal().residualTerms();
        s.line(String.format(Locale.ROOT, "Residual terms for modes outside the band: upper %s %s %s j m/N; lower %s %s %s j"
                        + " (m/N)(rad/s)².", F.number(res.upper().getReal()), res.upper().getImaginary() < 0 ? "-" : "+",
                F.number(Math.abs(res.upper().getImaginary())), F.number(res.lower().getReal()),
                res.lower().getImaginary() < 0 ? "-" : "+", F.number(Math.abs(res.lower().getImaginary()))), 8);
        beyondBand(s, res.outsideBand());
        r.modal().warnings().forEach(note -> s.line("Note: " + note, 8));
        return s;
    }

    /** The poles the fit holds beyond the band's edges, one line each, when there are any. */
    private static void beyondBand(Section s, List<Mode> poles) {
        if (poles.isEmpty()) {
            return;
        }
        s.line(ResultFile.BEYOND_BAND_LABEL.substring(0, 1).toUpperCase(Locale.ROOT)
                + ResultFile.BEYOND_BAND_LABEL.substring(1) + " (part of the residual terms, not modes of the specimen):", 8);
        for (Mode p : poles) {
            Complex a = p.modalConstant();
            s.line(String.format(Locale.ROOT, "%s, damping ratio %s, modal constant %s %s %s j 1/kg", F.value(
                    p.frequencyHz(), "Hz"), F.number(p.dampingRatio()), F.number(a.getReal()),
                    a.getImaginary() < 0 ? "-" : "+", F.number(Math.abs(a.getImaginary()))), 8);
        }
    }

    static Section properties(QualificationResult r) {
        Section s = new Section("Properties");
        if (r.tension().isPresent()) {
            TensionEstimate t = r.tension().get();
            s.line(String.format(Locale.ROOT, "Tension %s (%s); bending stiffness %s; inharmonicity B %s.",
                    F.withUncertainty(t.tensionN(), t.tensionStdN(), "N"), t.method().label(),
                    F.withUncertainty(t.bendingStiffnessNm2(), t.bendingStiffnessStdNm2(), "N m^2"),
                    inharmonicity(r, t)), 9);
            t.crossChecks().forEach(c -> s.line("Cross-check, " + c.method() + ": " + F.value(c.tensionN(), "N"), 8));
            t.warnings().forEach(note -> s.line("Note: " + note, 8));
        } else {
            s.line("Tension not determined: no harmonic was numbered.", 9);
        }
        r.participation().ifPresent(p -> {
            s.line(String.format(Locale.ROOT, "From the modal constants: stinger at %s, sensor at %s.",
                    F.withUncertainty(p.forcingPositionM(), p.forcingPositionStdM(), "m"),
                    F.withUncertainty(p.sensorPositionM(), p.sensorPositionStdM(), "m")), 9);
            s.line("Linear density implied by the modal constants (if the calibration is right): "
                    + F.value(p.effectiveLinearDensityKgPerM(), "kg/m") + ".", 9);
            p.findings().forEach(f -> s.line(f, 8));
        });
        r.linearity().ifPresent(l -> {
            l.shifts().forEach(h -> s.line(String.format(Locale.ROOT, "Level check, harmonic %d: %s at the first drive level, %s at"
                            + " the second; relative shift %s (Kirchhoff-Carrier predicts %s).", h.harmonic(),
                    F.value(h.firstFrequencyHz(), "Hz"), F.value(h.secondFrequencyHz(), "Hz"),
                    F.withUncertainty(h.relativeShift(), h.relativeShiftStd(), ""),
                    F.valueLike(h.predictedRelativeShift(), h.relativeShiftStd(), "")),
                    9));
            l.findings().forEach(f -> s.line(f, 8));
        });
        return s;
    }

    /** B with its standard uncertainty when the qualification evaluated one, else as the tension fit gives it. */
    private static String inharmonicity(QualificationResult r, TensionEstimate t) {
        Measurement b = r.measurements().get(Figure.INHARMONICITY.key());
        return b == null ? F.number(t.inharmonicityB()) : F.withUncertainty(b.value(), b.standardUncertainty(), "");
    }

    static Section figures(Map<String, Measurement> measurements) {
        Section s = new Section("Every figure of the run");
        s.row(new String[] {"figure", "value", "standard uncertainty", "unit"}, FIGURE_COLUMNS, true);
        measurements.forEach((key, m) -> {
            String[] pair = ReportText.pair(m.value(), m.standardUncertainty());
            if (m.standardUncertainty() == 0 && ReportText.judgedAsItStands(key)) {
                pair[1] = ReportText.NOT_APPLICABLE;
            }
            s.row(new String[] {Figure.labelFor(key), pair[0], pair[1], m.unit().isEmpty() ? "none" : F.unit(m.unit())},
                    FIGURE_COLUMNS, false);
        });
        return s;
    }
}
