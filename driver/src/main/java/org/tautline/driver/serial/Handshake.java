package org.tautline.driver.serial;

import java.util.ArrayList;
import java.util.List;

import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;
import org.tautline.driver.spi.ChannelInfo;

/**
 * Opening a serial rig (PROTOCOL.md, section 12): output off, identity, protocol version, settings, channels.
 *
 * <p>Values that do not change during a session are read until two replies in a row agree
 * ({@link CommandLink#stableQuery}), since a reply line has no check of its own.
 */
final class Handshake {
    /**
     * What the device said.
     *
     * @param identity maker, model, serial and firmware, in words
     * @param protocolVersion the version agreed
     * @param sampleRateHz sample rate, Hz
     * @param maxAmplitudeV largest peak drive, V
     * @param channels the channels
     * @param sensitivity engineering units per count of each channel
     */
    record Result(String identity, int protocolVersion, double sampleRateHz, double maxAmplitudeV,
                  List<ChannelInfo> channels, double[] sensitivity) {
    }

    private final CommandLink link;
    private final String port;

    private Handshake(CommandLink link) {
        this.link = link;
        this.port = link.port();
    }

    /**
     * @param link the command link, before anything was sent
     * @param settings the settings to give the device
     * @return what the device said; the caller takes a status next
     */
    static Result run(CommandLink link, SerialLinkSettings settings) {
        return new Handshake(link).run(settings);
    }

    private Result run(SerialLinkSettings settings) {
        link.send("DRIVE:OUT OFF");
        link.send("ACQ:ABORT");
        link.send("ACQ:STREAM OFF");
        link.send("*CLS");
        String idn = link.stableQuery("*IDN?");
        String[] f = idn.split(",", -1);
        if (f.length != 4) {
            throw link.fail(new RigLinkException(Kind.PROTOCOL, port, "*IDN? answered '" + idn + "'",
                    "four comma-separated fields: maker,model,serial,firmware"));
        }
        String identity = f[0].strip() + " " + f[1].strip() + ", serial " + f[2].strip() + ", firmware " + f[3].strip();
        long[] range = numbers(link.stableQuery("LINK:PROT?"), "LINK:PROT?", 2);
        long version = Math.min(range[1], SerialRig.HOST_PROTOCOL_MAX);
        if (version < Math.max(range[0], SerialRig.HOST_PROTOCOL_MIN)) {
            throw link.fail(new RigLinkException(Kind.PROTOCOL, port, "the device speaks protocol versions " + range[0]
                    + ".." + range[1], "a version in " + SerialRig.HOST_PROTOCOL_MIN + ".." + SerialRig.HOST_PROTOCOL_MAX
                    + "; update the host or firmware"));
        }
        link.send("LINK:PROT " + version);
        link.send("LINK:WDOG " + settings.watchdogMs());
        link.send("ACQ:FORM " + settings.format().mnemonic());
        link.send("ACQ:BLOCK " + settings.blockSamples());
        double rate = decimal(link.stableQuery("ACQ:RATE?"), "ACQ:RATE?");
        double max = decimal(link.stableQuery("DRIVE:MAX?"), "DRIVE:MAX?");
        int count = (int) numbers(link.stableQuery("ACQ:CHAN:COUNT?"), "ACQ:CHAN:COUNT?", 1)[0];
        if (count < 1 || count > BlockCodec.MAX_CHANNELS) {
            throw link.fail(new RigLinkException(Kind.PROTOCOL, port, "ACQ:CHAN:COUNT? answered " + count,
                    "1.." + BlockCodec.MAX_CHANNELS + " channels"));
        }
        List<ChannelInfo> channels = new ArrayList<>();
        double[] sensitivity = new double[count];
        for (int i = 0; i < count; i++) {
            String c = link.stableQuery("ACQ:CHAN? " + i);
            String[] p = c.split(",", -1);
            if (p.length != 4) {
                throw link.fail(new RigLinkException(Kind.PROTOCOL, port, "ACQ:CHAN? " + i + " answered '" + c + "'",
                        "name,quantity,unit,sensitivity"));
            }
            channels.add(new ChannelInfo(p[0].strip(), p[1].strip(), p[2].strip()));
            sensitivity[i] = decimal(p[3], "ACQ:CHAN? " + i);
        }
        return new Result(identity, (int) version, rate, max, List.copyOf(channels), sensitivity);
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
        throw link.fail(new RigLinkException(Kind.PROTOCOL, port, command + " answered '" + reply + "'",
                "a finite number"));
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
        throw link.fail(new RigLinkException(Kind.PROTOCOL, port, command + " answered '" + reply + "'",
                count + " comma-separated whole number(s)"));
    }
}
