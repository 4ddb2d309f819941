package org.tautline.driver.serial;

/**
 * What a serial link can carry: bytes per data block with all framing, the line's byte capacity, and the
 * highest sample rate a channel count and format fit in.
 *
 * <p>A UART sending 8N1 frames (start bit, 8 data bits, stop bit) carries 10 bits per byte, so a line of
 * B baud carries at most B / 10 bytes per second (common practice). A block of N samples per channel of C
 * channels in a format of b bytes is {@code '#'}, one digit d, d length digits, a 24-byte header, C N b
 * sample bytes, a 4-byte CRC and {@code '\n'} (PROTOCOL.md, section 5).
 */
public final class LinkBudget {
    /** Bits on the line per byte with 8N1 framing. */
    public static final int BITS_PER_BYTE = 10;

    private LinkBudget() {
    }

    /**
     * @param baud line speed, bits per second
     * @return the most bytes per second the line carries
     */
    public static double capacityBytesPerS(int baud) {
        return (double) baud / BITS_PER_BYTE;
    }

    /**
     * @param channels channel count
     * @param samples samples per channel in the block
     * @param format sample coding
     * @return bytes the block takes on the line, framing, header, CRC and terminator included
     */
    public static long blockBytes(int channels, int samples, SampleFormat format) {
        long payload = BlockCodec.payloadBytes(channels, samples, format);
        return 2 + Long.toString(payload).length() + payload + 1;
    }

    /**
     * @param sampleRateHz samples per second per channel
     * @param channels channel count
     * @param format sample coding
     * @param blockSamples samples per channel per block
     * @return bytes per second needed to carry every sample
     */
    public static double requiredBytesPerS(double sampleRateHz, int channels, SampleFormat format, int blockSamples) {
        return sampleRateHz / blockSamples * blockBytes(channels, blockSamples, format);
    }

    /**
     * @param baud line speed, bits per second
     * @param channels channel count
     * @param format sample coding
     * @param blockSamples samples per channel per block
     * @return the highest sample rate whose every sample the line carries, samples per second per channel
     */
    public static double maxSampleRateHz(int baud, int channels, SampleFormat format, int blockSamples) {
        return capacityBytesPerS(baud) * blockSamples / blockBytes(channels, blockSamples, format);
    }

    /**
     * @param baud line speed, bits per second
     * @param channels channel count
     * @param format sample coding
     * @param blockSamples samples per channel per block
     * @return how long one block takes on the line, ms
     */
    public static double blockMs(int baud, int channels, SampleFormat format, int blockSamples) {
        return blockBytes(channels, blockSamples, format) * 1000.0 / capacityBytesPerS(baud);
    }
}
