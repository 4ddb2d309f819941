package org.tautline.driver.serial;

/**
 * One decoded data block: its sequence number, where it starts and its samples.
 *
 * @param sequence block sequence number, 0..2^32-1, counting blocks the device has sent since its reset
 * @param firstSampleIndex running index of the first sample since the device's acquisition started
 * @param format how the samples were coded on the link
 * @param samples samples[channel][i], in engineering units
 */
record DataBlock(long sequence, long firstSampleIndex, SampleFormat format, double[][] samples) {

    /** @return samples per channel */
    int sampleCount() {
        return samples.length == 0 ? 0 : samples[0].length;
    }
}
