package org.tautline.app.ui.project;

import java.io.IOException;

/** A project file that cannot be read: the message names the file and the field. */
public final class ProjectFileException extends IOException {
    private static final long serialVersionUID = 1L;

    ProjectFileException(String message) {
        super(message);
    }

    ProjectFileException(String message, Throwable cause) {
        super(message, cause);
    }
}
