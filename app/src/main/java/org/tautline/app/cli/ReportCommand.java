package org.tautline.app.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.tautline.app.lot.FigureStatistics;
import org.tautline.app.lot.LotRegister;
import org.tautline.app.lot.LotStatistics;
import org.tautline.app.report.QualificationReport;
import org.tautline.app.report.ReportInfo;
import org.tautline.app.report.RunDirectory;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code tautline report}: the PDF report of a run directory: the result its result.json records, or the FRF fitted
 * again when there is none to take, which the report says.
 */
@Command(name = "report", mixinStandardHelpOptions = true,
        description = "Write the PDF report of a run directory (frf.csv, specimen.json, spec.json, result.json)."
                + " The modes reported are those result.json records when it names the SHA-256 of the folder's frf.csv"
                + " (a result.json made from another frf.csv is refused); they are numbered and judged again. Without"
                + " such a result.json the FRF is fitted again, and the report says so. The test date, the air and the rig come from the run's setup.json (written"
                + " by sweep); the options fill in what it lacks, and a value that differs from a recorded one is"
                + " refused. With --lot, the report also charts that lot from the register.",
        exitCodeListHeading = "%nExit status (the report is written in each case but an error):%n",
        exitCodeList = {"0:pass, or no specification", "1:an error", "10:fail", "11:not determinable"})
final class ReportCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "RUNDIR", description = "The run directory, as demo --out writes it.")
    private Path runDir;

    @Option(names = "--pdf", required = true, paramLabel = "FILE", description = "The PDF file to write.")
    private Path pdf;

    @Option(names = "--operator", paramLabel = "NAME", defaultValue = "", description = "The operator's name for the sign-off.")
    private String operator;

    @Option(names = "--lot", paramLabel = "LOT", description = "Chart this lot from the register in the report.")
    private String lot;

    @Option(names = "--register", paramLabel = "FILE|URL",
            description = "The lot register: an SQLite file or a jdbc:postgresql URL (default: "
                    + LotRegister.DEFAULT_FILE_NAME + " beside RUNDIR).")
    private String register;

    @Option(names = "--report-number", paramLabel = "NUMBER", defaultValue = "",
            description = "The lab's number for this report (printed on every page; \"not given\" without it).")
    private String reportNumber;

    @Option(names = "--test-date", paramLabel = "DATE",
            description = "When the run was made, for a run folder that does not record it: 2026-11-02 or"
                    + " 2026-11-02T09:14:00Z.")
    private String testDate;

    @Mixin
    private SetupOptions setup;

    @Override
    public Integer call() throws IOException {
        RunDirectory.Inputs inputs = RunDirectory.readInputs(runDir)
                .withSetup(setup.setup(Optional.ofNullable(testDate).map(SetupOptions::testDate)));
        List<FigureStatistics> statistics = List.of();
        if (lot != null) {
            try (LotRegister r = LotRegister.openForQueries(register != null ? register : LotCommand.besideRuns(runDir))) {
                statistics = LotStatistics.of(r.entries(lot));
            }
        }
        RunDirectory run = RunDirectory.analyse(inputs);
        QualificationReport.write(run, new ReportInfo(operator, ReportInfo.SOFTWARE, Instant.now(), reportNumber),
                lot == null ? "" : lot, statistics, pdf);
        spec.commandLine().getErr().println("tautline: wrote the report to " + pdf);
        return ExitCodes.of(run.result().verdict());
    }
}
