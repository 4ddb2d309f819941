package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class VirtualRigCommandTest {

    @Test
    void anUnknownFaultSaysWhichAreKnown() {
        CliRun r = CliRun.of("virtual-rig", "--fault", "meltdown@3");
        assertEquals(1, r.exitCode());
        assertEquals("tautline: --fault 'meltdown@3': expected KIND@SECONDS with KIND one of [drop-bytes, corrupt-block,"
                + " lose-block, short-stall, stall, reset, amplifier-fault, disappear]", r.err().strip());
    }

    @Test
    void aFaultTimeMustBeANumber() {
        CliRun r = CliRun.of("virtual-rig", "--fault", "stall@soon");
        assertEquals(1, r.exitCode());
        assertEquals("tautline: --fault 'stall@soon': 'soon' is not a number of seconds", r.err().strip());
    }

    @Test
    void aLogFileThatCannotBeWrittenIsNamedInTheError() {
        CliRun r = CliRun.of("virtual-rig", "--log", "/nonexistent-dir/rig.log");
        assertEquals(1, r.exitCode());
        assertTrue(r.err().startsWith("tautline: cannot write the virtual rig log /nonexistent-dir/rig.log: "), r.err());
        assertTrue(r.err().strip().endsWith("; expected a writable file path"), r.err());
    }

    @Test
    void theHelpDescribesTheLogFormatAndPacing() {
        CliRun r = CliRun.of("virtual-rig", "--help");
        String text = r.out().replaceAll("\\s+", " ");
        assertTrue(text.contains("'1764812345123456 recv DRIVE:OUT OFF'"), r.out());
        assertTrue(r.out().contains("--pace"), r.out());
    }

    @Test
    void benchHelpListsEveryBenchmark() {
        CliRun r = CliRun.of("bench", "--help");
        for (String name : new String[] {"simulator", "frf", "modal", "serial"}) {
            assertTrue(r.out().contains(name), name + " in " + r.out());
        }
    }
}
