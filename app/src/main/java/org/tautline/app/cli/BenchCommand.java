package org.tautline.app.cli;

import java.util.Locale;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.app.qualify.DemoScenario;
import org.tautline.driver.sim.SimulatorBenchmark;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code tautline bench}: benchmarks that print figures; none of them passes or fails on time. */
@Command(name = "bench", mixinStandardHelpOptions = true,
        description = "Run a benchmark and print its figures.",
        subcommands = {BenchCommand.Simulator.class})
final class BenchCommand implements Runnable {
    @Spec
    private CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** {@code tautline bench simulator}: the simulated rig's speed as a multiple of real time. */
    @Command(name = "simulator", mixinStandardHelpOptions = true,
            description = "Simulator speed as a multiple of real time: the demo wire model (30 modes in two"
                    + " polarisations) at 20 kS/s, driven by a sine. Target: at least 100x.")
    static final class Simulator implements Callable<Integer> {
        @Spec
        private CommandSpec spec;

        @Option(names = "--seconds", paramLabel = "S", defaultValue = "120",
                description = "Rig seconds to simulate (default: ${DEFAULT-VALUE}).")
        private double rigSeconds;

        @Option(names = "--json", description = "Print the figures as JSON.")
        private boolean json;

        @Override
        public Integer call() throws Exception {
            SimulatorBenchmark.Figures result = SimulatorBenchmark.run(DemoScenario.simulation(), rigSeconds);
            if (json) {
                ObjectNode node = ResultJson.MAPPER.createObjectNode();
                node.put("benchmark", "simulator");
                node.put("modes", result.modeCount());
                node.put("sampleRateHz", result.sampleRateHz());
                node.put("rigTimeS", result.simulatedS());
                node.put("wallTimeS", result.wallS());
                node.put("realTimeMultiple", result.realTimeMultiple());
                spec.commandLine().getOut().println(ResultJson.MAPPER.writeValueAsString(node));
            } else {
                spec.commandLine().getOut().printf(Locale.ROOT,
                        "simulator: %d modes x 2 polarisations at %.0f S/s: %.1f rig s in %.2f wall s = %.0fx real time%n",
                        result.modeCount(), result.sampleRateHz(), result.simulatedS(), result.wallS(),
                        result.realTimeMultiple());
            }
            return 0;
        }
    }
}
