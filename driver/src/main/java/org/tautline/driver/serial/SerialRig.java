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

    private final SerialLinkSettings settings;
    private final LinkInbox inbox;
    private final BlockAssembler assembler;
    private final CommandLink link;
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
    private final SerialExciter exciter = new SerialExciter();
    private final SerialAcquisition acquisition = new SerialAcquisition();

    private SerialRig(SerialTransport transport, SerialLinkSettings settings) {
        this.settings = settings;
        this.port = transport.port();
        this.inbox = new LinkInbox(port);
        this.assembler = new BlockAssembler(port, inbox);
        this.link = new CommandLink(transport, inbox, settings.replyTimeoutMs());
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
        link.send("DRIVE:OUT OFF");
        link.send("ACQ:STREAM OFF");
        link.send("*CLS");
        String idn = link.query("*IDN?");
        String[] f = idn.split(",", -1);
        if (f.length != 4) {
            throw link.fail(new RigLinkException(Kind.PROTOCOL, port, "*IDN? answered '" + idn + "'",
                    "four comma-separated fields: maker,model,serial,firmware"));
        }
        identity = f[0].strip() + " " + f[1].strip() + ", serial " + f[2].strip() + ", firmware " + f[3].strip();
        long[] range = link.numbers(link.query("LINK:PROT?"), "LINK:PROT?", 2);
        long version = Math.min(range[1], HOST_PROTOCOL_MAX);
        if (version < Math.max(range[0], HOST_PROTOCOL_MIN)) {
            throw link.fail(new RigLinkException(Kind.PROTOCOL, port, "the device speaks protocol versions " + range[0] + ".."
                    + range[1], "a version in " + HOST_PROTOCOL_MIN + ".." + HOST_PROTOCOL_MAX + "; update the host or firmware"));
        }
        protocolVersion = (int) version;
        link.send("LINK:PROT " + protocolVersion);
        bootCount = (int) link.numbers(link.query("LINK:BOOT?"), "LINK:BOOT?", 1)[0];
        link.send("LINK:WDOG " + settings.watchdogMs());
        link.send("ACQ:FORM " + settings.format().mnemonic());
        link.send("ACQ:BLOCK " + settings.blockSamples());
        sampleRateHz = link.decimal(link.query("ACQ:RATE?"), "ACQ:RATE?");
        maxAmplitudeV = link.decimal(link.query("DRIVE:MAX?"), "DRIVE:MAX?");
        int count = (int) link.numbers(link.query("ACQ:CHAN:COUNT?"), "ACQ:CHAN:COUNT?", 1)[0];
        List<ChannelInfo> list = new ArrayList<>();
        sensitivity = new double[count];
        for (int i = 0; i < count; i++) {
            String c = link.query("ACQ:CHAN? " + i);
            String[] p = c.split(",", -1);
            if (p.length != 4) {
                throw link.fail(new RigLinkException(Kind.PROTOCOL, port, "ACQ:CHAN? " + i + " answered '" + c + "'",
                        "name,quantity,unit,sensitivity"));
            }
            list.add(new ChannelInfo(p[0].strip(), p[1].strip(), p[2].strip()));
            sensitivity[i] = link.decimal(p[3], "ACQ:CHAN? " + i);
        }
        channels = List.copyOf(list);
        inbox.sensitivity(sensitivity);
        nextSampleIndex = link.numbers(link.query("ACQ:NEXT?"), "ACQ:NEXT?", 1)[0];
        nextSequence = link.numbers(link.query("ACQ:SEQ?"), "ACQ:SEQ?", 1)[0];
        link.checkErrors("setting up the link");
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
        return link.fault();
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
        outputOn = false;
        link.close();
    }

    private final class SerialExciter implements Exciter {
        @Override
        public void setSine(double frequencyHz, double amplitudeV) {
            synchronized (SerialRig.this) {
                link.requireUsable();
                checkAmplitude(amplitudeV);
                if (!(frequencyHz > 0 && frequencyHz < sampleRateHz / 2)) {
                    throw new RigException("drive frequency must lie between 0 and half the sample rate ("
                            + sampleRateHz / 2 + " Hz) of the rig on " + port + ", got " + frequencyHz + " Hz");
                }
                link.send("DRIVE:SINE " + frequencyHz + "," + amplitudeV);
                link.checkErrors("DRIVE:SINE " + frequencyHz + "," + amplitudeV);
            }
        }

        @Override
        public void rampTo(double amplitudeV, double durationS) {
            synchronized (SerialRig.this) {
                link.requireUsable();
                checkAmplitude(amplitudeV);
                if (!(durationS >= 0) || Double.isInfinite(durationS)) {
                    throw new RigException("ramp duration must be zero or a positive finite number of seconds, got "
                            + durationS);
                }
                link.send("DRIVE:RAMP " + amplitudeV + "," + durationS);
                nextSampleIndex = link.numbers(link.query("ACQ:NEXT?", settings.replyTimeoutMs() + Math.round(durationS * 1000)),
                        "ACQ:NEXT?", 1)[0];
                link.checkErrors("DRIVE:RAMP " + amplitudeV + "," + durationS);
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
                    outputOn = false;
                    link.outputOff();
                    return;
                }
                link.requireUsable();
                link.send("DRIVE:OUT ON");
                String state = link.query("DRIVE:OUT?");
                link.checkErrors("DRIVE:OUT ON");
                if (!state.equals("1")) {
                    throw link.fail(new RigLinkException(Kind.PROTOCOL, port, "DRIVE:OUT? answered '" + state
                            + "' after DRIVE:OUT ON", "1"));
                }
                outputOn = true;
            }
        }

        @Override
        public boolean isOutputEnabled() {
            synchronized (SerialRig.this) {
                return outputOn && link.fault() == null;
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
                link.requireUsable();
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
        link.send("ACQ:FETCH? " + n);
        double[][] out = null;
        int filled = 0;
        try {
            while (filled < n) {
                int expected = Math.min(settings.blockSamples(), n - filled);
                DataBlock b = assembler.await(nextSequence, settings.blockTimeoutMs(),
                        seq -> link.send("ACQ:RESEND? " + seq));
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
            throw link.fail(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw link.fail(new RigLinkException(Kind.TIMEOUT, port, "interrupted waiting for data block " + nextSequence,
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
