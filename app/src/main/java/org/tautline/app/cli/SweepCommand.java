package org.tautline.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.BooleanSupplier;
import java.util.function.Function;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.analysis.frf.FrfCsvWriter;
import org.tautline.app.SafetyNotice;
import org.tautline.driver.journal.JournalHeader;
import org.tautline.driver.journal.JournalReader;
import org.tautline.driver.journal.JournaledSweep;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SteppedSinePlan;
import org.tautline.driver.sweep.SweepFaultException;
import org.tautline.driver.sweep.SweepListener;
import org.tautline.driver.sweep.SweepRecord;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code tautline sweep}: a journaled stepped-sine sweep on any rig, writing the journal and the FRF. */
@Command(name = "sweep", mixinStandardHelpOptions = true,
        description = "Run a stepped-sine sweep on a rig, journaling every step to RUNDIR/journal and writing"
                + " RUNDIR/frf.csv. An interrupted run continues with 'tautline resume RUNDIR'.")
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
            description = "Run the adaptive engine with this sweep plan (driver/SWEEP_PLAN.md) instead of a uniform"
                    + " sweep; --from, --to, --steps, --settle-cycles, --cycles and --drive are then not used.")
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

    @Option(names = "--keep-samples", description = "Also keep every step's integration samples in RUNDIR/journal.samples.")
    private boolean keepSamples;

    @Option(names = "--out", required = true, paramLabel = "RUNDIR", description = "Folder for the journal and frf.csv.")
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
        String driver = rig.startsWith("serial:") ? "serial" : rig;
        Map<String, String> given = parseOptions(options);
        if (rig.startsWith("serial:")) {
            given.put("port", rig.substring("serial:".length()));
        }
        RigDrivers drivers = plugins.drivers(err);
        if (planFile != null) {
            return AdaptiveSweepCommand.run(drivers, driver, given, SweepPlanFile.read(planFile), runDir, json,
                    noProgress, spec.commandLine().getOut(), err);
        }
        if (steps == 0) {
            throw new IllegalArgumentException("--from, --to and --steps are required unless --plan is given");
        }
        SteppedSinePlan plan = new SteppedSinePlan(fromHz, toHz, steps, settleCycles, 0.02, cycles, driveV, rampS, 3);
        drivers.find(driver);
        Path journal = runDir.resolve(JOURNAL);
        if (Files.exists(journal)) {
            throw new IllegalArgumentException(runDir + " already holds a journal; continue it with 'tautline resume "
                    + runDir + "' or choose another --out");
        }
        Files.createDirectories(runDir);
        err.print(SafetyNotice.asText("sim".equals(driver)));
        err.flush();
        SweepRecord record = runInterruptibly(cancel -> JournaledSweep.run(drivers, driver, given, plan, journal,
                keepSamples, progress(noProgress), cancel, Clock.systemUTC()), runDir, err);
        return finish(record, runDir, json, spec.commandLine().getOut(), err);
    }

    static SweepListener progress(boolean noProgress) {
        return noProgress ? SweepListener.NONE : new ProgressBar(System.err, System.console() != null).sweep();
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

    /**
     * Runs a sweep so that an interrupt (Ctrl-C) cancels it: the drive ramps down, the output goes off
     * and the journal records the cancel before the process ends. A fault is reported with the way on.
     */
    static <T> T runInterruptibly(Function<BooleanSupplier, T> sweep, Path runDir, PrintWriter err) {
        AtomicBoolean cancel = new AtomicBoolean();
        CountDownLatch done = new CountDownLatch(1);
        Thread hook = new Thread(() -> {
            cancel.set(true);
            try {
                done.await(30, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "tautline-sweep-cancel");
        Runtime.getRuntime().addShutdownHook(hook);
        try {
            return sweep.apply(cancel::get);
        } catch (SweepFaultException e) {
            throw new IllegalStateException(e.getMessage() + ". The journal " + runDir.resolve(JOURNAL)
                    + " keeps them; continue with 'tautline resume " + runDir + "' once the rig is fixed", e);
        } finally {
            done.countDown();
            try {
                Runtime.getRuntime().removeShutdownHook(hook);
            } catch (IllegalStateException shuttingDown) {
                // The process is ending: the hook is running and has just been released.
            }
        }
    }

    /** Writes frf.csv for a complete sweep and prints the summary; an incomplete one says how to go on. */
    static int finish(SweepRecord record, Path runDir, boolean json, PrintWriter out, PrintWriter err) throws IOException {
        Path journal = runDir.resolve(JOURNAL);
        JournalHeader header = JournalReader.read(journal).header();
        int total = record.plan().stepCount();
        if (record.completed()) {
            Map<String, String> metadata = new LinkedHashMap<>();
            metadata.put("source", "Tautline stepped-sine sweep");
            metadata.put("rig", header.identity());
            metadata.put("steps", Integer.toString(total));
            FrfCsvWriter.write(record.toFrf(), metadata, runDir.resolve(FRF));
        }
        if (json) {
            ObjectNode node = ResultJson.MAPPER.createObjectNode();
            node.put("completed", record.completed());
            node.put("steps", record.points().size());
            node.put("plannedSteps", total);
            node.put("rigTimeS", record.rigTimeS());
            node.put("driver", header.driver());
            node.put("rigIdentity", header.identity());
            node.put("journal", journal.toString());
            if (record.completed()) {
                node.put("frf", runDir.resolve(FRF).toString());
            } else {
                node.putNull("frf");
            }
            out.println(ResultJson.MAPPER.writeValueAsString(node));
        } else if (record.completed()) {
            out.println(String.format(Locale.ROOT, "sweep complete: %d of %d steps, rig time %.1f s; wrote %s and %s",
                    record.points().size(), total, record.rigTimeS(), journal, runDir.resolve(FRF)));
        } else {
            out.println("sweep cancelled after " + record.points().size() + " of " + total + " steps; continue it with"
                    + " 'tautline resume " + runDir + "'");
        }
        out.flush();
        err.flush();
        return record.completed() ? 0 : 1;
    }
}
