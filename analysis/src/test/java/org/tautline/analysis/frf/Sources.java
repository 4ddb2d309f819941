package org.tautline.analysis.frf;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.tautline.analysis.signal.SampleSource;

/** Reads whole sample sources into memory for tests. */
final class Sources {
    private Sources() {
    }

    /**
     * Reads every frame.
     *
     * @param source the source
     * @param block frames asked for per read
     * @return samples[channel][frame]
     */
    static double[][] readAll(SampleSource source, int block) throws IOException {
        int channels = source.channelCount();
        double[][] buffer = new double[channels][block];
        List<double[]> rows = new ArrayList<>();
        for (int c = 0; c < channels; c++) {
            rows.add(new double[0]);
        }
        int total = 0;
        int n;
        while ((n = source.read(buffer, block)) != -1) {
            if (n < 1 || n > block) {
                throw new AssertionError("read returned " + n + " for a block of " + block);
            }
            for (int c = 0; c < channels; c++) {
                double[] grown = Arrays.copyOf(rows.get(c), total + n);
                System.arraycopy(buffer[c], 0, grown, total, n);
                rows.set(c, grown);
            }
            total += n;
        }
        return rows.toArray(new double[0][]);
    }
}
