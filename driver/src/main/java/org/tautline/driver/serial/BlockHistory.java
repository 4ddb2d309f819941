package org.tautline.driver.serial;

import java.util.LinkedHashMap;
import java.util.Map;

import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.SampleBlock;

/**
 * The virtual device's data blocks: numbering, encoding, and the last {@value #KEEP} kept for {@code ACQ:RESEND?}.
 * Guarded by the device's lock.
 */
final class BlockHistory {
    /** Blocks kept for {@code ACQ:RESEND?}. */
    static final int KEEP = 64;

    private final Map<Long, byte[]> kept = new LinkedHashMap<>();
    private final double[] sensitivity;
    private long nextSequence;

    /** @param sensitivity engineering units per count of each channel, for {@link SampleFormat#INT24_LE} */
    BlockHistory(double[] sensitivity) {
        this.sensitivity = sensitivity.clone();
    }

    /**
     * Reads the next samples and encodes them as the next block.
     *
     * @param acquisition where the samples come from
     * @param n samples per channel
     * @param format sample coding
     * @return the block's bytes, terminator included
     */
    byte[] make(Acquisition acquisition, int n, SampleFormat format) {
        long first = acquisition.nextSampleIndex();
        SampleBlock s = acquisition.read(n);
        long seq = nextSequence;
        nextSequence = (nextSequence + 1) & 0xFFFFFFFFL;
        byte[] bytes = BlockCodec.encode(new DataBlock(seq, first, format, s.samples()), sensitivity);
        kept.put(seq, bytes);
        if (kept.size() > KEEP) {
            kept.remove(kept.keySet().iterator().next());
        }
        return bytes;
    }

    /** @return the sequence number the next block will carry */
    long nextSequence() {
        return nextSequence;
    }

    /**
     * @param seq a sequence number
     * @return the block as first sent, or null when it is no longer kept
     */
    byte[] get(long seq) {
        return kept.get(seq);
    }

    /** Forgets the kept blocks (a device with a small buffer). */
    void forget() {
        kept.clear();
    }

    /** Forgets everything and numbers from 0 again (a reset). */
    void reset() {
        kept.clear();
        nextSequence = 0;
    }
}
