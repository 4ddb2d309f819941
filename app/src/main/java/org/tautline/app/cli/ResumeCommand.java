package org.tautline.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.tautline.app.SafetyNotice;
import org.tautline.driver.journal.JournalContents;
import org.tautline.driver.journal.JournalReader;
import org.tautline.driver.journal.JournaledSweep;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SweepResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code tautline resume RUNDIR}: continues an interrupted sweep from its journal to the same result. */
@Command(name = "resume", mixinStandardHelpOptions = true,
        description = "Continue an interrupted sweep: reopen the rig recorded in RUNDIR/journal (checking that it is the"
                + " same rig), take over the completed steps, run the rest under the same plan and limits, append them to"
                + " the journal and write RUNDIR/frf.csv. When the folder records the specimen (RUNDIR/specimen.json,"
                + " written by 'sweep --specimen') or --specimen gives it, the completed sweep is fitted and judged as"
                + " 'sweep' does: the level check on the rig, RUNDIR/result.json and the verdict.",
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:the sweep ran to its end (and, with a specification, PASS)", "1:an error; nothing was excited",
                "3:the sweep was stopped again", "4:a safety limit stopped the sweep",
                "5:a rig or link fault stopped the sweep", "10:FAIL", "11:not determinable (also when the FRF could"
                + " not be fitted)", "130/143:interrupted by Ctrl-C / kill, output off"})
final class ResumeCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "RUNDIR", description = "The run folder a 'tautline sweep --out' made.")
    private Path runDir;

    @Option(names = "--port", paramLabel = "PATH",
            description = "The serial port the rig answers on now, when it came back under another name.")
    private String port;

    @Option(names = "--option", paramLabel = "KEY=VALUE",
            description = "A rig driver option to use instead of the recorded one (repeatable).")
    private List<String> options = new ArrayList<>();

    @Option(names = "--json", description = "Print a summary as JSON on standard output.")
    private boolean json;

    @Option(names = "--no-progress", description = "Do not draw the progress bar.")
    private boolean noProgress;

    @Mixin
    private PluginFolders plugins;

    @Mixin
    private FitInputs fitInputs;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        Path journal = runDir.resolve(SweepCommand.JOURNAL);
        if (!Files.isRegularFile(journal)) {
            throw new IllegalArgumentException(runDir + " holds no journal (" + journal + "); give the folder a"
                    + " 'tautline sweep --out' made");
        }
        Map<String, String> changes = SweepCommand.parseOptions(options);
        if (port != null) {
            changes.put("port", port);
        }
        RigDrivers drivers = plugins.drivers(err);
        JournalContents contents = JournalReader.read(journal);
        Optional<FitInputs.Stated> stated = Optional.empty();
        if (!contents.finished()) {
            stated = StatedFiles.recordedOrGiven(runDir, fitInputs);
            err.print(SafetyNotice.asText("sim".equals(contents.header().driver())));
            err.flush();
        }
        try (SignalStop stop = new SignalStop()) {
            SweepQualifying qualifying = new SweepQualifying(stated, stop.control(), err);
            SweepResult result = JournaledSweep.resume(drivers, journal, changes, notice -> err.println("tautline: "
                    + notice), SweepCommand.progress(noProgress), stop.control(), Clock.systemUTC(), qualifying);
            return SweepReport.finish(result, runDir, qualifying, json, spec.commandLine().getOut(), err);
        }
    }
}
