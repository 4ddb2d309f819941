package org.tautline.driver.serial;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.SplittableRandom;

import org.tautline.driver.RigException;

/**
 * When the virtual rig injects which faults: a list of moments, each counted in items the device has sent since
 * the schedule was installed ({@link VirtualRigServer#schedule(FaultSchedule)}).
 *
 * <p>An item is one line (reply, status or notice) or one data block, counted from 0. A fault at moment k happens
 * when the device has sent k items: {@link InjectedFault#STALL}, {@link InjectedFault#RESET},
 * {@link InjectedFault#AMPLIFIER_FAULT} and {@link InjectedFault#DISAPPEAR} just before item k is taken (so a notice
 * they cause is item k); {@link InjectedFault#DROP_BYTES} changes item k itself, {@link InjectedFault#CORRUPT_BLOCK}
 * and {@link InjectedFault#LOSE_BLOCK} the first data block from item k on; {@link InjectedFault#FORGET_HISTORY}
 * strikes just after item k has been sent (so a block corrupted at k cannot be re-sent). For orientation: a read of n samples is
 * ceil(n / block) blocks and at least one status line; each drive command is followed by one status line.
 *
 * @param entries the faults, sorted by moment
 */
public record FaultSchedule(List<Entry> entries) {
    /**
     * One scheduled fault.
     *
     * @param item the moment: items sent since the schedule was installed, 0 or more
     * @param fault what happens
     * @param parameter bytes for {@link InjectedFault#DROP_BYTES}, milliseconds for {@link InjectedFault#STALL}
     */
    public record Entry(long item, InjectedFault fault, int parameter) {
        /** Checks the fields. */
        public Entry {
            if (item < 0 || fault == null || parameter < 0) {
                throw new RigException("fault schedule entry: expected item >= 0, a fault and parameter >= 0, got item "
                        + item + ", fault " + fault + ", parameter " + parameter);
            }
        }
    }

    /** Sorts and copies the entries. */
    public FaultSchedule {
        List<Entry> sorted = new ArrayList<>(entries);
        sorted.sort(Comparator.comparingLong(Entry::item));
        entries = List.copyOf(sorted);
    }

    /**
     * @param fault what to inject, with its default parameter
     * @param items the moments
     * @return the schedule
     */
    public static FaultSchedule at(InjectedFault fault, long... items) {
        List<Entry> list = new ArrayList<>();
        for (long item : items) {
            list.add(new Entry(item, fault, fault.defaultParameter()));
        }
        return new FaultSchedule(list);
    }

    /**
     * Count faults of one kind at seeded random moments: the first at {@code firstItem}, then gaps drawn
     * uniformly from 1 to {@code 2 * meanGapItems - 1} items.
     *
     * @param fault what to inject
     * @param parameter bytes or milliseconds (see {@link Entry#parameter()})
     * @param count how many
     * @param firstItem the first moment
     * @param meanGapItems mean items between two faults, 1 or more
     * @param seed random seed
     * @return the schedule
     */
    public static FaultSchedule spread(InjectedFault fault, int parameter, int count, long firstItem, int meanGapItems,
                                       long seed) {
        if (count < 0 || meanGapItems < 1) {
            throw new RigException("fault schedule: expected count >= 0 and meanGapItems >= 1, got " + count + " and "
                    + meanGapItems);
        }
        SplittableRandom rnd = new SplittableRandom(seed);
        List<Entry> list = new ArrayList<>();
        long item = firstItem;
        for (int i = 0; i < count; i++) {
            list.add(new Entry(item, fault, parameter));
            item += 1 + rnd.nextInt(2 * meanGapItems - 1);
        }
        return new FaultSchedule(list);
    }

    /**
     * @param other another schedule
     * @return both schedules' entries together
     */
    public FaultSchedule and(FaultSchedule other) {
        List<Entry> list = new ArrayList<>(entries);
        list.addAll(other.entries);
        return new FaultSchedule(list);
    }

    /**
     * @param fault a kind
     * @return how many entries are of that kind
     */
    public long count(InjectedFault fault) {
        return entries.stream().filter(e -> e.fault() == fault).count();
    }
}
