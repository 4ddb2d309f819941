package org.tautline.app.ui.project;

import java.nio.file.Path;
import java.util.Map;

import org.tautline.app.ui.setup.SetupField;
import org.tautline.app.ui.setup.SetupForm;

/** Turning a project read from a file into a setup form, with messages that name the file and the field. */
public final class ProjectFiles {
    private ProjectFiles() {
    }

    /**
     * @param project a project as read
     * @param file where it was read from, for messages
     * @return the demo form with every field set from the project (safety limits that an older project lacks keep the
     *         demo's, shown on the setup screen)
     * @throws ProjectFileException when the project lacks a field the form has or has one it does not know
     */
    public static SetupForm formOf(Project project, Path file) throws ProjectFileException {
        SetupForm form = SetupForm.demo();
        for (SetupField f : form.fields()) {
            if (!project.setup().containsKey(f.key()) && !SetupForm.mayBeMissingFromOlderProjects(f.key())) {
                throw new ProjectFileException("project file " + file + ": field 'setup." + f.key() + "' is missing; expected "
                        + f.kind().expected() + (f.unit().isEmpty() ? "" : " of " + f.unit()));
            }
        }
        for (Map.Entry<String, String> e : project.setup().entrySet()) {
            try {
                form.set(e.getKey(), e.getValue());
            } catch (IllegalArgumentException ex) {
                throw new ProjectFileException("project file " + file + ": field 'setup." + e.getKey()
                        + "' is not a setup field; expected only the fields the workbench writes");
            }
        }
        return form;
    }
}
