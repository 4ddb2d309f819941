package org.tautline.driver.serial;

import java.util.HashSet;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.BooleanSupplier;

import org.tautline.driver.RigDataLostException;
import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;
import org.tautline.driver.spi.SampleBlock;

/**
 * One read: {@code ACQ:FETCH? n}, its blocks in sequence order, re-requests, status polls and the final check.
 *
 * <p>A damaged block (CRC), a later block first (a gap) or a block overdue by {@link LinkTiming#retryMs()} is
 * re-requested once ({@code ACQ:RESEND? seq}). While it waits the host asks {@code LINK:STAT?} every
 * {@link LinkTiming#pollMs()}; every status is {@linkplain CommandLink#verify verified}, so an amplifier fault or a
 * reset whose notice was lost still ends the read at the next status. When the last block is in, the read returns
 * only after a status sent after that block shows the same boot counter and, while the host believes the output on,
 * the output on: the output cannot come back on by itself, so the output was on for every sample.
 *
 * <p>When the samples cannot all be had while the device is alive ({@code !ERR} to a re-request, a re-requested
 * block still missing, a jump in the sample index) the read resynchronises ({@link CommandLink#resync}), takes the
 * sequence number and sample index from the status, and throws {@link RigDataLostException}. Silence for
 * {@link LinkTiming#silenceMs()}, a notice, a reset, an output that went off, or a lost port are faults
 * ({@link RigLinkException}) that switch the output off.
 */
final class FetchRead {
    /** Where the next read starts; updated by every read, also by one that loses its data. */
    static final class Cursor {
        long sequence;
        long sampleIndex;
    }

    private final CommandLink link;
    private final LinkInbox inbox;
    private final Cursor cursor;
    private final int channels;
    private final int blockSamples;
    private final BooleanSupplier outputBelievedOn;
    private final String port;
    private final TreeMap<Long, DataBlock> early = new TreeMap<>();
    private final Set<Long> reRequested = new HashSet<>();
    private long recovered;
    private long received;

    /**
     * @param link the command link
     * @param inbox what arrives
     * @param cursor where reads start
     * @param channels channel count
     * @param blockSamples samples per channel per block
     * @param outputBelievedOn true while the host believes the output is on (read at every check)
     */
    FetchRead(CommandLink link, LinkInbox inbox, Cursor cursor, int channels, int blockSamples,
              BooleanSupplier outputBelievedOn) {
        this.link = link;
        this.inbox = inbox;
        this.cursor = cursor;
        this.channels = channels;
        this.blockSamples = blockSamples;
        this.outputBelievedOn = outputBelievedOn;
        this.port = link.port();
    }

    /** @return blocks recovered by a re-request so far */
    long recovered() {
        return recovered;
    }

    /** @return blocks accepted so far */
    long received() {
        return received;
    }

    /**
     * Reads n samples per channel.
     *
     * @param n samples per channel, 1 or more
     * @return the samples, starting at the cursor's sample index
     * @throws RigDataLostException when samples were lost but the link is healthy again
     * @throws RigLinkException on a link or device fault (the output has been commanded off)
     */
    SampleBlock read(int n) {
        LinkTiming t = link.timing();
        early.clear();
        reRequested.clear();
        inbox.clear();
        String request = "ACQ:FETCH? " + n;
        link.send(request);
        long first = cursor.sampleIndex;
        long awaited = cursor.sequence;
        double[][] out = new double[channels][n];
        int filled = 0;
        long waitStart = System.nanoTime();
        long lastProgress = waitStart;
        long lastPoll = waitStart;
        long finalTag = -1;
        long finalSent = 0;
        String symptom = null;
        boolean stuckBlockReleased = false;
        boolean finalHurried = false;
        int finalTries = 1;
        while (true) {
            DataBlock b = early.remove(awaited);
            LinkEvent e = b != null ? new LinkEvent.Block(b) : link.nextEvent(5);
            long now = System.nanoTime();
            if (e instanceof LinkEvent.Block || e instanceof LinkEvent.Damaged) {
                // The stream moves: a re-sent block waits behind the blocks still due, so it is not overdue yet.
                lastProgress = now;
            }
            lastProgress = Math.max(lastProgress, inbox.lastPartialBlockNanos());
            if (e instanceof LinkEvent.Status s) {
                link.verify(s.status(), outputBelievedOn.getAsBoolean(), "during " + request);
                if (finalTag >= 0 && s.status().tag() >= finalTag) {
                    return new SampleBlock(first, out);
                }
            } else if (e instanceof LinkEvent.Block blk && finalTag < 0) {
                DataBlock block = blk.block();
                long ahead = (block.sequence() - awaited) & 0xFFFFFFFFL;
                if (ahead == 0) {
                    int expected = Math.min(blockSamples, n - filled);
                    checkShape(block, expected);
                    if (block.firstSampleIndex() != cursor.sampleIndex) {
                        throw lose("data block " + awaited + " starts at sample " + block.firstSampleIndex()
                                + " where sample " + cursor.sampleIndex + " was due (the device skipped samples)");
                    }
                    for (int c = 0; c < channels; c++) {
                        System.arraycopy(block.samples()[c], 0, out[c], filled, expected);
                    }
                    filled += expected;
                    received++;
                    if (reRequested.contains(awaited)) {
                        recovered++;
                    }
                    awaited = (awaited + 1) & 0xFFFFFFFFL;
                    cursor.sequence = awaited;
                    cursor.sampleIndex += expected;
                    lastProgress = now;
                    if (filled == n) {
                        finalTag = sendStatus();
                        finalSent = now;
                    }
                } else if (ahead < 1L << 31) {
                    early.put(block.sequence(), block);
                    symptom = symptom != null ? symptom : "block " + block.sequence() + " arrived while block "
                            + awaited + " was awaited";
                    lastProgress = reRequest(awaited, lastProgress, now);
                }
            } else if (e instanceof LinkEvent.Damaged d && finalTag < 0) {
                symptom = symptom != null ? symptom : d.fault().getMessage();
                lastProgress = reRequest(awaited, lastProgress, now);
            } else if (e instanceof LinkEvent.Reply r && r.text().startsWith("!ERR") && !reRequested.isEmpty()
                    && finalTag < 0) {
                throw lose("the device could not resend data block " + awaited + " (" + r.text().substring(4).strip()
                        + ")" + (symptom == null ? "" : " after " + symptom));
            } else if (e instanceof LinkEvent.Garbled && finalTag >= 0 && !finalHurried) {
                sendStatus();
                finalHurried = true;
            } else if (e == null) {
                link.checkSilence(Math.max(waitStart, lastProgress), finalTag >= 0 ? "the status after " + request
                        : "data block " + awaited + " of " + request);
                if (finalTag >= 0 && now - finalSent > t.retryMs() * 1_000_000L) {
                    if (++finalTries > CommandLink.MAX_TRIES) {
                        throw link.fail(new RigLinkException(Kind.PROTOCOL, port, "no readable status reply after "
                                + request + " in " + CommandLink.MAX_TRIES + " tries", "STAT lines whose check matches"));
                    }
                    inbox.abandonPending();
                    sendStatus();
                    finalSent = now;
                    finalHurried = false;
                } else if (finalTag < 0 && now - lastProgress > t.retryMs() * 1_000_000L) {
                    if (reRequested.contains(awaited) && !stuckBlockReleased) {
                        // A block cut short by lost bytes holds the decoder until its length is made up, perhaps
                        // by the resent block itself: release it and give the resend half a wait more.
                        inbox.abandonPending();
                        stuckBlockReleased = true;
                        lastProgress = now - t.retryMs() * 500_000L;
                    } else if (reRequested.contains(awaited)) {
                        throw lose("data block " + awaited + " did not arrive within " + t.retryMs() * 3 / 2
                                + " ms of its re-request" + (symptom == null ? "" : " after " + symptom));
                    } else {
                        inbox.abandonPending();
                        lastProgress = reRequest(awaited, lastProgress, now);
                        stuckBlockReleased = false;
                    }
                }
            }
            if (now - lastPoll > t.pollMs() * 1_000_000L) {
                sendStatus();
                lastPoll = now;
            }
        }
    }

    private long sendStatus() {
        long tag = link.nextTag();
        link.send("LINK:STAT? " + tag);
        return tag;
    }

    private long reRequest(long sequence, long lastProgress, long now) {
        if (reRequested.add(sequence)) {
            link.send("ACQ:RESEND? " + sequence);
            return now;
        }
        return lastProgress;
    }

    private void checkShape(DataBlock b, int expected) {
        if (b.samples().length != channels || b.sampleCount() != expected) {
            throw link.fail(new RigLinkException(Kind.PROTOCOL, port, "data block " + b.sequence() + " has "
                    + b.samples().length + " channel(s) of " + b.sampleCount() + " samples", channels
                    + " channel(s) of " + expected));
        }
    }

    /** Resynchronises, moves the cursor to where the device now stands, and builds the exception. */
    private RigDataLostException lose(String what) {
        DeviceStatus s = link.resync(what);
        link.verify(s, outputBelievedOn.getAsBoolean(), "while resynchronising after lost samples");
        long lostFrom = cursor.sampleIndex;
        cursor.sequence = s.nextSequence();
        cursor.sampleIndex = s.nextSample();
        return new RigDataLostException("samples were lost on " + port + ": " + what + "; the read from sample "
                + lostFrom + " is abandoned and the link resynchronised (the next read starts at sample "
                + s.nextSample() + "); expected: measure the step again");
    }
}
