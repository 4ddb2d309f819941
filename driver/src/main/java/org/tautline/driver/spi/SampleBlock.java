package org.tautline.driver.spi;

/**
 * A contiguous block of simultaneously sampled channels, in engineering units.
 *
 * <p>Immutable by convention: the acquisition hands over fresh arrays and never touches them again.
 *
 * @param firstSampleIndex running index of the first sample since the acquisition started
 * @param samples samples[channel][i], in the units of {@link ChannelInfo#unit()}
 */
public record SampleBlock(long firstSampleIndex, double[][] samples) {

    /** @return samples per channel in this block */
    public int length() {
        return samples.length == 0 ? 0 : samples[0].length;
    }
}
