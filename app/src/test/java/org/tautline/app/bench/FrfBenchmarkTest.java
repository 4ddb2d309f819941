package org.tautline.app.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The FRF benchmark's figures are consistent (no timing is asserted). */
class FrfBenchmarkTest {

    @Test
    void readsTheWholeRecordingItWrote(@TempDir Path dir) throws Exception {
        FrfBenchmark.Figures f = FrfBenchmark.run(dir.resolve("rec.wav"), 1 << 16, 1024);
        assertEquals(1 << 16, f.frames());
        assertEquals(44 + 2L * 4 * (1 << 16), f.fileBytes(), "a 44-byte header and two float channels");
        assertEquals(((1 << 16) - 1024) / 512 + 1, f.averages(), "Welch segments at 50 % overlap");
        assertTrue(f.meanCoherence() > 0.5 && f.meanCoherence() <= 1.0, "coherence " + f.meanCoherence());
        assertTrue(f.peakHeapBytes() > 0);
    }
}
