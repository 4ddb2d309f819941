package org.tautline.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.OptionalLong;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.node.ObjectNode;

import org.tautline.analysis.frf.FrfCsvWriter;
import org.tautline.app.SafetyNotice;
import org.tautline.app.qualify.DemoOutcome;
import org.tautline.app.qualify.DemoRun;
import org.tautline.app.qualify.DemoScenario;
import org.tautline.app.qualify.ResultText;
import org.tautline.app.qualify.SweepStoppedException;
import org.tautline.app.report.ResultFile;
import org.tautline.app.report.RunDirectory;
import org.tautline.app.trace.DataFile;
import org.tautline.app.trace.SetupFile;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sim.SimulationConfigs;
import org.tautline.driver.sweep.SweepEventListener;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code tautline demo}: qualifies the invented demo wire on the simulated rig. */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Qualify the built-in demo specimen (invented) on the simulated rig and compare every estimate"
                + " with the simulated truth.",
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:PASS", "1:an error", "3:the sweep was stopped", "4:a safety limit stopped the sweep",
                "5:a fault stopped the sweep", "10:FAIL", "11:NOT_DETERMINABLE"})
final class DemoCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Option(names = "--json", description = "Print the result as JSON on standard output (progress goes to standard error).")
    private boolean json;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Write frf.csv, truth.json, result.json, specimen.json, spec.json and report.pdf into DIR.")
    private Path outDir;

    @Option(names = "--lot", paramLabel = "LOT", description = "Append the qualification to this lot in the register (needs --out).")
    private String lot;

    @Option(names = "--register", paramLabel = "FILE|URL", description = "The lot register: an SQLite file or a"
            + " jdbc:postgresql URL (default: " + org.tautline.app.lot.LotRegister.DEFAULT_FILE_NAME + " beside DIR).")
    private String register;

    @Option(names = "--operator", paramLabel = "NAME", defaultValue = "", description = "The operator's name for the report.")
    private String operator;

    @Option(names = "--no-progress", description = "Do not draw the progress bar.")
    private boolean noProgress;

    @Option(names = "--seed", paramLabel = "N", description = "Qualify one specimen of the demo wire's invented lot"
            + " instead of the wire as built: N (0 or more) draws its tension, mass per length, bending stiffness and"
            + " damping with the lot's spread and seeds the sensor noise; the same N gives the same specimen and"
            + " samples, and the stated specimen is DEMO-TW-S followed by N in four digits (DEMO-TW-S0007).")
    private Long seed;

    @Option(names = "--tension-n", paramLabel = "T", description = "Give the simulated wire this true tension in N,"
            + " from " + (int) SimulationConfigs.DEMO_MIN_TENSION_N + " to " + (int) SimulationConfigs.DEMO_MAX_TENSION_N
            + " (a marginal or failing specimen on purpose); the stated nominal tension stays 150 N.")
    private Double tensionN;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        if (outDir == null && lot != null) {
            throw new IllegalArgumentException("--lot needs --out DIR: the register keeps where the run's files are");
        }
        if (outDir != null) {
            refuseRecordedFolder(outDir);
        }
        OptionalLong specimenSeed = seedOption();
        SimulationConfig simulation = DemoScenario.simulation(specimenSeed, tensionOption());
        System.err.print(SafetyNotice.asText(true));
        System.err.flush();
        DemoOutcome outcome;
        Instant startedAt = Instant.now();
        try (SignalStop stop = new SignalStop()) {
            outcome = DemoRun.run(simulation, DemoScenario.specimen(specimenSeed), DemoScenario.plan(),
                    DemoScenario.specification(), progress(), stop.control());
        } catch (SweepStoppedException e) {
            System.err.println("tautline: " + e.getMessage());
            return switch (e.sweep().status()) {
                case LIMIT -> ExitCodes.SWEEP_LIMIT;
                case FAULT -> ExitCodes.SWEEP_FAULT;
                default -> ExitCodes.SWEEP_STOPPED;
            };
        }
        String simulated = DemoRecords.simulatedSpecimen(specimenSeed, tensionOption());
        ObjectNode json = DemoRecords.withSeed(ResultJson.outcome(outcome), specimenSeed);
        if (this.json) {
            out.println(ResultJson.MAPPER.writeValueAsString(json));
        } else {
            out.println("Simulated: " + simulated);
            out.print(ResultText.format(outcome));
        }
        out.flush();
        if (outDir != null) {
            write(outcome, json, simulated, outDir);
            SetupFile.write(outDir, DemoRecords.setup(startedAt, simulation));
            System.err.println("tautline: wrote frf.csv, truth.json, result.json, specimen.json, spec.json and setup.json to "
                    + outDir);
            DemoRecords.write(outDir, lot, register, operator);
        }
        return ExitCodes.of(outcome.result().verdict());
    }

    /**
     * The demo writes a new run folder; one that already holds files (an earlier run, perhaps in a lot) is refused
     * before anything is excited, so no recorded run is overwritten.
     */
    private static void refuseRecordedFolder(Path dir) throws IOException {
        if (Files.isRegularFile(dir)) {
            throw new IllegalArgumentException("--out " + dir + " is a file; expected a new or empty folder for the run");
        }
        if (Files.isDirectory(dir)) {
            try (java.util.stream.Stream<Path> entries = Files.list(dir)) {
                List<String> names = entries.map(p -> p.getFileName().toString()).sorted().limit(6).toList();
                if (!names.isEmpty()) {
                    throw new IllegalArgumentException("--out " + dir + " already holds " + String.join(", ", names)
                            + "; expected a new or empty folder, so that no recorded run is overwritten");
                }
            }
        }
    }

    private SweepEventListener progress() {
        return SweepCommand.progress(noProgress);
    }

    private OptionalLong seedOption() {
        if (seed == null) {
            return OptionalLong.empty();
        }
        if (seed < 0 || seed > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("--seed must be a whole number from 0 to " + Integer.MAX_VALUE + ", got "
                    + seed);
        }
        return OptionalLong.of(seed);
    }

    private OptionalDouble tensionOption() {
        if (tensionN == null) {
            return OptionalDouble.empty();
        }
        if (!(tensionN >= SimulationConfigs.DEMO_MIN_TENSION_N && tensionN <= SimulationConfigs.DEMO_MAX_TENSION_N)) {
            throw new IllegalArgumentException("--tension-n must lie between " + (int) SimulationConfigs.DEMO_MIN_TENSION_N
                    + " and " + (int) SimulationConfigs.DEMO_MAX_TENSION_N + " N (the simulated demo wire's range), got "
                    + tensionN + " N");
        }
        return OptionalDouble.of(tensionN);
    }

    private static void write(DemoOutcome outcome, ObjectNode json, String simulated, Path dir) throws IOException {
        Files.createDirectories(dir);
        Map<String, String> metadata = new LinkedHashMap<>();
        metadata.put("specimen", outcome.result().specimen().id());
        metadata.put("source", "Tautline demo on the simulated rig (invented specimen)");
        metadata.put("simulated specimen", simulated);
        metadata.putAll(DemoRecords.rigMetadata(outcome.truth().config()));
        FrfCsvWriter.write(outcome.result().receptance(), metadata, dir.resolve(RunDirectory.FRF));
        ResultJson.MAPPER.writeValue(dir.resolve("truth.json").toFile(), json.get("truth"));
        ResultFile.write(dir.resolve(RunDirectory.RESULT), json,
                DataFile.sha256(Files.readAllBytes(dir.resolve(RunDirectory.FRF))));
        ResultJson.MAPPER.writeValue(dir.resolve("specimen.json").toFile(),
                ResultJson.specimenFile(outcome.result().specimen()));
        ResultJson.MAPPER.writeValue(dir.resolve("spec.json").toFile(),
                ResultJson.specificationFile(DemoScenario.specification()));
    }
}
