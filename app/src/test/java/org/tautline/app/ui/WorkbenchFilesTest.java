package org.tautline.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tautline.app.ui.SwingDriver.find;
import static org.tautline.app.ui.SwingDriver.onEdt;
import static org.tautline.app.ui.SwingDriver.waitFor;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import javax.swing.AbstractButton;
import javax.swing.JDialog;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.app.ui.project.Project;
import org.tautline.app.ui.project.ProjectFile;
import org.tautline.app.ui.project.RecentFiles;
import org.tautline.app.ui.setup.SetupForm;

/** Opens projects in the window: the fields show the file, edits mark it unsaved, a bad file is named with its field. */
class WorkbenchFilesTest {
    @TempDir
    Path dir;

    @BeforeAll
    static void needsADisplay() {
        SwingDriver.needDisplay();
    }

    @Test
    void opensAProjectMarksEditsAndNamesTheFieldOfABadFile() throws Exception {
        SetupForm form = SetupForm.demo();
        form.set("nominalTensionN", "160");
        Path good = dir.resolve("wire.json");
        ProjectFile.write(new Project(form.values(), Map.of(), Optional.empty()), good);
        RecentFiles recent = new RecentFiles(dir.resolve("recent.txt"));
        Workbench w = onEdt(() -> {
            Workbench wb = Workbench.create(recent);
            wb.frame().setVisible(true);
            return wb;
        });
        JFrame frame = w.frame();
        try {
            SwingUtilities.invokeAndWait(() -> w.files().openFile(good));
            JTextField tension = find(frame, JTextField.class, "nominalTensionN");
            waitFor("the project to open", 10, () -> "160".equals(tension.getText()));
            assertEquals("wire.json - Tautline workbench", onEdt(frame::getTitle));
            assertFalse(onEdt(() -> w.files().isDirty()));
            assertEquals(List.of(good.toAbsolutePath()), recent.list());
            SwingUtilities.invokeAndWait(() -> tension.setText("161"));
            assertEquals("* wire.json - Tautline workbench", onEdt(frame::getTitle));
            assertEquals("161", onEdt(() -> w.files().project().setup().get("nominalTensionN")));

            Path bad = dir.resolve("bad.json");
            Files.writeString(bad, "{\"format\": \"tautline-project\", \"version\": 1, \"setup\": {\"lengthM\": 0.6}}",
                    StandardCharsets.UTF_8);
            SwingUtilities.invokeAndWait(() -> w.files().openFile(bad));
            JDialog error = SwingDriver.waitForDialog("Tautline");
            SwingDriver.shoot(error, "9-bad-project.png");
            AbstractButton ok = SwingDriver.findButtonByText(error, "OK");
            SwingUtilities.invokeAndWait(ok::doClick);
            String message = onEdt(find(frame, JLabel.class, "statusMessage")::getText);
            assertEquals("Could not open the project: project file " + bad + ": field 'setup.id' is missing; expected"
                    + " some text", message);
            assertEquals("161", onEdt(tension::getText), "a bad file leaves the open project as it was");
            assertTrue(onEdt(() -> w.files().isDirty()));
        } finally {
            SwingUtilities.invokeAndWait(frame::dispose);
        }
    }
}
