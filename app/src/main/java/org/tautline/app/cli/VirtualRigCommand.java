package org.tautline.app.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;

import org.tautline.analysis.AnalysisException;
import org.tautline.driver.serial.VirtualRigServer;
import org.tautline.driver.sim.SimulationConfigs;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code tautline virtual-rig}: the simulated rig served through the serial protocol on a pseudo-terminal. */
@Command(name = "virtual-rig", mixinStandardHelpOptions = true,
        description = "Make a pseudo-terminal pair with socat, serve the simulated demo wire on one end through the"
                + " serial protocol (driver/PROTOCOL.md), and print the other end's path for"
                + " 'tautline sweep --rig serial:PATH'. Runs until interrupted (Ctrl-C).")
final class VirtualRigCommand implements Callable<Integer> {
    /** The fault switches, by the name --fault takes. */
    static final List<String> FAULTS = List.of("drop-bytes", "corrupt-block", "lose-block", "stall", "reset",
            "amplifier-fault", "disappear");

    @Spec
    private CommandSpec spec;

    @Option(names = "--baud", paramLabel = "B", defaultValue = "921600", description = "Line speed (default: ${DEFAULT-VALUE}).")
    private int baud;

    @Option(names = "--fault", paramLabel = "KIND@S",
            description = "Inject a fault S seconds after start: drop-bytes, corrupt-block, lose-block, stall (2 s),"
                    + " reset, amplifier-fault or disappear. Repeatable.")
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
        try (VirtualRigServer server = VirtualRigServer.startOnPty(SimulationConfigs.demoWire(), baud)) {
            out.println(server.hostPath());
            out.flush();
            System.err.println("tautline: serving the simulated demo wire on " + server.devicePath() + "; open "
                    + server.hostPath() + " (for example: tautline sweep --rig serial:" + server.hostPath()
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
            CountDownLatch stop = new CountDownLatch(1);
            Thread hook = new Thread(stop::countDown, "virtual-rig-stop");
            Runtime.getRuntime().addShutdownHook(hook);
            stop.await();
            timer.shutdownNow();
        }
        return 0;
    }

    static void inject(VirtualRigServer server, String kind) {
        System.err.println(String.format(Locale.ROOT, "tautline: virtual rig: injecting %s", kind));
        switch (kind) {
            case "drop-bytes":
                server.dropBytes(7);
                break;
            case "corrupt-block":
                server.corruptBlock(1);
                break;
            case "lose-block":
                server.loseBlock(1);
                break;
            case "stall":
                server.stall(2000);
                break;
            case "reset":
                server.reset();
                break;
            case "amplifier-fault":
                server.amplifierFault();
                break;
            default:
                server.disappear();
                break;
        }
    }
}
