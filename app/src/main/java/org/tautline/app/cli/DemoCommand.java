package org.tautline.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;

import org.tautline.analysis.frf.FrfCsvWriter;
import org.tautline.app.SafetyNotice;
import org.tautline.app.qualify.DemoOutcome;
import org.tautline.app.qualify.DemoRun;
import org.tautline.app.qualify.DemoScenario;
import org.tautline.app.qualify.ResultText;
import org.tautline.app.qualify.SweepStoppedException;
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

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        System.err.print(SafetyNotice.asText(true));
        System.err.flush();
        DemoOutcome outcome;
        try (SignalStop stop = new SignalStop()) {
            outcome = DemoRun.run(SweepCommand.progress(noProgress), stop.control());
        } catch (SweepStoppedException e) {
            System.err.println("tautline: " + e.getMessage());
            return switch (e.sweep().status()) {
                case LIMIT -> ExitCodes.SWEEP_LIMIT;
                case FAULT -> ExitCodes.SWEEP_FAULT;
                default -> ExitCodes.SWEEP_STOPPED;
            };
        }
        if (json) {
            out.println(ResultJson.MAPPER.writeValueAsString(ResultJson.outcome(outcome)));
        } else {
            out.print(ResultText.format(outcome));
        }
        out.flush();
        if (outDir != null) {
            write(outcome, outDir);
            System.err.println("tautline: wrote frf.csv, truth.json, result.json, specimen.json and spec.json to " + outDir);
            DemoRecords.write(outDir, lot, register, operator);
        } else if (lot != null) {
            throw new org.tautline.analysis.AnalysisException("--lot needs --out DIR: the register keeps where the run's files are");
        }
        return ExitCodes.of(outcome.result().verdict());
    }

    private static void write(DemoOutcome outcome, Path dir) throws IOException {
        Files.createDirectories(dir);
        Map<String, String> metadata = new LinkedHashMap<>();
        metadata.put("specimen", outcome.result().specimen().id());
        metadata.put("source", "Tautline demo on the simulated rig (invented specimen)");
        metadata.putAll(DemoRecords.rigMetadata());
        FrfCsvWriter.write(outcome.result().receptance(), metadata, dir.resolve("frf.csv"));
        ResultJson.MAPPER.writeValue(dir.resolve("truth.json").toFile(), ResultJson.truth(outcome.truth()));
        ResultJson.MAPPER.writeValue(dir.resolve("result.json").toFile(), ResultJson.outcome(outcome));
        ResultJson.MAPPER.writeValue(dir.resolve("specimen.json").toFile(), ResultJson.specimenFile(DemoScenario.specimen()));
        ResultJson.MAPPER.writeValue(dir.resolve("spec.json").toFile(),
                ResultJson.specificationFile(DemoScenario.specification()));
    }
}
