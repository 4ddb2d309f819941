package org.tautline.analysis.signal;

import java.util.List;

import org.tautline.analysis.AnalysisException;

/**
 * A {@link SampleSource} over channels held in memory, read a block at a time.
 *
 * <p>The samples are copied on construction, so later changes to the caller's arrays do not show.
 * Reading is not thread-safe: the source keeps its read position.
 */
public final class ArraySampleSource implements SampleSource {
    private final String name;
    private final double sampleRateHz;
    private final List<String> channelNames;
    private final double[][] samples;
    private int next;

    /**
     * Creates a source over copies of the given channels.
     *
     * @param name what to call the source in messages, for example {@code "sweep 3"}
     * @param sampleRateHz sample rate, Hz, positive and finite
     * @param channelNames one name per channel, distinct
     * @param samples samples[channel][frame], all channels the same length
     * @throws AnalysisException if the rate, names or lengths are inconsistent
     */
    public ArraySampleSource(String name, double sampleRateHz, List<String> channelNames, double[][] samples) {
        this.name = name == null ? "samples in memory" : name;
        if (!(sampleRateHz > 0) || Double.isInfinite(sampleRateHz)) {
            throw new AnalysisException("sample rate of " + this.name + " must be positive and finite, got " + sampleRateHz
                    + " Hz");
        }
        if (channelNames == null || samples == null || channelNames.size() != samples.length || samples.length == 0) {
            throw new AnalysisException(this.name + " needs one name per channel and at least one channel, got "
                    + (channelNames == null ? "no names" : channelNames.size() + " names") + " and "
                    + (samples == null ? "no channels" : samples.length + " channels"));
        }
        if (channelNames.stream().distinct().count() != channelNames.size()) {
            throw new AnalysisException("channel names of " + this.name + " must be distinct, got " + channelNames);
        }
        this.samples = new double[samples.length][];
        for (int c = 0; c < samples.length; c++) {
            if (samples[c] == null || samples[c].length != samples[0].length) {
                throw new AnalysisException("channel " + c + " (" + channelNames.get(c) + ") of " + this.name + " has "
                        + (samples[c] == null ? "no samples" : samples[c].length + " samples") + ", expected "
                        + samples[0].length + " like channel 0");
            }
            this.samples[c] = samples[c].clone();
        }
        this.sampleRateHz = sampleRateHz;
        this.channelNames = List.copyOf(channelNames);
    }

    /**
     * Creates a source with channels named {@code ch0, ch1, ...}.
     *
     * @param name what to call the source in messages
     * @param sampleRateHz sample rate, Hz
     * @param samples samples[channel][frame]
     * @return the source
     */
    public static ArraySampleSource of(String name, double sampleRateHz, double[]... samples) {
        String[] names = new String[samples.length];
        for (int c = 0; c < names.length; c++) {
            names[c] = "ch" + c;
        }
        return new ArraySampleSource(name, sampleRateHz, List.of(names), samples);
    }

    @Override
    public double sampleRateHz() {
        return sampleRateHz;
    }

    @Override
    public List<String> channelNames() {
        return channelNames;
    }

    @Override
    public long frameCount() {
        return samples[0].length;
    }

    @Override
    public int read(double[][] buffer, int maxFrames) {
        if (maxFrames < 1) {
            throw new AnalysisException("read of " + name + " must ask for 1 frame or more, got " + maxFrames);
        }
        int left = samples[0].length - next;
        if (left <= 0) {
            return -1;
        }
        int n = Math.min(left, maxFrames);
        for (int c = 0; c < samples.length; c++) {
            System.arraycopy(samples[c], next, buffer[c], 0, n);
        }
        next += n;
        return n;
    }

    @Override
    public String position() {
        return name + ", frame " + next;
    }

    @Override
    public void close() {
        // nothing to release: the samples are in memory
    }
}
