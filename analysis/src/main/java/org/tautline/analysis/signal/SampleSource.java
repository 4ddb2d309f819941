package org.tautline.analysis.signal;

import java.io.Closeable;
import java.io.IOException;
import java.util.List;

/**
 * A stream of simultaneously sampled channels, read a block at a time (a WAV or CSV recording,
 * or samples held in memory).
 *
 * <p>Readers validate as they go: a malformed record is reported as an
 * {@link org.tautline.analysis.AnalysisException} whose message names the file and the line or
 * byte offset, and what was expected. Values are in the channel's engineering units when a
 * calibration was applied, raw (volts, or full-scale fraction for audio) otherwise.
 */
public interface SampleSource extends Closeable {

    /** @return sample rate, Hz */
    double sampleRateHz();

    /** @return channel names in order (generated as {@code ch0, ch1, ...} where the file has none) */
    List<String> channelNames();

    /** @return number of channels */
    default int channelCount() {
        return channelNames().size();
    }

    /** @return total frames (samples per channel) when known from a header, -1 otherwise */
    long frameCount();

    /**
     * Reads the next frames.
     *
     * @param buffer buffer[channel][i], at least {@link #channelCount()} rows of at least {@code maxFrames}
     * @param maxFrames most frames to read, 1 or more
     * @return frames read into buffer[c][0..n), at least 1, or -1 at the end of the stream (never 0)
     * @throws IOException when the underlying file cannot be read
     */
    int read(double[][] buffer, int maxFrames) throws IOException;

    /** @return where the reader is, for messages and progress: for example {@code rec.wav, byte 1044} */
    String position();

    /**
     * The channel's 0-based index from an index or a name.
     *
     * @param channel a 0-based index ("1") or a channel name ("force")
     * @return the index
     * @throws org.tautline.analysis.AnalysisException naming the channels there are
     */
    default int channelIndex(String channel) {
        List<String> names = channelNames();
        int byName = names.indexOf(channel);
        if (byName >= 0) {
            return byName;
        }
        try {
            int index = Integer.parseInt(channel.trim());
            if (index >= 0 && index < names.size()) {
                return index;
            }
        } catch (NumberFormatException e) {
            // not an index: fall through to the message
        }
        throw new org.tautline.analysis.AnalysisException("channel '" + channel + "' is not in the recording: expected a"
                + " 0-based index below " + names.size() + " or one of the names " + names);
    }
}
