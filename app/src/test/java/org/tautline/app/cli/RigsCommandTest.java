package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code tautline rigs} lists the drivers with their options, and the serial ports. */
class RigsCommandTest {

    @Test
    void listsTheBuiltInDriversWithTheirOptions(@TempDir Path emptyPlugins) {
        CliRun r = CliRun.of("rigs", "--plugins", emptyPlugins.toString());
        assertEquals(0, r.exitCode(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("Rig drivers:", lines.get(0));
        assertTrue(lines.contains("  sim        the simulated rig: a time-domain model of a tensioned wire, shaker and"
                + " sensors (no hardware)"), r.out());
        assertTrue(lines.contains("    seed         default none           none for the demo wire as built (sensor noise"
                + " seed 1), or a whole number 0 or more that draws one specimen of the wire's invented lot, with its"
                + " own tension, mass per length, bending stiffness and damping, and seeds the sensor noise; the same"
                + " seed gives the same specimen and samples"), r.out());
        assertTrue(lines.contains("    tensionN     default none N         none for the specimen's own true tension"
                + " (146.5 N as built), or the true tension to give it, 120 to 180 N"), r.out());
        assertTrue(lines.contains("    journal      (required)             the journal file to play back"), r.out());
        assertTrue(lines.contains("Serial ports:"), r.out());
        assertEquals("Choose one with: tautline sweep --rig NAME [--option KEY=VALUE]... or --rig serial:PORT",
                lines.get(lines.size() - 1));
    }

    @Test
    void printsTheDriversAsJson(@TempDir Path emptyPlugins) throws Exception {
        CliRun r = CliRun.of("rigs", "--json", "--plugins", emptyPlugins.toString());
        assertEquals(0, r.exitCode(), r.err());
        JsonNode root = ResultJson.MAPPER.readTree(r.out());
        List<String> names = new ArrayList<>();
        root.get("drivers").forEach(d -> names.add(d.get("name").asText()));
        assertEquals(List.of("replay", "serial", "sim"), names);
        JsonNode sim = root.get("drivers").get(2);
        assertEquals("scenario", sim.get("options").get(0).get("name").asText());
        assertEquals("demo-wire", sim.get("options").get(0).get("default").asText());
        JsonNode journal = root.get("drivers").get(0).get("options").get(0);
        assertTrue(journal.get("default").isNull());
        assertTrue(journal.get("required").asBoolean());
        assertTrue(root.get("serialPorts").isArray());
    }
}
