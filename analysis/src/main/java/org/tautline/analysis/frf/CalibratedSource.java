package org.tautline.analysis.frf;

import java.io.IOException;
import java.util.List;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.signal.SampleSource;

/**
 * A sample source whose calibrated channels are in engineering units: each is divided by its
 * sensitivity as it is read; other channels pass through raw.
 */
public final class CalibratedSource implements SampleSource {
    private final SampleSource source;
    private final ChannelCalibration[] byChannel;

    private CalibratedSource(SampleSource source, ChannelCalibration[] byChannel) {
        this.source = source;
        this.byChannel = byChannel;
    }

    /**
     * Wraps a source.
     *
     * @param source the raw recording; closing the wrapper closes it
     * @param calibrations at most one per channel, naming channels by name or 0-based index; may be empty
     * @return the calibrated source
     * @throws AnalysisException if a calibration names a channel that is not in the source, or two name the same
     */
    public static CalibratedSource of(SampleSource source, List<ChannelCalibration> calibrations) {
        if (source == null || calibrations == null) {
            throw new AnalysisException("a calibrated source needs a recording and a list of calibrations (empty when"
                    + " none), got " + (source == null ? "no recording" : "no list"));
        }
        ChannelCalibration[] byChannel = new ChannelCalibration[source.channelCount()];
        for (ChannelCalibration calibration : calibrations) {
            if (calibration == null) {
                throw new AnalysisException("the list of channel calibrations holds an empty entry");
            }
            int index = source.channelIndex(calibration.channel());
            if (byChannel[index] != null) {
                throw new AnalysisException("channel " + index + " ('" + source.channelNames().get(index)
                        + "') is calibrated twice, as '" + byChannel[index].channel() + "' and as '"
                        + calibration.channel() + "'; expected one calibration per channel");
            }
            byChannel[index] = calibration;
        }
        return new CalibratedSource(source, byChannel);
    }

    /**
     * The calibration of a channel.
     *
     * @param channel 0-based channel index
     * @return its calibration, or empty for a raw channel
     */
    public Optional<ChannelCalibration> calibration(int channel) {
        return Optional.ofNullable(byChannel[channel]);
    }

    /**
     * The unit of a channel's values.
     *
     * @param channel 0-based channel index
     * @return the calibrated SI unit, or empty for a raw channel (volts, or full-scale fraction for audio files)
     */
    public Optional<String> unit(int channel) {
        return calibration(channel).map(ChannelCalibration::unit);
    }

    @Override
    public double sampleRateHz() {
        return source.sampleRateHz();
    }

    @Override
    public List<String> channelNames() {
        return source.channelNames();
    }

    @Override
    public long frameCount() {
        return source.frameCount();
    }

    @Override
    public int read(double[][] buffer, int maxFrames) throws IOException {
        int n = source.read(buffer, maxFrames);
        for (int c = 0; c < byChannel.length && n > 0; c++) {
            if (byChannel[c] != null) {
                double sensitivity = byChannel[c].sensitivityVoltsPerUnit();
                double[] row = buffer[c];
                for (int i = 0; i < n; i++) {
                    row[i] /= sensitivity;
                }
            }
        }
        return n;
    }

    @Override
    public String position() {
        return source.position();
    }

    @Override
    public void close() throws IOException {
        source.close();
    }
}
