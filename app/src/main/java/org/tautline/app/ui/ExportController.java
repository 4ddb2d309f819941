package org.tautline.app.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutionException;

import javax.swing.JFileChooser;
import javax.swing.JOptionPane;
import javax.swing.SwingWorker;

import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.report.QualificationReport;
import org.tautline.app.report.ReportInfo;
import org.tautline.app.qualify.Qualification;
import org.tautline.app.report.RunDirectory;
import org.tautline.app.report.RunExport;
import org.tautline.app.report.RunFolderWriter;
import org.tautline.app.trace.Calibrations;
import org.tautline.app.trace.RunSetup;
import org.tautline.app.ui.results.ResultOrigin;
import org.tautline.driver.sweep.SweepResult;

/**
 * Writes the report (with the run's data files, its setup and their checksums, as the command line's report has
 * them) and the CSV and JSON exports of the result on show; the writing runs off the event thread. Every method but
 * {@link #writeReportFolder} is called on the event thread.
 */
final class ExportController {
    /** The report's file name inside the folder it is exported to, as {@code demo --out} names it. */
    static final String REPORT = "report.pdf";
    private final WorkbenchParts parts;
    private Optional<QualificationResult> shown = Optional.empty();
    private Optional<ResultOrigin> origin = Optional.empty();

    ExportController(WorkbenchParts parts) {
        this.parts = parts;
    }

    /** @param result the result now on the results screen, current */
    void resultShown(QualificationResult result) {
        shown = Optional.of(result);
    }

    /** @param from where the result now on show came from: when the run was made, on which rig */
    void originShown(ResultOrigin from) {
        origin = Optional.of(from);
    }

    /** The result on show is no longer current (a new run started, or one ended without a result): nothing to export. */
    void resultWithdrawn() {
        shown = Optional.empty();
        origin = Optional.empty();
    }

    /**
     * Asks for a new or empty folder and the report's details (operator, report number, the air, a rig file), then
     * writes the run's data files and the report there, off the event thread.
     */
    void exportReport() {
        if (shown.isEmpty()) {
            nothingYet();
            return;
        }
        QualificationResult result = shown.get();
        Optional<ResultOrigin> from = origin;
        JFileChooser chooser = new JFileChooser();
        chooser.setFileSelectionMode(JFileChooser.DIRECTORIES_ONLY);
        chooser.setDialogTitle("New or empty folder for the report and its data files");
        chooser.setSelectedFile(new java.io.File(result.specimen().id() + "-report"));
        if (chooser.showSaveDialog(parts.frame()) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Optional<ReportDetails> details = ReportDetailsForm.ask(parts.frame(), result.sweep().isPresent()
                ? from.map(ResultOrigin::when) : Optional.empty());
        if (details.isEmpty()) {
            return;
        }
        Path folder = chooser.getSelectedFile().toPath().toAbsolutePath();
        inBackground("writing the report to " + folder.getFileName(), "Wrote the report " + folder.resolve(REPORT)
                + " with the run's data files beside it", "Could not write the report",
                () -> writeReportFolder(folder, result, from, details.get(), Instant.now()));
    }

    /**
     * Writes a result on show as a run folder with its report, as {@code demo --out} and {@code report} would: the
     * data files ({@link RunFolderWriter}), then {@value #REPORT} naming their SHA-256, the test date and the rig.
     *
     * @param folder a new or empty folder
     * @param result the result on show
     * @param from where it came from (when the sweep started, on which rig), when known
     * @param details what the person exporting gave
     * @param now the report date
     * @return the report's file
     * @throws IOException when a file cannot be written or the rig file read
     */
    static Path writeReportFolder(Path folder, QualificationResult result, Optional<ResultOrigin> from,
                                  ReportDetails details, Instant now) throws IOException {
        boolean sweptHere = result.sweep().isPresent();
        RunSetup setup = details.setup(sweptHere ? from.map(ResultOrigin::madeAt) : Optional.empty(),
                sweptHere ? from.map(ResultOrigin::rig) : Optional.empty());
        // An instrument whose calibration had run out makes the verdict not determinable, as the command line's does.
        QualificationResult judged = Qualification.withCautions(result, Calibrations.expired(setup, now));
        RunDirectory run = RunFolderWriter.write(folder, judged, metadata(judged, from), recordedSweep(judged), setup);
        Path pdf = folder.resolve(REPORT);
        QualificationReport.write(run, new ReportInfo(details.operator(), ReportInfo.SOFTWARE, now,
                details.reportNumber()), "", List.of(), pdf);
        return pdf;
    }

    /** Asks for a folder, then writes the FRF, modes, properties and verdict there as CSV and JSON. */
    void exportResults() {
        if (shown.isEmpty()) {
            nothingYet();
            return;
        }
        JFileChooser chooser = new JFileChooser();
        chooser.setFileSelectionMode(JFileChooser.DIRECTORIES_ONLY);
        chooser.setDialogTitle("Folder for the CSV and JSON exports");
        if (chooser.showSaveDialog(parts.frame()) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path folder = chooser.getSelectedFile().toPath();
        QualificationResult result = shown.get();
        inBackground("exporting to " + folder.getFileName(), "Wrote " + String.join(", ", RunExport.FILES) + " to " + folder,
                "Could not export the results", () -> RunExport.write(result, folder));
    }

    /** What the FRF file and the report say of the rig and the plan: the workbench knows the plan of its own sweeps. */
    private static Map<String, String> metadata(QualificationResult result, Optional<ResultOrigin> from) {
        Map<String, String> lines = new LinkedHashMap<>();
        lines.put("specimen", result.specimen().id());
        lines.put("source", "Tautline workbench");
        from.ifPresent(o -> lines.put("rig", oneLine(o.rig())));
        from.ifPresent(o -> lines.put(o.how(), o.when()));
        result.sweep().ifPresentOrElse(sweep -> lines.put("sweep plan", oneLine(sweep.plan().describe())),
                () -> lines.put("sweep plan", "none: the FRF was imported from a file"));
        return lines;
    }

    /** A metadata value on one line, as the FRF file's header needs. */
    private static String oneLine(String text) {
        return text.replaceAll("\\s*[\\r\\n]+\\s*", "; ");
    }

    private static Optional<String> recordedSweep(QualificationResult result) {
        return result.sweep().map((SweepResult s) -> String.format(java.util.Locale.ROOT,
                "Sweep as run in the workbench: %d steps, rig time %.1f s, %s.", s.points().size(), s.rigTimeS(),
                s.completed() ? "completed" : "not completed"));
    }

    private void nothingYet() {
        JOptionPane.showMessageDialog(parts.frame(), "There is no current result to export: the results screen shows"
                + " none, or one marked \"not current\". Run a sweep to its end, or import an FRF, first.",
                "Tautline", JOptionPane.INFORMATION_MESSAGE);
    }

    /** A file job that throws IOException. */
    private interface FileJob {
        void run() throws IOException;
    }

    private void inBackground(String busy, String doneMessage, String failure, FileJob job) {
        parts.status().progress(-1, busy);
        new SwingWorker<Void, Void>() {
            @Override
            protected Void doInBackground() throws IOException {
                job.run();
                return null;
            }

            @Override
            protected void done() {
                parts.status().progress(0, "idle");
                try {
                    get();
                    parts.status().message(doneMessage);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    String why = PlainWords.of(e.getCause() == null ? e.toString() : e.getCause().getMessage());
                    parts.status().message(failure + ": " + why);
                    JOptionPane.showMessageDialog(parts.frame(), "<html><b>" + failure + "</b><br>" + why + "</html>",
                            "Tautline", JOptionPane.ERROR_MESSAGE);
                }
            }
        }.execute();
    }
}
