package org.tautline.app.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.app.bench.StopSignalBenchmark;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code tautline bench stop-signal}: how soon Ctrl-C or kill switches a serial rig's output off. */
@Command(name = "stop-signal", mixinStandardHelpOptions = true,
        description = "Send SIGINT and SIGTERM (alternately) to a 'tautline sweep' process on the virtual serial rig"
                + " (paced like a UART at 921600 baud) and measure, from the rig's own timed log, how long after the"
                + " signal the DRIVE:OUT OFF command arrived; also checks the exit status and that the journal ends as"
                + " cancelled. Target: under 100 ms.")
final class StopSignalBench implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Option(names = "--trials", paramLabel = "N", defaultValue = "10",
            description = "Interrupted sweeps, half of each signal (default: ${DEFAULT-VALUE}).")
    private int trials;

    @Option(names = "--json", description = "Print the figures as JSON.")
    private boolean json;

    @Override
    public Integer call() throws Exception {
        Path work = Files.createTempDirectory("tautline-stop-signal");
        List<StopSignalBenchmark.Trial> results = StopSignalBenchmark.run(trials, work);
        if (json) {
            ObjectNode node = ResultJson.MAPPER.createObjectNode();
            node.put("benchmark", "stop-signal");
            ArrayNode list = node.putArray("trials");
            for (StopSignalBenchmark.Trial t : results) {
                ObjectNode trial = list.addObject();
                trial.put("signal", t.signal());
                trial.put("offDelayMs", t.offDelayMs());
                trial.put("exitCode", t.exitCode());
                trial.put("journalEndedCancelled", t.journalEndedCancelled());
            }
            spec.commandLine().getOut().println(ResultJson.MAPPER.writeValueAsString(node));
            return 0;
        }
        for (String signal : List.of("INT", "TERM")) {
            List<StopSignalBenchmark.Trial> some = results.stream().filter(t -> t.signal().equals(signal)).toList();
            double[] d = StopSignalBenchmark.medianAndLargestMs(some);
            spec.commandLine().getOut().printf(Locale.ROOT, "SIG%s: %d sweeps; DRIVE:OUT OFF at the rig %.1f ms after"
                            + " the signal (median), %.1f ms at most; exit statuses %s; journal ended cancelled: %d of %d%n",
                    signal, some.size(), d[0], d[1], some.stream().map(t -> Integer.toString(t.exitCode())).distinct()
                            .toList(), some.stream().filter(StopSignalBenchmark.Trial::journalEndedCancelled).count(),
                    some.size());
        }
        return 0;
    }
}
