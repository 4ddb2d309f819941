package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

@Timeout(value = 60)
class SerialBenchmarkTest {
    @Test
    void streamsOverThePtyWithoutLosingBlocksAndReportsItsFigures() {
        SerialBenchmark.Figures f = SerialBenchmark.run(2.0, 921600);
        System.out.println("serial benchmark: " + f);
        assertTrue(f.decodeMegabytesPerS() > 0 && f.decodedBytes() > 0);
        assertTrue(f.blocksReceived() > 0, f.toString());
        assertEquals(0, f.lostBlocks(), f.toString());
        assertTrue(f.longestStallMs() > 0, f.toString());
        assertEquals(921600, f.baud());
    }
}
