package org.tautline.driver.serial;

import java.util.List;

import org.tautline.driver.RigDataLostException;
import org.tautline.driver.RigException;
import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;
import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/**
 * A rig on a serial port speaking PROTOCOL.md (version 2).
 *
 * <p>Opening ({@link Handshake}) switches the output off, reads the identity, agrees a protocol version, sets the
 * watchdog, format and block size, reads the channels, and takes the boot counter, sample index and sequence
 * number from a checked status. Every drive command is followed by a status
 * ({@code LINK:STAT?}) that must show the same boot counter and an empty error queue. Reads are described in
 * {@link FetchRead}: they return verified, contiguous samples, or throw {@link RigDataLostException} (samples lost,
 * link healthy, measure again) or a {@link RigLinkException} (a fault: the output has been commanded off, at once,
 * waiting at most {@value #OFF_CONFIRM_MS} ms for confirmation; every later call but switching off and closing
 * throws too). Methods are synchronised, except {@link Exciter#switchOffNow()} and
 * {@link Exciter#isOutputEnabled()}, which never wait for a command or read in progress.
 */
public final class SerialRig implements Rig {
    /** Lowest protocol version this host speaks. */
    static final int HOST_PROTOCOL_MIN = 2;
    /** Highest protocol version this host speaks. */
    static final int HOST_PROTOCOL_MAX = 2;
    /** Longest wait for the device to confirm the output is off after a fault, ms. */
    static final int OFF_CONFIRM_MS = 100;

    /**
     * A fault and what the rig did about it.
     *
     * @param fault the first link fault
     * @param detectedNanoTime {@link System#nanoTime()} when the host detected it
     * @param offSentNanoTime when {@code DRIVE:OUT OFF} was written, or -1 when the link did not allow it
     * @param offConfirmed true when a status showed the output off within the bounded wait
     */
    public record FaultRecord(RigLinkException fault, long detectedNanoTime, long offSentNanoTime,
                              boolean offConfirmed) {
    }

    private final SerialLinkSettings settings;
    private final SerialTransport transport;
    private final LinkInbox inbox;
    private final CommandLink link;
    private final String port;
    private final FetchRead.Cursor cursor = new FetchRead.Cursor();
    private final Object driveGate = new Object();
    private FetchRead reader;
    private String identity;
    private int protocolVersion;
    private long bootCount;
    private double sampleRateHz;
    private double maxAmplitudeV;
    private List<ChannelInfo> channels;
    private double[] sensitivity;
    private volatile boolean outputOn;
    private volatile boolean switchedOffNow;
    private volatile long switchOffNanoTime = -1;
    private final SerialExciter exciter = new SerialExciter();
    private final SerialAcquisition acquisition = new SerialAcquisition();

    private SerialRig(SerialTransport transport, SerialLinkSettings settings) {
        this.settings = settings;
        this.transport = transport;
        this.port = transport.port();
        this.inbox = new LinkInbox(port);
        this.link = new CommandLink(transport, inbox, LinkTiming.of(settings, 2));
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
            synchronized (rig) {
                rig.handshake();
            }
            return rig;
        } catch (RuntimeException e) {
            rig.close();
            throw e;
        }
    }

    private void handshake() {
        Handshake.Result r = Handshake.run(link, settings);
        identity = r.identity();
        protocolVersion = r.protocolVersion();
        sampleRateHz = r.sampleRateHz();
        maxAmplitudeV = r.maxAmplitudeV();
        channels = r.channels();
        sensitivity = r.sensitivity();
        inbox.sensitivity(sensitivity);
        link.timing(LinkTiming.of(settings, channels.size()));
        DeviceStatus s = link.status("while setting up the link");
        link.verify(s, false, "after setting up the link");
        bootCount = s.bootCount();
        link.bootCount(bootCount);
        cursor.sequence = s.nextSequence();
        cursor.sampleIndex = s.nextSample();
        reader = new FetchRead(link, inbox, cursor, channels.size(), settings.blockSamples(), () -> outputOn);
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

    /** @return the device's boot counter when the rig was opened */
    public synchronized long bootCount() {
        return bootCount;
    }

    /**
     * @param channel channel index
     * @return engineering units per count of an integer sample format, from {@code ACQ:CHAN?}
     */
    public synchronized double sensitivity(int channel) {
        return sensitivity[channel];
    }

    /**
     * How much of real time the link carries: the highest sample rate the baud rate carries for this channel count,
     * format and block size (PROTOCOL.md, section 11) over the rig's sample rate. Below 1, reads run slower than
     * real time (fine for stepped sine, whose timing is counted in samples); at 1 or more they keep up.
     *
     * @return the fraction, for example 0.57 for 2 channels of float32 at 20 kS/s over 921600 baud
     */
    public synchronized double linkRealTimeFraction() {
        return LinkBudget.maxSampleRateHz(settings.baud(), channels.size(), settings.format(), settings.blockSamples())
                / sampleRateHz;
    }

    /** @return the settings the rig was opened with */
    public SerialLinkSettings settings() {
        return settings;
    }

    /** @return the first link fault and what was done about it, or null while the link is healthy */
    public FaultRecord fault() {
        return link.fault();
    }

    /** @return {@link System#nanoTime()} just after the last {@link Exciter#switchOffNow()} wrote its command, or -1 */
    public long switchOffNanoTime() {
        return switchOffNanoTime;
    }

    /** @return data blocks accepted so far */
    public synchronized long blocksReceived() {
        return reader == null ? 0 : reader.received();
    }

    /** @return data blocks recovered by a re-request so far */
    public synchronized long blocksRecovered() {
        return reader == null ? 0 : reader.recovered();
    }

    /** @return stray or unreadable lines and bytes the decoder skipped, as counted fault events */
    public long strayByteEvents() {
        return inbox.strayFaults();
    }

    /** @return bytes received from the device so far */
    public long bytesReceived() {
        return inbox.bytesReceived();
    }

    /** Commands the output off (bounded wait), then closes the port; never throws, idempotent. */
    @Override
    public synchronized void close() {
        outputOn = false;
        link.close();
    }

    private void afterDriveCommand(String command) {
        DeviceStatus s = link.status("after " + command);
        link.verify(s, outputOn, "after " + command);
        cursor.sampleIndex = s.nextSample();
        cursor.sequence = s.nextSequence();
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
                String command = "DRIVE:SINE " + frequencyHz + "," + amplitudeV;
                link.send(command);
                afterDriveCommand(command);
            }
        }

        /** After {@link #switchOffNow()} and before the output is switched on again, a ramp is not sent: the output is off. */
        @Override
        public void rampTo(double amplitudeV, double durationS) {
            synchronized (SerialRig.this) {
                link.requireUsable();
                checkAmplitude(amplitudeV);
                if (!(durationS >= 0) || Double.isInfinite(durationS)) {
                    throw new RigException("ramp duration must be zero or a positive finite number of seconds, got "
                            + durationS);
                }
                if (switchedOffNow) {
                    return;
                }
                String command = "DRIVE:RAMP " + amplitudeV + "," + durationS;
                link.send(command);
                afterDriveCommand(command);
            }
        }

        private void checkAmplitude(double v) {
            if (!(v >= 0) || v > maxAmplitudeV) {
                throw new RigException("drive amplitude must lie in 0.." + maxAmplitudeV + " V (the limit of the rig on "
                        + port + "), got " + v + " V");
            }
        }

        /** Switching on is checked with a status; switching off is confirmed with one and never throws. */
        @Override
        public void setOutputEnabled(boolean enabled) {
            synchronized (SerialRig.this) {
                if (!enabled) {
                    outputOn = false;
                    link.outputOff();
                    return;
                }
                link.requireUsable();
                switchedOffNow = false;
                RigLinkException writeFault = null;
                synchronized (driveGate) {
                    if (switchedOffNow) {
                        throw stopped();
                    }
                    try {
                        transport.writeLine("DRIVE:OUT ON");
                    } catch (RigLinkException e) {
                        writeFault = e;
                    }
                }
                if (writeFault != null) {
                    throw link.fail(writeFault);
                }
                DeviceStatus s = link.status("after DRIVE:OUT ON");
                link.verify(s, false, "after DRIVE:OUT ON");
                synchronized (driveGate) {
                    if (switchedOffNow) {
                        throw stopped();
                    }
                    if (!s.outputOn()) {
                        throw link.fail(new RigLinkException(Kind.DEVICE_ERROR, port, "the output stayed off after"
                                + " DRIVE:OUT ON (" + DeviceStatus.faultText(s.lastFault()) + ")",
                                "the status to show the output on"));
                    }
                    outputOn = true;
                }
            }
        }

        private RigException stopped() {
            return new RigException("the output on " + port + " was switched off by a stop while it was being"
                    + " switched on; it stays off until it is switched on again");
        }

        @Override
        public boolean isOutputEnabled() {
            return outputOn && link.fault() == null;
        }

        /**
         * Writes {@code DRIVE:OUT OFF} from the calling thread at once, without the rig's lock.
         *
         * <p>Only the port's write lock is taken, which a writer holds for one line. A read in progress goes on
         * (the device keeps acquiring) and returns its samples; later ramps are not sent until the output is
         * switched on again.
         *
         * @return true when the command was written; false when the port is closed or gone (the device's own
         *         rule then switches its output off)
         */
        @Override
        public boolean switchOffNow() {
            try {
                synchronized (driveGate) {
                    switchedOffNow = true;
                    outputOn = false;
                    if (!transport.isOpen()) {
                        return false;
                    }
                    transport.writeLine("DRIVE:OUT OFF");
                    switchOffNanoTime = System.nanoTime();
                    return true;
                }
            } catch (RuntimeException e) {
                return false;
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

        /**
         * {@inheritDoc}
         *
         * @throws RigDataLostException when samples of this read were lost on the link but it is healthy again;
         *         the next read starts at {@link #nextSampleIndex()}, which has moved past the lost samples
         * @throws RigLinkException on a fault: reset, device fault, output gone off, port gone, silence
         */
        @Override
        public SampleBlock read(int sampleCount) {
            synchronized (SerialRig.this) {
                link.requireUsable();
                if (sampleCount < 1) {
                    throw new RigException("read needs 1 or more samples per channel, got " + sampleCount);
                }
                if (sampleCount > VirtualDevice.MAX_FETCH_SAMPLES) {
                    throw new RigException("read takes at most " + VirtualDevice.MAX_FETCH_SAMPLES
                            + " samples per channel, got " + sampleCount);
                }
                return reader.read(sampleCount);
            }
        }

        @Override
        public long nextSampleIndex() {
            synchronized (SerialRig.this) {
                return cursor.sampleIndex;
            }
        }
    }
}
