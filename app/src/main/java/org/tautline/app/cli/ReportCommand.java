package org.tautline.app.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.concurrent.Callable;

import org.tautline.app.lot.FigureStatistics;
import org.tautline.app.lot.LotRegister;
import org.tautline.app.lot.LotStatistics;
import org.tautline.app.report.QualificationReport;
import org.tautline.app.report.ReportInfo;
import org.tautline.app.report.RunDirectory;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code tautline report}: the PDF report of a run directory, qualified again from its files. */
@Command(name = "report", mixinStandardHelpOptions = true,
        description = "Write the PDF report of a run directory (frf.csv, specimen.json, spec.json), qualifying it"
                + " again from its files. With --lot, the report also charts that lot from the register.",
        exitCodeListHeading = "%nExit status (the report is written in each case but an error):%n",
        exitCodeList = {"0:PASS, or no specification", "1:an error", "10:FAIL", "11:NOT_DETERMINABLE"})
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

    @Override
    public Integer call() throws IOException {
        RunDirectory.Inputs inputs = RunDirectory.readInputs(runDir);
        List<FigureStatistics> statistics = List.of();
        if (lot != null) {
            try (LotRegister r = LotRegister.openForQueries(register != null ? register : LotCommand.besideRuns(runDir))) {
                statistics = LotStatistics.of(r.entries(lot));
            }
        }
        RunDirectory run = RunDirectory.analyse(inputs);
        QualificationReport.write(run, new ReportInfo(operator, ReportInfo.SOFTWARE, Instant.now()), lot == null ? "" : lot,
                statistics, pdf);
        spec.commandLine().getErr().println("tautline: wrote the report to " + pdf);
        return ExitCodes.of(run.result().verdict());
    }
}
