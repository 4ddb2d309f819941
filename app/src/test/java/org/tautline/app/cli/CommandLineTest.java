package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;


import org.junit.jupiter.api.Test;

class CommandLineTest {
    @Test
    void benchHelpListsTheSimulatorBenchmark() {
        CliRun r = CliRun.of("bench", "--help");
        assertEquals(0, r.exitCode());
        assertTrue(r.out().contains("simulator"), r.out());
    }

    @Test
    void benchSimulatorPrintsItsFiguresAsJson() throws Exception {
        CliRun r = CliRun.of("bench", "simulator", "--seconds", "2", "--json");
        assertEquals(0, r.exitCode(), r.err());
        var node = ResultJson.MAPPER.readTree(r.out());
        assertEquals("simulator", node.get("benchmark").asText());
        assertEquals(2.0, node.get("rigTimeS").asDouble(), 1e-3);
        assertTrue(node.get("realTimeMultiple").asDouble() > 0, r.out());
        assertEquals(30, node.get("modes").asInt());
    }

    @Test
    void anUnknownCommandIsNamedInTheError() {
        CliRun r = CliRun.of("qualify-everything");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("Unmatched argument at index 0: 'qualify-everything'"), r.err());
    }

    @Test
    void aBadNumberIsNamedInTheError() {
        CliRun r = CliRun.of("bench", "simulator", "--seconds", "lots");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("Invalid value for option '--seconds': 'lots' is not a double"), r.err());
    }

    @Test
    void theTopLevelHelpListsTheCommands() {
        CliRun r = CliRun.of("--help");
        assertEquals(0, r.exitCode());
        assertTrue(r.out().contains("demo"), r.out());
        assertTrue(r.out().contains("bench"), r.out());
    }
}
