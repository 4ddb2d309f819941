package org.tautline.driver.serial;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Consumer;

/** The virtual rig's fault switches, applied to what it sends; thread-safe. */
final class SenderFaults {
    /** The line a garbled reply becomes. */
    static final String GARBLED = "~~garbled~~";

    private int dropBytes;
    private int corruptTimes;
    private long corruptSequence = -1;
    private int loseTimes;
    private long loseSequence = -1;
    private boolean garbleNextReply;
    private byte[] garbage;
    private long stallUntilNs;
    private boolean stalled;

    synchronized void dropBytes(int count) {
        dropBytes = count;
    }

    synchronized void corruptBlock(int times) {
        corruptTimes = times;
        corruptSequence = -1;
    }

    synchronized void loseBlock(int times) {
        loseTimes = times;
        loseSequence = -1;
    }

    /** Reads the sequence number from an encoded block. */
    private static long sequenceOf(byte[] block) {
        int h = 2 + (block[1] - '0');
        return Integer.toUnsignedLong((int) BlockCodec.I32.get(block, h + 4));
    }

    synchronized void garbleNextReply() {
        garbleNextReply = true;
    }

    synchronized void insertGarbage(byte[] bytes) {
        garbage = bytes.clone();
    }

    synchronized void stallUntil(long nanoTime) {
        stallUntilNs = nanoTime;
        stalled = true;
    }

    /**
     * Waits out any stall, then applies the switches to one item.
     *
     * @param item a reply line or a data block, as the device would send it
     * @param log where to note each applied fault
     * @return what to write, in order (possibly nothing)
     * @throws InterruptedException when the server closes during a stall
     */
    List<byte[]> apply(byte[] item, Consumer<String> log) throws InterruptedException {
        waitOutStall();
        List<byte[]> out = new ArrayList<>(2);
        synchronized (this) {
            boolean block = item.length > 0 && item[0] == '#';
            if (!block) {
                if (garbleNextReply && item.length > 0 && item[0] != '!') {
                    garbleNextReply = false;
                    log.accept("garbled reply " + new String(item, StandardCharsets.US_ASCII).strip());
                    out.add((GARBLED + "\n").getBytes(StandardCharsets.US_ASCII));
                } else {
                    out.add(item);
                }
                return out;
            }
            if (garbage != null) {
                out.add(garbage);
                log.accept("inserted " + garbage.length + " garbage bytes");
                garbage = null;
            }
            long sequence = sequenceOf(item);
            if (loseTimes > 0 && (loseSequence < 0 || loseSequence == sequence)) {
                loseSequence = sequence;
                loseTimes--;
                log.accept("lost block " + sequence);
                return out;
            }
            byte[] b = item;
            if (corruptTimes > 0 && (corruptSequence < 0 || corruptSequence == sequence)) {
                corruptSequence = sequence;
                corruptTimes--;
                b = item.clone();
                b[b.length / 2] ^= 0x10;
                log.accept("corrupted block " + sequence + " at byte " + b.length / 2);
            }
            if (dropBytes > 0) {
                int cut = Math.min(dropBytes, b.length / 4);
                int at = b.length / 2;
                byte[] shorter = Arrays.copyOf(b, b.length - cut);
                System.arraycopy(b, at + cut, shorter, at, b.length - at - cut);
                b = shorter;
                dropBytes = 0;
                log.accept("dropped " + cut + " bytes from a block");
            }
            out.add(b);
            return out;
        }
    }

    private void waitOutStall() throws InterruptedException {
        while (true) {
            long waitNs;
            synchronized (this) {
                if (!stalled) {
                    return;
                }
                waitNs = stallUntilNs - System.nanoTime();
                if (waitNs <= 0) {
                    stalled = false;
                    return;
                }
            }
            Thread.sleep(Math.max(1, Math.min(20, waitNs / 1_000_000L)));
        }
    }
}
