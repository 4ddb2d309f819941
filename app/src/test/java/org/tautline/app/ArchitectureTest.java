package org.tautline.app;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/** Dependencies point one way, app -> driver -> analysis; Swing only in app (design decision). */
class ArchitectureTest {
    private static final Path ROOT = Path.of(System.getProperty("user.dir")).getParent();

    private static List<String> offending(String module, List<String> forbidden) throws IOException {
        List<String> found = new ArrayList<>();
        for (String tree : List.of("src/main/java", "src/test/java")) {
            Path dir = ROOT.resolve(module).resolve(tree);
            if (!Files.isDirectory(dir)) {
                continue;
            }
            try (Stream<Path> files = Files.walk(dir)) {
                for (Path file : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                    List<String> lines = Files.readAllLines(file);
                    for (int i = 0; i < lines.size(); i++) {
                        String line = lines.get(i).trim();
                        for (String prefix : forbidden) {
                            if (line.startsWith("import " + prefix) || line.startsWith("import static " + prefix)) {
                                found.add(ROOT.relativize(file) + ":" + (i + 1) + ": " + line);
                            }
                        }
                    }
                }
            }
        }
        return found;
    }

    @Test
    void analysisImportsNothingOfDriverOrAppNorSwingNorSerial() throws IOException {
        assertEquals(List.of(), offending("analysis",
                List.of("org.tautline.driver", "org.tautline.app", "javax.swing", "java.awt", "com.fazecast")));
    }

    @Test
    void driverImportsNothingOfAppNorSwing() throws IOException {
        assertEquals(List.of(), offending("driver", List.of("org.tautline.app", "javax.swing", "java.awt")));
    }
}
