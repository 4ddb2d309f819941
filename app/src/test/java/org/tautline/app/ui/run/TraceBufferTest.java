package org.tautline.app.ui.run;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.tautline.driver.spi.SampleBlock;

class TraceBufferTest {
    @Test
    void keepsTheNewestSamplesOldestFirst() {
        TraceBuffer buffer = new TraceBuffer(4);
        buffer.offer(new SampleBlock(0, new double[][] {{1, 2, 3}, {10, 20, 30}}), 100.0);
        buffer.offer(new SampleBlock(3, new double[][] {{4, 5}, {40, 50}}), 100.0);
        TraceBuffer.Snapshot s = buffer.snapshot();
        assertArrayEquals(new double[] {2, 3, 4, 5}, s.force());
        assertArrayEquals(new double[] {20, 30, 40, 50}, s.response());
        assertArrayEquals(new double[] {0, 0.01, 0.02, 0.03}, s.timeS(), 1e-15);
        buffer.clear();
        assertEquals(0, buffer.snapshot().force().length);
    }

    @Test
    void writesTheTimeToGoInMinutesAndSeconds() {
        assertEquals("about 2 min 05 s to go", ProgressText.eta(125.2));
        assertEquals("about 42 s to go", ProgressText.eta(41.6));
        assertEquals("time to go not known yet", ProgressText.eta(Double.NaN));
    }
}
