package org.tautline.app.report;

import java.awt.Color;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.LimitText;
import org.tautline.analysis.verdict.Outcome;
import org.tautline.analysis.verdict.Specification;
import org.tautline.analysis.verdict.Verdict;
import org.tautline.app.SafetyNotice;
import org.tautline.app.lot.FigureStatistics;
import org.tautline.app.qualify.QualificationResult;

/**
 * The qualification report as a PDF: traceability (report number, specification and revision, test and report
 * dates, the air, instruments with serials and calibration, the SHA-256 of each data file), the specimen, the rig
 * record, the FRF with the fit (magnitude, phase, line quality), the modes, the harmonic series, the participation,
 * the properties, every figure, every limit, the verdict, the lot's control charts, safety notes and sign-off lines.
 * Each section is kept whole on a page where it fits; every page says "page x of y".
 */
public final class QualificationReport {
    private static final float[] LIMIT_COLUMNS = {0, 135, 200, 255, 310, 365, 420};
    private static final Color PASS = new Color(0, 110, 70);
    private static final Color FAIL = new Color(180, 40, 0);
    private static final Color UNDECIDED = new Color(150, 100, 0);

    private QualificationReport() {
    }

    /**
     * Writes the report.
     *
     * @param run the run directory with its re-derived qualification, setup and data files
     * @param info operator, software version, report date and number
     * @param lotName the lot's name, empty for none
     * @param lot the lot's statistics to chart, empty for none
     * @param file the PDF to write
     * @throws IOException when the file cannot be written
     */
    public static void write(RunDirectory run, ReportInfo info, String lotName, List<FigureStatistics> lot, Path file)
            throws IOException {
        QualificationResult r = run.result();
        Optional<Specification> specification = r.assessment().request().specification();
        try (PDDocument document = new PDDocument()) {
            PDDocumentInformation meta = document.getDocumentInformation();
            meta.setTitle("Qualification of " + r.specimen().id());
            meta.setCreator(info.softwareVersion());
            String footer = "Tautline qualification report " + (info.reportNumber().isEmpty() ? "(report number not given)"
                    : info.reportNumber()) + ", specimen " + r.specimen().id() + ", made "
                    + ReportText.dateTime(info.createdAt());
            try (PageWriter w = new PageWriter(document, footer)) {
                w.boldLine("Qualification report: specimen " + r.specimen().id(), 16, Color.BLACK);
                TraceSections.header(run, info, specification).write(w);
                verdict(run, TraceSections.expiredCalibrations(run, info)).write(w);
                TraceSections.instruments(run, info).write(w);
                TraceSections.dataFiles(run).write(w);
                ResultSections.specimen(r.specimen()).write(w);
                ResultSections.rigRecord(run).write(w);
                new Section("Measured FRF and the fitted modal model").chart(ReportCharts.frf(r), 200)
                        .chart(ReportCharts.phase(r), 160).write(w);
                ReportCharts.lineQuality(r).ifPresentOrElse(chart -> new Section("Quality of the measurement")
                        .chart(chart, 160).write(w), () -> new Section("Quality of the measurement")
                        .line("The FRF file carries neither a coherence nor a quality figure per line.", 9).write(w));
                ResultSections.modes(r, run.resultSource().sentence()).write(w);
                ReportCharts.harmonicSeries(r).ifPresent(chart -> new Section("Harmonic series, tension and"
                        + " inharmonicity").chart(chart, 200).write(w));
                ReportCharts.participation(r).ifPresent(chart -> new Section("Participation: measured and expected"
                        + " modal constants").chart(chart, 190).write(w));
                ResultSections.properties(r).write(w);
                ResultSections.figures(r.measurements()).write(w);
                limits(r).write(w);
                if (!lot.isEmpty()) {
                    LotPages.write(w, lotName, lot);
                }
                safetyAndSignOff(info).write(w);
            }
            document.save(file.toFile());
        }
    }

    /** The verdict banner with what stands against trusting it, and whether the modes were recorded or fitted again. */
    private static Section verdict(RunDirectory run, List<String> expired) {
        QualificationResult r = run.result();
        Section s = new Section("").gap(4);
        if (r.verdict().isEmpty()) {
            s.boldLine("Verdict: none (no specification in the run)", 13, Color.DARK_GRAY);
        } else {
            Outcome outcome = r.verdict().get().outcome();
            s.boldLine("Verdict: " + outcome.label().toUpperCase(java.util.Locale.ROOT), 13, colour(outcome));
        }
        for (String caution : r.cautions()) {
            s.line("Not determinable as a whole: " + caution, 9);
        }
        for (String e : expired) {
            s.boldLine(e, 9, FAIL);
        }
        ResultSource source = run.resultSource();
        if (source.refitted()) {
            s.boldLine(source.sentence(), 9, UNDECIDED);
        } else if (!source.sentence().isEmpty()) {
            s.line(source.sentence(), 9);
        }
        return s.line("Values are written as value ± u, u the standard uncertainty (coverage factor k = 1) rounded to two"
                + " significant digits (GUM, JCGM 100:2008, 7.2.6); the limits use U = " + ReportText.FORMAT.number(
                Verdict.COVERAGE_FACTOR) + " u.", 8);
    }

    private static Color colour(Outcome outcome) {
        return outcome == Outcome.PASS ? PASS : outcome == Outcome.FAIL ? FAIL : UNDECIDED;
    }

    private static Section limits(QualificationResult r) {
        Section s = new Section("Limits and verdict");
        if (r.verdict().isEmpty()) {
            return s.line("No specification was given, so no limit was judged.", 9);
        }
        Verdict v = r.verdict().get();
        s.line("Decision rule: a limit passes when the value is inside it by more than the expanded uncertainty U = "
                + ReportText.FORMAT.number(Verdict.COVERAGE_FACTOR) + " u, fails when it is outside by more than U, and"
                + " is not determinable otherwise; the margin is the distance to the nearest bound, positive inside.", 8);
        s.row(new String[] {"limit (unit)", "value", "U", "lower", "upper", "margin", "result"}, LIMIT_COLUMNS, true);
        for (LimitResult l : v.results()) {
            String unit = l.limit().unit().isEmpty() ? "" : " (" + ReportText.FORMAT.unit(l.limit().unit()) + ")";
            double expanded = l.expandedUncertainty();
            String[] pair = ReportText.pair(l.measuredValue(), expanded);
            if (expanded == 0 && ReportText.judgedAsItStands(l.limit().figureKey())) {
                pair[1] = ReportText.NOT_APPLICABLE;
            }
            s.row(new String[] {l.limit().name() + unit, pair[0], pair[1], ReportText.bound(l.limit().lowerBound()),
                    ReportText.bound(l.limit().upperBound()), ReportText.like(l.margin(), expanded), l.outcome().label()},
                    LIMIT_COLUMNS, false);
        }
        s.gap(3);
        v.results().forEach(l -> s.line(l.outcome().label() + ": " + LimitText.reason(l, ReportText.FORMAT), 8));
        s.gap(3);
        Outcome outcome = v.outcome();
        s.boldLine("Verdict: " + outcome.label().toUpperCase(java.util.Locale.ROOT), 13, colour(outcome));
        r.cautions().forEach(c -> s.line("Not determinable as a whole: " + c, 9));
        return s;
    }

    /** Safety notes and sign-off as one block, so the sign-off never stands alone on a page. */
    private static Section safetyAndSignOff(ReportInfo info) {
        Section s = new Section("Safety notes and sign-off");
        SafetyNotice.cautions().forEach(c -> s.line("- " + c, 8));
        s.gap(14);
        s.line("Operator: " + (info.operator().isBlank() ? "______________________________" : info.operator())
                + "      Report date: " + ReportText.dateTime(info.createdAt()), 9);
        s.gap(18);
        s.line("Signature: ______________________________      Checked by: ______________________________", 9);
        s.gap(18);
        s.line("Software: " + info.softwareVersion(), 9);
        return s;
    }
}
