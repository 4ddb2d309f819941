package org.tautline.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.time.Instant;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.modal.ModeSelection;
import org.tautline.analysis.specimen.HarmonicShift;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.verdict.Figure;
import org.tautline.app.qualify.Qualification;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.report.QualificationReport;
import org.tautline.app.report.ReportInfo;
import org.tautline.app.report.RunDirectory;
import org.tautline.app.trace.RunSetup;
import org.tautline.app.ui.results.ResultOrigin;
import org.tautline.app.ui.results.SyntheticWire;

/**
 * The report the window exports carries what the command line's report carries: the test date, the air, the rig and
 * its instruments, the report number and the SHA-256 of the data files written beside it. Read back with PDFBox's own
 * text extraction; no display needed.
 */
class ExportReportTest {
    private static final Instant REPORT_DATE = Instant.parse("2026-11-03T10:00:00Z");
    private static QualificationResult wire;

    @BeforeAll
    static void qualify() {
        wire = SyntheticWire.qualified();
    }

    private static String text(Path pdf) throws Exception {
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            return new PDFTextStripper().getText(document);
        }
    }

    private static Path rigFile(Path dir) throws Exception {
        Path rig = dir.resolve("bench-2.json");
        Files.writeString(rig, "{\"name\": \"bench 2\", \"instruments\": [{\"role\": \"force sensor\", \"model\": \"FS-1\","
                + " \"serial\": \"F-4711\", \"calibrationCertificate\": \"CAL-2026-093\", \"calibrationDue\": \"2027-01-31\"}]}");
        return rig;
    }

    @Test
    void theExportedReportHoldsTheTestDateTheAirTheRigAndTheChecksumsOfItsFiles(@TempDir Path dir) throws Exception {
        Path folder = dir.resolve("DEMO-report");
        ReportDetails details = new ReportDetails("A. Tester", "R-2026-017", "2026-11-02", "21.5", "45",
                rigFile(dir).toString());
        Path pdf = ExportController.writeReportFolder(folder, wire, Optional.of(ResultOrigin.file(REPORT_DATE,
                "wire.csv")), details, REPORT_DATE);
        assertEquals(folder.resolve("report.pdf"), pdf);
        String text = text(pdf);
        for (String expected : List.of("Report number: R-2026-017", "Tested: 2026-11-02 00:00 UTC",
                "Report made: 2026-11-03 10:00 UTC", "temperature 21.5 °C", "relative humidity 45 %", "Rig: bench 2",
                "Operator: A. Tester", "F-4711", "CAL-2026-093", "2027-01-31", "source: Tautline workbench")) {
            assertTrue(text.contains(expected), "the report says '" + expected + "':\n" + text);
        }
        // Each file written beside the report is named with its SHA-256 (FIPS 180-4), computed here by the JDK.
        List<String> lines = text.lines().toList();
        for (String name : List.of(RunDirectory.FRF, RunDirectory.SPECIMEN, RunDirectory.SPECIFICATION,
                RunDirectory.RESULT, "setup.json")) {
            String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                    .digest(Files.readAllBytes(folder.resolve(name))));
            assertTrue(lines.stream().anyMatch(l -> l.startsWith(name) && l.endsWith(sha)), name + " " + sha + ":\n" + text);
        }
        // The folder is a run folder the command line reads again, with the same setup.
        RunDirectory.Inputs again = RunDirectory.readInputs(folder);
        assertEquals(Optional.of(Instant.parse("2026-11-02T00:00:00Z")), again.setup().testedAt());
        assertEquals("bench 2", again.setup().rig().orElseThrow().name());
        assertEquals(21.5, again.setup().temperatureC().getAsDouble(), 0);
        assertEquals(wire.specimen().id(), again.specimen().id());
    }

    /** The invented wire refitted as a technician would after dropping its second harmonic's pole by hand. */
    private static QualificationResult handEdited() {
        ModeSelection automatic = wire.modal().selection();
        int second = 0;
        for (int i = 0; i < automatic.size(); i++) {
            double f = automatic.poles().get(i).frequencyHz();
            if (Math.abs(f - SyntheticWire.frequencyHz(2)) < Math.abs(automatic.poles().get(second).frequencyHz()
                    - SyntheticWire.frequencyHz(2))) {
                second = i;
            }
        }
        // As the results screen refits (Refit.run): against the specification the result was judged against.
        return Qualification.refit(wire, automatic.withDropped(second), wire.assessment().request().specification(),
                System.nanoTime());
    }

    private static String report(RunDirectory run, Path pdf) throws Exception {
        QualificationReport.write(run, new ReportInfo("", ReportInfo.SOFTWARE, REPORT_DATE), "", List.of(), pdf);
        return text(pdf).replace('\n', ' ').replaceAll(" +", " ");
    }

    @Test
    void theReportOfAnExportedFolderGivesTheWindowsHandPickedModesAndVerdictWithoutFittingAgain(@TempDir Path dir)
            throws Exception {
        // A level check from the rig (invented figures: f1 up 0.1 % at the second drive level) beside the hand-picked fit.
        LinearityResult levels = new LinearityResult(List.of(new HarmonicShift(1, 228.20, 228.43, 1.0e-3, 2.0e-4, 8.0e-4,
                true)), false, List.of("invented level check"));
        QualificationResult shown = Qualification.withLinearity(handEdited(), levels,
                wire.assessment().request().specification());
        // The refit keeps the poles chosen: the second harmonic is gone, as the window shows it.
        assertEquals(wire.modes().size() - 1, shown.modes().size(), shown.modes().toString());
        assertTrue(shown.modes().stream().noneMatch(m -> m.harmonic() == 2), shown.modes().toString());
        Path folder = dir.resolve("edited");
        String exported = text(ExportController.writeReportFolder(folder, shown, Optional.empty(),
                new ReportDetails("", "", "2026-11-02", "", "", ""), REPORT_DATE));
        assertTrue(exported.contains("result.json"), "the exported report names result.json among its files");

        // What 'tautline report FOLDER' does: read the folder, qualify, write the report.
        RunDirectory again = RunDirectory.analyse(RunDirectory.readInputs(folder));
        assertFalse(again.resultSource().refitted());
        assertEquals(shown.modes(), again.result().modes(), "the window's modes, exactly, standard errors included");
        assertEquals(shown.modal().residualTerms(), again.result().modal().residualTerms());
        assertEquals(shown.measurements(), again.result().measurements());
        assertEquals(shown.verdict(), again.result().verdict(), "the window's verdict, limit by limit");
        assertEquals(shown.cautions(), again.result().cautions());
        assertEquals(levels.shifts(), again.result().linearity().orElseThrow().shifts(), "the rig's level check");
        assertEquals(1.0e-3, again.result().measurements().get(Figure.LEVEL_SHIFT.key()).value(), 0,
                "the level-check figure is among the figures, as in the window");
        assertEquals(shown.assessment().request().specification(), again.result().assessment().request().specification(),
                "spec.json holds the specification the window judged against");
        String text = report(again, dir.resolve("again.pdf"));
        assertTrue(text.contains("Modes as recorded in result.json with this frf.csv (the SHA-256 it names is that of"
                + " frf.csv); the FRF was not fitted again."), text);
        assertFalse(text.contains("re-fitted"), text);
    }

    @Test
    void aFolderWithoutResultJsonIsFittedAgainAndItsReportSaysSo(@TempDir Path dir) throws Exception {
        QualificationResult shown = handEdited();
        Path folder = dir.resolve("edited");
        ExportController.writeReportFolder(folder, shown, Optional.empty(), new ReportDetails("", "", "", "", "", ""),
                REPORT_DATE);
        Files.delete(folder.resolve(RunDirectory.RESULT));
        RunDirectory refitted = RunDirectory.analyse(RunDirectory.readInputs(folder));
        assertTrue(refitted.resultSource().refitted());
        // Fitted again, the FRF gives the automatic choice back, the second harmonic with it: not the window's result.
        assertEquals(wire.modes().size(), refitted.result().modes().size(), refitted.result().modes().toString());
        String text = report(refitted, dir.resolve("refitted.pdf"));
        assertTrue(text.contains("Modes re-fitted from frf.csv by this report, because the folder has no result.json:"
                + " poles chosen by hand at the test are not known here, so the modes and the verdict may differ from"
                + " the run's."), text);
    }

    @Test
    void aSweepRunInTheWindowIsDatedByItsStartAndNamesItsRigWithoutARigFile() throws Exception {
        Instant started = Instant.parse("2026-11-02T09:14:00Z");
        RunSetup setup = new ReportDetails("", "", "2020-01-01", "", "", "").setup(Optional.of(started),
                Optional.of("sim: the simulated rig, seed 1"));
        assertEquals(Optional.of(started), setup.testedAt(), "the sweep's start is the test date, not a typed one");
        assertEquals("sim: the simulated rig, seed 1", setup.rig().orElseThrow().name());
        assertTrue(setup.rig().orElseThrow().instruments().isEmpty(), "no instrument is made up");
        assertTrue(setup.temperatureC().isEmpty() && setup.relativeHumidityPct().isEmpty(), "the air is not given");
        RunSetup fromFile = new ReportDetails("", "", "", "", "", "").setup(Optional.empty(), Optional.empty());
        assertEquals(RunSetup.NONE, fromFile, "an FRF from a file with nothing given: every fact 'not given'");
    }

    @Test
    void refusesAUsedFolderAndDetailsThatAreNotNumbersOrDates(@TempDir Path dir) throws Exception {
        Path used = Files.createDirectories(dir.resolve("used"));
        Files.writeString(used.resolve("notes.txt"), "other work");
        ReportDetails fine = new ReportDetails("", "", "", "", "", "");
        AnalysisException e = assertThrows(AnalysisException.class, () -> ExportController.writeReportFolder(used, wire,
                Optional.empty(), fine, REPORT_DATE));
        assertEquals("folder " + used + " already holds files (notes.txt); choose a new or empty folder, so that the"
                + " report's checksums name only this run's files", e.getMessage());
        assertEquals(List.of("notes.txt"), Files.list(used).map(p -> p.getFileName().toString()).toList(),
                "nothing was written into it");
        assertEquals("Report details: Air temperature (°C) '21,5': expected a number, for example 21.5, or leave it"
                + " empty when not measured", assertThrows(AnalysisException.class, () -> new ReportDetails("", "", "",
                "21,5", "", "").setup(Optional.empty(), Optional.empty())).getMessage());
        assertEquals("Report details: relative humidity 120.0 %; expected 0 to 100 %", assertThrows(
                AnalysisException.class, () -> new ReportDetails("", "", "", "", "120", "").setup(Optional.empty(),
                        Optional.empty())).getMessage());
        assertTrue(assertThrows(AnalysisException.class, () -> new ReportDetails("", "", "2 Nov", "", "", "")
                .setup(Optional.empty(), Optional.empty())).getMessage().startsWith("Report details: Test date '2 Nov':"));
    }
}
