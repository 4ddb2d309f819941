package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.app.report.RunDirectory;

/**
 * {@code report} and {@code export} refuse a run folder whose files cannot be read, naming the file (and the line and
 * column, or byte offset), before anything is analysed or written; the optional files may be left out.
 */
class RunFolderCheckTest {
    static DemoRunFixture demo;

    @BeforeAll
    static void runTheDemo() throws Exception {
        demo = DemoRunFixture.get();
    }

    /** A change that spoils one file of a copied run folder, and the message (RUN for the folder) that refuses it. */
    private record Spoil(String name, String message, FileChange change) {
    }

    private interface FileChange {
        void apply(Path file) throws IOException;
    }

    private static FileChange write(String text) {
        return file -> Files.writeString(file, text);
    }

    private static FileChange folder() {
        return file -> {
            Files.delete(file);
            Files.createDirectory(file);
        };
    }

    private static List<Spoil> spoils() {
        List<Spoil> s = new ArrayList<>();
        String frf = "a file holding the measured FRF (CSV)";
        s.add(new Spoil("frf.csv", "run directory RUN: frf.csv is empty; expected " + frf, write("")));
        s.add(new Spoil("frf.csv", "run directory RUN: frf.csv is a folder; expected " + frf, folder()));
        s.add(new Spoil("specimen.json", "run directory RUN has no specimen.json; expected frf.csv and specimen.json (and"
                + " spec.json to judge the limits)", Files::delete));
        s.add(new Spoil("specimen.json", "RUN/specimen.json, line 1, column 1: a JSON array; expected a JSON object"
                + " describing the specimen", write("[{\"id\": \"W-1\"}]")));
        s.add(new Spoil("spec.json", "run directory RUN: spec.json is a folder; expected a file holding the specification"
                + " (JSON)", folder()));
        s.add(new Spoil("spec.json", "run directory RUN: spec.json is empty; expected a file holding the specification"
                + " (JSON)", write("")));
        s.add(new Spoil("spec.json", "RUN/spec.json, line 2, column 1: not valid JSON: Unexpected end-of-input: expected"
                + " close marker for Array", write("{\"name\": \"cut short\", \"limits\": [\n")));
        s.add(new Spoil("spec.json", "RUN/spec.json: holds only white space; expected a JSON object describing the"
                + " specification", write("\n\n")));
        s.add(new Spoil("result.json", "run directory RUN: result.json is a folder; expected a file holding the recorded"
                + " run (JSON)", folder()));
        s.add(new Spoil("result.json", "run directory RUN: result.json is empty; expected a file holding the recorded run"
                + " (JSON)", write("")));
        s.add(new Spoil("result.json", "RUN/result.json, line 1, column 1: a JSON array; expected a JSON object describing"
                + " the recorded run", write("[]")));
        s.add(new Spoil("result.json", "RUN/result.json, line 1, byte offset 17: 0xE9 is not UTF-8; expected UTF-8 text",
                file -> Files.write(file, "{\"operator\": \"Ren\u00e9\"}".getBytes(StandardCharsets.ISO_8859_1))));
        s.add(new Spoil("result.json", "RUN/result.json, line 1, column 37: field \"steps\" appears twice; expected each"
                + " field once", write("{\"steps\": 10, \"rigTimeS\": 2, \"steps\": 11, \"sweepCompleted\": true}")));
        s.add(new Spoil("result.json", "RUN/result.json, linearity: field \"linear\" is missing; expected true or false",
                write("{\"linearity\": {\"shifts\": []}}")));
        s.add(new Spoil("result.json", "RUN/result.json: field \"rigTimeS\" is missing; expected a number",
                write("{\"steps\": 10, \"sweepCompleted\": true}")));
        return s;
    }

    @Test
    void reportAndExportRefuseAFolderWhoseFilesCannotBeRead(@TempDir Path out) throws Exception {
        int i = 0;
        for (Spoil spoil : spoils()) {
            Path run = demo.copyInputs(out.resolve("run-" + i++));
            spoil.change().apply(run.resolve(spoil.name()));
            String expected = "tautline: " + spoil.message().replace("RUN", run.toString()) + "\n";
            Path pdf = out.resolve("report-" + i + ".pdf");
            CliRun report = CliRun.of("report", run.toString(), "--pdf", pdf.toString());
            assertEquals(1, report.exitCode(), spoil.message());
            assertEquals(expected, report.err().replace("\r", ""), "report: the message is the only thing printed");
            assertFalse(Files.exists(pdf), spoil.message() + ": no report");
            Path exports = out.resolve("export-" + i);
            CliRun export = CliRun.of("export", run.toString(), "--out", exports.toString());
            assertEquals(1, export.exitCode(), spoil.message());
            assertEquals(expected, export.err().replace("\r", ""), "export");
            assertFalse(Files.exists(exports), spoil.message() + ": nothing exported");
        }
    }

    @Test
    void aFolderWithoutSpecificationOrRecordedRunIsReadWithoutThem(@TempDir Path out) throws Exception {
        Path run = demo.copyInputs(out.resolve("by-hand"));
        Files.delete(run.resolve("spec.json"));
        Files.delete(run.resolve("result.json"));
        RunDirectory.Inputs inputs = RunDirectory.readInputs(run);
        assertTrue(inputs.specification().isEmpty(), "no limits without spec.json");
        assertTrue(inputs.levelCheck().isEmpty() && inputs.recordedSweep().isEmpty(), "no level check without result.json");
        RunDirectory.Inputs whole = RunDirectory.readInputs(demo.runDir());
        assertTrue(whole.levelCheck().isPresent() && whole.recordedSweep().isPresent() && whole.specification().isPresent());
        assertEquals(whole.frfSha256(), inputs.frfSha256(), "the fingerprint is of frf.csv alone");
    }
}
