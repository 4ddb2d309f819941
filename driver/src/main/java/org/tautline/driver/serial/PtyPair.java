package org.tautline.driver.serial;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.tautline.driver.RigException;

/**
 * A pair of connected pseudo-terminals made by {@code socat}: what one end writes, the other reads.
 *
 * <p>Runs {@code socat -d -d pty,raw,echo=0,link=<dir>/device pty,raw,echo=0,link=<dir>/host} with the
 * links in a fresh temporary directory, waits until both links exist, and kills socat on {@link #close()}.
 * The device end is for the virtual rig, the host end for {@link SerialRig}; both are ordinary serial
 * ports to jSerialComm.
 */
public final class PtyPair implements AutoCloseable {
    /** How long {@link #open()} waits for socat to make both links, ms. */
    static final long START_TIMEOUT_MS = 5000;

    private final Process socat;
    private final Path directory;
    private final Path devicePath;
    private final Path hostPath;
    private boolean closed;

    private PtyPair(Process socat, Path directory) {
        this.socat = socat;
        this.directory = directory;
        this.devicePath = directory.resolve("device");
        this.hostPath = directory.resolve("host");
    }

    /**
     * Starts socat and waits for both pseudo-terminals.
     *
     * @return the pair
     * @throws RigException when socat is not installed, exits early or is not ready within 5 s
     */
    public static PtyPair open() {
        Path dir;
        try {
            dir = Files.createTempDirectory("tautline-pty");
        } catch (IOException e) {
            throw new RigException("cannot make a temporary directory for the pseudo-terminal links: " + e.getMessage()
                    + "; check that java.io.tmpdir is writable", e);
        }
        Process p;
        try {
            p = new ProcessBuilder(List.of("socat", "-d", "-d",
                    "pty,raw,echo=0,link=" + dir.resolve("device"), "pty,raw,echo=0,link=" + dir.resolve("host")))
                    .redirectErrorStream(true).redirectOutput(dir.resolve("socat.log").toFile()).start();
        } catch (IOException e) {
            deleteQuietly(dir);
            throw new RigException("socat not found: install it (Debian: apt-get install socat)", e);
        }
        PtyPair pair = new PtyPair(p, dir);
        long deadline = System.nanoTime() + START_TIMEOUT_MS * 1_000_000L;
        while (!(Files.exists(pair.devicePath) && Files.exists(pair.hostPath))) {
            if (!p.isAlive()) {
                String log = pair.log();
                pair.close();
                throw new RigException("socat exited with status " + p.exitValue() + " before making the"
                        + " pseudo-terminals: " + log.strip() + "; expected it to keep running");
            }
            if (System.nanoTime() > deadline) {
                pair.close();
                throw new RigException("socat did not make both pseudo-terminal links in " + dir + " within "
                        + START_TIMEOUT_MS + " ms; expected 'device' and 'host' links there");
            }
            try {
                Thread.sleep(10);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                pair.close();
                throw new RigException("interrupted while waiting for socat to make the pseudo-terminals", e);
            }
        }
        return pair;
    }

    /** @return the link to the device end, for the virtual rig */
    public String devicePath() {
        return devicePath.toString();
    }

    /** @return the link to the host end, for {@link SerialRig} */
    public String hostPath() {
        return hostPath.toString();
    }

    /** @return true while socat runs */
    public boolean isAlive() {
        return socat.isAlive();
    }

    /** @return the process id of socat */
    public long pid() {
        return socat.pid();
    }

    private String log() {
        try {
            return Files.readString(directory.resolve("socat.log"));
        } catch (IOException e) {
            return "(no socat log: " + e.getMessage() + ")";
        }
    }

    /** Kills socat (which removes the links) and deletes the temporary directory; idempotent. */
    @Override
    public synchronized void close() {
        if (closed) {
            return;
        }
        closed = true;
        socat.destroy();
        try {
            if (!socat.waitFor(2, TimeUnit.SECONDS)) {
                socat.destroyForcibly();
                socat.waitFor(2, TimeUnit.SECONDS);
            }
        } catch (InterruptedException e) {
            socat.destroyForcibly();
            Thread.currentThread().interrupt();
        }
        deleteQuietly(directory);
    }

    private static void deleteQuietly(Path dir) {
        try (var entries = Files.list(dir)) {
            for (Path e : (Iterable<Path>) entries::iterator) {
                Files.deleteIfExists(e);
            }
            Files.deleteIfExists(dir);
        } catch (IOException | UncheckedIOException e) {
            // A leftover temporary directory is harmless; the links inside died with socat.
            return;
        }
    }
}
