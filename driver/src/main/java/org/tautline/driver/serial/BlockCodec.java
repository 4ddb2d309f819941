package org.tautline.driver.serial;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.util.zip.CRC32;

/**
 * The data block layout of PROTOCOL.md: an IEEE 488.2 definite-length arbitrary block whose payload is a
 * 24-byte header, interleaved samples and a CRC-32.
 *
 * <p>Framing follows IEEE 488.2-1992, 8.7.9 (definite-length arbitrary block response data, from memory):
 * {@code '#'}, one digit d (1..9), d digits giving the payload length in bytes, the payload. The CRC is
 * the CRC-32 of {@link CRC32} (ISO-HDLC polynomial 0x04C11DB7, reflected, check value of "123456789"
 * 0xCBF43926), over header and samples, stored little-endian.
 */
final class BlockCodec {
    /** Payload header bytes. */
    static final int HEADER_BYTES = 24;
    /** CRC bytes at the end of the payload. */
    static final int CRC_BYTES = 4;
    /** First two header bytes, ASCII "SB" (sample block). */
    static final byte MAGIC_0 = 'S';
    /** Second magic byte. */
    static final byte MAGIC_1 = 'B';
    /** Header layout version. */
    static final int LAYOUT_VERSION = 1;
    /** Most channels in one block. */
    static final int MAX_CHANNELS = 64;
    /** Largest payload the host accepts by default, bytes (16 MiB). */
    static final int DEFAULT_MAX_PAYLOAD_BYTES = 16 << 20;

    static final VarHandle I16 = MethodHandles.byteArrayViewVarHandle(short[].class, ByteOrder.LITTLE_ENDIAN);
    static final VarHandle I32 = MethodHandles.byteArrayViewVarHandle(int[].class, ByteOrder.LITTLE_ENDIAN);
    static final VarHandle I64 = MethodHandles.byteArrayViewVarHandle(long[].class, ByteOrder.LITTLE_ENDIAN);
    static final VarHandle F32 = MethodHandles.byteArrayViewVarHandle(float[].class, ByteOrder.LITTLE_ENDIAN);
    static final VarHandle F64 = MethodHandles.byteArrayViewVarHandle(double[].class, ByteOrder.LITTLE_ENDIAN);

    private BlockCodec() {
    }

    /**
     * Payload length of a block.
     *
     * @param channels channel count
     * @param samples samples per channel
     * @param format sample coding
     * @return header + samples + CRC, bytes
     */
    static long payloadBytes(int channels, long samples, SampleFormat format) {
        return HEADER_BYTES + channels * samples * format.bytesPerSample() + CRC_BYTES;
    }

    /**
     * Encodes a block, framing and terminating newline included.
     *
     * @param block the block; all channels the same length
     * @param sensitivity engineering units per count of each channel (used by {@link SampleFormat#INT24_LE})
     * @return the bytes to send
     */
    static byte[] encode(DataBlock block, double[] sensitivity) {
        double[][] s = block.samples();
        int channels = s.length;
        int n = block.sampleCount();
        SampleFormat format = block.format();
        long payload = payloadBytes(channels, n, format);
        byte[] digits = Long.toString(payload).getBytes(StandardCharsets.US_ASCII);
        int h = 2 + digits.length;
        byte[] out = new byte[(int) (h + payload + 1)];
        out[0] = '#';
        out[1] = (byte) ('0' + digits.length);
        System.arraycopy(digits, 0, out, 2, digits.length);
        out[h] = MAGIC_0;
        out[h + 1] = MAGIC_1;
        out[h + 2] = LAYOUT_VERSION;
        out[h + 3] = (byte) format.code();
        I32.set(out, h + 4, (int) block.sequence());
        I64.set(out, h + 8, block.firstSampleIndex());
        I16.set(out, h + 16, (short) channels);
        I16.set(out, h + 18, (short) 0);
        I32.set(out, h + 20, n);
        int p = h + HEADER_BYTES;
        for (int i = 0; i < n; i++) {
            for (int c = 0; c < channels; c++) {
                double v = s[c][i];
                switch (format) {
                    case FLOAT32_LE -> F32.set(out, p, (float) v);
                    case FLOAT64_LE -> F64.set(out, p, v);
                    case INT24_LE -> {
                        long count = Math.round(v / sensitivity[c]);
                        int clamped = (int) Math.max(-8388608, Math.min(8388607, count));
                        out[p] = (byte) clamped;
                        out[p + 1] = (byte) (clamped >> 8);
                        out[p + 2] = (byte) (clamped >> 16);
                    }
                }
                p += format.bytesPerSample();
            }
        }
        CRC32 crc = new CRC32();
        crc.update(out, h, p - h);
        I32.set(out, p, (int) crc.getValue());
        out[out.length - 1] = '\n';
        return out;
    }
}
