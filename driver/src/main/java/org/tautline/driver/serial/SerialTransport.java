package org.tautline.driver.serial;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import com.fazecast.jSerialComm.SerialPort;
import com.fazecast.jSerialComm.SerialPortInvalidPortException;

import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;

/**
 * A serial port opened with jSerialComm, 8 data bits, no parity, one stop bit, with a reader thread.
 *
 * <p>The reader thread (named {@code serial-reader <port>}) hands every chunk it reads to a
 * {@link Receiver}. The port counts as gone when a read or write fails or the device node (the path the
 * port was opened by, a symbolic link included) disappears; the receiver then hears of it once, as a
 * {@link Kind#PORT_GONE} fault. {@link #close()} may be called any number of times from any thread.
 */
public final class SerialTransport implements AutoCloseable {
    /** Read poll interval, ms: the longest a read waits before the reader checks the port is still there. */
    static final int POLL_MS = 100;

    /**
     * A port the system offers.
     *
     * @param path the device path, for example {@code /dev/ttyUSB0}
     * @param name the system name, for example {@code ttyUSB0}
     * @param description what the system says the port is
     */
    public record PortEntry(String path, String name, String description) {
    }

    /** Receives what the reader thread reads; called on that thread. */
    public interface Receiver {
        /**
         * @param data a buffer the reader reuses once this returns
         * @param offset first byte
         * @param length byte count, 1 or more
         */
        void bytes(byte[] data, int offset, int length);

        /** @param fault why the port is gone; called at most once, not after {@link #close()} */
        void gone(RigLinkException fault);
    }

    private final SerialPort port;
    private final String name;
    private final Path openedPath;
    private volatile boolean closed;
    private volatile boolean goneReported;
    private final Object writeLock = new Object();
    private Thread reader;

    private SerialTransport(SerialPort port, String name, Path openedPath) {
        this.port = port;
        this.name = name;
        this.openedPath = openedPath;
    }

    /** @return the serial ports the system lists, in its order */
    public static List<PortEntry> listPorts() {
        List<PortEntry> out = new ArrayList<>();
        for (SerialPort p : SerialPort.getCommPorts()) {
            out.add(new PortEntry(p.getSystemPortPath(), p.getSystemPortName(), p.getPortDescription()));
        }
        return out;
    }

    /**
     * Opens a port.
     *
     * @param nameOrPath a path ({@code /dev/ttyUSB0}, a symbolic link to a pseudo-terminal) or a system name
     *        ({@code ttyUSB0}, {@code COM3})
     * @param baud baud rate, bits per second, for example 921600
     * @return the open transport; call {@link #startReading(Receiver)} next
     * @throws RigLinkException of kind {@link Kind#PORT_GONE} when the port does not exist or cannot be opened
     */
    public static SerialTransport open(String nameOrPath, int baud) {
        if (baud <= 0) {
            throw new RigLinkException(Kind.PROTOCOL, nameOrPath, "baud rate " + baud + " is not allowed",
                    "a positive baud rate such as 115200 or 921600");
        }
        SerialPort port;
        try {
            port = SerialPort.getCommPort(nameOrPath);
        } catch (SerialPortInvalidPortException e) {
            throw new RigLinkException(Kind.PORT_GONE, nameOrPath, "there is no such serial port",
                    "an existing port; 'tautline rigs' lists them", e);
        }
        if (!port.openPort(0)) {
            throw new RigLinkException(Kind.PORT_GONE, nameOrPath, "the port could not be opened (system error "
                    + port.getLastErrorCode() + ")", "a port not in use by another program and readable by this user");
        }
        port.setComPortParameters(baud, 8, SerialPort.ONE_STOP_BIT, SerialPort.NO_PARITY);
        port.setFlowControl(SerialPort.FLOW_CONTROL_DISABLED);
        port.setComPortTimeouts(SerialPort.TIMEOUT_READ_SEMI_BLOCKING | SerialPort.TIMEOUT_WRITE_BLOCKING, POLL_MS, 0);
        Path path = nameOrPath.contains("/") ? Path.of(nameOrPath) : Path.of(port.getSystemPortPath());
        return new SerialTransport(port, nameOrPath, path);
    }

    /** @return the name or path the port was opened by */
    public String port() {
        return name;
    }

    /**
     * Starts the reader thread; call once.
     *
     * @param receiver where the bytes go
     */
    public synchronized void startReading(Receiver receiver) {
        if (reader != null) {
            throw new IllegalStateException("the reader of " + name + " is already running; call startReading once");
        }
        reader = new Thread(() -> readLoop(receiver), "serial-reader " + name);
        reader.setDaemon(true);
        reader.start();
    }

    private void readLoop(Receiver receiver) {
        byte[] chunk = new byte[1 << 16];
        long lastCheckNs = System.nanoTime();
        while (!closed) {
            int n;
            try {
                n = port.readBytes(chunk, chunk.length);
            } catch (RuntimeException e) {
                reportGone(receiver, "reading failed (" + e + ")");
                return;
            }
            if (closed) {
                return;
            }
            if (n < 0) {
                reportGone(receiver, "reading failed (system error " + port.getLastErrorCode() + ")");
                return;
            }
            if (n > 0) {
                receiver.bytes(chunk, 0, n);
            }
            long now = System.nanoTime();
            if (n == 0 || now - lastCheckNs > POLL_MS * 1_000_000L) {
                lastCheckNs = now;
                if (!Files.exists(openedPath, LinkOption.NOFOLLOW_LINKS)) {
                    reportGone(receiver, "the device node " + openedPath + " disappeared");
                    return;
                }
            }
        }
    }

    private void reportGone(Receiver receiver, String what) {
        if (!closed && !goneReported) {
            goneReported = true;
            receiver.gone(new RigLinkException(Kind.PORT_GONE, name, what,
                    "the device to stay connected; check the cable and power, then reconnect"));
        }
    }

    /**
     * Writes all bytes.
     *
     * @param data the bytes
     * @throws RigLinkException of kind {@link Kind#PORT_GONE} when the port is closed, gone or the write fails
     */
    public void write(byte[] data) {
        write(data, 0, data.length);
    }

    /**
     * Writes bytes as one unit: writes from other threads (each one line, for example) never interleave with them.
     *
     * @param data the buffer
     * @param offset first byte
     * @param length byte count
     * @throws RigLinkException of kind {@link Kind#PORT_GONE} when the port is closed, gone or the write fails
     */
    public void write(byte[] data, int offset, int length) {
        synchronized (writeLock) {
            if (closed || goneReported) {
                throw new RigLinkException(Kind.PORT_GONE, name, "the port is " + (closed ? "closed" : "gone"),
                        "an open port; open it again");
            }
            int done = 0;
            while (done < length) {
                int n = port.writeBytes(data, length - done, offset + done);
                if (n <= 0) {
                    throw new RigLinkException(Kind.PORT_GONE, name, "writing failed after " + done + " of "
                            + length + " bytes (system error " + port.getLastErrorCode() + ")",
                            "the device to accept data");
                }
                done += n;
            }
        }
    }

    /**
     * Writes one command line with its {@code \n} terminator, as one unit; safe from any thread.
     *
     * @param line the command, ASCII, without terminator
     */
    public void writeLine(String line) {
        write((line + "\n").getBytes(StandardCharsets.US_ASCII));
    }

    /** @return true until closed or gone */
    public boolean isOpen() {
        return !closed && !goneReported;
    }

    /** Closes the port and stops the reader within about {@value #POLL_MS} ms; idempotent. */
    @Override
    public void close() {
        Thread r;
        synchronized (this) {
            if (closed) {
                return;
            }
            closed = true;
            r = reader;
        }
        if (r != null && r != Thread.currentThread()) {
            try {
                r.join(4L * POLL_MS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
        port.closePort();
    }
}
