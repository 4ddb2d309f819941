package org.tautline.driver.serial;

import org.tautline.driver.RigLinkException;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sim.SimulationConfigs;

/**
 * Measures the serial path: decoder throughput on in-memory data, and streaming over a socat pty pair.
 *
 * <p>The link part serves the demo wire with {@link VirtualRigServer} and streams float32 blocks of 1024
 * samples of 2 channels at the simulated sample rate (20 kS/s, about 19.5 blocks/s), counting blocks,
 * sequence numbers skipped and the longest time between two blocks. A pseudo-terminal does not limit the
 * byte rate to the baud rate, as a real UART would.
 */
public final class SerialBenchmark {
    /** Samples per channel per block in both parts. */
    static final int BLOCK_SAMPLES = 1024;

    /**
     * The figures.
     *
     * @param decodeMegabytesPerS decoder throughput, 10^6 bytes per second of encoded stream
     * @param decodedBytes bytes decoded for that figure
     * @param linkSeconds how long the link part streamed, s
     * @param baud baud rate the ports were set to
     * @param blocksReceived intact blocks received over the link
     * @param lostBlocks blocks missing by sequence number, or damaged
     * @param longestStallMs longest time between two received blocks, ms
     */
    public record Figures(double decodeMegabytesPerS, long decodedBytes, double linkSeconds, int baud,
                          long blocksReceived, long lostBlocks, double longestStallMs) {
    }

    private SerialBenchmark() {
    }

    /**
     * Runs both parts.
     *
     * @param linkSeconds how long to stream over the pty, s (60 for the record, about 2 in tests)
     * @param baud baud rate for both ends, for example 921600
     * @return the figures
     */
    public static Figures run(double linkSeconds, int baud) {
        long[] decoded = new long[1];
        double mbps = decodeMegabytesPerS(0.5, decoded);
        long[] link = streamOverPty(SimulationConfigs.demoWire(), linkSeconds, baud);
        return new Figures(mbps, decoded[0], linkSeconds, baud, link[0], link[1], link[2] / 1e6);
    }

    /**
     * Decodes float32 blocks from memory in 4 KiB chunks for at least the given time.
     *
     * @param seconds minimum measuring time, s
     * @param bytesOut receives the bytes decoded in element 0
     * @return throughput, 10^6 bytes per second
     */
    static double decodeMegabytesPerS(double seconds, long[] bytesOut) {
        byte[] stream = encodedStream(64);
        long[] blocks = new long[1];
        StreamDecoder d = new StreamDecoder("memory", BlockCodec.DEFAULT_MAX_PAYLOAD_BYTES, new StreamDecoder.Sink() {
            @Override
            public void line(String line) {
                // The measured stream holds blocks only.
            }

            @Override
            public void block(DataBlock block) {
                blocks[0] += block.sampleCount();
            }

            @Override
            public void fault(RigLinkException fault) {
                throw fault;
            }
        });
        for (int warm = 0; warm < 20; warm++) {
            feedAll(d, stream);
        }
        long bytes = 0;
        long start = System.nanoTime();
        long end = start + (long) (seconds * 1e9);
        long now;
        do {
            feedAll(d, stream);
            bytes += stream.length;
            now = System.nanoTime();
        } while (now < end);
        bytesOut[0] = bytes;
        return bytes / ((now - start) * 1e-9) / 1e6;
    }

    private static void feedAll(StreamDecoder d, byte[] stream) {
        for (int i = 0; i < stream.length; i += 4096) {
            d.feed(stream, i, Math.min(4096, stream.length - i));
        }
    }

    private static byte[] encodedStream(int blocks) {
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(7);
        double[] unit = {1e-6, 1e-9};
        for (int k = 0; k < blocks; k++) {
            double[][] s = new double[2][BLOCK_SAMPLES];
            for (int i = 0; i < BLOCK_SAMPLES; i++) {
                s[0][i] = rnd.nextGaussian();
                s[1][i] = 1e-4 * rnd.nextGaussian();
            }
            out.writeBytes(BlockCodec.encode(new DataBlock(k, (long) k * BLOCK_SAMPLES, SampleFormat.FLOAT32_LE, s), unit));
        }
        return out.toByteArray();
    }

    /** Streams for the given time; returns {received, lost, longest gap ns}. */
    static long[] streamOverPty(SimulationConfig config, double seconds, int baud) {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(config, baud);
             SerialTransport host = SerialTransport.open(server.hostPath(), baud)) {
            LinkInbox inbox = new LinkInbox(host.port());
            host.startReading(inbox);
            host.writeLine("DRIVE:OUT OFF");
            host.writeLine("ACQ:FORM F32");
            host.writeLine("ACQ:BLOCK " + BLOCK_SAMPLES);
            host.writeLine("ACQ:STREAM ON");
            long received = 0;
            long lost = 0;
            long longestNs = 0;
            long expected = -1;
            long lastNs = System.nanoTime();
            long lastFeedNs = lastNs;
            long end = lastNs + (long) (seconds * 1e9);
            while (System.nanoTime() < end) {
                Object e;
                try {
                    e = inbox.pollBlockEvent(20);
                } catch (InterruptedException interrupted) {
                    Thread.currentThread().interrupt();
                    break;
                }
                long now = System.nanoTime();
                if (now - lastFeedNs > 200_000_000L) {
                    host.writeLine("LINK:FEED");
                    lastFeedNs = now;
                }
                if (e instanceof DataBlock b) {
                    if (expected >= 0) {
                        lost += (b.sequence() - expected) & 0xFFFFFFFFL;
                        longestNs = Math.max(longestNs, now - lastNs);
                    }
                    expected = (b.sequence() + 1) & 0xFFFFFFFFL;
                    received++;
                    lastNs = now;
                } else if (e instanceof RigLinkException) {
                    lost++;
                }
                if (inbox.linkFault() != null) {
                    throw inbox.linkFault();
                }
            }
            host.writeLine("ACQ:STREAM OFF");
            return new long[] {received, lost, Math.max(longestNs, System.nanoTime() - lastNs)};
        }
    }
}
