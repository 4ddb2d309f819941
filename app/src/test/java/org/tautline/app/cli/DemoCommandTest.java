package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
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
    }
}
