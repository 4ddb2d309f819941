package org.tautline.driver.serial;

import java.util.concurrent.locks.LockSupport;

/**
 * Writes to a port no faster than a UART at a baud rate would send (8N1: 10 bits per byte, {@link LinkBudget}), in
 * chunks of about 1 ms of line time; after a late wake-up it catches up by at most 2 ms. Used by one thread.
 */
final class PacedWriter {
    private static final long CATCH_UP_NS = 2_000_000L;

    private final SerialTransport transport;
    private final double bytesPerS;
    private final int chunk;
    private long lineFreeNs;

    /**
     * @param transport the port
     * @param baud the line speed to imitate, bits per second
     */
    PacedWriter(SerialTransport transport, int baud) {
        this.transport = transport;
        this.bytesPerS = LinkBudget.capacityBytesPerS(baud);
        this.chunk = (int) Math.max(1, bytesPerS / 1000);
    }

    /** @param b bytes to send, returning once the last chunk has been handed to the port */
    void write(byte[] b) {
        for (int off = 0; off < b.length; off += chunk) {
            int n = Math.min(chunk, b.length - off);
            long now = System.nanoTime();
            lineFreeNs = Math.max(lineFreeNs, now - CATCH_UP_NS);
            while (lineFreeNs > now) {
                LockSupport.parkNanos(lineFreeNs - now);
                now = System.nanoTime();
            }
            transport.write(b, off, n);
            lineFreeNs += (long) (n * 1e9 / bytesPerS);
        }
    }
}
