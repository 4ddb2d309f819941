package org.tautline.driver.serial;

import java.nio.charset.StandardCharsets;
import java.util.zip.CRC32;

import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;

/**
 * Splits the bytes a device sends into reply lines and data blocks, whatever the chunking.
 *
 * <p>Bytes are appended to one receive buffer; a {@code '#'} that starts a well-formed block header
 * (IEEE 488.2 definite-length framing, magic, layout version, format, counts agreeing with the length)
 * is held until the whole payload is in, then its CRC-32 is checked and its samples are decoded straight
 * from the buffer into the double arrays. Anything else is text: lines end at {@code '\n'}. After a bad
 * CRC the decoder rescans from the byte after the {@code '#'}, so blocks the damaged one seemed to cover
 * are still found. Faults are reported to the sink as events, never thrown; the decoder never waits.
 * Not thread-safe: one thread feeds it.
 */
final class StreamDecoder {
    /** Longest reply line kept, bytes; longer lines are reported as unreadable. */
    static final int MAX_LINE_BYTES = 4096;

    /** Receives what the decoder finds, on the feeding thread. */
    interface Sink {
        /** @param line a reply or notice line, without its terminator ({@code \r} stripped too) */
        void line(String line);

        /** @param block a block whose CRC matched */
        void block(DataBlock block);

        /** @param fault a decode fault: {@link Kind#CRC} for a damaged block, {@link Kind#PROTOCOL} otherwise */
        void fault(RigLinkException fault);
    }

    private static final int NEED_MORE = -1;
    private static final int NOT_A_BLOCK = -2;
    private static final int BAD_CRC = -3;

    private final String where;
    private final int maxPayloadBytes;
    private final Sink sink;
    private final CRC32 crc = new CRC32();
    private byte[] buf = new byte[1 << 16];
    private int start;
    private int end;
    private boolean abandonFirst;
    private final byte[] line = new byte[MAX_LINE_BYTES];
    private int lineLength;
    private int lineSeen;
    private boolean lineUnreadable;
    private double[] sensitivity = new double[0];
    private long badCrcSequence;
    private long blocks;
    private long faults;

    /**
     * @param where the port name, for messages
     * @param maxPayloadBytes largest block payload accepted, bytes
     * @param sink receives lines, blocks and faults
     */
    StreamDecoder(String where, int maxPayloadBytes, Sink sink) {
        this.where = where;
        this.maxPayloadBytes = maxPayloadBytes;
        this.sink = sink;
    }

    /** @param unitsPerCount engineering units per count of each channel, for {@link SampleFormat#INT24_LE} */
    void sensitivity(double[] unitsPerCount) {
        this.sensitivity = unitsPerCount.clone();
    }

    /** @return blocks decoded so far */
    long blocksDecoded() {
        return blocks;
    }

    /** @return faults reported so far */
    long faultCount() {
        return faults;
    }

    /** @return bytes held waiting for the rest of a block */
    int pendingBytes() {
        return end - start;
    }

    /**
     * Takes the next bytes from the link.
     *
     * @param data the bytes
     * @param offset first byte
     * @param length byte count
     */
    void feed(byte[] data, int offset, int length) {
        int off = offset;
        int left = length;
        while (left > 0) {
            makeRoom(left);
            int n = Math.min(left, buf.length - end);
            System.arraycopy(data, off, buf, end, n);
            end += n;
            off += n;
            left -= n;
            parse();
        }
    }

    /** Gives up on a block whose payload has not all arrived and rescans what came after its {@code '#'}. */
    void abandonPending() {
        if (end > start) {
            abandonFirst = true;
            parse();
        }
    }

    private void makeRoom(int wanted) {
        if (buf.length - end >= Math.min(wanted, 4096)) {
            return;
        }
        int held = end - start;
        int needed = held + Math.min(wanted, 1 << 16);
        if (needed > buf.length) {
            byte[] bigger = new byte[Math.max(needed, Math.min(2 * buf.length, maxPayloadBytes + (1 << 17)))];
            System.arraycopy(buf, start, bigger, 0, held);
            buf = bigger;
        } else {
            System.arraycopy(buf, start, buf, 0, held);
        }
        start = 0;
        end = held;
    }

    private void parse() {
        int pos = start;
        while (pos < end) {
            byte b = buf[pos];
            if (b == '#') {
                boolean skip = abandonFirst;
                abandonFirst = false;
                int r = skip ? NOT_A_BLOCK : tryBlock(pos);
                if (r == NEED_MORE) {
                    start = pos;
                    return;
                }
                if (r > 0) {
                    pos += r;
                    continue;
                }
                if (r == BAD_CRC) {
                    fault(Kind.CRC, "data block (sequence " + badCrcSequence + " as received) failed its CRC-32",
                            "the CRC-32 over header and samples to match; the host re-requests the block");
                    lineUnreadable = true;
                }
            }
            if (b == '\n') {
                endLine();
            } else {
                appendToLine(b);
            }
            pos++;
        }
        start = pos;
        abandonFirst = false;
    }

    private void appendToLine(byte b) {
        lineSeen++;
        if (b == '\r' || b == '\t') {
            if (b == '\t' && lineLength < MAX_LINE_BYTES) {
                line[lineLength++] = b;
            }
            return;
        }
        if (b < 0x20 || b > 0x7E) {
            lineUnreadable = true;
        }
        if (lineLength < MAX_LINE_BYTES) {
            line[lineLength++] = b;
        } else {
            lineUnreadable = true;
        }
    }

    private void endLine() {
        if (lineUnreadable) {
            fault(Kind.PROTOCOL, "an unreadable line of " + lineSeen + " bytes arrived",
                    "printable ASCII lines of at most " + MAX_LINE_BYTES + " bytes, or data blocks");
        } else if (lineLength > 0) {
            sink.line(new String(line, 0, lineLength, StandardCharsets.US_ASCII));
        }
        lineLength = 0;
        lineSeen = 0;
        lineUnreadable = false;
    }

    private void strayBytesBeforeBlock() {
        if (lineSeen > 0) {
            fault(Kind.PROTOCOL, lineSeen + " stray bytes arrived before a data block",
                    "a data block to start a line");
            lineLength = 0;
            lineSeen = 0;
            lineUnreadable = false;
        }
    }

    private void fault(Kind kind, String what, String expected) {
        faults++;
        sink.fault(new RigLinkException(kind, where, what, expected));
    }

    /** Returns the bytes the block at p takes, or NEED_MORE, NOT_A_BLOCK or BAD_CRC. */
    private int tryBlock(int p) {
        int avail = end - p;
        if (avail < 2) {
            return NEED_MORE;
        }
        int d = buf[p + 1] - '0';
        if (d < 1 || d > 9) {
            return NOT_A_BLOCK;
        }
        if (avail < 2 + d) {
            return NEED_MORE;
        }
        long length = 0;
        for (int i = 0; i < d; i++) {
            int digit = buf[p + 2 + i] - '0';
            if (digit < 0 || digit > 9) {
                return NOT_A_BLOCK;
            }
            length = length * 10 + digit;
        }
        if (length < BlockCodec.HEADER_BYTES + BlockCodec.CRC_BYTES || length > maxPayloadBytes) {
            return NOT_A_BLOCK;
        }
        int h = p + 2 + d;
        int headerAvail = Math.min(end - h, BlockCodec.HEADER_BYTES);
        if (!headerPrefixPlausible(h, headerAvail)) {
            return NOT_A_BLOCK;
        }
        if (headerAvail < BlockCodec.HEADER_BYTES) {
            return NEED_MORE;
        }
        SampleFormat format = SampleFormat.ofCode(buf[h + 3]);
        int channels = Short.toUnsignedInt((short) BlockCodec.I16.get(buf, h + 16));
        int reserved = Short.toUnsignedInt((short) BlockCodec.I16.get(buf, h + 18));
        long samples = Integer.toUnsignedLong((int) BlockCodec.I32.get(buf, h + 20));
        long first = (long) BlockCodec.I64.get(buf, h + 8);
        if (channels < 1 || channels > BlockCodec.MAX_CHANNELS || reserved != 0 || samples < 1 || first < 0
                || BlockCodec.payloadBytes(channels, samples, format) != length) {
            return NOT_A_BLOCK;
        }
        if (end - h < length) {
            return NEED_MORE;
        }
        int body = (int) length - BlockCodec.CRC_BYTES;
        crc.reset();
        crc.update(buf, h, body);
        long sequence = Integer.toUnsignedLong((int) BlockCodec.I32.get(buf, h + 4));
        if ((int) crc.getValue() != (int) BlockCodec.I32.get(buf, h + body)) {
            badCrcSequence = sequence;
            return BAD_CRC;
        }
        if (format == SampleFormat.INT24_LE && sensitivity.length < channels) {
            strayBytesBeforeBlock();
            fault(Kind.PROTOCOL, "an I24 data block of " + channels + " channels arrived before the sensitivity of"
                    + " each channel was known", "ACQ:CHAN? answered for every channel before I24 data");
            return 2 + d + (int) length;
        }
        strayBytesBeforeBlock();
        double[][] out = decodeSamples(h + BlockCodec.HEADER_BYTES, channels, (int) samples, format);
        blocks++;
        sink.block(new DataBlock(sequence, first, format, out));
        return 2 + d + (int) length;
    }

    private boolean headerPrefixPlausible(int h, int avail) {
        return (avail < 1 || buf[h] == BlockCodec.MAGIC_0)
                && (avail < 2 || buf[h + 1] == BlockCodec.MAGIC_1)
                && (avail < 3 || buf[h + 2] == BlockCodec.LAYOUT_VERSION)
                && (avail < 4 || SampleFormat.ofCode(buf[h + 3]) != null);
    }

    private double[][] decodeSamples(int from, int channels, int n, SampleFormat format) {
        double[][] out = new double[channels][n];
        int p = from;
        switch (format) {
            case FLOAT32_LE -> {
                for (int i = 0; i < n; i++) {
                    for (int c = 0; c < channels; c++, p += 4) {
                        out[c][i] = (float) BlockCodec.F32.get(buf, p);
                    }
                }
            }
            case FLOAT64_LE -> {
                for (int i = 0; i < n; i++) {
                    for (int c = 0; c < channels; c++, p += 8) {
                        out[c][i] = (double) BlockCodec.F64.get(buf, p);
                    }
                }
            }
            case INT24_LE -> {
                for (int i = 0; i < n; i++) {
                    for (int c = 0; c < channels; c++, p += 3) {
                        int count = (buf[p] & 0xFF) | (buf[p + 1] & 0xFF) << 8 | buf[p + 2] << 16;
                        out[c][i] = count * sensitivity[c];
                    }
                }
            }
        }
        return out;
    }
}
