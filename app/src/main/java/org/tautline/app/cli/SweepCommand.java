package org.tautline.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.tautline.app.SafetyNotice;
import org.tautline.app.report.RunDirectory;
import org.tautline.app.trace.RunSetup;
import org.tautline.app.trace.SetupFile;
import org.tautline.driver.journal.JournaledSweep;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code tautline sweep}: a journaled stepped-sine sweep on any rig, uniform or from a plan file. */
@Command(name = "sweep", mixinStandardHelpOptions = true,
        description = "Run a stepped-sine sweep on a rig, journaling every step to RUNDIR/journal and writing"
                + " RUNDIR/frf.csv. The test date, and the rig file and the air when given, are recorded in"
                + " RUNDIR/setup.json for the report. With --specimen (and --spec) they are recorded as"
                + " RUNDIR/specimen.json (and spec.json) before anything is excited, and a sweep that runs to its end"
                + " is fitted and judged on its rig: the level check (the fundamental again at a second drive level,"
                + " when --max-drive leaves room for one at 1.5 times --drive or more), then RUNDIR/result.json and"
                + " the verdict. An interrupted run continues with 'tautline resume RUNDIR'.",
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:the sweep ran to its end (and, with --spec, PASS)", "1:an error; nothing was excited",
                "3:the sweep was stopped; resume continues it", "4:a safety limit stopped the sweep",
                "5:a rig or link fault stopped the sweep; resume continues it", "10:FAIL (with --spec)",
                "11:not determinable (with --specimen: also when the FRF could not be fitted)",
                "130/143:interrupted by Ctrl-C / kill, after the output was switched off"})
final class SweepCommand implements Callable<Integer> {
    /** Journal file name inside a run folder. */
    static final String JOURNAL = "journal";
    /** FRF file name inside a run folder. */
    static final String FRF = "frf.csv";

    @Spec
    private CommandSpec spec;

    @Option(names = "--rig", required = true, paramLabel = "RIG",
            description = "sim (the simulated rig), serial:PORT (the serial rig on PORT) or a driver NAME from 'tautline rigs'.")
    private String rig;

    @Option(names = "--option", paramLabel = "KEY=VALUE", description = "A rig driver option (repeatable), for example seed=7.")
    private List<String> options = new ArrayList<>();

    @Option(names = "--from", paramLabel = "HZ", description = "First step, Hz.")
    private double fromHz;

    @Option(names = "--to", paramLabel = "HZ", description = "Last step, Hz.")
    private double toHz;

    @Option(names = "--steps", paramLabel = "N", description = "Number of log-spaced steps, 2 or more.")
    private int steps;

    @Option(names = "--plan", paramLabel = "PLAN.json",
            description = "Run this sweep plan (driver/SWEEP_PLAN.md), adaptive or uniform, instead of a uniform sweep"
                    + " from the options; --from, --to, --steps, --settle-cycles, --cycles, --drive, --ramp and the"
                    + " --max options are then not used (the plan holds its own limits).")
    private Path planFile;

    @Option(names = "--settle-cycles", paramLabel = "C", defaultValue = "250",
            description = "Drive cycles to wait after each step before fitting (default ${DEFAULT-VALUE}).")
    private double settleCycles;

    @Option(names = "--cycles", paramLabel = "C", defaultValue = "100",
            description = "Whole drive cycles fitted at each step (default ${DEFAULT-VALUE}).")
    private int cycles;

    @Option(names = "--drive", paramLabel = "V", defaultValue = "1.0",
            description = "Peak drive voltage, V (default ${DEFAULT-VALUE}).")
    private double driveV;

    @Option(names = "--ramp", paramLabel = "S", defaultValue = "0.2",
            description = "Drive ramp time at the start and the end, s (default ${DEFAULT-VALUE}).")
    private double rampS;

    @Option(names = "--max-drive", paramLabel = "V",
            description = "Safety limit: the drive is never commanded above it, V (default: the --drive level).")
    private Double maxDriveV;

    @Option(names = "--max-force", paramLabel = "N", defaultValue = "2.0",
            description = "Safety limit: peak force; the sweep ramps down and stops on the first block that reaches it,"
                    + " N (default ${DEFAULT-VALUE}).")
    private double maxForceN;

    @Option(names = "--max-displacement", paramLabel = "M", defaultValue = "0.001",
            description = "Safety limit: peak displacement of the specimen at the response sensor, m (default"
                    + " ${DEFAULT-VALUE}).")
    private double maxDisplacementM;

    @Option(names = "--max-response", paramLabel = "X",
            description = "Safety limit: peak of the response channel in its own unit (m, m/s or m/s^2), for example"
                    + " the sensor's range (default: none beyond --max-displacement).")
    private Double maxResponse;

    @Option(names = "--keep-samples", description = "Also keep every step's integration samples in RUNDIR/journal.samples.")
    private boolean keepSamples;

    @Option(names = "--out", required = true, paramLabel = "RUNDIR",
            description = "Folder for the journal and frf.csv (and, with --specimen, specimen.json, spec.json and result.json).")
    private Path runDir;

    @Option(names = "--json", description = "Print a summary as JSON on standard output.")
    private boolean json;

    @Option(names = "--no-progress", description = "Do not draw the progress bar.")
    private boolean noProgress;

    @Mixin
    private PluginFolders plugins;

    @Mixin
    private SetupOptions setup;

    @Mixin
    private FitInputs fitInputs;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        String driver = rig.startsWith("serial:") ? "serial" : rig;
        Map<String, String> given = parseOptions(options);
        if (rig.startsWith("serial:")) {
            given.put("port", rig.substring("serial:".length()));
        }
        RigDrivers drivers = plugins.drivers(err);
        SweepPlan plan = planFile != null ? SweepPlanFile.read(planFile) : uniformPlan();
        drivers.find(driver);
        Path journal = runDir.resolve(JOURNAL);
        if (Files.exists(journal)) {
            throw new IllegalArgumentException(runDir + " already holds a journal; continue it with 'tautline resume "
                    + runDir + "' or choose another --out");
        }
        for (String name : List.of(SetupFile.NAME, RunDirectory.FRF, RunDirectory.RESULT, RunDirectory.SPECIMEN,
                RunDirectory.SPECIFICATION)) {
            if (Files.exists(runDir.resolve(name), LinkOption.NOFOLLOW_LINKS)) {
                throw new IllegalArgumentException(runDir + " already holds a " + name + " from another run; choose"
                        + " another --out");
            }
        }
        Optional<FitInputs.Stated> stated = fitInputs.read();
        RunSetup recorded = setup.setup(Optional.of(Clock.systemUTC().instant()));
        Files.createDirectories(runDir);
        SetupFile.write(runDir, recorded);
        if (stated.isPresent()) {
            StatedFiles.write(runDir, stated.get());
        }
        err.print(SafetyNotice.asText("sim".equals(driver)));
        err.flush();
        try (SignalStop stop = new SignalStop()) {
            SweepQualifying qualifying = new SweepQualifying(stated, stop.control(), err);
            SweepResult result = JournaledSweep.run(drivers, driver, given, plan, journal, keepSamples,
                    progress(noProgress), stop.control(), Clock.systemUTC(), qualifying);
            return SweepReport.finish(result, runDir, qualifying, json, spec.commandLine().getOut(), err);
        } catch (RuntimeException e) {
            if (!Files.exists(journal)) {
                // No run was made: the folder can be used again.
                Files.deleteIfExists(runDir.resolve(SetupFile.NAME));
                StatedFiles.remove(runDir);
            }
            throw e;
        }
    }

    private SweepPlan uniformPlan() {
        if (steps == 0) {
            throw new IllegalArgumentException("--from, --to and --steps are required unless --plan is given");
        }
        SafetyLimits limits = new SafetyLimits(maxDriveV == null ? driveV : maxDriveV, maxForceN,
                maxResponse == null ? Double.POSITIVE_INFINITY : maxResponse, maxDisplacementM);
        return SweepPlan.uniform(fromHz, toHz, steps, settleCycles, 0.02, cycles, driveV, rampS, 3, limits);
    }

    static SweepEventListener progress(boolean noProgress) {
        return noProgress ? SweepEventListener.NONE : new ProgressBar(System.err, System.console() != null).sweep();
    }

    static Map<String, String> parseOptions(List<String> options) {
        Map<String, String> map = new LinkedHashMap<>();
        for (String option : options) {
            int eq = option.indexOf('=');
            if (eq <= 0) {
                throw new IllegalArgumentException("--option '" + option + "': expected KEY=VALUE, for example seed=7");
            }
            map.put(option.substring(0, eq), option.substring(eq + 1));
        }
        return map;
    }
}
