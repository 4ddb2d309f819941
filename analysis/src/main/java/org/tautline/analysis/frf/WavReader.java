package org.tautline.analysis.frf;

import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.signal.SampleSource;

/**
 * Streams the samples of a RIFF/WAVE file, a block at a time.
 *
 * <p>Supported: PCM integers (format code 1) of 16, 24 and 32 bits, IEEE floats (format code 3)
 * of 32 and 64 bits, and WAVE_FORMAT_EXTENSIBLE (0xFFFE) with a PCM or IEEE float subformat; any
 * channel count. Unknown chunks before the data are skipped. Integer samples are scaled to [-1, 1)
 * by dividing by 2^(bits-1) (a 24-bit sample in a 32-bit extensible container counts as 32-bit);
 * floats are delivered as stored and must be finite. Channels are named {@code ch0, ch1, ...} and
 * the frame count comes from the data chunk's size. See the layout notes of the package-private
 * header parser, from memory of "Multimedia Programming Interface and Data Specifications 1.0"
 * (IBM and Microsoft, 1991) and Microsoft's WAVEFORMATEXTENSIBLE documentation.
 *
 * <p>Errors name the file and the byte offset. When the data chunk is shorter than declared or a
 * float sample is not finite, nothing already read is lost: {@link #read} first returns the whole
 * frames before the fault, and the next call throws; every call after that throws the same
 * exception.
 */
public final class WavReader implements SampleSource {
    private static final int BUFFER_BYTES = 1 << 16;

    private final InputStream in;
    private final String name;
    private final WavHeader header;
    private final List<String> channelNames;
    private final byte[] bytes;
    private final int bufferFrames;
    private long framesLeft;
    private long position;
    private AnalysisException failure;

    private WavReader(InputStream in, String name) throws IOException {
        this.in = in;
        this.name = name;
        this.header = WavHeader.read(in, name);
        List<String> names = new ArrayList<>(header.channels());
        for (int c = 0; c < header.channels(); c++) {
            names.add("ch" + c);
        }
        this.channelNames = List.copyOf(names);
        this.bufferFrames = Math.max(1, BUFFER_BYTES / header.blockAlign());
        this.bytes = new byte[bufferFrames * header.blockAlign()];
        this.framesLeft = header.dataBytes() / header.blockAlign();
        this.position = header.dataOffset();
    }

    /**
     * Opens a WAV file, using its file name in messages; the header is read and checked now.
     *
     * @param file the file
     * @return the reader, to be closed by the caller
     * @throws IOException if the file cannot be read
     * @throws AnalysisException if the header is malformed or unsupported (the file is then closed)
     */
    public static WavReader open(Path file) throws IOException {
        InputStream stream = Files.newInputStream(file);
        try {
            return open(stream, FrfCsvReader.displayName(file));
        } catch (IOException | RuntimeException e) {
            stream.close();
            throw e;
        }
    }

    /**
     * Opens WAV bytes from a stream at byte 0; {@link #close} closes the stream.
     *
     * <p>When opening fails the stream is left open for the caller to close.
     *
     * @param in the bytes
     * @param displayName how messages name the source, for example {@code rec.wav}
     * @return the reader
     * @throws IOException if the stream cannot be read
     * @throws AnalysisException if the header is malformed or unsupported
     */
    public static WavReader open(InputStream in, String displayName) throws IOException {
        return new WavReader(new BufferedInputStream(in, BUFFER_BYTES), displayName);
    }

    @Override
    public double sampleRateHz() {
        return header.sampleRateHz();
    }

    @Override
    public List<String> channelNames() {
        return channelNames;
    }

    /** @return the frames the data chunk declares */
    @Override
    public long frameCount() {
        return header.dataBytes() / header.blockAlign();
    }

    @Override
    public int read(double[][] buffer, int maxFrames) throws IOException {
        int channels = header.channels();
        checkBuffer(buffer, maxFrames, channels);
        if (failure != null) {
            throw failure;
        }
        if (framesLeft == 0) {
            return -1;
        }
        int blockAlign = header.blockAlign();
        int want = (int) Math.min(maxFrames, framesLeft);
        int done = 0;
        while (done < want) {
            int chunk = Math.min(want - done, bufferFrames);
            int got = in.readNBytes(bytes, 0, chunk * blockAlign);
            int whole = got / blockAlign;
            int bad = WavDecoder.decode(header.encoding(), bytes, whole, blockAlign, buffer, done, channels);
            if (bad >= 0) {
                failure = notFinite(buffer, done, bad);
                whole = bad;
            } else if (got < chunk * blockAlign) {
                long readFrames = frameCount() - framesLeft + whole;
                failure = new AnalysisException(name + ", byte " + (position + got) + ": data chunk ends after "
                        + (position + got - header.dataOffset()) + " of " + header.dataBytes() + " declared bytes; "
                        + readFrames + " whole frames were read of " + frameCount() + " declared; expected the"
                        + " declared data");
            }
            done += whole;
            framesLeft -= whole;
            position += (long) whole * blockAlign;
            if (failure != null) {
                if (done > 0) {
                    return done;
                }
                throw failure;
            }
        }
        return done;
    }

    private AnalysisException notFinite(double[][] buffer, int offset, int frame) {
        int channel = 0;
        while (Double.isFinite(buffer[channel][offset + frame])) {
            channel++;
        }
        long byteOffset = position + (long) frame * header.blockAlign() + (long) channel * header.encoding().bytes();
        long frameIndex = frameCount() - framesLeft + frame;
        return new AnalysisException(name + ", byte " + byteOffset + ": sample of channel ch" + channel + " in frame "
                + frameIndex + " is " + buffer[channel][offset + frame] + "; expected finite samples");
    }

    /**
     * Checks the arguments of {@link SampleSource#read}.
     *
     * @param buffer the caller's buffer
     * @param maxFrames frames asked for
     * @param channels the source's channel count
     * @throws AnalysisException saying what is missing
     */
    static void checkBuffer(double[][] buffer, int maxFrames, int channels) {
        if (maxFrames < 1) {
            throw new AnalysisException("reading samples needs maxFrames of 1 or more, got " + maxFrames);
        }
        if (buffer == null || buffer.length < channels) {
            throw new AnalysisException("reading samples needs a buffer of " + channels + " channel rows, got "
                    + (buffer == null ? "none" : buffer.length));
        }
        for (int c = 0; c < channels; c++) {
            if (buffer[c] == null || buffer[c].length < maxFrames) {
                throw new AnalysisException("reading samples needs buffer row " + c + " of at least " + maxFrames
                        + " values, got " + (buffer[c] == null ? "none" : buffer[c].length));
            }
        }
    }

    /** @return the offset of the next unread byte, for example {@code rec.wav, byte 1044} */
    @Override
    public String position() {
        return name + ", byte " + position;
    }

    @Override
    public void close() throws IOException {
        in.close();
    }
}
