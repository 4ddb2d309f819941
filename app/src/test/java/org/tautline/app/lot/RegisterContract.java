package org.tautline.app.lot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;

/** Register tests shared by the SQLite and the PostgreSQL register. */
abstract class RegisterContract {

    /** @return a fresh, empty register location for one test */
    abstract String freshLocation() throws Exception;

    @Test
    void roundTripKeepsEveryField() throws Exception {
        String location = freshLocation();
        Instant at = Instant.parse("2026-11-30T10:15:30.123Z");
        LotEntry entry = new LotEntry("LOT-A", "W-001", at, "PASS", "/runs/w1",
                List.of(new LotFigure("tensionN", 146.514, 1.46522, "N", 135, 165),
                        new LotFigure("inharmonicityB", 1.02166e-4, 3.07e-5, "", Double.NaN, 1e-3)));
        try (LotRegister r = LotRegister.open(location)) {
            r.append(entry);
            r.append(new LotEntry("LOT-B", "W-900", at, "FAIL", "", List.of()));
        }
        try (LotRegister r = LotRegister.open(location)) {
            List<LotEntry> back = r.entries("LOT-A");
            assertEquals(1, back.size());
            LotEntry e = back.get(0);
            assertEquals(entry.specimenId(), e.specimenId());
            assertEquals(at, e.recordedAt());
            assertEquals("PASS", e.outcome());
            assertEquals("/runs/w1", e.runDirectory());
            assertEquals(entry.figures().get(0), e.figures().get(0));
            LotFigure b = e.figures().get(1);
            assertEquals(1.02166e-4, b.value());
            assertTrue(Double.isNaN(b.lowerLimit()), "a missing bound comes back as NaN");
            assertEquals(1e-3, b.upperLimit());
            assertEquals(List.of(), r.entries("LOT-B").get(0).figures());
            assertEquals(List.of(), r.entries("NO-SUCH-LOT"));
        }
    }

    @Test
    void twoProcessesAppendingAtOnceLoseNothing() throws Exception {
        String location = freshLocation();
        try (LotRegister r = LotRegister.open(location)) {
            assertEquals(List.of(), r.entries("SHARED"));
        }
        int each = 40;
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<Process> processes = new ArrayList<>();
        for (String name : List.of("first", "second")) {
            processes.add(new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                    RegisterAppender.class.getName(), location, "SHARED", Integer.toString(each), name)
                    .redirectErrorStream(true).redirectOutput(new File(System.getProperty("java.io.tmpdir"),
                            "tautline-appender-" + name + ".log")).start());
        }
        for (Process p : processes) {
            assertTrue(p.waitFor(120, TimeUnit.SECONDS), "an appender did not finish in 120 s");
            assertEquals(0, p.exitValue(), "an appender failed; see tautline-appender-*.log in the temp folder");
        }
        try (LotRegister r = LotRegister.open(location)) {
            List<LotEntry> all = r.entries("SHARED");
            assertEquals(2 * each, all.size());
            Set<String> ids = new HashSet<>();
            all.forEach(e -> {
                ids.add(e.specimenId());
                assertEquals(2, e.figures().size(), "every entry keeps both figures");
            });
            assertEquals(2 * each, ids.size(), "every appended specimen is there once");
            FigureStatistics tension = LotStatistics.of(all).get(0);
            assertEquals(2 * each, tension.n());
            assertEquals(150 + (each - 1) / 2.0, tension.mean(), 1e-9);
        }
    }
}
