package org.tautline.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.format.QuantityFormat;
import org.tautline.analysis.verdict.Figure;
import org.tautline.app.lot.FigureStatistics;
import org.tautline.app.lot.LotEntries;
import org.tautline.app.lot.LotEntry;
import org.tautline.app.lot.LotRegister;
import org.tautline.app.lot.LotStatistics;
import org.tautline.app.report.RunDirectory;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code tautline lot}: per-figure statistics of a lot from the register; {@code --add} appends a run first. */
@Command(name = "lot", mixinStandardHelpOptions = true,
        description = "Print per-figure statistics of a lot from the lot register (n, mean, std, min, max, Cpk against"
                + " the specification) with its individuals-chart limits. --add RUNDIR appends a run first.",
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:done; with --add, the added run's verdict is pass (or it has no specification)",
                "1:an error", "10:with --add, the added run's verdict is fail",
                "11:with --add, the added run's verdict is not determinable"})
final class LotCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "LOT", description = "The lot name.")
    private String lot;

    @Option(names = "--register", paramLabel = "FILE|URL",
            description = "An SQLite file or a jdbc:postgresql URL (default: " + LotRegister.DEFAULT_FILE_NAME
                    + " in the current folder, or beside RUNDIR with --add).")
    private String register;

    @Option(names = "--add", paramLabel = "RUNDIR", description = "Qualify this run directory again and append it to"
            + " the lot; a run folder already in the lot (the same folder, or the same frf.csv) is refused.")
    private Path add;

    @Option(names = "--json", description = "Print the statistics as JSON.")
    private boolean json;

    /** @return the default register beside a run directory: in its parent folder */
    static String besideRuns(Path runDir) {
        Path parent = runDir.toAbsolutePath().getParent();
        return (parent == null ? Path.of(LotRegister.DEFAULT_FILE_NAME) : parent.resolve(LotRegister.DEFAULT_FILE_NAME)).toString();
    }

    @Override
    public Integer call() throws IOException {
        String location = register != null ? register : add != null ? besideRuns(add) : LotRegister.DEFAULT_FILE_NAME;
        List<LotEntry> entries;
        int status = ExitCodes.OK;
        if (add == null) {
            if (!location.startsWith("jdbc:") && !Files.exists(Path.of(location))) {
                throw new AnalysisException("register file " + Path.of(location).toAbsolutePath() + " does not exist;"
                        + " expected --register FILE|URL naming a lot register, or --add RUNDIR to start one");
            }
            try (LotRegister r = LotRegister.openForQueries(location)) {
                entries = r.entries(lot);
            }
        } else {
            RunDirectory.Inputs inputs = RunDirectory.readInputs(add);
            Path folder = add.toAbsolutePath().normalize();
            if (location.startsWith("jdbc:") || Files.exists(Path.of(location))) {
                // Refused before the (slow) qualification; the append checks again in its transaction.
                try (LotRegister r = LotRegister.openForAppending(location)) {
                    r.refuseRepeatedRun(lot, folder.toString(), inputs.frfSha256());
                }
            }
            RunDirectory run = RunDirectory.analyse(inputs);
            try (LotRegister r = LotRegister.openForAppending(location)) {
                r.append(LotEntries.ofRunFolder(lot, run.result(), folder, run.frfSha256(), Instant.now()));
                status = ExitCodes.of(run.result().verdict());
                entries = r.entries(lot);
            }
        }
        List<FigureStatistics> statistics = LotStatistics.of(entries);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.println(ResultJson.MAPPER.writeValueAsString(json(statistics)));
        } else if (entries.isEmpty()) {
            out.println("Lot " + lot + " has no qualification in " + location);
        } else {
            out.printf(Locale.ROOT, "Lot %s: %d qualification%s%n", lot, entries.size(), entries.size() == 1 ? "" : "s");
            QuantityFormat f = QuantityFormat.forStandardOutput();
            out.printf(Locale.ROOT, "%-40s %4s %11s %11s %11s %11s %6s %11s %11s%n", "figure", "n", "mean", "std", "min",
                    "max", "Cpk", "LCL", "UCL");
            for (FigureStatistics s : statistics) {
                out.printf(Locale.ROOT, "%-40s %4d %11s %11s %11s %11s %6s %11s %11s%n",
                        Figure.labelFor(s.key()) + (s.unit().isEmpty() ? "" : " (" + f.unit(s.unit()) + ")"), s.n(),
                        f.number(s.mean()), f.number(s.std()), f.number(s.min()), f.number(s.max()),
                        Double.isFinite(s.cpk()) ? String.format(Locale.ROOT, "%.2f", s.cpk()) : "-",
                        f.number(s.chart().lowerControlLimit()), f.number(s.chart().upperControlLimit()));
            }
            out.println("std: sample standard deviation; Cpk against the specification's limits (- without both a limit"
                    + " and a spread); LCL, UCL: the individuals chart's control limits, mean -/+ 2.66 times the average"
                    + " moving range (Montgomery, Introduction to Statistical Quality Control).");
        }
        out.flush();
        return status;
    }

    private static ObjectNode json(List<FigureStatistics> statistics) {
        ObjectNode root = ResultJson.MAPPER.createObjectNode();
        ArrayNode figures = root.putArray("figures");
        for (FigureStatistics s : statistics) {
            ObjectNode f = figures.addObject();
            f.put("figure", s.key());
            f.put("unit", s.unit());
            f.put("n", s.n());
            f.put("mean", s.mean());
            f.put("std", s.std());
            f.put("min", s.min());
            f.put("max", s.max());
            f.put("lowerLimit", s.lowerLimit());
            f.put("upperLimit", s.upperLimit());
            f.put("cpk", s.cpk());
            f.put("chartCentre", s.chart().centre());
            f.put("chartAverageMovingRange", s.chart().averageMovingRange());
            f.put("chartLowerControlLimit", s.chart().lowerControlLimit());
            f.put("chartUpperControlLimit", s.chart().upperControlLimit());
            ArrayNode values = f.putArray("values");
            s.chart().values().forEach(values::add);
        }
        return root;
    }
}
