package org.tautline.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import org.tautline.app.SafetyNotice;
import org.tautline.driver.journal.JournalContents;
import org.tautline.driver.journal.JournalReader;
import org.tautline.driver.journal.JournaledSweep;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SweepRecord;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code tautline resume RUNDIR}: continues an interrupted sweep from its journal to the same result. */
@Command(name = "resume", mixinStandardHelpOptions = true,
        description = "Continue an interrupted sweep: reopen the rig recorded in RUNDIR/journal, run only the steps not"
                + " yet done, append them to the journal and write RUNDIR/frf.csv.")
final class ResumeCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "RUNDIR", description = "The run folder a 'tautline sweep --out' made.")
    private Path runDir;

    @Option(names = "--json", description = "Print a summary as JSON on standard output.")
    private boolean json;

    @Option(names = "--no-progress", description = "Do not draw the progress bar.")
    private boolean noProgress;

    @Mixin
    private PluginFolders plugins;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        Path journal = runDir.resolve(SweepCommand.JOURNAL);
        if (!Files.isRegularFile(journal)) {
            throw new IllegalArgumentException(runDir + " holds no journal (" + journal + "); give the folder a"
                    + " 'tautline sweep --out' made");
        }
        RigDrivers drivers = plugins.drivers(err);
        JournalContents contents = JournalReader.read(journal);
        if (!contents.allStepsDone()) {
            err.print(SafetyNotice.asText("sim".equals(contents.header().driver())));
            err.flush();
        }
        SweepRecord record = SweepCommand.runInterruptibly(cancel -> JournaledSweep.resume(drivers, journal,
                notice -> err.println("tautline: " + notice), SweepCommand.progress(noProgress), cancel,
                Clock.systemUTC()), runDir, err);
        return SweepCommand.finish(record, runDir, json, spec.commandLine().getOut(), err);
    }
}
