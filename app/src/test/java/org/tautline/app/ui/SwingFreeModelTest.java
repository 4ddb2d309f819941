package org.tautline.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/** The workbench's model and presenter packages stay free of Swing and AWT, so they test without a display. */
class SwingFreeModelTest {
    @Test
    void setupProjectAndRunPackagesImportNoSwingNorAwt() throws IOException {
        List<String> offending = new ArrayList<>();
        int files = 0;
        for (String pkg : List.of("setup", "project", "run", "lot")) {
            Path dir = Path.of("src", "main", "java", "org", "tautline", "app", "ui", pkg);
            try (Stream<Path> sources = Files.list(dir)) {
                for (Path source : sources.filter(p -> p.toString().endsWith(".java")).toList()) {
                    files++;
                    for (String line : Files.readAllLines(source)) {
                        if (line.startsWith("import javax.swing") || line.startsWith("import java.awt")) {
                            offending.add(source.getFileName() + ": " + line);
                        }
                    }
                }
            }
        }
        assertTrue(files >= 10, "found only " + files + " sources");
        assertEquals(List.of(), offending);
    }
}
