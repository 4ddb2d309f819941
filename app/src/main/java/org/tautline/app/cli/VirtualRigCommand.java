package org.tautline.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;

import org.tautline.analysis.AnalysisException;
import org.tautline.driver.serial.InjectedFault;
import org.tautline.driver.serial.VirtualRigServer;
import org.tautline.driver.serial.VirtualRigSettings;
import org.tautline.driver.sim.SimulationConfigs;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code tautline virtual-rig}: the simulated rig served through the serial protocol on a pseudo-terminal. */
@Command(name = "virtual-rig", mixinStandardHelpOptions = true,
        description = {"Make a pseudo-terminal pair with socat, serve the simulated demo wire on one end through the"
                + " serial protocol (driver/PROTOCOL.md), and print the other end's path for"
                + " 'tautline sweep --rig serial:PATH'. Runs until interrupted (Ctrl-C).",
                "",
                "The log (--log FILE) has one line per event: the wall-clock time in microseconds since 1970-01-01"
                        + " UTC, a kind and a text, for example '1764812345123456 recv DRIVE:OUT OFF'. Kinds: recv (a"
                        + " command line as received), notice (a line starting with ! as sent), output (on or off and"
                        + " the cause), fault (an injected fault), event (anything else)."})
final class VirtualRigCommand implements Callable<Integer> {
    /** The faults --fault takes. */
    static final List<String> FAULTS = List.of("drop-bytes", "corrupt-block", "lose-block", "short-stall", "stall",
            "reset", "amplifier-fault", "disappear");
    /** How long a short stall lasts, ms: shorter than the serial rig's reply timeout, so the link recovers. */
    static final int SHORT_STALL_MS = 200;
    /** How long a stall lasts, ms: longer than the serial rig's default reply timeout (2000 ms), a fault. */
    static final int STALL_MS = 3000;

    @Spec
    private CommandSpec spec;

    @Option(names = "--baud", paramLabel = "B", defaultValue = "921600", description = "Line speed (default: ${DEFAULT-VALUE}).")
    private int baud;

    @Option(names = "--pace", description = "Send no faster than a UART at the baud rate would (10 bits per byte);"
            + " a pseudo-terminal alone is much faster.")
    private boolean pace;

    @Option(names = "--log", paramLabel = "FILE", description = "Also write the event log to FILE (see above).")
    private Path logFile;

    @Option(names = "--fault", paramLabel = "KIND@S",
            description = "Inject a fault S seconds after start: drop-bytes (7 bytes of the next block), corrupt-block,"
                    + " lose-block, short-stall (" + SHORT_STALL_MS + " ms), stall (" + STALL_MS + " ms), reset,"
                    + " amplifier-fault or disappear. Repeatable.")
    private List<String> faults = new ArrayList<>();

    @Override
    public Integer call() throws InterruptedException {
        List<Double> delays = new ArrayList<>();
        for (String text : faults) {
            int at = text.indexOf('@');
            String kind = at < 0 ? text : text.substring(0, at);
            if (!FAULTS.contains(kind)) {
                throw new AnalysisException("--fault '" + text + "': expected KIND@SECONDS with KIND one of " + FAULTS);
            }
            double seconds;
            try {
                seconds = at < 0 ? 10.0 : Double.parseDouble(text.substring(at + 1));
            } catch (NumberFormatException e) {
                throw new AnalysisException("--fault '" + text + "': '" + text.substring(at + 1) + "' is not a number of seconds");
            }
            delays.add(seconds);
        }
        PrintWriter out = spec.commandLine().getOut();
        VirtualRigSettings settings = VirtualRigSettings.of(baud).withPacing(pace).withLogFile(logFile);
        VirtualRigServer server = VirtualRigServer.startOnPty(SimulationConfigs.demoWire(), settings);
        try {
            out.println(server.hostPath());
            out.flush();
            System.err.println("tautline: serving the simulated demo wire on " + server.devicePath() + (pace
                    ? " paced at " + baud + " baud" : "") + (logFile == null ? "" : ", logging to " + logFile)
                    + "; open " + server.hostPath() + " (for example: tautline sweep --rig serial:" + server.hostPath()
                    + " ...); Ctrl-C stops");
            ScheduledExecutorService timer = Executors.newSingleThreadScheduledExecutor(r -> {
                Thread t = new Thread(r, "virtual-rig-faults");
                t.setDaemon(true);
                return t;
            });
            for (int i = 0; i < faults.size(); i++) {
                String kind = faults.get(i).split("@")[0];
                timer.schedule(() -> inject(server, kind), Math.round(delays.get(i) * 1000), TimeUnit.MILLISECONDS);
            }
            // The hook itself closes the server: the JVM does not wait for this thread once a signal arrived, and
            // closing switches the output off, kills socat and closes the log.
            CountDownLatch stop = new CountDownLatch(1);
            Thread hook = new Thread(() -> {
                timer.shutdownNow();
                server.close();
                stop.countDown();
            }, "virtual-rig-stop");
            Runtime.getRuntime().addShutdownHook(hook);
            stop.await();
        } finally {
            server.close();
        }
        return 0;
    }

    static void inject(VirtualRigServer server, String kind) {
        System.err.println(String.format(Locale.ROOT, "tautline: virtual rig: injecting %s", kind));
        switch (kind) {
            case "short-stall" -> server.inject(InjectedFault.STALL, SHORT_STALL_MS);
            case "stall" -> server.inject(InjectedFault.STALL, STALL_MS);
            default -> {
                for (InjectedFault f : InjectedFault.values()) {
                    if (f.label().equals(kind)) {
                        server.inject(f, f.defaultParameter());
                    }
                }
            }
        }
    }
}
