package org.tautline.driver.serial;

import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;

import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;

/**
 * What the host has received: reply lines, data blocks and CRC faults in arrival order, and any fault
 * that ends the link (port gone, device reset notice, device watchdog notice).
 *
 * <p>Fed by the transport's reader thread; read by the thread using the rig.
 */
final class LinkInbox implements StreamDecoder.Sink, SerialTransport.Receiver {
    private final String port;
    private final StreamDecoder decoder;
    private final LinkedBlockingQueue<String> lines = new LinkedBlockingQueue<>();
    private final LinkedBlockingQueue<Object> blockEvents = new LinkedBlockingQueue<>();
    private volatile RigLinkException linkFault;
    private final AtomicLong strayFaults = new AtomicLong();

    LinkInbox(String port) {
        this.port = port;
        this.decoder = new StreamDecoder(port, BlockCodec.DEFAULT_MAX_PAYLOAD_BYTES, this);
    }

    @Override
    public void bytes(byte[] data, int offset, int length) {
        synchronized (decoder) {
            decoder.feed(data, offset, length);
        }
    }

    @Override
    public void gone(RigLinkException fault) {
        if (linkFault == null) {
            linkFault = fault;
        }
    }

    @Override
    public void line(String line) {
        if (line.startsWith("!RESET")) {
            linkFault = new RigLinkException(Kind.DEVICE_RESET, port, "the device announced a reset ('" + line
                    + "') and has forgotten its state", "no reset during a session; reconnect to go on");
        } else if (line.startsWith("!WDOG")) {
            linkFault = new RigLinkException(Kind.DEVICE_ERROR, port, "the device's watchdog switched the output"
                    + " off ('" + line + "')", "a command within the watchdog time");
        } else {
            lines.add(line);
        }
    }

    @Override
    public void block(DataBlock block) {
        blockEvents.add(block);
    }

    @Override
    public void fault(RigLinkException fault) {
        if (fault.kind() == Kind.CRC) {
            blockEvents.add(fault);
        } else {
            strayFaults.incrementAndGet();
        }
    }

    /** @param unitsPerCount engineering units per count of each channel */
    void sensitivity(double[] unitsPerCount) {
        synchronized (decoder) {
            decoder.sensitivity(unitsPerCount);
        }
    }

    /** Gives up on a partly received block so that what follows it can be decoded. */
    void abandonPending() {
        synchronized (decoder) {
            decoder.abandonPending();
        }
    }

    /** @return the fault that ended the link, or null */
    RigLinkException linkFault() {
        return linkFault;
    }

    /** Forgets reply lines nobody waited for. */
    void clearLines() {
        lines.clear();
    }

    /** @param ms longest wait @return the next reply line, or null */
    String pollLine(long ms) throws InterruptedException {
        return lines.poll(ms, TimeUnit.MILLISECONDS);
    }

    /** @param ms longest wait @return the next {@link DataBlock} or CRC {@link RigLinkException}, or null */
    Object pollBlockEvent(long ms) throws InterruptedException {
        return blockEvents.poll(ms, TimeUnit.MILLISECONDS);
    }

    /** Forgets blocks and CRC faults nobody waited for. */
    void clearBlocks() {
        blockEvents.clear();
    }

    /** @return stray or unreadable bytes reported by the decoder */
    long strayFaults() {
        return strayFaults.get();
    }
}
