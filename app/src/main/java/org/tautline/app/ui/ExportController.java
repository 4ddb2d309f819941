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
import javax.swing.filechooser.FileNameExtensionFilter;

import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.report.QualificationReport;
import org.tautline.app.report.ReportInfo;
import org.tautline.app.report.RunDirectory;
import org.tautline.app.report.RunExport;
import org.tautline.driver.sweep.SweepResult;

/**
 * Writes the PDF report and the CSV and JSON exports of the result on show; the writing runs off the event
 * thread. Every method is called on the event thread.
 */
final class ExportController {
    private final WorkbenchParts parts;
    private Optional<QualificationResult> shown = Optional.empty();

    ExportController(WorkbenchParts parts) {
        this.parts = parts;
    }

    /** @param result the result now on the results screen, current */
    void resultShown(QualificationResult result) {
        shown = Optional.of(result);
    }

    /** The result on show is no longer current (a new run started, or one ended without a result): nothing to export. */
    void resultWithdrawn() {
        shown = Optional.empty();
    }

    /** Asks for the operator's name and a PDF file, then writes the qualification report there. */
    void exportReport() {
        if (shown.isEmpty()) {
            nothingYet();
            return;
        }
        JFileChooser chooser = new JFileChooser();
        chooser.setFileFilter(new FileNameExtensionFilter("PDF report", "pdf"));
        chooser.setSelectedFile(new java.io.File(shown.get().specimen().id() + "-report.pdf"));
        if (chooser.showSaveDialog(parts.frame()) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        String operator = JOptionPane.showInputDialog(parts.frame(), "Operator's name for the report (may be left empty):",
                System.getProperty("user.name", ""));
        if (operator == null) {
            return;
        }
        Path file = chooser.getSelectedFile().toPath();
        QualificationResult result = shown.get();
        Path folder = file.toAbsolutePath().getParent();
        RunDirectory run = new RunDirectory(folder, result, metadata(result), recordedSweep(result));
        ReportInfo info = new ReportInfo(operator.strip(), ReportInfo.SOFTWARE, Instant.now());
        inBackground("writing the report to " + file.getFileName(), "Wrote the report " + file, "Could not write the report",
                () -> QualificationReport.write(run, info, "", List.of(), file));
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

    /** What the report says of the rig and the plan: the workbench knows the plan of a sweep it ran itself. */
    private static Map<String, String> metadata(QualificationResult result) {
        Map<String, String> lines = new LinkedHashMap<>();
        lines.put("source", "Tautline workbench");
        result.sweep().ifPresentOrElse(sweep -> lines.put("sweep plan", sweep.plan().describe()),
                () -> lines.put("sweep plan", "none: the FRF was imported from a file"));
        return lines;
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
