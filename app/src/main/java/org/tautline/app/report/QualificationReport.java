package org.tautline.app.report;

import java.awt.Color;
import java.io.IOException;
import java.nio.file.Path;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.specimen.AbsentHarmonic;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.specimen.TensionEstimate;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.Measurement;
import org.tautline.analysis.verdict.Outcome;
import org.tautline.analysis.verdict.Verdict;
import org.tautline.app.SafetyNotice;
import org.tautline.app.lot.FigureStatistics;
import org.tautline.app.qualify.QualificationResult;

/**
 * The qualification report as a PDF: specimen, rig and plan, FRF with the fit, modes, participation,
 * properties, every figure, every limit, the verdict, the lot's control charts, safety notes and sign-off lines.
 */
public final class QualificationReport {
    private static final float[] MODE_COLUMNS = {0, 30, 60, 130, 190, 260, 330, 410};
    private static final float[] FIGURE_COLUMNS = {0, 200, 290, 380};
    private static final float[] LIMIT_COLUMNS = {0, 140, 205, 255, 315, 375, 440};
    private static final DateTimeFormatter DATE = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'").withZone(ZoneOffset.UTC);

    private QualificationReport() {
    }

    /**
     * Writes the report.
     *
     * @param run the run directory with its re-derived qualification
     * @param info operator, software version and date
     * @param lot the lot's name and statistics to chart, empty statistics for none
     * @param lotName the lot's name, empty for none
     * @param file the PDF to write
     * @throws IOException when the file cannot be written
     */
    public static void write(RunDirectory run, ReportInfo info, String lotName, List<FigureStatistics> lot, Path file)
            throws IOException {
        QualificationResult r = run.result();
        try (PDDocument document = new PDDocument()) {
            PDDocumentInformation meta = document.getDocumentInformation();
            meta.setTitle("Qualification of " + r.specimen().id());
            meta.setCreator(info.softwareVersion());
            try (PageWriter w = new PageWriter(document, "Tautline qualification report, specimen " + r.specimen().id()
                    + ", " + DATE.format(info.createdAt()))) {
                w.boldLine("Qualification report: specimen " + r.specimen().id(), 16, Color.BLACK);
                w.line("Made " + DATE.format(info.createdAt()) + " by " + info.softwareVersion() + " from the run in "
                        + run.directory().toAbsolutePath() + (info.operator().isBlank() ? "" : "; operator " + info.operator()), 9);
                verdictLine(w, r);
                specimen(w, r.specimen());
                rig(w, run.metadata());
                run.recordedSweep().ifPresent(line -> w.line(line, 9));
                w.keep(260);
                w.heading("Measured FRF and the fitted modal model");
                ReportCharts.frf(r).draw(w, 230);
                modes(w, r);
                ReportCharts.participation(r).ifPresent(chart -> {
                    w.keep(220);
                    w.heading("Participation: measured and expected modal constants");
                    draw(chart, w, 190);
                });
                properties(w, r);
                figures(w, r.measurements());
                limits(w, r);
                lot(w, lotName, lot);
                safety(w);
                signOff(w, info);
            }
            document.save(file.toFile());
        }
    }

    private static void draw(PdfChart chart, PageWriter w, float height) {
        try {
            chart.draw(w, height);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private static void verdictLine(PageWriter w, QualificationResult r) {
        w.gap(4);
        if (r.verdict().isEmpty()) {
            w.boldLine("Verdict: none (no specification in the run)", 13, Color.DARK_GRAY);
            return;
        }
        Outcome outcome = r.verdict().get().outcome();
        Color colour = outcome == Outcome.PASS ? new Color(0, 110, 70) : outcome == Outcome.FAIL ? new Color(180, 40, 0)
                : new Color(150, 100, 0);
        w.boldLine("Verdict: " + outcome, 13, colour);
        for (String caution : r.cautions()) {
            w.line("Not determinable as a whole: " + caution, 9);
        }
    }

    private static void specimen(PageWriter w, Specimen s) {
        w.heading("Specimen");
        w.line(String.format(Locale.ROOT, "Identifier %s; span %s m, %s ends; linear density %s +/- %s kg/m;"
                        + " bending stiffness %s +/- %s N m^2; axial stiffness %s N; nominal tension %s N.",
                s.id(), Figures.format(s.lengthM()), s.ends().name().toLowerCase(Locale.ROOT),
                Figures.format(s.linearDensityKgPerM()), Figures.format(s.linearDensityStdKgPerM()),
                Figures.format(s.bendingStiffnessNm2()), Figures.format(s.bendingStiffnessStdNm2()),
                Figures.format(s.axialStiffnessN()), Figures.format(s.nominalTensionN())), 9);
        w.line(String.format(Locale.ROOT, "Stated setup: stinger at %s m, sensor at %s m, sensor angle %s rad, belt speed %s m/s.",
                Figures.format(s.forcingPositionM()), Figures.format(s.sensorPositionM()),
                Figures.format(s.sensorAngleRad()), Figures.format(s.beltSpeedMPerS())), 9);
    }

    private static void rig(PageWriter w, Map<String, String> metadata) {
        w.heading("Rig, sensors, calibration and sweep plan");
        if (metadata.isEmpty()) {
            w.line("The run's FRF file records no rig, sensor or plan details.", 9);
        }
        metadata.forEach((key, value) -> w.line(key + ": " + value, 9));
    }

    private static void modes(PageWriter w, QualificationResult r) {
        w.heading("Modes (estimate and standard error)");
        w.row(new String[] {"n", "pol", "f (Hz)", "+/- (Hz)", "zeta", "+/-", "A (1/kg)", "+/- (1/kg)"}, MODE_COLUMNS, true);
        for (QualifiedMode m : r.modes()) {
            FittedMode f = m.fitted();
            Mode e = f.mode();
            w.row(new String[] {m.harmonic() > 0 ? Integer.toString(m.harmonic()) : "?",
                    m.polarisation() > 0 ? Integer.toString(m.polarisation()) : "-", Figures.format(e.frequencyHz()),
                    Figures.format(f.frequencyStdHz()), Figures.format(e.dampingRatio()), Figures.format(f.dampingRatioStd()),
                    Figures.format(e.modalConstant().getReal()), Figures.format(f.modalConstantStd().getReal())},
                    MODE_COLUMNS, false);
        }
        if (r.modes().isEmpty()) {
            w.line("No mode was found in the band.", 9);
        }
        for (AbsentHarmonic a : r.harmonics().absent()) {
            w.line(String.format(Locale.ROOT, "Harmonic %d (about %s Hz) absent: %s", a.harmonic(),
                    Figures.format(a.expectedFrequencyHz()), a.explanation()), 8);
        }
        r.modal().quality().ifPresent(q -> w.line(String.format(Locale.ROOT,
                "Fit over %s .. %s Hz: normalised residual %s, correlation %s.", Figures.format(r.modal().bandLowHz()),
                Figures.format(r.modal().bandHighHz()), Figures.format(q.normalisedResidual()),
                Figures.format(q.correlation())), 8));
        var res = r.modal().residualTerms();
        w.line(String.format(Locale.ROOT, "Residual terms: upper %s %+.6g j m/N, lower %s %+.6g j N/m per (rad/s)^2 term.",
                Figures.format(res.upper().getReal()), res.upper().getImaginary(), Figures.format(res.lower().getReal()),
                res.lower().getImaginary()), 8);
        r.modal().warnings().forEach(note -> w.line("Note: " + note, 8));
    }

    private static void properties(PageWriter w, QualificationResult r) {
        w.heading("Properties");
        if (r.tension().isPresent()) {
            TensionEstimate t = r.tension().get();
            w.line(String.format(Locale.ROOT, "Tension %s +/- %s N (%s); bending stiffness %s +/- %s N m^2; inharmonicity B %s.",
                    Figures.format(t.tensionN()), Figures.format(t.tensionStdN()),
                    t.method().name().toLowerCase(Locale.ROOT).replace('_', ' '), Figures.format(t.bendingStiffnessNm2()),
                    Figures.format(t.bendingStiffnessStdNm2()), Figures.format(t.inharmonicityB())), 9);
            t.crossChecks().forEach(c -> w.line("Cross-check " + c.method() + ": " + Figures.format(c.tensionN()) + " N", 9));
            t.warnings().forEach(note -> w.line("Note: " + note, 8));
        } else {
            w.line("Tension not determined: no harmonic was numbered.", 9);
        }
        r.participation().ifPresent(p -> {
            w.line(String.format(Locale.ROOT, "From the modal constants: stinger at %s +/- %s m, sensor at %s +/- %s m.",
                    Figures.format(p.forcingPositionM()), Figures.format(p.forcingPositionStdM()),
                    Figures.format(p.sensorPositionM()), Figures.format(p.sensorPositionStdM())), 9);
            w.line("Linear density implied by the modal constants (if the calibration is right): "
                    + Figures.format(p.effectiveLinearDensityKgPerM()) + " kg/m.", 9);
            p.findings().forEach(f -> w.line(f, 8));
        });
        r.linearity().ifPresent(l -> {
            l.shifts().forEach(h -> w.line(String.format(Locale.ROOT, "Level check, harmonic %d: %s Hz at the first level,"
                            + " %s Hz at the second; relative shift %s +/- %s (Kirchhoff-Carrier predicts %s).", h.harmonic(),
                    Figures.format(h.firstFrequencyHz()), Figures.format(h.secondFrequencyHz()),
                    Figures.format(h.relativeShift()), Figures.format(h.relativeShiftStd()),
                    Figures.format(h.predictedRelativeShift())), 9));
            l.findings().forEach(f -> w.line(f, 8));
        });
    }

    private static void figures(PageWriter w, Map<String, Measurement> measurements) {
        w.heading("Every figure of the run");
        w.row(new String[] {"figure", "value", "standard uncertainty", "unit"}, FIGURE_COLUMNS, true);
        measurements.forEach((key, m) -> w.row(new String[] {key, Figures.format(m.value()),
                Figures.format(m.standardUncertainty()), m.unit().isEmpty() ? "1" : m.unit()}, FIGURE_COLUMNS, false));
    }

    private static void limits(PageWriter w, QualificationResult r) {
        w.heading("Limits");
        if (r.verdict().isEmpty()) {
            w.line("No specification was given, so no limit was judged.", 9);
            return;
        }
        Verdict v = r.verdict().get();
        w.line("Decision rule: a limit passes when the value is inside it by more than the expanded uncertainty U = "
                + Figures.format(Verdict.COVERAGE_FACTOR) + " u; the margin is the distance to the nearest bound.", 8);
        w.row(new String[] {"limit", "value", "U", "lower", "upper", "margin", "result"}, LIMIT_COLUMNS, true);
        for (LimitResult l : v.results()) {
            w.row(new String[] {l.limit().name(), Figures.format(l.measuredValue()), Figures.format(l.expandedUncertainty()),
                    Figures.format(l.limit().lowerBound()), Figures.format(l.limit().upperBound()), Figures.format(l.margin()),
                    l.outcome().name()}, LIMIT_COLUMNS, false);
        }
        w.gap(3);
        v.results().forEach(l -> w.line(l.outcome() + ": " + l.reason(), 8));
        w.gap(3);
        verdictLine(w, r);
    }

    private static void lot(PageWriter w, String lotName, List<FigureStatistics> lot) {
        if (lot.isEmpty()) {
            return;
        }
        LotPages.write(w, lotName, lot);
    }

    private static void safety(PageWriter w) {
        w.heading("Safety notes");
        SafetyNotice.cautions().forEach(c -> w.line("- " + c, 8));
    }

    private static void signOff(PageWriter w, ReportInfo info) {
        w.keep(110);
        w.heading("Sign-off");
        w.reserve(10);
        w.line("Operator: " + (info.operator().isBlank() ? "______________________________" : info.operator())
                + "      Date: " + DATE.format(info.createdAt()), 9);
        w.gap(18);
        w.line("Signature: ______________________________      Checked by: ______________________________", 9);
        w.gap(18);
        w.line("Software: " + info.softwareVersion(), 9);
    }
}
