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
    private int corruptBlocks;
    private int loseBlocks;
    private boolean garbleNextReply;
    private byte[] garbage;
    private long stallUntilNs;
    private boolean stalled;

    synchronized void dropBytes(int count) {
        dropBytes = count;
    }

    synchronized void corruptBlocks(int count) {
        corruptBlocks = count;
    }

    synchronized void loseBlocks(int count) {
        loseBlocks = count;
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
            if (loseBlocks > 0) {
                loseBlocks--;
                log.accept("lost a block of " + item.length + " bytes");
                return out;
            }
            byte[] b = item;
            if (corruptBlocks > 0) {
                corruptBlocks--;
                b = item.clone();
                b[b.length / 2] ^= 0x10;
                log.accept("corrupted a block at byte " + b.length / 2);
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
