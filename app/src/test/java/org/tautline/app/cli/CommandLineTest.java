package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.junit.jupiter.api.Test;
import picocli.CommandLine;

class CommandLineTest {
    private static String[] run(String... args) {
        CommandLine cl = Main.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    @Test
    void benchHelpListsTheSimulatorBenchmark() {
        String[] r = run("bench", "--help");
        assertEquals("0", r[0]);
        assertTrue(r[1].contains("simulator"), r[1]);
    }

    @Test
    void benchSimulatorPrintsItsFiguresAsJson() throws Exception {
        String[] r = run("bench", "simulator", "--seconds", "2", "--json");
        assertEquals("0", r[0], r[2]);
        var node = ResultJson.MAPPER.readTree(r[1]);
        assertEquals("simulator", node.get("benchmark").asText());
        assertEquals(2.0, node.get("rigTimeS").asDouble(), 1e-3);
        assertTrue(node.get("realTimeMultiple").asDouble() > 0, r[1]);
        assertEquals(30, node.get("modes").asInt());
    }

    @Test
    void anUnknownCommandIsNamedInTheError() {
        String[] r = run("qualify-everything");
        assertEquals("2", r[0]);
        assertTrue(r[2].contains("Unmatched argument at index 0: 'qualify-everything'"), r[2]);
    }

    @Test
    void aBadNumberIsNamedInTheError() {
        String[] r = run("bench", "simulator", "--seconds", "lots");
        assertEquals("2", r[0]);
        assertTrue(r[2].contains("Invalid value for option '--seconds': 'lots' is not a double"), r[2]);
    }

    @Test
    void theTopLevelHelpListsTheCommands() {
        String[] r = run("--help");
        assertEquals("0", r[0]);
        assertTrue(r[1].contains("demo"), r[1]);
        assertTrue(r[1].contains("bench"), r[1]);
    }
}
