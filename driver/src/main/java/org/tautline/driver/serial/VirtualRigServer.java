package org.tautline.driver.serial;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;

import org.tautline.driver.RigLinkException;
import org.tautline.driver.sim.SimulationConfig;

/**
 * A virtual rig: a {@link org.tautline.driver.sim.SimulatedRig} served through PROTOCOL.md on a serial port,
 * with switches that inject link faults.
 *
 * <p>Three threads: the port reader runs each command as its line arrives; a sender writes replies and
 * blocks in order (applying the fault switches); a worker checks the watchdog every 5 ms and paces
 * streaming at the simulated sample rate. Every event that matters for safety (each {@code DRIVE:OUT}
 * command, each time the device switches the output off itself, resets, resends) goes to {@link #log()}
 * with its {@link System#nanoTime()}.
 */
public final class VirtualRigServer implements AutoCloseable {
    private static final byte[] STOP = new byte[0];

    /**
     * One logged event.
     *
     * @param nanoTime {@link System#nanoTime()} when it happened
     * @param event what happened, for example {@code command DRIVE:OUT OFF}
     */
    public record LogEntry(long nanoTime, String event) {
    }

    private final SerialTransport transport;
    private final PtyPair ownedPair;
    private final VirtualDevice device;
    private final LinkedBlockingQueue<byte[]> outbox = new LinkedBlockingQueue<>();
    private final List<LogEntry> log = new ArrayList<>();
    private final StringBuilder pendingLine = new StringBuilder();
    private final Thread sender;
    private final Thread worker;
    private final SenderFaults faults = new SenderFaults();
    private volatile boolean closed;

    private VirtualRigServer(SimulationConfig config, SerialTransport transport, PtyPair ownedPair) {
        this.transport = transport;
        this.ownedPair = ownedPair;
        this.device = new VirtualDevice(config, outbox::add, this::record);
        this.sender = new Thread(this::sendLoop, "virtual-rig sender " + transport.port());
        this.worker = new Thread(this::workLoop, "virtual-rig worker " + transport.port());
        sender.setDaemon(true);
        worker.setDaemon(true);
    }

    /**
     * Serves a simulated rig on a serial port, typically the device end of a {@link PtyPair}.
     *
     * @param config what to simulate
     * @param devicePath the port to serve on
     * @param baud baud rate, bits per second
     * @return the running server
     */
    public static VirtualRigServer start(SimulationConfig config, String devicePath, int baud) {
        return begin(config, SerialTransport.open(devicePath, baud), null);
    }

    /**
     * Makes a {@link PtyPair} and serves a simulated rig on its device end; the pair closes with the server.
     *
     * @param config what to simulate
     * @param baud baud rate, bits per second
     * @return the running server; connect a {@link SerialRig} to {@link #hostPath()}
     */
    public static VirtualRigServer startOnPty(SimulationConfig config, int baud) {
        PtyPair pair = PtyPair.open();
        try {
            return begin(config, SerialTransport.open(pair.devicePath(), baud), pair);
        } catch (RuntimeException e) {
            pair.close();
            throw e;
        }
    }

    private static VirtualRigServer begin(SimulationConfig config, SerialTransport transport, PtyPair pair) {
        VirtualRigServer s = new VirtualRigServer(config, transport, pair);
        s.sender.start();
        s.worker.start();
        transport.startReading(new SerialTransport.Receiver() {
            @Override
            public void bytes(byte[] data, int offset, int length) {
                s.received(data, offset, length);
            }

            @Override
            public void gone(RigLinkException fault) {
                s.device.outputOff("port gone: " + fault.getMessage());
            }
        });
        return s;
    }

    /** @return the port the server listens on */
    public String devicePath() {
        return transport.port();
    }

    /** @return the host end of the owned pty pair, or null when started on a given port */
    public String hostPath() {
        return ownedPair == null ? null : ownedPair.hostPath();
    }

    private void received(byte[] data, int offset, int length) {
        for (int i = offset; i < offset + length; i++) {
            char ch = (char) (data[i] & 0xFF);
            if (ch == '\n') {
                device.handle(pendingLine.toString());
                pendingLine.setLength(0);
            } else if (pendingLine.length() < StreamDecoder.MAX_LINE_BYTES) {
                pendingLine.append(ch);
            }
        }
    }

    private void record(String event) {
        synchronized (log) {
            log.add(new LogEntry(System.nanoTime(), event));
        }
    }

    /** @return a copy of the event log, oldest first */
    public List<LogEntry> log() {
        synchronized (log) {
            return List.copyOf(log);
        }
    }

    /** @return true while the simulated drive output is on */
    public boolean outputEnabled() {
        return device.outputEnabled();
    }

    /** @param count bytes to cut out of the middle of the next data block sent */
    public void dropBytes(int count) {
        faults.dropBytes(count);
    }

    /** @param times the next data block gets one sample byte flipped, and so do its first {@code times - 1} resends */
    public void corruptBlock(int times) {
        faults.corruptBlock(times);
    }

    /** @param times the next data block is not sent, nor are its first {@code times - 1} resends */
    public void loseBlock(int times) {
        faults.loseBlock(times);
    }

    /** @param garbage bytes sent just before the next data block */
    public void insertGarbage(byte[] garbage) {
        faults.insertGarbage(garbage);
    }

    /** The next reply line is replaced by a line the protocol does not allow. */
    public void garbleNextReply() {
        faults.garbleNextReply();
    }

    /** @param durationMs from now, nothing is sent for this long; commands are still obeyed */
    public void stall(long durationMs) {
        faults.stallUntil(System.nanoTime() + durationMs * 1_000_000L);
        record("stall " + durationMs + " ms");
    }

    /** Resets the device: it forgets its state, switches the output off and sends {@code !RESET}. */
    public void reset() {
        device.reset();
    }

    /** An amplifier fault: the device switches the output off and queues error 110. */
    public void amplifierFault() {
        device.amplifierFault();
    }

    /** The device vanishes: output off, port closed, and the owned pty pair (if any) killed. */
    public void disappear() {
        device.outputOff("device disappeared");
        record("disappear");
        shutDown();
    }

    private void sendLoop() {
        try {
            while (true) {
                byte[] item = outbox.take();
                if (item == STOP) {
                    return;
                }
                for (byte[] out : faults.apply(item, this::record)) {
                    transport.write(out);
                }
                device.activity();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (RigLinkException e) {
            device.outputOff("write failed: " + e.getMessage());
        }
    }

    private void workLoop() {
        long nextBlockNs = System.nanoTime();
        while (!closed) {
            long now = System.nanoTime();
            device.checkWatchdog(now);
            if (device.streaming()) {
                if (now >= nextBlockNs) {
                    device.streamOneBlock();
                    nextBlockNs = Math.max(nextBlockNs + device.blockPeriodNs(), now - device.blockPeriodNs());
                }
            } else {
                nextBlockNs = now;
            }
            long sleepNs = Math.min(5_000_000L, Math.max(200_000L, nextBlockNs - System.nanoTime()));
            try {
                TimeUnit.NANOSECONDS.sleep(device.streaming() ? sleepNs : 5_000_000L);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return;
            }
        }
    }

    private void shutDown() {
        if (closed) {
            return;
        }
        closed = true;
        outbox.add(STOP);
        worker.interrupt();
        transport.close();
        if (ownedPair != null) {
            ownedPair.close();
        }
        try {
            sender.join(1000);
            worker.join(1000);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    /** Switches the simulated output off, stops the threads, closes the port and any owned pty pair; idempotent. */
    @Override
    public void close() {
        device.outputOff("server closed");
        shutDown();
    }
}
