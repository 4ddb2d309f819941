package org.tautline.driver.spi;

import java.util.List;

/** The measuring side of a rig: simultaneously sampled channels with a running sample index. */
public interface Acquisition {

    /** @return sample rate, Hz */
    double sampleRateHz();

    /** @return the channels, in the order of {@link SampleBlock#samples()} */
    List<ChannelInfo> channels();

    /**
     * Reads the next contiguous samples; blocks until they are there.
     *
     * @param sampleCount samples per channel, 1 or more
     * @return the block, which starts where the previous one ended
     */
    SampleBlock read(int sampleCount);

    /** @return the running index of the next sample {@link #read(int)} will return */
    long nextSampleIndex();

    /** @return rig time of the next sample, s: the rig clock, {@code nextSampleIndex / sampleRateHz} */
    default double rigTimeS() {
        return nextSampleIndex() / sampleRateHz();
    }
}
