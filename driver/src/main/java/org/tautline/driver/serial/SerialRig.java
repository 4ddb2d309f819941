package org.tautline.driver.serial;

import java.util.ArrayList;
import java.util.List;

import org.tautline.driver.RigException;
import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;
import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/**
 * A rig on a serial port speaking PROTOCOL.md.
 *
 * <p>Opening switches the output off, reads the identity ({@code *IDN?}), agrees a protocol version
 * ({@code LINK:PROT?}, {@code LINK:PROT}), sets the watchdog, format and block size and reads the channels.
 * Reads are {@code ACQ:FETCH?} requests assembled from sequence-numbered blocks; a damaged or missing block
 * is re-requested once. On any link fault the rig commands the output off at once (best effort, waiting at
 * most {@value #OFF_CONFIRM_MS} ms for confirmation), records the fault ({@link #fault()}), and throws it;
 * every later call but switching off and closing throws too. Methods are synchronised.
 */
public final class SerialRig implements Rig {
    /** Protocol versions this host speaks. */
    static final int HOST_PROTOCOL_MIN = 1;
    /** Highest protocol version this host speaks. */
    static final int HOST_PROTOCOL_MAX = 1;
    /** Longest wait for the device to confirm the output is off after a fault, ms. */
    static final int OFF_CONFIRM_MS = 100;

    /**
     * A fault and what the rig did about it.
     *
     * @param fault the first link fault
     * @param detectedNanoTime {@link System#nanoTime()} when the host detected it
     * @param offSentNanoTime when {@code DRIVE:OUT OFF} was written, or -1 when the link did not allow it
     * @param offConfirmed true when the device answered {@code DRIVE:OUT?} with 0 within the bounded wait
     */
    public record FaultRecord(RigLinkException fault, long detectedNanoTime, long offSentNanoTime,
                              boolean offConfirmed) {
    }

    private final SerialTransport transport;
    private final SerialLinkSettings settings;
    private final LinkInbox inbox;
    private final BlockAssembler assembler;
    private final String port;
    private String identity;
    private int protocolVersion;
    private int bootCount;
    private double sampleRateHz;
    private double maxAmplitudeV;
    private List<ChannelInfo> channels;
    private double[] sensitivity;
    private long nextSampleIndex;
    private long nextSequence;
    private boolean outputOn;
    private boolean closed;
    private FaultRecord faultRecord;
    private final SerialExciter exciter = new SerialExciter();
    private final SerialAcquisition acquisition = new SerialAcquisition();

    private SerialRig(SerialTransport transport, SerialLinkSettings settings) {
        this.transport = transport;
        this.settings = settings;
        this.port = transport.port();
        this.inbox = new LinkInbox(port);
        this.assembler = new BlockAssembler(port, inbox);
    }

    /**
     * Opens a serial rig with {@link SerialLinkSettings#defaults()}.
     *
     * @param port a port path or system name
     * @return the connected rig, output off
     */
    public static SerialRig open(String port) {
        return open(port, SerialLinkSettings.defaults());
    }

    /**
     * Opens a serial rig.
     *
     * @param port a port path or system name
     * @param settings baud rate, timeouts, format, block size, watchdog
     * @return the connected rig, output off
     * @throws RigLinkException when the port cannot be opened or the device does not answer as the protocol says
     */
    public static SerialRig open(String port, SerialLinkSettings settings) {
        SerialTransport t = SerialTransport.open(port, settings.baud());
        SerialRig rig = new SerialRig(t, settings);
        t.startReading(rig.inbox);
        try {
            rig.handshake();
            return rig;
        } catch (RuntimeException e) {
            rig.close();
            throw e;
        }
    }

    private void handshake() {
        send("DRIVE:OUT OFF");
        send("ACQ:STREAM OFF");
        send("*CLS");
        String idn = query("*IDN?");
        String[] f = idn.split(",", -1);
        if (f.length != 4) {
            throw fail(new RigLinkException(Kind.PROTOCOL, port, "*IDN? answered '" + idn + "'",
                    "four comma-separated fields: maker,model,serial,firmware"));
        }
        identity = f[0].strip() + " " + f[1].strip() + ", serial " + f[2].strip() + ", firmware " + f[3].strip();
        long[] range = numbers(query("LINK:PROT?"), "LINK:PROT?", 2);
        long version = Math.min(range[1], HOST_PROTOCOL_MAX);
        if (version < Math.max(range[0], HOST_PROTOCOL_MIN)) {
            throw fail(new RigLinkException(Kind.PROTOCOL, port, "the device speaks protocol versions " + range[0] + ".."
                    + range[1], "a version in " + HOST_PROTOCOL_MIN + ".." + HOST_PROTOCOL_MAX + "; update the host or firmware"));
        }
        protocolVersion = (int) version;
        send("LINK:PROT " + protocolVersion);
        bootCount = (int) numbers(query("LINK:BOOT?"), "LINK:BOOT?", 1)[0];
        send("LINK:WDOG " + settings.watchdogMs());
        send("ACQ:FORM " + settings.format().mnemonic());
        send("ACQ:BLOCK " + settings.blockSamples());
        sampleRateHz = decimal(query("ACQ:RATE?"), "ACQ:RATE?");
        maxAmplitudeV = decimal(query("DRIVE:MAX?"), "DRIVE:MAX?");
        int count = (int) numbers(query("ACQ:CHAN:COUNT?"), "ACQ:CHAN:COUNT?", 1)[0];
        List<ChannelInfo> list = new ArrayList<>();
        sensitivity = new double[count];
        for (int i = 0; i < count; i++) {
            String c = query("ACQ:CHAN? " + i);
            String[] p = c.split(",", -1);
            if (p.length != 4) {
                throw fail(new RigLinkException(Kind.PROTOCOL, port, "ACQ:CHAN? " + i + " answered '" + c + "'",
                        "name,quantity,unit,sensitivity"));
            }
            list.add(new ChannelInfo(p[0].strip(), p[1].strip(), p[2].strip()));
            sensitivity[i] = decimal(p[3], "ACQ:CHAN? " + i);
        }
        channels = List.copyOf(list);
        inbox.sensitivity(sensitivity);
        nextSampleIndex = numbers(query("ACQ:NEXT?"), "ACQ:NEXT?", 1)[0];
        nextSequence = numbers(query("ACQ:SEQ?"), "ACQ:SEQ?", 1)[0];
        checkErrors("setting up the link");
    }

    @Override
    public synchronized String identity() {
        return identity;
    }

    @Override
    public Exciter exciter() {
        return exciter;
    }

    @Override
    public Acquisition acquisition() {
        return acquisition;
    }

    /** @return the protocol version agreed with the device */
    public synchronized int protocolVersion() {
        return protocolVersion;
    }

    /** @return the device's boot counter when the rig was opened ({@code LINK:BOOT?}) */
    public synchronized int bootCount() {
        return bootCount;
    }

    /**
     * @param channel channel index
     * @return engineering units per count of an integer sample format, from {@code ACQ:CHAN?}
     */
    public synchronized double sensitivity(int channel) {
        return sensitivity[channel];
    }

    /** @return the first link fault and what was done about it, or null while the link is healthy */
    public synchronized FaultRecord fault() {
        return faultRecord;
    }

    /** @return data blocks accepted so far */
    public synchronized long blocksReceived() {
        return assembler.received();
    }

    /** @return data blocks recovered by a re-request so far */
    public synchronized long blocksRecovered() {
        return assembler.recovered();
    }

    /** @return stray or unreadable bytes the decoder skipped, as counted fault events */
    public long strayByteEvents() {
        return inbox.strayFaults();
    }

    /** Commands the output off (bounded wait), then closes the port; never throws, idempotent. */
    @Override
    public synchronized void close() {
        if (closed) {
            return;
        }
        outputOff();
        closed = true;
        transport.close();
    }

    private void outputOff() {
        outputOn = false;
        if (!transport.isOpen()) {
            return;
        }
        try {
            transport.writeLine("DRIVE:OUT OFF");
            if (faultRecord == null) {
                confirmOff(settings.replyTimeoutMs());
            }
        } catch (RigLinkException e) {
            record(e);
        }
    }

    /** Asks DRIVE:OUT? and waits at most waitMs for "0"; returns whether it came. */
    private boolean confirmOff(long waitMs) {
        inbox.clearLines();
        transport.writeLine("DRIVE:OUT?");
        long deadline = System.nanoTime() + waitMs * 1_000_000L;
        try {
            while (System.nanoTime() < deadline) {
                String line = inbox.pollLine(5);
                if (line != null) {
                    return line.strip().equals("0");
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        return false;
    }

    private void record(RigLinkException e) {
        if (faultRecord == null) {
            faultRecord = new FaultRecord(e, System.nanoTime(), -1, false);
        }
    }

    /** Records the fault, commands the output off at once, and returns the fault for throwing. */
    private RigLinkException fail(RigLinkException e) {
        if (faultRecord != null) {
            return e;
        }
        long detected = System.nanoTime();
        outputOn = false;
        long sent = -1;
        boolean confirmed = false;
        if (transport.isOpen()) {
            try {
                transport.writeLine("DRIVE:OUT OFF");
                sent = System.nanoTime();
                confirmed = confirmOff(OFF_CONFIRM_MS);
            } catch (RigLinkException writeFault) {
                e.addSuppressed(writeFault);
            }
        }
        faultRecord = new FaultRecord(e, detected, sent, confirmed);
        return e;
    }

    private void requireUsable() {
        if (closed) {
            throw new RigException("the serial rig on " + port + " is closed; open it again with SerialRig.open");
        }
        if (faultRecord != null) {
            RigLinkException first = faultRecord.fault();
            throw new RigLinkException(first.kind(), port, "the link faulted earlier (" + first.getMessage() + ")",
                    "a new connection: close this rig and open it again");
        }
        RigLinkException link = inbox.linkFault();
        if (link != null) {
            throw fail(link);
        }
    }

    private void send(String command) {
        requireUsable();
        try {
            transport.writeLine(command);
        } catch (RigLinkException e) {
            throw fail(e);
        }
    }

    private String query(String command) {
        return query(command, settings.replyTimeoutMs());
    }

    private String query(String command, long timeoutMs) {
        inbox.clearLines();
        send(command);
        long deadline = System.nanoTime() + timeoutMs * 1_000_000L;
        try {
            while (true) {
                RigLinkException link = inbox.linkFault();
                if (link != null) {
                    throw fail(link);
                }
                String line = inbox.pollLine(5);
                if (line != null) {
                    if (line.startsWith("!ERR")) {
                        throw fail(new RigLinkException(Kind.DEVICE_ERROR, port, "the device refused " + command + ": "
                                + line.substring(4).strip(), "a reply; see PROTOCOL.md for the command"));
                    }
                    return line.strip();
                }
                if (System.nanoTime() > deadline) {
                    throw fail(new RigLinkException(Kind.TIMEOUT, port, "no reply to " + command + " within "
                            + timeoutMs + " ms", "one reply line"));
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw fail(new RigLinkException(Kind.TIMEOUT, port, "interrupted waiting for the reply to " + command,
                    "one reply line", e));
        }
    }

    private void checkErrors(String after) {
        String reply = query("SYST:ERR?");
        DeviceError e = DeviceError.parse(reply);
        if (e == null) {
            throw fail(new RigLinkException(Kind.PROTOCOL, port, "SYST:ERR? answered '" + reply + "'",
                    "code,\"message\", for example 0,\"No error\""));
        }
        if (e.code() != 0) {
            throw fail(new RigLinkException(Kind.DEVICE_ERROR, port, "the device reported " + e.reply() + " after "
                    + after, "0,\"No error\""));
        }
    }

    private double decimal(String reply, String command) {
        try {
            double v = Double.parseDouble(reply.strip());
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // Reported below with the reply text.
        }
        throw fail(new RigLinkException(Kind.PROTOCOL, port, command + " answered '" + reply + "'", "a finite number"));
    }

    private long[] numbers(String reply, String command, int count) {
        String[] parts = reply.split(",", -1);
        long[] out = new long[count];
        try {
            if (parts.length == count) {
                for (int i = 0; i < count; i++) {
                    out[i] = Long.parseLong(parts[i].strip());
                }
                return out;
            }
        } catch (NumberFormatException e) {
            // Reported below with the reply text.
        }
        throw fail(new RigLinkException(Kind.PROTOCOL, port, command + " answered '" + reply + "'",
                count + " comma-separated whole number(s)"));
    }

    private final class SerialExciter implements Exciter {
        @Override
        public void setSine(double frequencyHz, double amplitudeV) {
            synchronized (SerialRig.this) {
                requireUsable();
                checkAmplitude(amplitudeV);
                if (!(frequencyHz > 0 && frequencyHz < sampleRateHz / 2)) {
                    throw new RigException("drive frequency must lie between 0 and half the sample rate ("
                            + sampleRateHz / 2 + " Hz) of the rig on " + port + ", got " + frequencyHz + " Hz");
                }
                send("DRIVE:SINE " + frequencyHz + "," + amplitudeV);
                checkErrors("DRIVE:SINE " + frequencyHz + "," + amplitudeV);
            }
        }

        @Override
        public void rampTo(double amplitudeV, double durationS) {
            synchronized (SerialRig.this) {
                requireUsable();
                checkAmplitude(amplitudeV);
                if (!(durationS >= 0) || Double.isInfinite(durationS)) {
                    throw new RigException("ramp duration must be zero or a positive finite number of seconds, got "
                            + durationS);
                }
                send("DRIVE:RAMP " + amplitudeV + "," + durationS);
                nextSampleIndex = numbers(query("ACQ:NEXT?", settings.replyTimeoutMs() + Math.round(durationS * 1000)),
                        "ACQ:NEXT?", 1)[0];
                checkErrors("DRIVE:RAMP " + amplitudeV + "," + durationS);
            }
        }

        private void checkAmplitude(double v) {
            if (!(v >= 0) || v > maxAmplitudeV) {
                throw new RigException("drive amplitude must lie in 0.." + maxAmplitudeV + " V (the limit of the rig on "
                        + port + "), got " + v + " V");
            }
        }

        /** Switching on is checked with the device; switching off is best effort and never throws. */
        @Override
        public void setOutputEnabled(boolean enabled) {
            synchronized (SerialRig.this) {
                if (!enabled) {
                    outputOff();
                    return;
                }
                requireUsable();
                send("DRIVE:OUT ON");
                String state = query("DRIVE:OUT?");
                checkErrors("DRIVE:OUT ON");
                if (!state.equals("1")) {
                    throw fail(new RigLinkException(Kind.PROTOCOL, port, "DRIVE:OUT? answered '" + state
                            + "' after DRIVE:OUT ON", "1"));
                }
                outputOn = true;
            }
        }

        @Override
        public boolean isOutputEnabled() {
            synchronized (SerialRig.this) {
                return outputOn;
            }
        }

        @Override
        public double maxAmplitudeV() {
            synchronized (SerialRig.this) {
                return maxAmplitudeV;
            }
        }
    }

    private final class SerialAcquisition implements Acquisition {
        @Override
        public double sampleRateHz() {
            synchronized (SerialRig.this) {
                return sampleRateHz;
            }
        }

        @Override
        public List<ChannelInfo> channels() {
            synchronized (SerialRig.this) {
                return channels;
            }
        }

        @Override
        public SampleBlock read(int sampleCount) {
            synchronized (SerialRig.this) {
                requireUsable();
                if (sampleCount < 1) {
                    throw new RigException("read needs 1 or more samples per channel, got " + sampleCount);
                }
                return fetch(sampleCount);
            }
        }

        @Override
        public long nextSampleIndex() {
            synchronized (SerialRig.this) {
                return nextSampleIndex;
            }
        }
    }

    private SampleBlock fetch(int n) {
        long first = nextSampleIndex;
        assembler.clear();
        inbox.clearBlocks();
        send("ACQ:FETCH? " + n);
        double[][] out = null;
        int filled = 0;
        try {
            while (filled < n) {
                int expected = Math.min(settings.blockSamples(), n - filled);
                DataBlock b = assembler.await(nextSequence, settings.blockTimeoutMs(),
                        seq -> send("ACQ:RESEND? " + seq));
                checkBlock(b, expected);
                nextSequence = (nextSequence + 1) & 0xFFFFFFFFL;
                nextSampleIndex += expected;
                if (expected == n) {
                    return new SampleBlock(first, b.samples());
                }
                if (out == null) {
                    out = new double[channels.size()][n];
                }
                for (int c = 0; c < out.length; c++) {
                    System.arraycopy(b.samples()[c], 0, out[c], filled, expected);
                }
                filled += expected;
            }
        } catch (RigLinkException e) {
            throw fail(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw fail(new RigLinkException(Kind.TIMEOUT, port, "interrupted waiting for data block " + nextSequence,
                    "the blocks of ACQ:FETCH? " + n, e));
        }
        return new SampleBlock(first, out);
    }

    private void checkBlock(DataBlock b, int expected) {
        if (b.samples().length != channels.size() || b.sampleCount() != expected) {
            throw new RigLinkException(Kind.PROTOCOL, port, "data block " + b.sequence() + " has " + b.samples().length
                    + " channel(s) of " + b.sampleCount() + " samples", channels.size() + " channel(s) of " + expected);
        }
        if (b.firstSampleIndex() != nextSampleIndex) {
            throw new RigLinkException(Kind.SEQUENCE_GAP, port, "data block " + b.sequence() + " starts at sample "
                    + b.firstSampleIndex(), "sample " + nextSampleIndex + ", the one after the last delivered");
        }
    }
}
