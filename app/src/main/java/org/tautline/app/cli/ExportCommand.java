package org.tautline.app.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.tautline.app.report.RunDirectory;
import org.tautline.app.report.RunExport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code tautline export}: FRF, modes, properties and verdict of a run directory as CSV and JSON. */
@Command(name = "export", mixinStandardHelpOptions = true,
        description = "Write the FRF with the fit, the modes, the properties and the verdict of a run directory as CSV"
                + " and JSON, with units in the column names and keys.")
final class ExportCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "RUNDIR", description = "The run directory, as demo --out writes it.")
    private Path runDir;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "Where to write the files.")
    private Path outDir;

    @Override
    public Integer call() throws IOException {
        RunExport.write(RunDirectory.read(runDir).result(), outDir);
        spec.commandLine().getErr().println("tautline: wrote " + String.join(", ", RunExport.FILES) + " to " + outDir);
        return 0;
    }
}
