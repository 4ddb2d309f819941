package org.tautline.analysis.frf;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;

/**
 * Decodes interleaved little-endian frames of a WAV data chunk into per-channel doubles.
 *
 * <p>Integers are scaled to [-1, 1) by 2^-(bits-1); floats are widened as they are. One tight loop
 * per channel and encoding, reading through little-endian byte-array views.
 */
final class WavDecoder {
    private static final VarHandle SHORT = MethodHandles.byteArrayViewVarHandle(short[].class, ByteOrder.LITTLE_ENDIAN);
    private static final VarHandle INT = MethodHandles.byteArrayViewVarHandle(int[].class, ByteOrder.LITTLE_ENDIAN);
    private static final VarHandle FLOAT = MethodHandles.byteArrayViewVarHandle(float[].class, ByteOrder.LITTLE_ENDIAN);
    private static final VarHandle DOUBLE = MethodHandles.byteArrayViewVarHandle(double[].class, ByteOrder.LITTLE_ENDIAN);
    private static final double SCALE16 = 0x1p-15;
    private static final double SCALE24 = 0x1p-23;
    private static final double SCALE32 = 0x1p-31;

    private WavDecoder() {
    }

    /**
     * Decodes whole frames.
     *
     * @param encoding the sample encoding
     * @param bytes the frames, from index 0
     * @param frames how many frames
     * @param blockAlign bytes per frame
     * @param out out[channel][outOffset + i]
     * @param outOffset first index written
     * @param channels channel count
     * @return the first frame holding a NaN or infinite sample, or -1 when all are finite
     */
    static int decode(WavEncoding encoding, byte[] bytes, int frames, int blockAlign, double[][] out, int outOffset,
                      int channels) {
        int width = encoding.bytes();
        int firstBad = -1;
        for (int c = 0; c < channels; c++) {
            double[] o = out[c];
            int p = c * width;
            switch (encoding) {
                case PCM16:
                    for (int i = 0; i < frames; i++, p += blockAlign) {
                        o[outOffset + i] = (short) SHORT.get(bytes, p) * SCALE16;
                    }
                    break;
                case PCM24:
                    for (int i = 0; i < frames; i++, p += blockAlign) {
                        int v = (bytes[p] & 0xff) | (bytes[p + 1] & 0xff) << 8 | bytes[p + 2] << 16;
                        o[outOffset + i] = v * SCALE24;
                    }
                    break;
                case PCM32:
                    for (int i = 0; i < frames; i++, p += blockAlign) {
                        o[outOffset + i] = (int) INT.get(bytes, p) * SCALE32;
                    }
                    break;
                case FLOAT32:
                    firstBad = earlier(firstBad, floats(bytes, p, frames, blockAlign, o, outOffset));
                    break;
                default:
                    firstBad = earlier(firstBad, doubles(bytes, p, frames, blockAlign, o, outOffset));
                    break;
            }
        }
        return firstBad;
    }

    private static int floats(byte[] bytes, int start, int frames, int blockAlign, double[] o, int outOffset) {
        int bad = -1;
        int p = start;
        for (int i = 0; i < frames; i++, p += blockAlign) {
            float v = (float) FLOAT.get(bytes, p);
            o[outOffset + i] = v;
            if (bad < 0 && !Float.isFinite(v)) {
                bad = i;
            }
        }
        return bad;
    }

    private static int doubles(byte[] bytes, int start, int frames, int blockAlign, double[] o, int outOffset) {
        int bad = -1;
        int p = start;
        for (int i = 0; i < frames; i++, p += blockAlign) {
            double v = (double) DOUBLE.get(bytes, p);
            o[outOffset + i] = v;
            if (bad < 0 && !Double.isFinite(v)) {
                bad = i;
            }
        }
        return bad;
    }

    private static int earlier(int a, int b) {
        return a < 0 ? b : b < 0 ? a : Math.min(a, b);
    }
}
