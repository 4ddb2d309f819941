package org.tautline.driver.serial;

import java.util.ArrayDeque;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;

import org.tautline.driver.RigException;
import org.tautline.driver.sim.SensorSetup;
import org.tautline.driver.sim.SimulatedRig;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.spi.SampleBlock;

/**
 * The device side of PROTOCOL.md over a {@link SimulatedRig}: reads command lines, keeps the error queue,
 * the block history and the watchdog, and hands replies and blocks to an output.
 *
 * <p>Methods are synchronised: the command reader and the streaming and watchdog thread share the state.
 */
final class VirtualDevice {
    /** Protocol versions this device speaks. */
    static final int PROTOCOL_MIN = 1;
    /** Highest protocol version. */
    static final int PROTOCOL_MAX = 1;
    /** Error queue length; IEEE 488.2 / SCPI-1999 replace the newest entry by -350 on overflow (from memory). */
    static final int ERROR_QUEUE_LENGTH = 16;
    /** Blocks kept for {@code ACQ:RESEND?}. */
    static final int HISTORY_BLOCKS = 64;
    /** Default watchdog, ms. */
    static final int DEFAULT_WATCHDOG_MS = 2000;
    /** Default samples per channel per block. */
    static final int DEFAULT_BLOCK_SAMPLES = 1024;
    /** Largest {@code ACQ:BLOCK} setting. */
    static final int MAX_BLOCK_SAMPLES = 65536;
    /** Largest {@code ACQ:FETCH?} request, samples per channel. */
    static final int MAX_FETCH_SAMPLES = 1 << 24;

    private final SimulationConfig config;
    private final Consumer<byte[]> output;
    private final Consumer<String> log;
    private SimulatedRig rig;
    private int bootCount;
    private final ArrayDeque<DeviceError> errors = new ArrayDeque<>();
    private final Map<Long, byte[]> history = new LinkedHashMap<>();
    private long nextSequence;
    private SampleFormat format = SampleFormat.FLOAT32_LE;
    private int blockSamples = DEFAULT_BLOCK_SAMPLES;
    private int watchdogMs = DEFAULT_WATCHDOG_MS;
    private int protocolVersion = PROTOCOL_MAX;
    private boolean streaming;
    private double frequencyHz;
    private double amplitudeV;
    private long lastActivityNs = System.nanoTime();
    private final double[] sensitivity;

    /**
     * @param config what to simulate
     * @param output where replies and blocks go, in order
     * @param log where events go, for the server's log
     */
    VirtualDevice(SimulationConfig config, Consumer<byte[]> output, Consumer<String> log) {
        this.config = config;
        this.output = output;
        this.log = log;
        SensorSetup s = config.sensors();
        double counts = Math.pow(2, s.adcBits() - 1);
        this.sensitivity = new double[] {s.forceFullScale() / counts, s.responseFullScale() / counts};
        this.rig = new SimulatedRig(config);
    }

    /** Forgets everything as a power cycle would, then announces it with {@code !RESET <boot count>}. */
    synchronized void reset() {
        rig.close();
        rig = new SimulatedRig(config);
        bootCount++;
        errors.clear();
        history.clear();
        nextSequence = 0;
        format = SampleFormat.FLOAT32_LE;
        blockSamples = DEFAULT_BLOCK_SAMPLES;
        watchdogMs = DEFAULT_WATCHDOG_MS;
        streaming = false;
        frequencyHz = 0.0;
        amplitudeV = 0.0;
        log.accept("reset: state forgotten, output off, boot " + bootCount);
        send("!RESET " + bootCount);
    }

    /** Switches the output off without a command (port lost, device fault). @param why for the log */
    synchronized void outputOff(String why) {
        if (rig.exciter().isOutputEnabled()) {
            rig.exciter().setOutputEnabled(false);
            log.accept("output off: " + why);
        }
    }

    /** @return true while the drive output is on */
    synchronized boolean outputEnabled() {
        return rig.exciter().isOutputEnabled();
    }

    /** An amplifier fault: the output goes off and error 110 is queued. */
    synchronized void amplifierFault() {
        outputOff("amplifier fault");
        queue(new DeviceError(110, "Amplifier fault: output switched off"));
    }

    /** Checks the watchdog; call often. */
    synchronized void checkWatchdog(long nowNs) {
        if (rig.exciter().isOutputEnabled() && nowNs - lastActivityNs > watchdogMs * 1_000_000L) {
            outputOff("watchdog expired after " + watchdogMs + " ms without a command");
            queue(new DeviceError(101, "Watchdog expired: output switched off"));
            send("!WDOG " + watchdogMs);
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

    /** Sends the next streaming block. */
    synchronized void streamOneBlock() {
        if (streaming) {
            sendBlock(blockSamples);
        }
    }

    /** Marks the end of a reply for the watchdog. */
    synchronized void activity() {
        lastActivityNs = System.nanoTime();
    }

    private void send(String line) {
        output.accept((line + "\n").getBytes(java.nio.charset.StandardCharsets.US_ASCII));
    }

    private void queue(DeviceError e) {
        if (errors.size() >= ERROR_QUEUE_LENGTH) {
            errors.removeLast();
            errors.addLast(new DeviceError(-350, "Queue overflow"));
            return;
        }
        errors.addLast(e);
    }

    /**
     * Handles one command line.
     *
     * @param text the line without its terminator
     */
    synchronized void handle(String text) {
        lastActivityNs = System.nanoTime();
        CommandLine c = CommandLine.parse(text);
        if (c == null) {
            return;
        }
        if (c.header().equals("DRIVE:OUT") && !c.query()) {
            log.accept("command " + text.strip());
        }
        try {
            String reply = execute(c);
            if (reply != null) {
                send(reply);
            }
        } catch (CommandFault f) {
            queue(f.error);
            if (c.query()) {
                send("!ERR " + f.error.reply());
            }
        } catch (RigException e) {
            DeviceError err = new DeviceError(-200, "Execution error; " + e.getMessage());
            queue(err);
            if (c.query()) {
                send("!ERR " + err.reply());
            }
        }
    }

    private String execute(CommandLine c) {
        String h = c.name();
        List<String> p = c.parameters();
        return switch (h) {
            case "*IDN?" -> "Tautline,Virtual rig,SIM-" + config.randomSeed() + "," + PROTOCOL_MAX + ".0";
            case "*RST" -> {
                rig.exciter().setOutputEnabled(false);
                amplitudeV = 0.0;
                if (frequencyHz > 0) {
                    rig.exciter().setSine(frequencyHz, 0.0);
                }
                streaming = false;
                format = SampleFormat.FLOAT32_LE;
                blockSamples = DEFAULT_BLOCK_SAMPLES;
                yield null;
            }
            case "*OPC?" -> "1";
            case "*CLS" -> {
                errors.clear();
                yield null;
            }
            case "SYST:ERR?" -> (errors.isEmpty() ? DeviceError.NONE : errors.removeFirst()).reply();
            case "SYST:VERS?" -> "1999.0";
            case "LINK:PROT?" -> PROTOCOL_MIN + "," + PROTOCOL_MAX;
            case "LINK:PROT" -> {
                int v = integer(p, 0, PROTOCOL_MIN, PROTOCOL_MAX);
                protocolVersion = v;
                yield null;
            }
            case "LINK:WDOG" -> {
                watchdogMs = integer(p, 0, 50, 60000);
                yield null;
            }
            case "LINK:WDOG?" -> Integer.toString(watchdogMs);
            case "LINK:FEED" -> null;
            case "LINK:BOOT?" -> Integer.toString(bootCount);
            case "DRIVE:SINE" -> {
                double f = number(p, 0);
                double a = number(p, 1);
                rig.exciter().setSine(f, a);
                frequencyHz = f;
                amplitudeV = a;
                yield null;
            }
            case "DRIVE:RAMP" -> {
                double a = number(p, 0);
                rig.exciter().rampTo(a, number(p, 1));
                amplitudeV = a;
                yield null;
            }
            case "DRIVE:OUT" -> {
                rig.exciter().setOutputEnabled(onOff(p));
                yield null;
            }
            case "DRIVE:OUT?" -> rig.exciter().isOutputEnabled() ? "1" : "0";
            case "DRIVE:FREQ?" -> Double.toString(frequencyHz);
            case "DRIVE:AMPL?" -> Double.toString(amplitudeV);
            case "DRIVE:MAX?" -> Double.toString(rig.exciter().maxAmplitudeV());
            case "ACQ:RATE?" -> Double.toString(config.sampleRateHz());
            case "ACQ:CHAN:COUNT?" -> Integer.toString(rig.acquisition().channels().size());
            case "ACQ:CHAN?" -> {
                int i = integer(p, 0, 0, rig.acquisition().channels().size() - 1);
                ChannelInfo ch = rig.acquisition().channels().get(i);
                yield ch.name() + "," + ch.quantity() + "," + ch.unit() + "," + sensitivity[i];
            }
            case "ACQ:FORM" -> {
                SampleFormat f = p.isEmpty() ? null : SampleFormat.ofMnemonic(p.get(0));
                if (f == null) {
                    throw new CommandFault(-224, "Illegal parameter value; expected F32, I24 or F64");
                }
                format = f;
                yield null;
            }
            case "ACQ:FORM?" -> format.mnemonic();
            case "ACQ:BLOCK" -> {
                blockSamples = integer(p, 0, 1, MAX_BLOCK_SAMPLES);
                yield null;
            }
            case "ACQ:BLOCK?" -> Integer.toString(blockSamples);
            case "ACQ:NEXT?" -> Long.toString(rig.acquisition().nextSampleIndex());
            case "ACQ:SEQ?" -> Long.toString(nextSequence);
            case "ACQ:FETCH?" -> {
                if (streaming) {
                    throw new CommandFault(-221, "Settings conflict; ACQ:FETCH? while streaming, send ACQ:STREAM OFF");
                }
                int n = integer(p, 0, 1, MAX_FETCH_SAMPLES);
                for (int done = 0; done < n; done += blockSamples) {
                    sendBlock(Math.min(blockSamples, n - done));
                }
                yield null;
            }
            case "ACQ:STREAM" -> {
                streaming = onOff(p);
                yield null;
            }
            case "ACQ:STREAM?" -> streaming ? "1" : "0";
            case "ACQ:RESEND?" -> {
                long seq = wholeNumber(p, 0, 0, 0xFFFFFFFFL);
                byte[] b = history.get(seq);
                if (b == null) {
                    throw new CommandFault(102, "Block " + seq + " not available for resend; the last "
                            + HISTORY_BLOCKS + " are kept");
                }
                log.accept("resend block " + seq);
                output.accept(b);
                yield null;
            }
            default -> throw new CommandFault(-113, "Undefined header; " + h);
        };
    }

    private void sendBlock(int n) {
        long first = rig.acquisition().nextSampleIndex();
        SampleBlock s = rig.acquisition().read(n);
        long seq = nextSequence;
        nextSequence = (nextSequence + 1) & 0xFFFFFFFFL;
        byte[] bytes = BlockCodec.encode(new DataBlock(seq, first, format, s.samples()), sensitivity);
        history.put(seq, bytes);
        if (history.size() > HISTORY_BLOCKS) {
            history.remove(history.keySet().iterator().next());
        }
        output.accept(bytes);
    }

    /** @return the protocol version selected by {@code LINK:PROT} */
    synchronized int protocolVersion() {
        return protocolVersion;
    }

    private static boolean onOff(List<String> p) {
        String v = p.isEmpty() ? "" : p.get(0).toUpperCase(Locale.ROOT);
        return switch (v) {
            case "ON", "1" -> true;
            case "OFF", "0" -> false;
            default -> throw new CommandFault(p.isEmpty() ? -109 : -224, p.isEmpty() ? "Missing parameter; expected ON or OFF"
                    : "Illegal parameter value; expected ON or OFF, got " + p.get(0));
        };
    }

    private static double number(List<String> p, int i) {
        if (p.size() <= i) {
            throw new CommandFault(-109, "Missing parameter; expected " + (i + 1) + " or more");
        }
        try {
            double v = Double.parseDouble(p.get(i));
            if (!Double.isFinite(v)) {
                throw new CommandFault(-222, "Data out of range; " + p.get(i));
            }
            return v;
        } catch (NumberFormatException e) {
            throw new CommandFault(-102, "Syntax error; not a number: " + p.get(i));
        }
    }

    private static int integer(List<String> p, int i, int min, int max) {
        return (int) wholeNumber(p, i, min, max);
    }

    private static long wholeNumber(List<String> p, int i, long min, long max) {
        double v = number(p, i);
        if (v != Math.rint(v) || v < min || v > max) {
            throw new CommandFault(-222, "Data out of range; expected a whole number " + min + ".." + max + ", got "
                    + p.get(i));
        }
        return (long) v;
    }

    /** A command the device refuses, with its error-queue entry. */
    private static final class CommandFault extends RuntimeException {
        private static final long serialVersionUID = 1L;
        private final transient DeviceError error;

        CommandFault(int code, String message) {
            super(message, null, false, false);
            this.error = new DeviceError(code, message);
        }
    }
}
