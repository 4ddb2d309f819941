package org.tautline.app.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.app.qualify.DemoScenario;
import org.tautline.app.bench.FrfBenchmark;
import org.tautline.app.bench.ModalBenchmark;
import org.tautline.app.bench.ModalSuiteBenchmark;
import org.tautline.app.bench.ModalSuiteText;
import org.tautline.app.bench.UiBenchmark;
import org.tautline.driver.serial.SerialBenchmark;
import org.tautline.driver.sim.SimulatorBenchmark;
import org.tautline.driver.sim.SweepBenchmark;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code tautline bench}: benchmarks that print figures; none of them passes or fails on time. */
@Command(name = "bench", mixinStandardHelpOptions = true,
        description = "Run a benchmark and print its figures.",
        subcommands = {BenchCommand.Simulator.class, BenchCommand.FrfFromWav.class, BenchCommand.Modal.class,
                BenchCommand.Serial.class, BenchCommand.Sweep.class, StopSignalBench.class, UiBenchmark.class})
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

    /** {@code tautline bench frf}: H1 and coherence from a two-channel WAV file, and the heap it takes. */
    @Command(name = "frf", mixinStandardHelpOptions = true,
            description = "Time H1 + coherence (Hann, 50 %% overlap) on a two-channel float WAV of 2^24 samples per"
                    + " channel, and on one a quarter as long after a warm-up run, and print throughput and heap use: the heap should not"
                    + " grow with the record. Compare with app/src/bench/frf_reference.py (scipy) on the same file.")
    static final class FrfFromWav implements Callable<Integer> {
        @Spec
        private CommandSpec spec;

        @Option(names = "--frames", paramLabel = "N", defaultValue = "16777216",
                description = "Samples per channel (default: ${DEFAULT-VALUE} = 2^24).")
        private long frames;

        @Option(names = "--segment", paramLabel = "N", defaultValue = "4096",
                description = "Welch segment length (default: ${DEFAULT-VALUE}).")
        private int segment;

        @Option(names = "--keep", paramLabel = "FILE.wav",
                description = "Keep the full-length recording here (for the scipy reference) instead of deleting it.")
        private Path keep;

        @Option(names = "--json", description = "Print the figures as JSON.")
        private boolean json;

        @Override
        public Integer call() throws Exception {
            Path dir = Files.createTempDirectory("tautline-bench-frf");
            Path full = keep != null ? keep : dir.resolve("full.wav");
            Path quarter = dir.resolve("quarter.wav");
            try {
                FrfBenchmark.run(quarter, frames / 4, segment); // warm-up: let the JIT compile the hot loops
                FrfBenchmark.Figures small = FrfBenchmark.run(quarter, frames / 4, segment);
                FrfBenchmark.Figures large = FrfBenchmark.run(full, frames, segment);
                if (json) {
                    ObjectNode node = ResultJson.MAPPER.createObjectNode();
                    node.put("benchmark", "frf");
                    node.set("quarterLength", figures(small));
                    node.set("fullLength", figures(large));
                    spec.commandLine().getOut().println(ResultJson.MAPPER.writeValueAsString(node));
                } else {
                    spec.commandLine().getOut().print(text(small) + text(large));
                    spec.commandLine().getOut().flush();
                }
            } finally {
                Files.deleteIfExists(quarter);
                if (keep == null) {
                    Files.deleteIfExists(full);
                }
                Files.deleteIfExists(dir);
            }
            return 0;
        }

        private static ObjectNode figures(FrfBenchmark.Figures f) {
            ObjectNode node = ResultJson.MAPPER.createObjectNode();
            node.put("framesPerChannel", f.frames());
            node.put("segment", f.segmentLength());
            node.put("fileBytes", f.fileBytes());
            node.put("wallTimeS", f.wallS());
            node.put("samplesPerS", f.samplesPerS());
            node.put("fileBytesPerS", f.bytesPerS());
            node.put("peakHeapBytes", f.peakHeapBytes());
            node.put("retainedHeapBytes", f.retainedHeapBytes());
            node.put("averages", f.averages());
            node.put("meanCoherence", f.meanCoherence());
            return node;
        }

        private static String text(FrfBenchmark.Figures f) {
            return String.format(Locale.ROOT,
                    "frf: 2 x %d samples (%.0f MiB WAV), segment %d: %.2f s = %.1f M samples/s, %.0f MiB/s;"
                            + " peak heap %.1f MiB, retained %.1f MiB; %d averages, mean coherence %.3f%n",
                    f.frames(), f.fileBytes() / 1048576.0, f.segmentLength(), f.wallS(), f.samplesPerS() / 1e6,
                    f.bytesPerS() / 1048576.0, f.peakHeapBytes() / 1048576.0, f.retainedHeapBytes() / 1048576.0,
                    f.averages(), f.meanCoherence());
        }
    }

    /** {@code tautline bench modal}: the modal fit on a suite of named cases, or a Monte Carlo, against the Cramer-Rao bound. */
    @Command(name = "modal", mixinStandardHelpOptions = true,
            description = "The modal fit on a suite of named, seeded, invented stiff-string FRFs (doublets 0.5-5"
                    + " half-power bandwidths apart at damping 0.01, 0.001 and 0.0001; weak modes 5-10 noise standard"
                    + " deviations high; 24 modes between strong out-of-band modes; uniform 4000-line and stepped-sine"
                    + " lines; receptance, mobility and accelerance). Per case: true modes, how many the Cramer-Rao bound"
                    + " can determine, missed and spurious modes, RMS error / bound of f and zeta, fit warnings and the"
                    + " fit's time. Targets where determinable: 0 missed, 0 spurious, <= 1.5 (f), <= 2 (zeta), under 1 s"
                    + " per 4000-line case. With --monte-carlo, --trials or --seed: a Monte Carlo on random cases instead.")
    static final class Modal implements Callable<Integer> {
        @Spec
        private CommandSpec spec;

        @Option(names = "--case", paramLabel = "TEXT",
                description = "Suite: run only the cases whose name contains TEXT (capitals or not).")
        private String caseName;

        @Option(names = "--repeats", paramLabel = "R",
                description = "Suite: timed fits per case, the median reported (default: 3).")
        private Integer repeats;

        @Option(names = "--monte-carlo", description = "Run the Monte Carlo on random cases instead of the suite.")
        private boolean monteCarlo;

        @Option(names = "--trials", paramLabel = "N",
                description = "Monte Carlo: trials per line spacing (default: 100); implies --monte-carlo.")
        private Integer trials;

        @Option(names = "--seed", paramLabel = "S",
                description = "Monte Carlo: random seed (default: 20240611); implies --monte-carlo.")
        private Long seed;

        @Option(names = "--json", description = "Print the figures as JSON.")
        private boolean json;

        @Override
        public Integer call() throws Exception {
            boolean random = monteCarlo || trials != null || seed != null;
            if (random && (caseName != null || repeats != null)) {
                throw new IllegalArgumentException("--case and --repeats are for the suite; they cannot be used with"
                        + " --monte-carlo, --trials or --seed");
            }
            Object figures;
            String text;
            if (random) {
                ModalBenchmark.Figures f = ModalBenchmark.run(trials == null ? 100 : trials,
                        seed == null ? 20240611L : seed, null);
                figures = f;
                text = ModalBenchmark.text(f);
            } else {
                ModalSuiteBenchmark.Figures f = ModalSuiteBenchmark.run(caseName,
                        repeats == null ? 3 : repeats, null);
                figures = f;
                text = ModalSuiteText.of(f);
            }
            if (json) {
                spec.commandLine().getOut().println(ResultJson.MAPPER.writeValueAsString(figures));
            } else {
                spec.commandLine().getOut().print(text);
            }
            spec.commandLine().getOut().flush();
            return 0;
        }
    }

    /** {@code tautline bench serial}: block decoding speed and streaming over a pseudo-terminal. */
    @Command(name = "serial", mixinStandardHelpOptions = true,
            description = "Decode throughput of the serial block decoder (MB/s, target >= 50), then the virtual rig"
                    + " over a socat pseudo-terminal paced like a UART at the baud rate (10 bits per byte): streaming"
                    + " (blocks received, lost on the link (target 0), dropped by the device because the line is too"
                    + " slow, longest stall) and fetching, each as bytes/s and %% of the line's capacity.")
    static final class Serial implements Callable<Integer> {
        @Spec
        private CommandSpec spec;

        @Option(names = "--seconds", paramLabel = "S", defaultValue = "60",
                description = "How long to use the pty, half streaming, half fetching (default: ${DEFAULT-VALUE}).")
        private double seconds;

        @Option(names = "--baud", paramLabel = "B", defaultValue = "921600",
                description = "Line speed (default: ${DEFAULT-VALUE}).")
        private int baud;

        @Option(names = "--json", description = "Print the figures as JSON.")
        private boolean json;

        @Override
        public Integer call() throws Exception {
            SerialBenchmark.Figures f = SerialBenchmark.run(seconds, baud);
            if (json) {
                spec.commandLine().getOut().println(ResultJson.MAPPER.writeValueAsString(f));
            } else {
                spec.commandLine().getOut().printf(Locale.ROOT,
                        "serial: decode %.0f MB/s; line %d baud carries %.0f B/s, 2 ch x F32 at the sample rate needs %.0f B/s%n"
                                + "  stream %.0f s: %.0f B/s = %.1f %% of capacity; %d blocks, %d lost, %d dropped by the"
                                + " device, longest stall %.0f ms%n"
                                + "  fetch %.0f s: %.0f B/s = %.1f %% of capacity; %.2f x real time%n",
                        f.decodeMegabytesPerS(), f.baud(), f.capacityBytesPerS(), f.neededBytesPerS(), f.streamSeconds(),
                        f.streamBytesPerS(), f.streamCapacityPercent(), f.blocksReceived(), f.lostBlocks(),
                        f.overrunBlocks(), f.longestStallMs(), f.fetchSeconds(), f.fetchBytesPerS(),
                        f.fetchCapacityPercent(), f.fetchRealTimeMultiple());
            }
            spec.commandLine().getOut().flush();
            return 0;
        }
    }

    /** {@code tautline bench sweep}: rig time of the adaptive sweep against a tuned uniform sweep and a lower bound. */
    @Command(name = "sweep", mixinStandardHelpOptions = true,
            description = "Rig time of the adaptive sweep on the simulated wire (three modes, zeta about 0.1 %%) against a"
                    + " uniform log-spaced stepped sine whose step count and settle time are searched until it reaches the"
                    + " same f and zeta accuracy (checked against the simulator's truth), and against a lower bound of"
                    + " 4.6 tau per step. Targets: uniform / adaptive >= 10, adaptive / lower bound <= 2.")
    static final class Sweep implements Callable<Integer> {
        @Spec
        private CommandSpec spec;

        @Option(names = "--json", description = "Print the figures as JSON.")
        private boolean json;

        @Override
        public Integer call() throws Exception {
            SweepBenchmark.Figures f = SweepBenchmark.run();
            if (json) {
                ObjectNode node = ResultJson.MAPPER.valueToTree(f);
                java.util.List<String> keys = new java.util.ArrayList<>();
                node.fieldNames().forEachRemaining(keys::add);
                for (String key : keys) {
                    if (node.get(key).isDouble()) {
                        ResultJson.putFinite(node, key, node.get(key).asDouble());
                    }
                }
                spec.commandLine().getOut().println(ResultJson.MAPPER.writeValueAsString(node));
            } else {
                spec.commandLine().getOut().printf(Locale.ROOT,
                        "sweep: adaptive %.1f rig s (%d steps; max error f %.2g, zeta %.2g)%n"
                                + "       uniform %s%.1f rig s (%s; %d sweeps searched)%n"
                                + "       lower bound %.1f rig s; uniform/adaptive %s%.1fx, adaptive/lower bound %.2fx;"
                                + " %.0f s wall%n",
                        f.adaptiveRigTimeS(), f.adaptiveSteps(), f.adaptiveFrequencyError(), f.adaptiveDampingError(),
                        f.uniformReachedGoal() ? "" : "> ", f.uniformRigTimeS(), f.uniformReachedGoal()
                                ? String.format(Locale.ROOT, "%d steps, settle %.3f s; max error f %.2g, zeta %.2g",
                                        f.uniformSteps(), f.uniformSettleS(), f.uniformFrequencyError(),
                                        f.uniformDampingError())
                                : "no uniform sweep within the search reached the adaptive sweep's accuracy",
                        f.uniformTrials(), f.lowerBoundRigTimeS(), f.uniformReachedGoal() ? "" : ">= ",
                        f.uniformToAdaptive(), f.adaptiveToLowerBound(), f.wallTimeS());
            }
            spec.commandLine().getOut().flush();
            return 0;
        }
    }
}
