package org.tautline.driver.serial;

import com.fazecast.jSerialComm.SerialPort;

/**
 * Registers work that must run when the process ends, before the serial library lets go of its ports.
 *
 * <p>The serial library (jSerialComm) installs a shutdown hook of its own that releases every open port; the JVM
 * runs shutdown hooks in no set order, so a hook of ours that still has to command a serial rig's output off, or
 * wait for a sweep to ramp down and journal its end, could find the port already gone. The library runs the hooks
 * given to {@link SerialPort#addShutdownHook(Thread)} to their end before it releases anything, so this class hands
 * ours to it. Where the library cannot load on this platform (no serial rig can be open either), the hook goes to
 * the JVM directly.
 */
public final class ShutdownHooks {
    private ShutdownHooks() {
    }

    /**
     * @param hook a thread, not yet started, to run when the process ends; it runs before serial ports are released
     */
    public static void add(Thread hook) {
        try {
            SerialPort.addShutdownHook(hook);
        } catch (LinkageError libraryUnavailable) {
            Runtime.getRuntime().addShutdownHook(hook);
        }
    }
}
