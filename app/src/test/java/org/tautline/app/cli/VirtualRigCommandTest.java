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
                + " lose-block, stall, reset, amplifier-fault, disappear]", r.err().strip());
    }

    @Test
    void aFaultTimeMustBeANumber() {
        CliRun r = CliRun.of("virtual-rig", "--fault", "stall@soon");
        assertEquals(1, r.exitCode());
        assertEquals("tautline: --fault 'stall@soon': 'soon' is not a number of seconds", r.err().strip());
    }

    @Test
    void benchHelpListsEveryBenchmark() {
        CliRun r = CliRun.of("bench", "--help");
        for (String name : new String[] {"simulator", "frf", "modal", "serial"}) {
            assertTrue(r.out().contains(name), name + " in " + r.out());
        }
    }
}
