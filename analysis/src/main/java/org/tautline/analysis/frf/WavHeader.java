package org.tautline.analysis.frf;

import java.io.IOException;
import java.io.InputStream;
import java.util.Locale;

import org.tautline.analysis.AnalysisException;

/**
 * The RIFF/WAVE header up to the start of the sample data: format, channels, rate and data size.
 *
 * <p>Layout from memory of "Multimedia Programming Interface and Data Specifications 1.0"
 * (IBM and Microsoft, 1991): {@code "RIFF"}, a 32-bit little-endian size, {@code "WAVE"}, then
 * chunks of a 4-byte id, a 32-bit little-endian size and that many bytes, plus one pad byte when
 * the size is odd. The {@code fmt } chunk holds the format code (16 bits), channel count (16),
 * sample rate (32), average bytes per second (32), block align (16) and bits per sample (16);
 * WAVE_FORMAT_EXTENSIBLE (0xFFFE), from memory of Microsoft's documentation of
 * WAVEFORMATEXTENSIBLE and the KSDATAFORMAT_SUBTYPE GUIDs, adds an extension size (16), valid bits
 * (16), a channel mask (32) and a 16-byte subformat GUID whose first 32 bits are the format code.
 * Chunks other than {@code fmt } and {@code data} are skipped; reading stops at the data chunk, so
 * a fmt chunk after it is never seen. The RIFF size and the average bytes per second are not used
 * (many writers get them wrong) and are not checked.
 */
final class WavHeader {
    private static final int FORMAT_PCM = 1;
    private static final int FORMAT_FLOAT = 3;
    private static final int FORMAT_EXTENSIBLE = 0xFFFE;
    /** Bytes 4..15 of the KSDATAFORMAT_SUBTYPE_PCM and _IEEE_FLOAT GUIDs, as stored in the file. */
    private static final byte[] GUID_TAIL = {0x00, 0x00, 0x10, 0x00, (byte) 0x80, 0x00, 0x00, (byte) 0xAA, 0x00, 0x38,
        (byte) 0x9B, 0x71};
    private static final String SUPPORTED = "expected 1 (PCM integers of 16, 24 or 32 bits), 3 (IEEE floats of 32 or 64"
            + " bits) or 65534 (extensible, with a PCM or IEEE float subformat)";

    private final String name;
    private final InputStream in;
    private final byte[] scratch = new byte[4096];
    private long position;
    private WavEncoding encoding;
    private int channels;
    private long sampleRateHz;
    private int blockAlign;
    private long dataBytes;

    private WavHeader(InputStream in, String name) {
        this.in = in;
        this.name = name;
    }

    /**
     * Reads the header, leaving the stream at the first byte of sample data.
     *
     * @param in the stream at byte 0
     * @param name the display name, for messages
     * @return the header
     * @throws AnalysisException naming the byte offset of what is malformed or unsupported
     */
    static WavHeader read(InputStream in, String name) throws IOException {
        WavHeader header = new WavHeader(in, name);
        header.parse();
        return header;
    }

    private String at(long offset) {
        return name + ", byte " + offset + ": ";
    }

    private void parse() throws IOException {
        byte[] riff = new byte[12];
        int n = fill(riff, 12);
        if (n == 0) {
            throw new AnalysisException(at(0) + "file is empty; expected a RIFF/WAVE file");
        }
        if (n < 12) {
            throw new AnalysisException(at(n) + "file ends after " + n + " bytes; expected a 12-byte RIFF/WAVE header");
        }
        if (!id(riff, 0).equals("RIFF")) {
            throw new AnalysisException(at(0) + "not a RIFF/WAVE file: it starts with " + quotedId(riff, 0)
                    + ", expected 'RIFF'");
        }
        if (!id(riff, 8).equals("WAVE")) {
            throw new AnalysisException(at(8) + "not a RIFF/WAVE file: the RIFF form type is " + quotedId(riff, 8)
                    + ", expected 'WAVE'");
        }
        byte[] chunk = new byte[8];
        while (true) {
            long start = position;
            n = fill(chunk, 8);
            if (n == 0) {
                throw new AnalysisException(at(start) + (encoding == null
                        ? "file ends without a fmt chunk; expected a fmt chunk and then a data chunk"
                        : "file ends without a data chunk; expected a data chunk after the fmt chunk"));
            }
            if (n < 8) {
                throw new AnalysisException(at(position) + "file ends inside a chunk header (" + n
                        + " of 8 bytes); expected a chunk id and size");
            }
            String id = id(chunk, 0);
            long size = u32(chunk, 4);
            if (id.equals("data")) {
                data(start, size);
                return;
            }
            if (id.equals("fmt ")) {
                if (encoding != null) {
                    throw new AnalysisException(at(start) + "second fmt chunk; expected one");
                }
                format(start, size);
            } else {
                skip(start, quotedId(chunk, 0), size, size + (size & 1));
            }
        }
    }

    private void format(long start, long size) throws IOException {
        if (size < 16) {
            throw new AnalysisException(at(start) + "fmt chunk holds " + size + " bytes; expected at least 16");
        }
        byte[] fmt = new byte[40];
        int wanted = (int) Math.min(size, 40);
        if (fill(fmt, wanted) < wanted) {
            truncated(start, "'fmt '", size);
        }
        skip(start, "'fmt '", size, size + (size & 1) - wanted);
        long fields = start + 8;
        int code = u16(fmt, 0);
        int bits = u16(fmt, 14);
        int formatCode = code;
        if (code == FORMAT_EXTENSIBLE) {
            if (size < 40) {
                throw new AnalysisException(at(start) + "extensible fmt chunk holds " + size + " bytes; expected at least 40");
            }
            if (u16(fmt, 16) < 22) {
                throw new AnalysisException(at(fields + 16) + "extensible fmt extension holds " + u16(fmt, 16)
                        + " bytes; expected at least 22");
            }
            formatCode = subformat(fmt, fields);
            int valid = u16(fmt, 18);
            if (valid > bits) {
                throw new AnalysisException(at(fields + 18) + "valid bits per sample " + valid + " exceed the " + bits
                        + "-bit container; expected at most " + bits);
            }
        } else if (code != FORMAT_PCM && code != FORMAT_FLOAT) {
            throw new AnalysisException(at(fields) + "format code " + code + " is not supported; " + SUPPORTED);
        }
        channels = u16(fmt, 2);
        if (channels == 0) {
            throw new AnalysisException(at(fields + 2) + "channel count is 0; expected 1 or more");
        }
        sampleRateHz = u32(fmt, 4);
        if (sampleRateHz == 0) {
            throw new AnalysisException(at(fields + 4) + "sample rate is 0 Hz; expected a sample rate above 0 Hz");
        }
        WavEncoding found = WavEncoding.of(formatCode, bits);
        if (found == null) {
            throw new AnalysisException(at(fields + 14) + (formatCode == FORMAT_PCM
                    ? "PCM samples of " + bits + " bits are not supported; expected 16, 24 or 32 bits"
                    : "IEEE float samples of " + bits + " bits are not supported; expected 32 or 64 bits"));
        }
        blockAlign = u16(fmt, 12);
        if (blockAlign != channels * found.bytes()) {
            throw new AnalysisException(at(fields + 12) + "block align " + blockAlign + " does not match " + channels
                    + (channels == 1 ? " channel" : " channels") + " of " + bits + " bits; expected "
                    + channels * found.bytes());
        }
        encoding = found;
    }

    private int subformat(byte[] fmt, long fields) {
        long code = u32(fmt, 24);
        boolean known = code == FORMAT_PCM || code == FORMAT_FLOAT;
        for (int i = 0; i < GUID_TAIL.length && known; i++) {
            known = fmt[28 + i] == GUID_TAIL[i];
        }
        if (!known) {
            throw new AnalysisException(at(fields + 24) + "extensible subformat " + guid(fmt, 24)
                    + " is not supported; expected PCM {00000001-0000-0010-8000-00aa00389b71} or IEEE float"
                    + " {00000003-0000-0010-8000-00aa00389b71}");
        }
        return (int) code;
    }

    private void data(long start, long size) {
        if (encoding == null) {
            throw new AnalysisException(at(start) + "data chunk comes before the fmt chunk; expected the fmt chunk first"
                    + " (a fmt chunk after the data is not read)");
        }
        if (size % blockAlign != 0) {
            throw new AnalysisException(at(start + 4) + "data chunk declares " + size + " bytes, not a whole number of "
                    + blockAlign + "-byte frames");
        }
        dataBytes = size;
    }

    private void skip(long start, String id, long size, long count) throws IOException {
        long left = count;
        while (left > 0) {
            int n = in.read(scratch, 0, (int) Math.min(left, scratch.length));
            if (n < 0) {
                truncated(start, id, size);
            }
            position += n;
            left -= n;
        }
    }

    private void truncated(long start, String id, long size) {
        throw new AnalysisException(at(position) + "file ends inside chunk " + id + " that starts at byte " + start
                + " and declares " + size + " bytes; expected the whole chunk (and a pad byte after an odd size)");
    }

    private int fill(byte[] into, int count) throws IOException {
        int n = in.readNBytes(into, 0, count);
        position += n;
        return n;
    }

    private static String id(byte[] b, int at) {
        char[] chars = new char[4];
        for (int i = 0; i < 4; i++) {
            chars[i] = (char) (b[at + i] & 0xff);
        }
        return new String(chars);
    }

    private static String quotedId(byte[] b, int at) {
        for (int i = 0; i < 4; i++) {
            int c = b[at + i] & 0xff;
            if (c < 0x20 || c > 0x7e) {
                return String.format(Locale.ROOT, "0x%08x", u32(b, at));
            }
        }
        return "'" + id(b, at) + "'";
    }

    private static String guid(byte[] b, int at) {
        StringBuilder out = new StringBuilder("{").append(String.format(Locale.ROOT, "%08x-%04x-%04x-", u32(b, at),
                u16(b, at + 4), u16(b, at + 6)));
        for (int i = 8; i < 16; i++) {
            out.append(String.format(Locale.ROOT, "%02x", b[at + i] & 0xff));
            if (i == 9) {
                out.append('-');
            }
        }
        return out.append('}').toString();
    }

    private static int u16(byte[] b, int at) {
        return (b[at] & 0xff) | (b[at + 1] & 0xff) << 8;
    }

    private static long u32(byte[] b, int at) {
        return ((b[at] & 0xffL) | (b[at + 1] & 0xffL) << 8 | (b[at + 2] & 0xffL) << 16 | (b[at + 3] & 0xffL) << 24);
    }

    WavEncoding encoding() {
        return encoding;
    }

    int channels() {
        return channels;
    }

    long sampleRateHz() {
        return sampleRateHz;
    }

    int blockAlign() {
        return blockAlign;
    }

    long dataBytes() {
        return dataBytes;
    }

    /** @return the offset of the first byte of sample data */
    long dataOffset() {
        return position;
    }
}
