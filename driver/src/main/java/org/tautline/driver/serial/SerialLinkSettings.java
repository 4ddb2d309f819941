package org.tautline.driver.serial;

import org.tautline.driver.RigException;

/**
 * How {@link SerialRig} uses its link: baud rate, timeouts, sample format, block size and device watchdog.
 *
 * @param baud baud rate, bits per second; default 921600
 * @param replyTimeoutMs silence limit, ms: the device sending nothing at all for this long while the host waits is a
 *        fault (PROTOCOL.md, section 12); default 1000
 * @param blockTimeoutMs retry time, ms: a data block, reply or status still missing this long (plus the time one
 *        block takes on the line) is asked for again; default 1000
 * @param format sample coding asked of the device; default {@link SampleFormat#FLOAT32_LE}
 * @param blockSamples samples per channel per data block ({@code ACQ:BLOCK}); default 1024
 * @param watchdogMs device watchdog ({@code LINK:WDOG}): the device switches its output off after this long
 *        without a command, ms, 50..60000; default 2000
 */
public record SerialLinkSettings(int baud, int replyTimeoutMs, int blockTimeoutMs, SampleFormat format,
                                 int blockSamples, int watchdogMs) {

    /** Checks every field. */
    public SerialLinkSettings {
        if (baud <= 0) {
            throw new RigException("serial link: baud must be positive, for example 921600, got " + baud);
        }
        if (replyTimeoutMs < 1 || blockTimeoutMs < 1) {
            throw new RigException("serial link: replyTimeoutMs and blockTimeoutMs must be 1 ms or more, got "
                    + replyTimeoutMs + " and " + blockTimeoutMs);
        }
        if (format == null) {
            throw new RigException("serial link: format is missing; use F32, I24 or F64");
        }
        if (blockSamples < 1 || blockSamples > VirtualDevice.MAX_BLOCK_SAMPLES) {
            throw new RigException("serial link: blockSamples must lie in 1.." + VirtualDevice.MAX_BLOCK_SAMPLES
                    + ", got " + blockSamples);
        }
        if (watchdogMs < 50 || watchdogMs > 60000) {
            throw new RigException("serial link: watchdogMs must lie in 50..60000 ms, got " + watchdogMs);
        }
    }

    /** @return 921600 baud, 1000 ms timeouts, float32, 1024-sample blocks, 2000 ms watchdog */
    public static SerialLinkSettings defaults() {
        return new SerialLinkSettings(921600, 1000, 1000, SampleFormat.FLOAT32_LE, 1024, 2000);
    }

    /** @param value baud rate @return a copy with it */
    public SerialLinkSettings withBaud(int value) {
        return new SerialLinkSettings(value, replyTimeoutMs, blockTimeoutMs, format, blockSamples, watchdogMs);
    }

    /** @param value reply timeout, ms @return a copy with it */
    public SerialLinkSettings withReplyTimeoutMs(int value) {
        return new SerialLinkSettings(baud, value, blockTimeoutMs, format, blockSamples, watchdogMs);
    }

    /** @param value block timeout, ms @return a copy with it */
    public SerialLinkSettings withBlockTimeoutMs(int value) {
        return new SerialLinkSettings(baud, replyTimeoutMs, value, format, blockSamples, watchdogMs);
    }

    /** @param value sample format @return a copy with it */
    public SerialLinkSettings withFormat(SampleFormat value) {
        return new SerialLinkSettings(baud, replyTimeoutMs, blockTimeoutMs, value, blockSamples, watchdogMs);
    }

    /** @param value samples per channel per block @return a copy with it */
    public SerialLinkSettings withBlockSamples(int value) {
        return new SerialLinkSettings(baud, replyTimeoutMs, blockTimeoutMs, format, value, watchdogMs);
    }

    /** @param value device watchdog, ms @return a copy with it */
    public SerialLinkSettings withWatchdogMs(int value) {
        return new SerialLinkSettings(baud, replyTimeoutMs, blockTimeoutMs, format, blockSamples, value);
    }
}
