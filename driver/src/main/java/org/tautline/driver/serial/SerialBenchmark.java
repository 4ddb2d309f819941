package org.tautline.driver.serial;

import java.io.ByteArrayOutputStream;
import java.util.SplittableRandom;

import org.tautline.driver.RigLinkException;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sim.SimulationConfigs;

/**
 * Measures the serial path: decoder throughput on in-memory data, then the virtual rig over a socat pty pair
 * paced at the baud rate like a UART ({@link VirtualRigSettings#paced()}), first streaming and then fetching.
 *
 * <p>Both link parts use float32 blocks of 1024 samples of the demo wire's 2 channels at 20 kS/s, which need
 * about 160.7 kB/s ({@link LinkBudget}); a line of 921600 baud carries 92.16 kB/s. Streaming therefore drops
 * blocks at the device (overruns, by design of PROTOCOL.md) and fetching runs slower than real time. Throughput
 * is reported in bytes per second and as a percentage of the line's capacity.
 */
public final class SerialBenchmark {
    /** Samples per channel per block in every part. */
    static final int BLOCK_SAMPLES = 1024;
    /** Samples per channel per read in the fetch part. */
    static final int FETCH_SAMPLES = 8192;

    /**
     * The figures.
     *
     * @param decodeMegabytesPerS decoder throughput, 10^6 bytes per second of encoded stream
     * @param decodedBytes bytes decoded for that figure
     * @param baud baud rate the ports were set to
     * @param capacityBytesPerS what the line carries at that baud rate with 8N1 framing, bytes per second
     * @param neededBytesPerS what every sample at the sample rate needs, bytes per second
     * @param streamSeconds how long the stream part ran, s
     * @param streamBytesPerS bytes per second received while streaming
     * @param streamCapacityPercent that, in percent of the capacity
     * @param blocksReceived intact streaming blocks received
     * @param lostBlocks streaming blocks missing by sequence number, or damaged, on the link
     * @param overrunBlocks streaming blocks the device dropped because the line could not carry them
     * @param longestStallMs longest time between two streaming blocks, ms
     * @param fetchSeconds how long the fetch part ran, s
     * @param fetchBytesPerS bytes per second received while fetching through {@link SerialRig}
     * @param fetchCapacityPercent that, in percent of the capacity
     * @param fetchRealTimeMultiple samples fetched per second over the sample rate (below 1: slower than real time)
     */
    public record Figures(double decodeMegabytesPerS, long decodedBytes, int baud, double capacityBytesPerS,
                          double neededBytesPerS, double streamSeconds, double streamBytesPerS,
                          double streamCapacityPercent, long blocksReceived, long lostBlocks, long overrunBlocks,
                          double longestStallMs, double fetchSeconds, double fetchBytesPerS,
                          double fetchCapacityPercent, double fetchRealTimeMultiple) {
    }

    private SerialBenchmark() {
    }

    /**
     * Runs every part.
     *
     * @param linkSeconds how long to use the paced pty, s, half streaming and half fetching (60 for the record,
     *        about 2 in tests)
     * @param baud baud rate for both ends, for example 921600
     * @return the figures
     */
    public static Figures run(double linkSeconds, int baud) {
        long[] decoded = new long[1];
        double mbps = decodeMegabytesPerS(0.5, decoded);
        SimulationConfig config = SimulationConfigs.demoWire();
        double capacity = LinkBudget.capacityBytesPerS(baud);
        double needed = LinkBudget.requiredBytesPerS(config.sampleRateHz(), 2, SampleFormat.FLOAT32_LE, BLOCK_SAMPLES);
        double[] s = streamOverPty(config, linkSeconds / 2, baud);
        double[] f = fetchOverPty(config, linkSeconds / 2, baud);
        return new Figures(mbps, decoded[0], baud, capacity, needed, s[0], s[1], 100 * s[1] / capacity, (long) s[2],
                (long) s[3], (long) s[4], s[5], f[0], f[1], 100 * f[1] / capacity, f[2]);
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
        StreamDecoder d = new StreamDecoder("memory", BlockCodec.DEFAULT_MAX_PAYLOAD_BYTES, new StreamDecoder.Sink() {
            @Override
            public void line(String line) {
                // The measured stream holds blocks only.
            }

            @Override
            public void block(DataBlock block) {
                // Counted by the bytes fed.
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
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        SplittableRandom rnd = new SplittableRandom(7);
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

    /**
     * Streams for the given time over a paced pty, feeding the watchdog every 200 ms.
     *
     * @return {seconds, bytes/s, received, lost, overruns, longest gap ms}
     */
    static double[] streamOverPty(SimulationConfig config, double seconds, int baud) {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(config, VirtualRigSettings.of(baud).withPacing(true));
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
            long startNs = 0;
            long startBytes = 0;
            long lastNs = System.nanoTime();
            long lastFeedNs = lastNs;
            long end = lastNs + (long) ((seconds + 0.5) * 1e9);
            while (System.nanoTime() < end) {
                LinkEvent e;
                try {
                    e = inbox.poll(20);
                } catch (InterruptedException interrupted) {
                    Thread.currentThread().interrupt();
                    break;
                }
                long now = System.nanoTime();
                if (now - lastFeedNs > 200_000_000L) {
                    host.writeLine("LINK:FEED");
                    lastFeedNs = now;
                }
                if (e instanceof LinkEvent.Block b) {
                    if (expected < 0) {
                        startNs = now;
                        startBytes = inbox.bytesReceived();
                        end = now + (long) (seconds * 1e9);
                    } else {
                        lost += (b.block().sequence() - expected) & 0xFFFFFFFFL;
                        longestNs = Math.max(longestNs, now - lastNs);
                        received++;
                    }
                    expected = (b.block().sequence() + 1) & 0xFFFFFFFFL;
                    lastNs = now;
                } else if (e instanceof LinkEvent.Damaged) {
                    lost++;
                }
                if (inbox.linkFault() != null) {
                    throw inbox.linkFault();
                }
            }
            double elapsed = (System.nanoTime() - startNs) * 1e-9;
            double bytesPerS = (inbox.bytesReceived() - startBytes) / elapsed;
            host.writeLine("ACQ:STREAM OFF");
            return new double[] {elapsed, bytesPerS, received, lost, server.streamOverruns(), longestNs / 1e6};
        }
    }

    /**
     * Fetches {@value #FETCH_SAMPLES}-sample reads through {@link SerialRig} over a paced pty for the given time.
     *
     * @return {seconds, bytes/s, samples fetched per second over the sample rate}
     */
    static double[] fetchOverPty(SimulationConfig config, double seconds, int baud) {
        SerialLinkSettings settings = SerialLinkSettings.defaults().withBaud(baud).withBlockSamples(BLOCK_SAMPLES)
                .withFormat(SampleFormat.FLOAT32_LE);
        try (VirtualRigServer server = VirtualRigServer.startOnPty(config, VirtualRigSettings.of(baud).withPacing(true));
             SerialRig rig = SerialRig.open(server.hostPath(), settings)) {
            rig.acquisition().read(FETCH_SAMPLES);
            long startBytes = rig.bytesReceived();
            long start = System.nanoTime();
            long samples = 0;
            long now;
            do {
                samples += rig.acquisition().read(FETCH_SAMPLES).samples()[0].length;
                now = System.nanoTime();
            } while (now - start < seconds * 1e9);
            double elapsed = (now - start) * 1e-9;
            return new double[] {elapsed, (rig.bytesReceived() - startBytes) / elapsed,
                    samples / elapsed / rig.acquisition().sampleRateHz()};
        }
    }
}
