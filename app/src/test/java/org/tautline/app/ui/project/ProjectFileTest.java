package org.tautline.app.ui.project;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.app.ui.setup.SetupForm;

class ProjectFileTest {
    @TempDir
    Path dir;

    private static Project sample() {
        MeasuredFrf frf = new MeasuredFrf(FrfQuantity.RECEPTANCE, List.of(200.0, 201.0, 202.5),
                List.of(1e-4, -2.5e-3, 3.0e-5), List.of(-1e-5, -4e-3, -7.25e-6));
        return new Project(SetupForm.demo().values(), Map.of("verdict", "PASS", "f1Hz", "228.24"), Optional.of(frf));
    }

    @Test
    void loadsChangesSavesAndReloadsTheProjectIdentically() throws IOException {
        Path file = dir.resolve("wire.json");
        ProjectFile.write(sample(), file);
        Project loaded = ProjectFile.read(file);
        assertEquals(sample(), loaded);
        SetupForm form = ProjectFiles.formOf(loaded, file);
        form.set("nominalTensionN", "152.5");
        form.set("stepCount", "400");
        Project changed = loaded.withSetup(form.values());
        ProjectFile.write(changed, file);
        byte[] firstSave = Files.readAllBytes(file);
        Project reloaded = ProjectFile.read(file);
        assertEquals(changed, reloaded);
        assertEquals("152.5", ProjectFiles.formOf(reloaded, file).value("nominalTensionN"));
        ProjectFile.write(reloaded, file);
        assertArrayEquals(firstSave, Files.readAllBytes(file));
        assertEquals(List.of(file), Files.list(dir).toList(), "the atomic write left no temporary file");
    }

    @Test
    void keepsTextThatIsNotANumberSoNothingTypedIsLost() throws IOException {
        SetupForm form = SetupForm.demo();
        form.set("lengthM", "0,6");
        Path file = dir.resolve("typo.json");
        ProjectFile.write(new Project(form.values(), Map.of(), Optional.empty()), file);
        assertEquals("0,6", ProjectFiles.formOf(ProjectFile.read(file), file).value("lengthM"));
    }

    @Test
    void namesTheFileAndTheFieldOfABadProject() throws IOException {
        Path file = dir.resolve("bad.json");
        Files.writeString(file, "{\"format\": \"tautline-project\", \"version\": 1, \"setup\": {\"lengthM\": [1]}}",
                StandardCharsets.UTF_8);
        IOException e = assertThrows(ProjectFileException.class, () -> ProjectFile.read(file));
        assertEquals("project file " + file + ": field 'setup.lengthM' is missing or wrong; expected a number or text,"
                + " got ARRAY", e.getMessage());

        Files.writeString(file, "{\"format\": \"tautline-project\", \"version\": 1, \"setup\": {\"lengthM\": 0.6}}",
                StandardCharsets.UTF_8);
        Project partial = ProjectFile.read(file);
        e = assertThrows(ProjectFileException.class, () -> ProjectFiles.formOf(partial, file));
        assertEquals("project file " + file + ": field 'setup.id' is missing; expected some text", e.getMessage());

        Files.writeString(file, "{\"format\": \"tautline-project\",\n \"version\": 1,,}", StandardCharsets.UTF_8);
        e = assertThrows(ProjectFileException.class, () -> ProjectFile.read(file));
        assertEquals(true, e.getMessage().startsWith("project file " + file + ": not valid JSON at line 2, column 15"),
                e.getMessage());

        Files.writeString(file, "{\"format\": \"something else\", \"version\": 1}", StandardCharsets.UTF_8);
        e = assertThrows(ProjectFileException.class, () -> ProjectFile.read(file));
        assertEquals("project file " + file + ": field 'format' is missing or wrong; expected \"tautline-project\"",
                e.getMessage());
    }

    @Test
    void refusesAnFrfWithMissingValues() throws IOException {
        Path file = dir.resolve("frf.json");
        Files.writeString(file, "{\"format\": \"tautline-project\", \"version\": 1, \"setup\": {}, \"measuredFrf\":"
                + " {\"quantity\": \"RECEPTANCE\", \"frequencyHz\": [1, 2], \"real\": [1, \"x\"], \"imag\": [0, 0]}}",
                StandardCharsets.UTF_8);
        IOException e = assertThrows(ProjectFileException.class, () -> ProjectFile.read(file));
        assertEquals("project file " + file + ": field 'measuredFrf.real[1]' is missing or wrong; expected a number,"
                + " got \"x\"", e.getMessage());
    }

    @Test
    void keepsTheRecentFilesNewestFirstWithoutRepeats() throws IOException {
        RecentFiles recent = new RecentFiles(dir.resolve("config").resolve("recent.txt"));
        assertEquals(List.of(), recent.list());
        for (int i = 0; i < RecentFiles.LIMIT + 2; i++) {
            recent.add(dir.resolve("p" + i + ".json"));
        }
        recent.add(dir.resolve("p3.json"));
        List<Path> list = recent.list();
        assertEquals(RecentFiles.LIMIT, list.size());
        assertEquals(dir.resolve("p3.json").toAbsolutePath(), list.get(0));
        assertEquals(dir.resolve("p9.json").toAbsolutePath(), list.get(1));
        assertEquals(1, list.stream().filter(p -> p.endsWith("p3.json")).count());
    }
}
