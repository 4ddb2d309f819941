package org.tautline.driver.serial;

import java.util.HashSet;
import java.util.Set;
import java.util.TreeMap;

import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;

/**
 * Waits for data blocks in sequence order, re-requesting a missing or damaged block once by its number.
 *
 * <p>A CRC fault is charged to the block awaited; a block with a later sequence number means those
 * between are missing (a gap) and is kept until they are in; silence for the block timeout means the
 * awaited block is lost. Each of these re-requests the awaited block once ({@code ACQ:RESEND? <seq>});
 * when it has still not arrived intact one block timeout after the re-request, the read ends with a
 * {@link RigLinkException} of the first fault's kind ({@link Kind#TIMEOUT} when there was only silence).
 */
final class BlockAssembler {
    /** Sends a re-request for one sequence number. */
    interface ReRequester {
        /** @param sequence the block wanted again */
        void reRequest(long sequence);
    }

    private static final long POLL_MS = 5;

    private final String port;
    private final LinkInbox inbox;
    private final TreeMap<Long, DataBlock> early = new TreeMap<>();
    private final Set<Long> reRequested = new HashSet<>();
    private long recovered;
    private long received;

    LinkInbox inbox() {
        return inbox;
    }

    BlockAssembler(String port, LinkInbox inbox) {
        this.port = port;
        this.inbox = inbox;
    }

    /** @return blocks recovered by a re-request so far */
    long recovered() {
        return recovered;
    }

    /** @return blocks accepted so far */
    long received() {
        return received;
    }

    /** Forgets blocks kept from an earlier request. */
    void clear() {
        early.clear();
        reRequested.clear();
    }

    /**
     * Waits for one block.
     *
     * @param sequence the sequence number wanted
     * @param timeoutMs longest silence before a re-request, and again before giving up, ms
     * @param requester sends {@code ACQ:RESEND?}
     * @return the block
     * @throws RigLinkException when it cannot be had, or the link ends
     * @throws InterruptedException when the waiting thread is interrupted
     */
    DataBlock await(long sequence, long timeoutMs, ReRequester requester) throws InterruptedException {
        long deadline = System.nanoTime() + timeoutMs * 1_000_000L;
        RigLinkException cause = null;
        while (true) {
            DataBlock kept = early.remove(sequence);
            if (kept != null) {
                return accept(sequence, kept);
            }
            RigLinkException link = inbox.linkFault();
            if (link != null) {
                throw link;
            }
            Object event = inbox.pollBlockEvent(POLL_MS);
            if (event == null) {
                if (System.nanoTime() < deadline) {
                    continue;
                }
                if (!reRequested.contains(sequence)) {
                    inbox.abandonPending();
                    reRequest(sequence, requester);
                    deadline = System.nanoTime() + timeoutMs * 1_000_000L;
                    continue;
                }
                throw giveUp(sequence, timeoutMs, cause);
            }
            if (event instanceof RigLinkException crc) {
                // The damaged block is taken to be the one awaited; if it was a later one, that one shows up
                // missing in turn and is re-requested by its own number.
                cause = cause == null ? crc : cause;
                if (!reRequested.contains(sequence)) {
                    reRequest(sequence, requester);
                    deadline = System.nanoTime() + timeoutMs * 1_000_000L;
                }
                continue;
            }
            DataBlock block = (DataBlock) event;
            long ahead = (block.sequence() - sequence) & 0xFFFFFFFFL;
            if (ahead == 0) {
                return accept(sequence, block);
            }
            if (ahead < 1L << 31) {
                early.put(block.sequence(), block);
                if (cause == null) {
                    cause = new RigLinkException(Kind.SEQUENCE_GAP, port, "data block " + block.sequence()
                            + " arrived while block " + sequence + " was awaited", "blocks in sequence order");
                }
                if (!reRequested.contains(sequence)) {
                    reRequest(sequence, requester);
                    deadline = System.nanoTime() + timeoutMs * 1_000_000L;
                }
            }
        }
    }

    private DataBlock accept(long sequence, DataBlock block) {
        if (reRequested.remove(sequence)) {
            recovered++;
        }
        received++;
        return block;
    }

    private void reRequest(long sequence, ReRequester requester) {
        reRequested.add(sequence);
        requester.reRequest(sequence);
    }

    private RigLinkException giveUp(long sequence, long timeoutMs, RigLinkException cause) {
        if (cause == null) {
            return new RigLinkException(Kind.TIMEOUT, port, "data block " + sequence + " did not arrive within "
                    + timeoutMs + " ms, nor after a re-request", "the next block of the request");
        }
        Kind kind = cause.kind();
        String what = kind == Kind.CRC ? "data block " + sequence + " failed its CRC-32 and did not arrive intact"
                + " within " + timeoutMs + " ms of its re-request"
                : "data block " + sequence + " is missing (a later block arrived) and its re-request was not"
                + " answered within " + timeoutMs + " ms";
        return new RigLinkException(kind, port, what, "the device to resend the block from its history");
    }
}
