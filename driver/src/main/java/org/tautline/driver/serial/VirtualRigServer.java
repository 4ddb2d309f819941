package org.tautline.driver.serial;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Supplier;

import org.tautline.driver.RigLinkException;
import org.tautline.driver.sim.SimulationConfig;

/**
 * A virtual rig: a {@link org.tautline.driver.sim.SimulatedRig} served through PROTOCOL.md on a serial port,
 * with switches and a schedule that inject link faults.
 *
 * <p>Three threads: the port reader runs each command as its line arrives; a sender writes urgent items (notices,
 * status replies) and then the ordered ones (replies, blocks), applying the faults, and paced at the baud rate when
 * {@link VirtualRigSettings#paced()}; a worker checks the watchdog every 5 ms and paces streaming at the simulated
 * sample rate. Every command line received, notice sent, output change and injected fault goes to the
 * {@link VirtualRigLog} ({@link #log()}, and the settings' log file).
 */
public final class VirtualRigServer implements AutoCloseable {
    private final SerialTransport transport;
    private final PtyPair ownedPair;
    private final VirtualRigSettings settings;
    private final DeviceOutbox outbox = new DeviceOutbox();
    private final VirtualRigLog log;
    private final VirtualDevice device;
    private final SenderFaults faults = new SenderFaults();
    private final StringBuilder pendingLine = new StringBuilder();
    private int pendingLength;
    private final Thread sender;
    private final Thread worker;
    private final AtomicLong itemsSent = new AtomicLong();
    private final PacedWriter paced;
    private volatile boolean closed;

    private VirtualRigServer(SimulationConfig config, SerialTransport transport, PtyPair ownedPair,
                             VirtualRigSettings settings, VirtualRigLog log) {
        this.transport = transport;
        this.ownedPair = ownedPair;
        this.settings = settings;
        this.log = log;
        this.paced = settings.paced() ? new PacedWriter(transport, settings.baud()) : null;
        this.device = new VirtualDevice(config, outbox, log);
        this.sender = new Thread(this::sendLoop, "virtual-rig sender " + transport.port());
        this.worker = new Thread(this::workLoop, "virtual-rig worker " + transport.port());
        sender.setDaemon(true);
        worker.setDaemon(true);
    }

    /**
     * Serves a simulated rig on a serial port, typically the device end of a {@link PtyPair}; unpaced, log in memory.
     *
     * @param config what to simulate
     * @param devicePath the port to serve on
     * @param baud baud rate, bits per second
     * @return the running server
     */
    public static VirtualRigServer start(SimulationConfig config, String devicePath, int baud) {
        return start(config, devicePath, VirtualRigSettings.of(baud));
    }

    /**
     * Serves a simulated rig on a serial port.
     *
     * @param config what to simulate
     * @param devicePath the port to serve on
     * @param settings baud rate, pacing, log file
     * @return the running server
     */
    public static VirtualRigServer start(SimulationConfig config, String devicePath, VirtualRigSettings settings) {
        VirtualRigLog log = new VirtualRigLog(settings.logFile());
        try {
            return begin(config, SerialTransport.open(devicePath, settings.baud()), null, settings, log);
        } catch (RuntimeException e) {
            log.close();
            throw e;
        }
    }

    /**
     * Makes a {@link PtyPair} and serves a simulated rig on its device end; unpaced, log in memory.
     *
     * @param config what to simulate
     * @param baud baud rate, bits per second
     * @return the running server; connect a {@link SerialRig} to {@link #hostPath()}
     */
    public static VirtualRigServer startOnPty(SimulationConfig config, int baud) {
        return startOnPty(config, VirtualRigSettings.of(baud));
    }

    /**
     * Makes a {@link PtyPair} and serves a simulated rig on its device end; the pair closes with the server.
     *
     * @param config what to simulate
     * @param settings baud rate, pacing, log file
     * @return the running server; connect a {@link SerialRig} to {@link #hostPath()}
     */
    public static VirtualRigServer startOnPty(SimulationConfig config, VirtualRigSettings settings) {
        VirtualRigLog log = new VirtualRigLog(settings.logFile());
        PtyPair pair = PtyPair.open();
        try {
            return begin(config, SerialTransport.open(pair.devicePath(), settings.baud()), pair, settings, log);
        } catch (RuntimeException e) {
            pair.close();
            log.close();
            throw e;
        }
    }

    private static VirtualRigServer begin(SimulationConfig config, SerialTransport transport, PtyPair pair,
                                          VirtualRigSettings settings, VirtualRigLog log) {
        VirtualRigServer s = new VirtualRigServer(config, transport, pair, settings, log);
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

    /** @return the settings the server runs with */
    public VirtualRigSettings settings() {
        return settings;
    }

    private void received(byte[] data, int offset, int length) {
        for (int i = offset; i < offset + length; i++) {
            char ch = (char) (data[i] & 0xFF);
            if (ch == '\n') {
                if (pendingLength > StreamDecoder.MAX_LINE_BYTES) {
                    device.overlongLine(pendingLength);
                } else {
                    device.handle(pendingLine.toString());
                }
                pendingLine.setLength(0);
                pendingLength = 0;
            } else {
                pendingLength++;
                if (pendingLength <= StreamDecoder.MAX_LINE_BYTES) {
                    pendingLine.append(ch);
                }
            }
        }
    }

    /** @return a copy of the event log kept in memory, oldest first (see {@link VirtualRigLog} for the format) */
    public List<VirtualRigLog.Entry> log() {
        return log.entries();
    }

    /** @return true while the simulated drive output is on */
    public boolean outputEnabled() {
        return device.outputEnabled();
    }

    /** @return lines and data blocks sent so far (the unit of {@link FaultSchedule} moments) */
    public long itemsSent() {
        return itemsSent.get();
    }

    /** @return streaming blocks dropped because the line could not carry them (only with pacing) */
    public long streamOverruns() {
        return device.overruns();
    }

    /**
     * Adds scheduled faults; their moments count from the items sent so far.
     *
     * @param schedule the faults and their moments
     */
    public void schedule(FaultSchedule schedule) {
        faults.schedule(schedule, itemsSent.get());
        outbox.nudge();
    }

    /**
     * @param fault a kind
     * @return how many faults of that kind were injected so far, scheduled or switched
     */
    public long injected(InjectedFault fault) {
        return faults.applied(fault);
    }

    /** @return faults scheduled or switched on and not yet injected */
    public int pendingFaults() {
        return faults.pending();
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

    /** The next reply or status line is replaced by a line the protocol does not allow. */
    public void garbleNextReply() {
        faults.garbleNextReply();
    }

    /** @param durationMs from now, nothing is sent for this long; commands are still obeyed */
    public void stall(long durationMs) {
        faults.stallUntil(System.nanoTime() + durationMs * 1_000_000L);
        faults.count(InjectedFault.STALL);
        log.add("fault", "stall " + durationMs + " ms");
    }

    /** The device forgets the blocks it keeps for resends. */
    public void forgetHistory() {
        faults.count(InjectedFault.FORGET_HISTORY);
        log.add("fault", "forget-history");
        device.forgetHistory();
    }

    /** Resets the device: it forgets its state, switches the output off and sends {@code !RESET}. */
    public void reset() {
        faults.count(InjectedFault.RESET);
        log.add("fault", "reset");
        device.reset();
    }

    /** An amplifier fault: the device switches the output off, queues error 110 and sends {@code !FAULT 110}. */
    public void amplifierFault() {
        faults.count(InjectedFault.AMPLIFIER_FAULT);
        log.add("fault", "amplifier-fault");
        device.amplifierFault();
    }

    /** The device vanishes: output off, port closed, and the owned pty pair (if any) killed. */
    public void disappear() {
        faults.count(InjectedFault.DISAPPEAR);
        log.add("fault", "disappear");
        device.outputOff("device disappeared");
        shutDown();
    }

    /**
     * Injects one fault now.
     *
     * @param fault what
     * @param parameter bytes for {@link InjectedFault#DROP_BYTES}, milliseconds for {@link InjectedFault#STALL}
     */
    public void inject(InjectedFault fault, int parameter) {
        switch (fault) {
            case DROP_BYTES -> dropBytes(parameter);
            case CORRUPT_BLOCK -> corruptBlock(1);
            case LOSE_BLOCK -> loseBlock(1);
            case STALL -> stall(parameter);
            case FORGET_HISTORY -> forgetHistory();
            case RESET -> reset();
            case AMPLIFIER_FAULT -> amplifierFault();
            case DISAPPEAR -> disappear();
        }
    }

    private void sendLoop() {
        try {
            List<FaultSchedule.Entry> afterItem = new ArrayList<>();
            while (!closed) {
                for (FaultSchedule.Entry e : faults.due(itemsSent.get())) {
                    if (e.fault() == InjectedFault.FORGET_HISTORY) {
                        afterItem.add(e);
                    } else {
                        inject(e.fault(), e.parameter());
                    }
                }
                if (closed) {
                    return;
                }
                if (faults.waitOutStall()) {
                    log.add("event", "stall ended");
                }
                Object o = outbox.take();
                if (o == null) {
                    return;
                }
                byte[] item = resolve(o);
                if (item == null) {
                    continue;
                }
                for (byte[] out : faults.apply(item, text -> log.add("fault", text))) {
                    write(out);
                }
                if (item[0] == '!') {
                    log.add("notice", new String(item, StandardCharsets.US_ASCII).strip());
                }
                itemsSent.incrementAndGet();
                for (FaultSchedule.Entry e : afterItem) {
                    inject(e.fault(), e.parameter());
                }
                afterItem.clear();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (RigLinkException e) {
            device.outputOff("write failed: " + e.getMessage());
        }
    }

    @SuppressWarnings("unchecked")
    private byte[] resolve(Object o) {
        if (o == DeviceOutbox.NUDGE) {
            return null;
        }
        if (o instanceof DeviceOutbox.FetchJob job) {
            return device.produce(job);
        }
        if (o instanceof Supplier<?> lazy) {
            return ((Supplier<byte[]>) lazy).get();
        }
        return (byte[]) o;
    }

    private void write(byte[] b) {
        if (paced == null) {
            transport.write(b);
        } else {
            paced.write(b);
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
        outbox.close();
        worker.interrupt();
        transport.close();
        if (ownedPair != null) {
            ownedPair.close();
        }
        try {
            for (Thread t : new Thread[] {sender, worker}) {
                if (t != Thread.currentThread()) {
                    t.join(1000);
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    /** Switches the simulated output off, stops the threads, closes the port, any owned pty pair and the log; idempotent. */
    @Override
    public void close() {
        device.outputOff("server closed");
        shutDown();
        log.close();
    }
}
