package org.tautline.driver.serial;

import java.nio.charset.StandardCharsets;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;

/** The virtual rig's fault switches and fault schedule, applied to what it sends; thread-safe. */
final class SenderFaults {
    /** The line a garbled reply becomes. */
    static final String GARBLED = "~~garbled~~";

    private int dropFromNextBlock;
    private int dropFromNextItem;
    private int corruptTimes;
    private long corruptSequence = -1;
    private int loseTimes;
    private long loseSequence = -1;
    private boolean garbleNextReply;
    private byte[] garbage;
    private long stallUntilNs;
    private boolean stalled;
    private final ArrayDeque<FaultSchedule.Entry> scheduled = new ArrayDeque<>();
    private int scheduledCorrupt;
    private int scheduledLose;
    private final Map<InjectedFault, Long> applied = new EnumMap<>(InjectedFault.class);

    /** @param count bytes to cut from the next data block */
    synchronized void dropBytes(int count) {
        dropFromNextBlock = count;
    }

    synchronized void corruptBlock(int times) {
        corruptTimes = times;
        corruptSequence = -1;
    }

    synchronized void loseBlock(int times) {
        loseTimes = times;
        loseSequence = -1;
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
     * @param schedule faults to add
     * @param itemsSent items sent so far: the schedule's moments count from here
     */
    synchronized void schedule(FaultSchedule schedule, long itemsSent) {
        List<FaultSchedule.Entry> all = new ArrayList<>(scheduled);
        for (FaultSchedule.Entry e : schedule.entries()) {
            all.add(new FaultSchedule.Entry(e.item() + itemsSent, e.fault(), e.parameter()));
        }
        scheduled.clear();
        scheduled.addAll(new FaultSchedule(all).entries());
    }

    /** @param fault a kind that was just applied */
    synchronized void count(InjectedFault fault) {
        applied.merge(fault, 1L, Long::sum);
    }

    /** @return how many faults of a kind were applied so far */
    synchronized long applied(InjectedFault fault) {
        return applied.getOrDefault(fault, 0L);
    }

    /** @return faults scheduled or switched on and not yet applied (an armed byte drop counts as one) */
    synchronized int pending() {
        return scheduled.size() + scheduledCorrupt + scheduledLose + (dropFromNextBlock > 0 ? 1 : 0)
                + (dropFromNextItem > 0 ? 1 : 0);
    }

    /**
     * Takes the scheduled faults due at an item that do not change an item (stall, reset...), and notes those that do.
     *
     * @param item the number of the item about to be taken
     * @return the faults to apply before taking it, in order
     */
    synchronized List<FaultSchedule.Entry> due(long item) {
        List<FaultSchedule.Entry> out = new ArrayList<>();
        while (!scheduled.isEmpty() && scheduled.peek().item() <= item) {
            FaultSchedule.Entry e = scheduled.poll();
            switch (e.fault()) {
                case DROP_BYTES -> dropFromNextItem += e.parameter();
                case CORRUPT_BLOCK -> scheduledCorrupt++;
                case LOSE_BLOCK -> scheduledLose++;
                default -> out.add(e);
            }
        }
        return out;
    }

    /** Reads the sequence number from an encoded block. */
    private static long sequenceOf(byte[] block) {
        int h = 2 + (block[1] - '0');
        return Integer.toUnsignedLong((int) BlockCodec.I32.get(block, h + 4));
    }

    /**
     * Applies the switches and the faults due to one item.
     *
     * @param item a line or a data block, as the device would send it
     * @param log where to note each applied fault
     * @return what to write, in order (possibly nothing)
     */
    List<byte[]> apply(byte[] item, Consumer<String> log) {
        List<byte[]> out = new ArrayList<>(2);
        synchronized (this) {
            boolean block = item.length > 0 && item[0] == '#';
            if (!block) {
                byte[] b = item;
                if (garbleNextReply && item.length > 0 && item[0] != '!') {
                    garbleNextReply = false;
                    log.accept("garbled reply " + new String(item, StandardCharsets.US_ASCII).strip());
                    b = (GARBLED + "\n").getBytes(StandardCharsets.US_ASCII);
                }
                if (dropFromNextItem > 0 && b.length > 1) {
                    int cut = Math.min(dropFromNextItem, b.length - 1);
                    int at = cutPosition(b.length - 1 - cut);
                    b = cut(b, at, cut);
                    dropFromNextItem = 0;
                    count(InjectedFault.DROP_BYTES);
                    log.accept("drop-bytes " + cut + " from the line '" + new String(item, StandardCharsets.US_ASCII)
                            .strip() + "'");
                }
                out.add(b);
                return out;
            }
            if (garbage != null) {
                out.add(garbage);
                log.accept("inserted " + garbage.length + " garbage bytes");
                garbage = null;
            }
            long sequence = sequenceOf(item);
            if (scheduledLose > 0 || loseTimes > 0 && (loseSequence < 0 || loseSequence == sequence)) {
                if (scheduledLose > 0) {
                    scheduledLose--;
                } else {
                    loseSequence = sequence;
                    loseTimes--;
                }
                count(InjectedFault.LOSE_BLOCK);
                log.accept("lose-block " + sequence);
                return out;
            }
            byte[] b = item;
            if (scheduledCorrupt > 0 || corruptTimes > 0 && (corruptSequence < 0 || corruptSequence == sequence)) {
                if (scheduledCorrupt > 0) {
                    scheduledCorrupt--;
                } else {
                    corruptSequence = sequence;
                    corruptTimes--;
                }
                b = item.clone();
                b[b.length / 2] ^= 0x10;
                count(InjectedFault.CORRUPT_BLOCK);
                log.accept("corrupt-block " + sequence + " at byte " + b.length / 2);
            }
            int drop = dropFromNextItem + dropFromNextBlock;
            if (drop > 0) {
                int cut = Math.max(1, Math.min(drop, b.length / 4));
                b = cut(b, cutPosition(b.length - cut), cut);
                dropFromNextItem = 0;
                dropFromNextBlock = 0;
                count(InjectedFault.DROP_BYTES);
                log.accept("drop-bytes " + cut + " from block " + sequence);
            }
            out.add(b);
            return out;
        }
    }

    /**
     * Where the next cut starts: the first cut takes an item's first bytes, later ones move through the item in steps
     * of 7919 bytes (a prime), so that cuts land in headers, samples, terminators and the heads of lines alike.
     */
    private int cutPosition(int room) {
        long k = applied(InjectedFault.DROP_BYTES);
        return room <= 0 ? 0 : (int) (k * 7919 % (room + 1));
    }

    private static byte[] cut(byte[] b, int at, int count) {
        byte[] shorter = Arrays.copyOf(b, b.length - count);
        System.arraycopy(b, at + count, shorter, at, b.length - at - count);
        return shorter;
    }

    /**
     * Waits until no stall is in force.
     *
     * @return true when a stall was waited out
     * @throws InterruptedException when the server closes during a stall
     */
    boolean waitOutStall() throws InterruptedException {
        boolean waited = false;
        while (true) {
            long waitNs;
            synchronized (this) {
                if (!stalled) {
                    return waited;
                }
                waitNs = stallUntilNs - System.nanoTime();
                if (waitNs <= 0) {
                    stalled = false;
                    return true;
                }
            }
            waited = true;
            Thread.sleep(Math.max(1, Math.min(20, waitNs / 1_000_000L)));
        }
    }
}
