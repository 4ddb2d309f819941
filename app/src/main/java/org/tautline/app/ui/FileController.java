package org.tautline.app.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutionException;

import javax.swing.JFileChooser;
import javax.swing.JMenu;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.SwingWorker;
import javax.swing.filechooser.FileNameExtensionFilter;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfCsvReader;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.ui.project.MeasuredFrf;
import org.tautline.app.ui.project.Project;
import org.tautline.app.ui.project.ProjectFile;
import org.tautline.app.ui.project.ProjectFiles;
import org.tautline.app.ui.project.RecentFiles;
import org.tautline.app.ui.setup.SetupForm;

/**
 * New, open, save and import, with the unsaved-changes prompt and the recent-files list; reading and
 * writing run off the event thread. Every method is called on the event thread.
 */
final class FileController {
    private final WorkbenchParts parts;
    private final RunController runs;
    private final RecentFiles recent;
    private final JMenu recentMenu = new JMenu("Open recent");
    private Path current;
    private boolean dirty;
    private Optional<QualificationResult> lastResult = Optional.empty();
    private Optional<MeasuredFrf> loadedFrf = Optional.empty();

    FileController(WorkbenchParts parts, RunController runs, RecentFiles recent) {
        this.parts = parts;
        this.runs = runs;
        this.recent = recent;
        recentMenu.setMnemonic('R');
        refreshRecent();
        updateTitle();
    }

    JMenu recentMenu() {
        return recentMenu;
    }

    void edited() {
        dirty = true;
        updateTitle();
    }

    void resultShown(QualificationResult result) {
        lastResult = Optional.of(result);
        loadedFrf = Optional.empty();
        edited();
    }

    boolean isDirty() {
        return dirty;
    }

    Optional<Path> currentFile() {
        return Optional.ofNullable(current);
    }

    /** A project cannot be replaced while a sweep runs or is paused: it is analysed with the setup it started with. */
    private boolean setupLocked() {
        if (parts.setup().isLocked()) {
            parts.status().message("A sweep is running or paused: cancel it, or let it finish, before opening or starting"
                    + " another project.");
            return true;
        }
        return false;
    }

    void newProject() {
        if (setupLocked() || !confirmDiscard()) {
            return;
        }
        parts.setup().show(SetupForm.demo());
        parts.noResult("A new project was started.");
        current = null;
        lastResult = Optional.empty();
        loadedFrf = Optional.empty();
        dirty = false;
        updateTitle();
    }

    void open() {
        if (setupLocked() || !confirmDiscard()) {
            return;
        }
        JFileChooser chooser = chooser("Tautline project", "json");
        if (chooser.showOpenDialog(parts.frame()) == JFileChooser.APPROVE_OPTION) {
            openFile(chooser.getSelectedFile().toPath());
        }
    }

    /** Reads a project off the event thread and shows it; a bad file leaves the current project as it was. */
    void openFile(Path file) {
        if (setupLocked()) {
            return;
        }
        parts.status().progress(-1, "reading " + file.getFileName());
        new SwingWorker<Project, Void>() {
            @Override
            protected Project doInBackground() throws IOException {
                return ProjectFile.read(file);
            }

            @Override
            protected void done() {
                parts.status().progress(0, "idle");
                try {
                    Project project = get();
                    SetupForm form = ProjectFiles.formOf(project, file);
                    parts.setup().show(form);
                    parts.noResult("The project " + file.getFileName() + " was opened.");
                    current = file;
                    lastResult = Optional.empty();
                    loadedFrf = project.measuredFrf();
                    dirty = false;
                    updateTitle();
                    remember(file);
                    parts.status().message("Opened " + file);
                    if (loadedFrf.isPresent() && parts.setup().validate()) {
                        runs.analyse(loadedFrf.get().toFrf(), form, "the project " + file.getFileName());
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    error("Could not open the project", e.getCause());
                } catch (IOException e) {
                    error("Could not open the project", e);
                }
            }
        }.execute();
    }

    boolean save() {
        if (current == null) {
            return saveAs();
        }
        write(current);
        return true;
    }

    boolean saveAs() {
        JFileChooser chooser = chooser("Tautline project", "json");
        if (chooser.showSaveDialog(parts.frame()) != JFileChooser.APPROVE_OPTION) {
            return false;
        }
        Path file = chooser.getSelectedFile().toPath();
        if (!file.getFileName().toString().contains(".")) {
            file = file.resolveSibling(file.getFileName() + ".json");
        }
        write(file);
        return true;
    }

    /** The project as it stands: the setup as typed, and the last result or the FRF it was opened with. */
    Project project() {
        Map<String, String> setup = parts.setup().form().values();
        if (lastResult.isPresent()) {
            return Project.of(setup, lastResult.get());
        }
        return new Project(setup, Map.of(), loadedFrf);
    }

    private void write(Path file) {
        Project project = project();
        parts.status().progress(-1, "saving " + file.getFileName());
        new SwingWorker<Void, Void>() {
            @Override
            protected Void doInBackground() throws IOException {
                ProjectFile.write(project, file);
                return null;
            }

            @Override
            protected void done() {
                parts.status().progress(0, "idle");
                try {
                    get();
                    current = file;
                    dirty = false;
                    updateTitle();
                    remember(file);
                    parts.status().message("Saved " + file);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    error("Could not save the project; the file on disk was left as it was", e.getCause());
                }
            }
        }.execute();
    }

    void importFrf() {
        JFileChooser chooser = chooser("FRF as CSV", "csv");
        if (chooser.showOpenDialog(parts.frame()) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path file = chooser.getSelectedFile().toPath();
        readThenAnalyse(file, () -> FrfCsvReader.read(file).frf());
    }

    void importRecording() {
        JFileChooser chooser = chooser("Recording (WAV or time-series CSV)", "wav", "csv");
        if (chooser.showOpenDialog(parts.frame()) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path file = chooser.getSelectedFile().toPath();
        SetupForm form = parts.setup().form();
        if (!parts.setup().validate()) {
            parts.showSetup();
            parts.status().message("Fix the setup first: the import needs the sensor sensitivities.");
            return;
        }
        readThenAnalyse(file, () -> RecordingImport.frfOf(file, form.recordingCalibrations(), form.recordingQuantity()));
    }

    private interface FrfSource {
        Frf read() throws IOException;
    }

    private void readThenAnalyse(Path file, FrfSource source) {
        if (!parts.setup().validate()) {
            parts.showSetup();
            parts.status().message("Fix the setup first: the fit needs the specimen and the limits.");
            return;
        }
        SetupForm form = parts.setup().form();
        parts.status().progress(-1, "reading " + file.getFileName());
        new SwingWorker<Frf, Void>() {
            @Override
            protected Frf doInBackground() throws IOException {
                return source.read();
            }

            @Override
            protected void done() {
                parts.status().progress(0, "idle");
                try {
                    runs.analyse(get(), form, file.getFileName().toString());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    error("Could not read " + file, e.getCause());
                }
            }
        }.execute();
    }

    /** @return true when there is nothing unsaved, or the user chose to save it or to discard it */
    boolean confirmDiscard() {
        if (!dirty) {
            return true;
        }
        String[] choices = {"Save", "Discard changes", "Cancel"};
        int answer = JOptionPane.showOptionDialog(parts.frame(), "The project has changes that are not saved.",
                "Unsaved changes", JOptionPane.YES_NO_CANCEL_OPTION, JOptionPane.QUESTION_MESSAGE, null, choices, choices[0]);
        if (answer == 0) {
            return save();
        }
        return answer == 1;
    }

    private void remember(Path file) {
        try {
            recent.add(file);
        } catch (IOException e) {
            parts.status().message("Could not update the recent-files list: " + e.getMessage());
        }
        refreshRecent();
    }

    private void refreshRecent() {
        recentMenu.removeAll();
        for (Path p : recent.list()) {
            JMenuItem item = new JMenuItem(p.toString());
            item.addActionListener(e -> {
                if (confirmDiscard()) {
                    openFile(p);
                }
            });
            recentMenu.add(item);
        }
        recentMenu.setEnabled(recentMenu.getItemCount() > 0);
    }

    private void updateTitle() {
        String name = current == null ? "untitled project" : current.getFileName().toString();
        parts.frame().setTitle((dirty ? "* " : "") + name + " - Tautline workbench");
    }

    private void error(String what, Throwable cause) {
        // A file's message names the file's own fields as they are written in it: it is passed on as it stands.
        String why = String.valueOf(cause.getMessage());
        parts.status().message(what + ": " + why);
        JOptionPane.showMessageDialog(parts.frame(), "<html><b>" + what + "</b><br>" + escape(why) + "</html>",
                "Tautline", JOptionPane.ERROR_MESSAGE);
    }

    private static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    private static JFileChooser chooser(String description, String... extensions) {
        JFileChooser chooser = new JFileChooser();
        chooser.setFileFilter(new FileNameExtensionFilter(description, extensions));
        return chooser;
    }
}
