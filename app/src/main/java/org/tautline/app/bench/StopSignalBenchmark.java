package org.tautline.app.bench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.concurrent.TimeUnit;

import org.tautline.driver.journal.JournalReader;
import org.tautline.driver.serial.VirtualRigLog;
import org.tautline.driver.serial.VirtualRigServer;
import org.tautline.driver.serial.VirtualRigSettings;
import org.tautline.driver.sim.SimulationConfigs;
import org.tautline.driver.sweep.SweepStatus;

/**
 * How soon a stop signal switches a serial rig's output off: a {@code tautline sweep} process on the virtual rig
 * (paced like a UART at 921600 baud) is sent SIGINT or SIGTERM mid-sweep, and the virtual rig's own log gives the
 * time its {@code DRIVE:OUT OFF} arrived. The delay counts from just before the signal is sent (for SIGINT, before
 * the {@code kill} command that sends it is started) to the command's arrival.
 */
public final class StopSignalBenchmark {
    private StopSignalBenchmark() {
    }

    /**
     * One interrupted sweep.
     *
     * @param signal "INT" or "TERM"
     * @param offDelayMs from the signal to DRIVE:OUT OFF at the rig, ms
     * @param exitCode the process's exit status
     * @param journalEndedCancelled true when the journal's last record says the sweep was cancelled
     */
    public record Trial(String signal, double offDelayMs, int exitCode, boolean journalEndedCancelled) {
    }

    /**
     * Runs the trials, alternating SIGINT and SIGTERM.
     *
     * @param trials how many
     * @param work a folder for the run folders
     * @return one result per trial
     * @throws IOException when a process cannot be started or a file read
     * @throws InterruptedException when interrupted while waiting
     */
    public static List<Trial> run(int trials, Path work) throws IOException, InterruptedException {
        List<Trial> results = new ArrayList<>();
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        for (int i = 0; i < trials; i++) {
            String signal = i % 2 == 0 ? "INT" : "TERM";
            Path run = work.resolve("run-" + i);
            try (VirtualRigServer rig = VirtualRigServer.startOnPty(SimulationConfigs.demoWire(),
                    VirtualRigSettings.of(921600).withPacing(true))) {
                // env restores SIGINT's default handling, which a shell's background job inherits ignored.
                Process child = new ProcessBuilder("env", "--default-signal=INT", java, "-cp", System.getProperty("java.class.path"),
                        "org.tautline.app.cli.Main", "sweep", "--rig", "serial:" + rig.hostPath(), "--from", "150", "--to",
                        "300", "--steps", "400", "--settle-cycles", "100", "--cycles", "40", "--no-progress", "--out",
                        run.toString()).redirectErrorStream(true).redirectOutput(work.resolve("out-" + i + ".txt").toFile())
                        .start();
                try {
                    waitForSteps(child, run.resolve("journal"), 2 + i % 3);
                    Instant sent = Instant.now();
                    if (signal.equals("TERM")) {
                        child.destroy();
                    } else {
                        new ProcessBuilder("kill", "-INT", Long.toString(child.pid())).start().waitFor();
                    }
                    if (!child.waitFor(60, TimeUnit.SECONDS)) {
                        throw new IOException("the sweep process did not end within 60 s of SIG" + signal);
                    }
                    long sentMicros = ChronoUnit.MICROS.between(Instant.EPOCH, sent);
                    OptionalLong off = VirtualRigLog.firstAfter(rig.log(), sentMicros, "recv", "DRIVE:OUT OFF");
                    boolean cancelled = JournalReader.read(run.resolve("journal")).lastStatus()
                            .equals(Optional.of(SweepStatus.CANCELLED));
                    results.add(new Trial(signal, off.isPresent() ? (off.getAsLong() - sentMicros) / 1000.0 : Double.NaN,
                            child.exitValue(), cancelled));
                } finally {
                    child.destroyForcibly();
                }
            }
        }
        return results;
    }

    /**
     * @param trials the trials of one signal
     * @return {median, largest} delay, ms
     */
    public static double[] medianAndLargestMs(List<Trial> trials) {
        double[] d = trials.stream().mapToDouble(Trial::offDelayMs).sorted().toArray();
        return d.length == 0 ? new double[] {Double.NaN, Double.NaN}
                : new double[] {d[d.length / 2], Arrays.stream(d).max().orElse(Double.NaN)};
    }

    private static void waitForSteps(Process child, Path journal, int steps) throws IOException, InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (System.nanoTime() < deadline) {
            if (!child.isAlive()) {
                throw new IOException("the sweep process ended before it could be interrupted: exit " + child.exitValue());
            }
            if (Files.exists(journal) && Files.readAllLines(journal, StandardCharsets.US_ASCII).stream()
                    .filter(l -> l.startsWith("STEP ")).count() >= steps) {
                return;
            }
            Thread.sleep(20);
        }
        throw new IOException("the sweep did not journal " + steps + " steps within 60 s");
    }
}
