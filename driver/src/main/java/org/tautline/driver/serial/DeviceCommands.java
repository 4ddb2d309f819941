package org.tautline.driver.serial;

import org.tautline.driver.spi.ChannelInfo;

/**
 * The virtual device's command table (PROTOCOL.md, sections 2 to 4): what each command does and answers, and the
 * error each refusal reports (section 7). Called with the device's lock held.
 */
final class DeviceCommands {
    private DeviceCommands() {
    }

    /**
     * @param d the device
     * @param c the command
     * @return the reply line, or null for a command without one (or whose reply is queued otherwise)
     * @throws CommandFault when the device refuses the command
     */
    static String execute(VirtualDevice d, CommandLine c) {
        return switch (c.name()) {
            case "*IDN?", "*OPC?", "SYST:ERR?", "SYST:ERR:COUNT?", "SYST:VERS?", "LINK:PROT?", "LINK:BOOT?",
                    "LINK:WDOG?", "DRIVE:FREQ?", "DRIVE:AMPL?", "DRIVE:MAX?", "DRIVE:OUT?", "ACQ:RATE?",
                    "ACQ:CHAN:COUNT?", "ACQ:FORM?", "ACQ:BLOCK?", "ACQ:NEXT?", "ACQ:SEQ?", "ACQ:STREAM?" -> {
                c.atMost(0);
                yield plainQuery(d, c.name());
            }
            case "*RST" -> {
                c.atMost(0);
                d.output(false, "*RST");
                d.abortFetches();
                d.drive(d.frequencyHz(), 0.0);
                if (d.frequencyHz() > 0) {
                    d.rig().exciter().setSine(d.frequencyHz(), 0.0);
                }
                d.streaming(false);
                d.format(SampleFormat.FLOAT32_LE);
                d.blockSamples(VirtualDevice.DEFAULT_BLOCK_SAMPLES);
                yield null;
            }
            case "*CLS" -> {
                c.atMost(0);
                d.clearErrors();
                yield null;
            }
            case "LINK:PROT" -> {
                c.atMost(1);
                d.protocolVersion((int) c.wholeNumber(0, VirtualDevice.PROTOCOL_MIN, VirtualDevice.PROTOCOL_MAX));
                yield null;
            }
            case "LINK:WDOG" -> {
                c.atMost(1);
                d.watchdogMs((int) c.wholeNumber(0, 50, 60000));
                yield null;
            }
            case "LINK:FEED", "ACQ:ABORT" -> {
                c.atMost(0);
                if (c.name().equals("ACQ:ABORT")) {
                    d.abortFetches();
                }
                yield null;
            }
            case "LINK:STAT?" -> {
                c.atMost(1);
                d.status(c.wholeNumber(0, 0, 0xFFFFFFFFL));
                yield null;
            }
            case "DRIVE:SINE" -> {
                c.atMost(2);
                double f = c.number(0);
                double a = c.number(1);
                checkDrive(d, c, a);
                if (!(f > 0 && f < d.config().sampleRateHz() / 2)) {
                    throw new CommandFault(-222, "Data out of range; frequency " + f + " Hz, expected more than 0 and"
                            + " less than " + d.config().sampleRateHz() / 2 + " Hz");
                }
                d.rig().exciter().setSine(f, a);
                d.drive(f, a);
                yield null;
            }
            case "DRIVE:RAMP" -> {
                c.atMost(2);
                double a = c.number(0);
                double s = c.number(1);
                checkDrive(d, c, a);
                if (!(s >= 0 && s <= VirtualDevice.MAX_RAMP_S)) {
                    throw new CommandFault(-222, "Data out of range; ramp time " + s + " s, expected 0.."
                            + VirtualDevice.MAX_RAMP_S + " s");
                }
                d.rig().exciter().rampTo(a, s);
                d.drive(d.frequencyHz(), a);
                yield null;
            }
            case "DRIVE:OUT" -> {
                c.atMost(1);
                d.output(c.onOff(), "DRIVE:OUT " + c.parameters().get(0));
                yield null;
            }
            case "ACQ:CHAN?" -> {
                c.atMost(1);
                int i = (int) c.wholeNumber(0, 0, d.rig().acquisition().channels().size() - 1);
                ChannelInfo ch = d.channel(i);
                yield ch.name() + "," + ch.quantity() + "," + ch.unit() + "," + d.sensitivity(i);
            }
            case "ACQ:FORM" -> {
                c.atMost(1);
                SampleFormat f = c.parameters().isEmpty() ? null : SampleFormat.ofMnemonic(c.parameters().get(0));
                if (f == null) {
                    throw new CommandFault(c.parameters().isEmpty() ? -109 : -224, (c.parameters().isEmpty()
                            ? "Missing parameter" : "Illegal parameter value") + "; expected F32, I24 or F64");
                }
                d.format(f);
                yield null;
            }
            case "ACQ:BLOCK" -> {
                c.atMost(1);
                d.blockSamples((int) c.wholeNumber(0, 1, VirtualDevice.MAX_BLOCK_SAMPLES));
                yield null;
            }
            case "ACQ:FETCH?" -> {
                c.atMost(1);
                int n = (int) c.wholeNumber(0, 1, VirtualDevice.MAX_FETCH_SAMPLES);
                if (d.streamingNow()) {
                    throw new CommandFault(-221, "Settings conflict; ACQ:FETCH? while streaming, send ACQ:STREAM OFF");
                }
                d.fetch(n);
                yield null;
            }
            case "ACQ:STREAM" -> {
                c.atMost(1);
                boolean on = c.onOff();
                if (on && d.fetchInProgress()) {
                    throw new CommandFault(-221, "Settings conflict; ACQ:STREAM ON while a fetch is being sent");
                }
                d.streaming(on);
                yield null;
            }
            case "ACQ:RESEND?" -> {
                c.atMost(1);
                long seq = c.wholeNumber(0, 0, 0xFFFFFFFFL);
                if (!d.resend(seq)) {
                    throw new CommandFault(102, "Block " + seq + " not available for resend; the last "
                            + BlockHistory.KEEP + " are kept");
                }
                yield null;
            }
            default -> throw new CommandFault(-113, "Undefined header; " + CommandLine.quote(c.name()));
        };
    }

    private static void checkDrive(VirtualDevice d, CommandLine c, double amplitudeV) {
        if (d.fetchInProgress()) {
            throw new CommandFault(-221, "Settings conflict; " + c.name() + " while a fetch is being sent");
        }
        double max = d.rig().exciter().maxAmplitudeV();
        if (!(amplitudeV >= 0 && amplitudeV <= max)) {
            throw new CommandFault(-222, "Data out of range; amplitude " + amplitudeV + " V, expected 0.." + max + " V");
        }
    }

    private static String plainQuery(VirtualDevice d, String name) {
        return switch (name) {
            case "*IDN?" -> d.identity();
            case "*OPC?" -> "1";
            case "SYST:ERR?" -> d.takeError().reply();
            case "SYST:ERR:COUNT?" -> Integer.toString(d.errorCount());
            case "SYST:VERS?" -> "1999.0";
            case "LINK:PROT?" -> VirtualDevice.PROTOCOL_MIN + "," + VirtualDevice.PROTOCOL_MAX;
            case "LINK:BOOT?" -> Integer.toString(d.bootCount());
            case "LINK:WDOG?" -> Integer.toString(d.watchdogMs());
            case "DRIVE:FREQ?" -> Double.toString(d.frequencyHz());
            case "DRIVE:AMPL?" -> Double.toString(d.amplitudeV());
            case "DRIVE:MAX?" -> Double.toString(d.rig().exciter().maxAmplitudeV());
            case "DRIVE:OUT?" -> d.rig().exciter().isOutputEnabled() ? "1" : "0";
            case "ACQ:RATE?" -> Double.toString(d.config().sampleRateHz());
            case "ACQ:CHAN:COUNT?" -> Integer.toString(d.rig().acquisition().channels().size());
            case "ACQ:FORM?" -> d.format().mnemonic();
            case "ACQ:BLOCK?" -> Integer.toString(d.blockSamples());
            case "ACQ:NEXT?" -> Long.toString(d.nextSample());
            case "ACQ:SEQ?" -> Long.toString(d.nextSequence());
            default -> d.streamingNow() ? "1" : "0";
        };
    }
}
