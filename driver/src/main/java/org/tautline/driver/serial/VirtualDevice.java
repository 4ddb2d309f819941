package org.tautline.driver.serial;

import java.nio.charset.StandardCharsets;
import java.util.ArrayDeque;

import org.tautline.driver.RigException;
import org.tautline.driver.sim.SensorSetup;
import org.tautline.driver.sim.SimulatedRig;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.spi.ChannelInfo;

/**
 * The device side of PROTOCOL.md over a {@link SimulatedRig}: runs command lines as they arrive, keeps the error
 * queue, the block history and the watchdog, and queues replies, blocks and notices on a {@link DeviceOutbox}.
 *
 * <p>The simulated rig produces samples on demand: a fetch's block is computed when the sender reaches it, a ramp's
 * samples when the ramp is commanded, a streaming block at the sample rate. Methods are synchronised: the port
 * reader, the sender and the worker thread share the state.
 */
final class VirtualDevice {
    /** Protocol versions this device speaks. */
    static final int PROTOCOL_MIN = 2;
    /** Highest protocol version. */
    static final int PROTOCOL_MAX = 2;
    /** Error queue length; IEEE 488.2 / SCPI-1999 replace the newest entry by -350 on overflow (from memory). */
    static final int ERROR_QUEUE_LENGTH = 16;
    /** Default watchdog, ms. */
    static final int DEFAULT_WATCHDOG_MS = 2000;
    /** Default samples per channel per block. */
    static final int DEFAULT_BLOCK_SAMPLES = 1024;
    /** Largest {@code ACQ:BLOCK} setting. */
    static final int MAX_BLOCK_SAMPLES = 65536;
    /** Largest {@code ACQ:FETCH?} request, samples per channel. */
    static final int MAX_FETCH_SAMPLES = 1 << 24;
    /** Longest ramp, s. */
    static final double MAX_RAMP_S = 3600;
    /** Streaming blocks allowed to wait for the line; a further one is dropped (an overrun). */
    static final int STREAM_QUEUE_BLOCKS = 2;

    private final SimulationConfig config;
    private final DeviceOutbox outbox;
    private final VirtualRigLog log;
    private final double[] sensitivity;
    private SimulatedRig rig;
    private int bootCount;
    private final ArrayDeque<DeviceError> errors = new ArrayDeque<>();
    private final ArrayDeque<DeviceOutbox.FetchJob> fetches = new ArrayDeque<>();
    private final BlockHistory blocks;
    private SampleFormat format = SampleFormat.FLOAT32_LE;
    private int blockSamples = DEFAULT_BLOCK_SAMPLES;
    private int watchdogMs = DEFAULT_WATCHDOG_MS;
    private int protocolVersion = PROTOCOL_MIN;
    private boolean streaming;
    private double frequencyHz;
    private double amplitudeV;
    private int lastFault;
    private long overruns;
    private long lastLineNs = System.nanoTime();

    /**
     * @param config what to simulate
     * @param outbox where replies, blocks and notices go
     * @param log the event log
     */
    VirtualDevice(SimulationConfig config, DeviceOutbox outbox, VirtualRigLog log) {
        this.config = config;
        this.outbox = outbox;
        this.log = log;
        SensorSetup s = config.sensors();
        double counts = Math.pow(2, s.adcBits() - 1);
        this.sensitivity = new double[] {s.forceFullScale() / counts, s.responseFullScale() / counts};
        this.rig = new SimulatedRig(config);
        this.blocks = new BlockHistory(sensitivity);
    }

    /** Forgets everything as a power cycle would, then announces it with {@code !RESET <boot count>}. */
    synchronized void reset() {
        setOutput(false, "reset");
        abortFetches();
        outbox.dropAll();
        rig.close();
        rig = new SimulatedRig(config);
        bootCount++;
        errors.clear();
        blocks.reset();
        format = SampleFormat.FLOAT32_LE;
        blockSamples = DEFAULT_BLOCK_SAMPLES;
        watchdogMs = DEFAULT_WATCHDOG_MS;
        protocolVersion = PROTOCOL_MIN;
        streaming = false;
        frequencyHz = 0.0;
        amplitudeV = 0.0;
        lastFault = 0;
        log.add("event", "reset: state forgotten, boot counter " + bootCount);
        outbox.urgent(line("!RESET " + bootCount));
    }

    private void setOutput(boolean on, String cause) {
        if (rig.exciter().isOutputEnabled() != on) {
            rig.exciter().setOutputEnabled(on);
            log.add("output", (on ? "on " : "off ") + cause);
        }
    }

    /** Switches the output off without a command. @param why the cause, for the log */
    synchronized void outputOff(String why) {
        setOutput(false, why);
    }

    /** @return true while the drive output is on */
    synchronized boolean outputEnabled() {
        return rig.exciter().isOutputEnabled();
    }

    /** An amplifier fault: the output goes off, error 110 is queued and {@code !FAULT 110} is sent at once. */
    synchronized void amplifierFault() {
        deviceFault(110, "Amplifier fault: output switched off", "amplifier fault");
    }

    private void deviceFault(int code, String message, String cause) {
        setOutput(false, cause);
        DeviceError e = new DeviceError(code, message);
        queue(e);
        lastFault = code;
        outbox.urgent(line("!FAULT " + e.reply()));
    }

    /** Forgets the blocks kept for resends, as a device with a small buffer would. */
    synchronized void forgetHistory() {
        blocks.forget();
    }

    /** Checks the watchdog; call often. @param nowNs {@link System#nanoTime()} */
    synchronized void checkWatchdog(long nowNs) {
        if (rig.exciter().isOutputEnabled() && nowNs - lastLineNs > watchdogMs * 1_000_000L) {
            deviceFault(101, "Watchdog expired after " + watchdogMs + " ms: output switched off",
                    "watchdog expired after " + watchdogMs + " ms without a command line");
        }
    }

    /** @return true while streaming; the caller then calls {@link #streamOneBlock()} at the block rate */
    synchronized boolean streaming() {
        return streaming;
    }

    /** @return the block period of streaming, ns */
    synchronized long blockPeriodNs() {
        return Math.round(blockSamples / config.sampleRateHz() * 1e9);
    }

    /** @return streaming blocks dropped because the line could not carry them */
    synchronized long overruns() {
        return overruns;
    }

    /** Makes the next streaming block; drops it when {@value #STREAM_QUEUE_BLOCKS} are already waiting. */
    synchronized void streamOneBlock() {
        if (!streaming) {
            return;
        }
        if (outbox.queuedStreamBlocks() >= STREAM_QUEUE_BLOCKS) {
            long first = rig.acquisition().nextSampleIndex();
            rig.acquisition().read(blockSamples);
            overruns++;
            log.add("event", "stream overrun: samples " + first + ".." + (first + blockSamples - 1) + " dropped");
            return;
        }
        outbox.sendStreamBlock(blocks.make(rig.acquisition(), blockSamples, format));
    }

    /**
     * Makes the next block of a fetch.
     *
     * @param job the fetch
     * @return the block, or null when the fetch was aborted or is done
     */
    synchronized byte[] produce(DeviceOutbox.FetchJob job) {
        if (job.done()) {
            return null;
        }
        int n = Math.min(job.blockSamples, job.remaining);
        byte[] b = blocks.make(rig.acquisition(), n, job.format);
        job.remaining -= n;
        if (job.done()) {
            fetches.remove(job);
        }
        return b;
    }

    /** @return the status line for tag, as the device stands now */
    synchronized byte[] statusLine(long tag) {
        return line(new DeviceStatus(tag, rig.exciter().isOutputEnabled(), bootCount, errors.size(), lastFault,
                nextToDeliver(), sequenceAfterFetches()).line());
    }

    private long nextToDeliver() {
        long n = rig.acquisition().nextSampleIndex();
        for (DeviceOutbox.FetchJob j : fetches) {
            n += j.remaining;
        }
        return n;
    }

    private long sequenceAfterFetches() {
        long s = blocks.nextSequence();
        for (DeviceOutbox.FetchJob j : fetches) {
            s += (j.remaining + j.blockSamples - 1) / j.blockSamples;
        }
        return s & 0xFFFFFFFFL;
    }

    private static byte[] line(String text) {
        return (text + "\n").getBytes(StandardCharsets.US_ASCII);
    }

    private void queue(DeviceError e) {
        if (errors.size() >= ERROR_QUEUE_LENGTH) {
            errors.removeLast();
            errors.addLast(new DeviceError(-350, "Queue overflow"));
            return;
        }
        errors.addLast(e);
    }

    /** A line longer than the limit arrived and was discarded. @param bytes its length without terminator */
    synchronized void overlongLine(int bytes) {
        lastLineNs = System.nanoTime();
        log.add("recv", "(a line of " + bytes + " bytes, discarded)");
        queue(new DeviceError(-363, "Input buffer overrun; a line of " + bytes + " bytes, at most "
                + StreamDecoder.MAX_LINE_BYTES + " allowed"));
    }

    /**
     * Runs one command line.
     *
     * @param text the line without its terminator
     */
    synchronized void handle(String text) {
        lastLineNs = System.nanoTime();
        CommandLine c = CommandLine.parse(text);
        if (c == null) {
            return;
        }
        log.add("recv", text.strip());
        try {
            String reply = DeviceCommands.execute(this, c);
            if (reply != null) {
                outbox.send(line(reply));
            }
        } catch (CommandFault f) {
            refuse(c, f.error());
        } catch (RigException e) {
            refuse(c, new DeviceError(-200, "Execution error; " + e.getMessage()));
        }
    }

    /** A refused query is answered by {@code !ERR} in place of its reply and not queued; a refused set command is queued. */
    private void refuse(CommandLine c, DeviceError e) {
        if (c.query()) {
            outbox.send(line("!ERR " + e.reply()));
        } else {
            queue(e);
        }
    }

    // The state DeviceCommands works on; called with this device's lock held.

    SimulatedRig rig() {
        return rig;
    }

    SimulationConfig config() {
        return config;
    }

    double sensitivity(int channel) {
        return sensitivity[channel];
    }

    String identity() {
        return "Tautline,Virtual rig,SIM-" + config.randomSeed() + "," + PROTOCOL_MAX + ".0";
    }

    void clearErrors() {
        errors.clear();
    }

    DeviceError takeError() {
        return errors.isEmpty() ? DeviceError.NONE : errors.removeFirst();
    }

    int errorCount() {
        return errors.size();
    }

    int bootCount() {
        return bootCount;
    }

    void protocolVersion(int v) {
        protocolVersion = v;
    }

    /** @return the protocol version selected by {@code LINK:PROT} */
    synchronized int protocolVersion() {
        return protocolVersion;
    }

    int watchdogMs() {
        return watchdogMs;
    }

    void watchdogMs(int ms) {
        watchdogMs = ms;
    }

    void output(boolean on, String cause) {
        setOutput(on, cause);
    }

    double frequencyHz() {
        return frequencyHz;
    }

    double amplitudeV() {
        return amplitudeV;
    }

    void drive(double f, double a) {
        frequencyHz = f;
        amplitudeV = a;
    }

    SampleFormat format() {
        return format;
    }

    void format(SampleFormat f) {
        format = f;
    }

    int blockSamples() {
        return blockSamples;
    }

    void blockSamples(int n) {
        blockSamples = n;
    }

    boolean streamingNow() {
        return streaming;
    }

    void streaming(boolean on) {
        streaming = on;
    }

    boolean fetchInProgress() {
        return !fetches.isEmpty();
    }

    long nextSample() {
        return nextToDeliver();
    }

    long nextSequence() {
        return sequenceAfterFetches();
    }

    void fetch(int samples) {
        DeviceOutbox.FetchJob job = new DeviceOutbox.FetchJob(samples, blockSamples, format);
        fetches.add(job);
        outbox.fetch(job);
    }

    /** Ends every fetch and drops everything queued but not begun. */
    void abortFetches() {
        for (DeviceOutbox.FetchJob j : fetches) {
            j.cancelled = true;
        }
        fetches.clear();
        outbox.dropOrdered();
    }

    void status(long tag) {
        outbox.urgent(() -> statusLine(tag));
    }

    /** @return false when block seq is no longer kept */
    boolean resend(long seq) {
        byte[] b = blocks.get(seq);
        if (b == null) {
            return false;
        }
        log.add("event", "resend block " + seq);
        outbox.send(b);
        return true;
    }

    /** @return channel i */
    ChannelInfo channel(int i) {
        return rig.acquisition().channels().get(i);
    }
}
