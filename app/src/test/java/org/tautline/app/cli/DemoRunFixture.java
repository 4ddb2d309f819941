package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;

/**
 * One run of {@code demo --out RUN --lot LOT-7 --register REGISTER}, made once per test JVM and shared by the report,
 * export and lot tests (the demo takes tens of seconds). Tests read its files; a test that changes the register or a
 * run folder works on a copy. The folder is removed when the JVM ends.
 *
 * @param runDir the run folder the demo wrote
 * @param register the register the demo appended the run to, in lot {@code LOT-7}
 * @param recorded the demo's result.json
 */
record DemoRunFixture(Path runDir, Path register, JsonNode recorded) {
    private static DemoRunFixture shared;

    /** @return the shared run, made on first use */
    static synchronized DemoRunFixture get() throws IOException {
        if (shared == null) {
            Path dir = Files.createTempDirectory("tautline-demo-run");
            Runtime.getRuntime().addShutdownHook(new Thread(() -> delete(dir), "delete the shared demo run"));
            Path runDir = dir.resolve("run");
            Path register = dir.resolve("lots.sqlite");
            CliRun demo = CliRun.of("demo", "--no-progress", "--out", runDir.toString(), "--lot", "LOT-7", "--register",
                    register.toString(), "--operator", "A. Tester");
            assertEquals(0, demo.exitCode(), demo.err());
            shared = new DemoRunFixture(runDir, register, ResultJson.MAPPER.readTree(runDir.resolve("result.json").toFile()));
        }
        return shared;
    }

    /**
     * Copies the run's input files (frf.csv, specimen.json, spec.json, result.json) into a new folder.
     *
     * @param folder the new folder, which must not exist
     * @return the folder
     */
    Path copyInputs(Path folder) throws IOException {
        Files.createDirectories(folder);
        for (String name : new String[] {"frf.csv", "specimen.json", "spec.json", "result.json"}) {
            Files.copy(runDir.resolve(name), folder.resolve(name));
        }
        return folder;
    }

    private static void delete(Path dir) {
        try (Stream<Path> all = Files.walk(dir)) {
            for (Path p : all.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
