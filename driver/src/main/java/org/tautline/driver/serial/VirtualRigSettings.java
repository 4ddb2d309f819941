package org.tautline.driver.serial;

import java.nio.file.Path;

import org.tautline.driver.RigException;

/**
 * How a {@link VirtualRigServer} runs.
 *
 * @param baud the port's baud rate, bits per second; default 921600
 * @param paced when true the server sends no faster than a UART at that baud rate would (8N1: 10 bits per byte,
 *        see {@link LinkBudget}); a pseudo-terminal alone carries bytes as fast as they are written. Default false
 * @param logFile where the event log is also written, line by line ({@link VirtualRigLog}), or null for memory only
 */
public record VirtualRigSettings(int baud, boolean paced, Path logFile) {
    /** Checks the baud rate. */
    public VirtualRigSettings {
        if (baud <= 0) {
            throw new RigException("virtual rig: baud must be positive, for example 921600, got " + baud);
        }
    }

    /**
     * @param baud baud rate
     * @return unpaced, logging to memory only
     */
    public static VirtualRigSettings of(int baud) {
        return new VirtualRigSettings(baud, false, null);
    }

    /** @param value true to pace bytes at the baud rate @return a copy with it */
    public VirtualRigSettings withPacing(boolean value) {
        return new VirtualRigSettings(baud, value, logFile);
    }

    /** @param value the log file, or null @return a copy with it */
    public VirtualRigSettings withLogFile(Path value) {
        return new VirtualRigSettings(baud, paced, value);
    }
}
