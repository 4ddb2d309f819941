package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.tautline.driver.journal.JournalContents;
import org.tautline.driver.journal.JournalReader;
import org.tautline.driver.serial.VirtualRigLog;
import org.tautline.driver.serial.VirtualRigServer;
import org.tautline.driver.sim.SimulationConfigs;
import org.tautline.driver.sweep.SweepStatus;

/**
 * A stop signal during a serial sweep: the output-off command reaches the rig at once, the journal ends as cancelled,
 * the command says how to resume and the process ends with 128 + the signal number.
 *
 * <p>The sweep runs in a child process (a signal must reach a real process) against the virtual rig served in this
 * one over a socat pseudo-terminal pair, whose own timed log shows what arrived and when. The test asserts the order
 * of events, not their timing: the output-off command reaches the rig after the signal (a command of the step then
 * in progress may come just before it), and nothing switches the output on again. It prints the measured delay from the signal to the command; the
 * {@code bench stop-signal} command measures it over many runs.
 */
class StopSignalTest {
    private Process child;

    @AfterEach
    void stopChild() throws InterruptedException {
        if (child != null && child.isAlive()) {
            child.destroyForcibly();
            child.waitFor(10, TimeUnit.SECONDS);
        }
    }

    @ParameterizedTest(name = "SIG{0}")
    @CsvSource({"INT, 130", "TERM, 143"})
    void aStopSignalSwitchesTheOutputOffJournalsTheStopAndSaysHowToResume(String signal, int exitCode,
                                                                           @TempDir Path dir) throws Exception {
        Path run = dir.resolve("run");
        Path out = dir.resolve("out.txt");
        try (VirtualRigServer rig = VirtualRigServer.startOnPty(SimulationConfigs.demoWire(), 921600)) {
            String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
            // A process started in the background by a non-interactive shell (as a CI job may be) inherits SIGINT
            // ignored, and a JVM that starts with SIGINT ignored leaves it so (POSIX, sh "Asynchronous lists", from
            // memory): coreutils' env restores the default handling, so the child sees Ctrl-C as a person's would.
            child = new ProcessBuilder("env", "--default-signal=INT", java, "-cp", System.getProperty("java.class.path"), Main.class.getName(), "sweep",
                    "--rig", "serial:" + rig.hostPath(), "--from", "300", "--to", "420", "--steps", "20000",
                    "--settle-cycles", "100", "--cycles", "40", "--no-progress", "--out", run.toString())
                    .redirectErrorStream(true).redirectOutput(out.toFile()).start();
            // Between the first two harmonics of the demo wire (225 and 451 Hz) the motion stays far below the safety
            // limits, and 20000 steps cannot be done before the signal however slowly this test is scheduled: the
            // sweep can only end by the signal.
            Path journal = run.resolve(SweepCommand.JOURNAL);
            waitForSteps(journal, 3);

            Instant signalled = Instant.now();
            if (signal.equals("TERM")) {
                child.destroy(); // SIGTERM, sent straight from this process
            } else {
                new ProcessBuilder("kill", "-" + signal, Long.toString(child.pid())).inheritIO().start().waitFor();
            }
            assertTrue(child.waitFor(60, TimeUnit.SECONDS), "the process ends after the stop signal");
            String printed = Files.readString(out, StandardCharsets.UTF_8);
            assertEquals(exitCode, child.exitValue(), "128 + the signal number; printed: " + printed);

            long signalMicros = ChronoUnit.MICROS.between(Instant.EPOCH, signalled);
            List<VirtualRigLog.Entry> log = rig.log();
            VirtualRigLog.Entry off = log.stream().filter(e -> e.epochMicros() >= signalMicros
                    && e.kind().equals("recv") && e.text().equals("DRIVE:OUT OFF")).findFirst().orElseThrow(
                            () -> new AssertionError("the output-off command never reached the rig after the signal;"
                                    + " the rig's log from the signal on: " + log.stream().filter(e -> e.epochMicros()
                                    >= signalMicros - 20_000).map(VirtualRigLog.Entry::line).toList() + "; printed: "
                                    + printed));
            assertTrue(log.stream().noneMatch(e -> e.epochMicros() > off.epochMicros() && e.kind().equals("recv")
                    && e.text().equals("DRIVE:OUT ON")), "nothing switches the output on again");
            assertFalse(rig.outputEnabled(), "the rig's output is off");
            System.out.printf("SIG%s: DRIVE:OUT OFF reached the rig %.1f ms after the signal was sent%n", signal,
                    (off.epochMicros() - signalMicros) / 1000.0);

            JournalContents contents = JournalReader.read(journal);
            assertEquals(Optional.of(SweepStatus.CANCELLED), contents.lastStatus());
            assertTrue(contents.sessions().get(0).reason().startsWith(SignalStop.REASON), contents.sessions().get(0)
                    .reason());
            assertTrue(printed.contains("sweep stopped after " + contents.steps().size() + " steps (" + SignalStop.REASON),
                    printed);
            assertTrue(printed.contains("Continue it with 'tautline resume " + run + "'"), printed);
        }
    }

    private void waitForSteps(Path journal, int steps) throws IOException, InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (System.nanoTime() < deadline) {
            if (!child.isAlive()) {
                throw new AssertionError("the sweep ended before it could be interrupted: exit " + child.exitValue());
            }
            if (Files.exists(journal) && stepsIn(journal) >= steps) {
                return;
            }
            Thread.sleep(50);
        }
        throw new AssertionError("the sweep did not journal " + steps + " steps within 60 s");
    }

    private static long stepsIn(Path journal) throws IOException {
        return Files.readAllLines(journal, StandardCharsets.US_ASCII).stream().filter(l -> l.startsWith("STEP ")).count();
    }
}
