package org.tautline.app.ui.run;

import org.tautline.driver.spi.SampleBlock;

/**
 * The latest samples of the force and response channels, decimated to a fixed number of points for a live plot.
 *
 * <p>Thread-safe: the sweep thread offers blocks, the event thread takes snapshots.
 */
public final class TraceBuffer {
    private final int capacity;
    private final double[][] ring;
    private long written;
    private double sampleRateHz;

    /** @param capacity samples kept per channel */
    public TraceBuffer(int capacity) {
        if (capacity < 2) {
            throw new IllegalArgumentException("trace buffer capacity must be 2 or more samples, got " + capacity);
        }
        this.capacity = capacity;
        this.ring = new double[2][capacity];
    }

    /**
     * Keeps the newest samples of channels 0 and 1.
     *
     * @param block a block as read
     * @param rateHz the acquisition's sample rate, Hz
     */
    public synchronized void offer(SampleBlock block, double rateHz) {
        sampleRateHz = rateHz;
        int n = block.length();
        int start = Math.max(0, n - capacity);
        for (int i = start; i < n; i++) {
            int slot = (int) (written % capacity);
            for (int c = 0; c < 2 && c < block.samples().length; c++) {
                ring[c][slot] = block.samples()[c][i];
            }
            written++;
        }
    }

    /** @return the samples held, oldest first: time (s, 0 at the oldest), force and response */
    public synchronized Snapshot snapshot() {
        int n = (int) Math.min(written, capacity);
        double[] t = new double[n];
        double[] force = new double[n];
        double[] response = new double[n];
        long first = written - n;
        for (int i = 0; i < n; i++) {
            int slot = (int) ((first + i) % capacity);
            t[i] = sampleRateHz > 0 ? i / sampleRateHz : i;
            force[i] = ring[0][slot];
            response[i] = ring[1][slot];
        }
        return new Snapshot(t, force, response);
    }

    /** Forgets every sample. */
    public synchronized void clear() {
        written = 0;
    }

    /**
     * Samples of both channels over the same times.
     *
     * @param timeS time of each sample, s, from the oldest held
     * @param force channel 0, N
     * @param response channel 1, in its unit
     */
    public record Snapshot(double[] timeS, double[] force, double[] response) {
    }
}
