package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.app.trace.RunSetup;
import org.tautline.app.trace.SetupFile;
import picocli.CommandLine;

/** {@code tautline demo --json --out DIR} end to end, as a script would call it. */
class DemoCommandTest {

    @Test
    void printsTheDocumentedJsonAndWritesTheRun(@TempDir Path dir) throws Exception {
        CommandLine cl = Main.commandLine();
        StringWriter out = new StringWriter();
        cl.setOut(new PrintWriter(out));
        Path runDir = dir.resolve("run");
        int code = cl.execute("demo", "--json", "--no-progress", "--out", runDir.toString());
        assertEquals(0, code);

        JsonNode root = ResultJson.MAPPER.readTree(out.toString());
        for (String key : List.of("specimen", "truth", "modes", "properties", "rigTimeS", "verdict")) {
            assertTrue(root.has(key), "top-level key " + key + " in " + root.fieldNames());
        }
        JsonNode truthSpecimen = root.get("truth").get("specimen");
        for (String key : List.of("lengthM", "tensionN", "linearDensityKgPerM", "forcingPositionM", "sensorPositionM")) {
            assertTrue(truthSpecimen.get(key).isNumber(), "truth.specimen." + key);
        }
        assertEquals(60, root.get("truth").get("modes").size(), "30 harmonics in two polarisations");
        for (JsonNode mode : root.get("modes")) {
            assertTrue(mode.get("frequencyHz").isNumber());
            assertTrue(mode.get("dampingRatio").isNumber());
            assertTrue(mode.get("modalConstant").get("re").isNumber());
            assertTrue(mode.get("modalConstant").get("im").isNumber());
        }
        assertTrue(root.get("modes").size() >= 6, "at least the first six modes");
        assertTrue(root.get("properties").get("tensionN").isNumber());
        assertTrue(root.get("rigTimeS").asDouble() > 100, "rig time in seconds: " + root.get("rigTimeS"));
        assertEquals("PASS", root.get("verdict").get("outcome").asText());

        List<String> csv = Files.readAllLines(runDir.resolve("frf.csv"));
        assertEquals("# quantity: receptance", csv.get(0));
        assertEquals("# units: m/N", csv.get(1));
        assertTrue(csv.contains("frequency_hz,real,imag,quality,variance"), csv.subList(0, 6).toString());
        assertEquals(root.get("steps").asInt(), csv.size() - csv.indexOf("frequency_hz,real,imag,quality,variance") - 1,
                "one CSV line per sweep step");
        JsonNode truth = ResultJson.MAPPER.readTree(runDir.resolve("truth.json").toFile());
        assertEquals(root.get("truth"), truth);
        JsonNode result = ResultJson.MAPPER.readTree(runDir.resolve("result.json").toFile());
        assertEquals(root.get("modes"), result.get("modes"));

        // The same analysis from the files the demo wrote gives the same modes, properties and verdict.
        CliRun fit = CliRun.of("fit", "--frf", runDir.resolve("frf.csv").toString(), "--specimen",
                runDir.resolve("specimen.json").toString(), "--spec", runDir.resolve("spec.json").toString(), "--json");
        assertEquals(0, fit.exitCode(), fit.err());
        JsonNode fitted = ResultJson.MAPPER.readTree(fit.out());
        assertEquals(root.get("modes").size(), fitted.get("modes").size());
        for (int i = 0; i < fitted.get("modes").size(); i++) {
            assertEquals(root.get("modes").get(i).get("frequencyHz").asDouble(),
                    fitted.get("modes").get(i).get("frequencyHz").asDouble(), 0.0, "mode " + i);
            JsonNode mode = fitted.get("modes").get(i);
            assertTrue(mode.get("frequencyStdHz").isNumber());
            // Every mode whose frequency is determined to 1 % is numbered; a pole the fit cannot place (standard error
            // of its frequency above 1 %) may stay unnumbered, and is shown as such.
            if (mode.get("frequencyStdHz").asDouble() < 0.01 * mode.get("frequencyHz").asDouble()) {
                assertTrue(mode.get("harmonic").asInt() > 0, "mode " + i + " is numbered: " + mode);
            }
        }
        assertEquals(root.get("properties").get("tensionN"), fitted.get("properties").get("tensionN"));
        // The level check needs the rig; fit reads its figure from the run's result.json beside frf.csv, so the
        // verdict from the files is the demo's own.
        assertEquals(root.get("verdict").get("outcome"), fitted.get("verdict").get("outcome"));
        assertEquals(ExitCodes.of(java.util.Optional.empty()) + ("PASS".equals(root.get("verdict").get("outcome")
                .asText()) ? 0 : 11), fit.exitCode(), "the exit status is the verdict's");
        assertTrue(fit.err().contains("the level check (it needs the rig) was read from"), fit.err());

        // A specification the wire fails: the exit status says FAIL.
        Path failing = dir.resolve("failing-spec.json");
        Files.writeString(failing, "{\"name\": \"a tighter tie wire, invented\", \"limits\": [{\"name\": \"tension\","
                + " \"figure\": \"tensionN\", \"unit\": \"N\", \"lower\": 100, \"upper\": 120}]}");
        CliRun fails = CliRun.of("fit", "--frf", runDir.resolve("frf.csv").toString(), "--specimen",
                runDir.resolve("specimen.json").toString(), "--spec", failing.toString());
        assertEquals(ExitCodes.VERDICT_FAIL, fails.exitCode(), fails.out() + fails.err());

        // Without the run's result.json the level-check limit says plainly that it needs the rig.
        Path alone = dir.resolve("alone");
        Files.createDirectories(alone);
        Files.copy(runDir.resolve("frf.csv"), alone.resolve("frf.csv"));
        CliRun bare = CliRun.of("fit", "--frf", alone.resolve("frf.csv").toString(), "--specimen",
                runDir.resolve("specimen.json").toString(), "--spec", runDir.resolve("spec.json").toString(), "--json");
        assertEquals(ExitCodes.VERDICT_NOT_DETERMINABLE, bare.exitCode(), bare.err());
        JsonNode bareJson = ResultJson.MAPPER.readTree(bare.out());
        for (JsonNode limit : bareJson.get("verdict").get("limits")) {
            if ("linearityShift1".equals(limit.get("figure").asText())) {
                assertEquals("NOT_DETERMINABLE", limit.get("outcome").asText());
                assertTrue(limit.get("reason").asText().contains("the level check needs the rig"), limit.toString());
            }
        }
        assertTrue(fitted.get("residuals").get("upper").has("re"));
        assertTrue(fitted.get("quality").get("normalisedResidual").asDouble() < 0.1);

        // The run folder records when the demo ran and on which rig, for the report's traceability.
        RunSetup setup = SetupFile.read(runDir);
        assertTrue(setup.testedAt().isPresent(), "the test date is recorded");
        assertTrue(setup.rig().orElseThrow().name().contains("simulated rig (invented)"), setup.toString());
        assertTrue(setup.temperatureC().isEmpty(), "a simulation has no air temperature to record");
    }

    @Test
    void aFolderThatAlreadyHoldsFilesIsRefusedBeforeAnythingIsExcited(@TempDir Path dir) throws Exception {
        Path earlier = dir.resolve("earlier-run");
        Files.createDirectories(earlier);
        Files.writeString(earlier.resolve("frf.csv"), "# an earlier run's data\n");
        CliRun r = CliRun.of("demo", "--no-progress", "--out", earlier.toString());
        assertEquals(1, r.exitCode(), r.err());
        assertTrue(r.err().contains("--out " + earlier + " already holds frf.csv"), r.err());
        assertEquals(1, Files.list(earlier).count(), "refused before the demo ran: nothing was written beside it");
        assertEquals("# an earlier run's data\n", Files.readString(earlier.resolve("frf.csv")), "nothing overwritten");
    }

    @Test
    void fitNeedsASpecimenToJudgeAgainstASpecification(@TempDir Path dir) throws Exception {
        Path frf = dir.resolve("f.csv");
        Files.writeString(frf, "# quantity: receptance\nfrequency_hz,real,imag\n1,1,0\n");
        CliRun r = CliRun.of("fit", "--frf", frf.toString(), "--spec", dir.resolve("spec.json").toString());
        assertEquals(1, r.exitCode());
        assertEquals("tautline: --spec needs --specimen: the limits judge the specimen's properties", r.err().strip());
        CliRun band = CliRun.of("fit", "--frf", frf.toString(), "--band", "500-100");
        assertEquals("tautline: --band '500-100': expected F1:F2 in Hz with 0 <= F1 < F2, for example 150:1500",
                band.err().strip());
    }
}
