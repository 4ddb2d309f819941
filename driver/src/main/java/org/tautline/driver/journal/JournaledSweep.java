package org.tautline.driver.journal;

import java.nio.file.Path;
import java.time.Clock;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Consumer;

import org.tautline.driver.RigException;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.RigDriver;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.spi.RigOptionValues;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEngine;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepResult;

/**
 * Runs a sweep on a rig chosen by driver name with a journal, and continues one from its journal.
 *
 * <p>A resume reads the journal (up to its last valid record), opens the rig again with the driver and
 * options the header recorded (an option such as the port may be given anew: a serial adapter that came
 * back under another name), refuses a rig whose identity, sample rate or channels differ from the recorded
 * ones, cuts the journal after its last valid record, appends a RESUMED record and lets the
 * {@link SweepEngine} continue from the recorded steps. The result is the whole sweep.
 *
 * <p>Work that needs the same rig after a sweep that ran to its end (a level check) is handed the open rig through
 * {@link AfterCompletion}, once the journal has recorded the end and with the output off; the rig is closed after it.
 */
public final class JournaledSweep {
    /** File name of the samples side file, beside the journal, when samples are kept. */
    public static final String SAMPLES_FILE = "journal.samples";

    /**
     * Work on the rig after a sweep that ran to its end, before the rig is closed: the journal has recorded the end
     * and the output is off. A level check, for one, needs the rig the sweep ran on.
     */
    @FunctionalInterface
    public interface AfterCompletion {
        /** Nothing to do after the sweep. */
        AfterCompletion NONE = (rig, sweep) -> { };

        /**
         * @param rig the rig, still open; anything that excites it runs through the {@link SweepEngine}
         * @param sweep the completed sweep
         */
        void completed(Rig rig, SweepResult sweep);
    }

    private JournaledSweep() {
    }

    /**
     * Opens the rig, checks the plan against it, writes the journal header and runs the plan.
     *
     * @param drivers where to find the driver
     * @param driverName the driver, for example {@code sim}
     * @param options the driver's options as given (defaults are filled in and recorded)
     * @param plan the sweep
     * @param journalFile the journal to create; it must not exist
     * @param keepSamples true to keep every step's integration samples in {@value #SAMPLES_FILE} beside the journal
     * @param listener progress events
     * @param control stop requests
     * @param clock the clock for the journal's times
     * @return the sweep; its status says how it ended, the output is off
     * @throws RigException for a bad driver or option, or a rig that cannot run the plan (nothing was excited)
     */
    public static SweepResult run(RigDrivers drivers, String driverName, Map<String, String> options, SweepPlan plan,
                                  Path journalFile, boolean keepSamples, SweepEventListener listener,
                                  SweepControl control, Clock clock) {
        return run(drivers, driverName, options, plan, journalFile, keepSamples, listener, control, clock,
                AfterCompletion.NONE);
    }

    /**
     * Runs a plan as {@link #run(RigDrivers, String, Map, SweepPlan, Path, boolean, SweepEventListener, SweepControl,
     * Clock)} does and, when it ran to its end, hands the still-open rig to {@code after} before closing it.
     *
     * @param drivers where to find the driver
     * @param driverName the driver
     * @param options the driver's options as given
     * @param plan the sweep
     * @param journalFile the journal to create; it must not exist
     * @param keepSamples true to keep every step's integration samples
     * @param listener progress events
     * @param control stop requests
     * @param clock the clock for the journal's times
     * @param after what to do on the rig after a completed sweep (not called when the sweep ended early); what it
     *        throws reaches the caller after the rig is closed, and the journal keeps the whole sweep
     * @return the sweep; its status says how it ended, the output is off
     */
    public static SweepResult run(RigDrivers drivers, String driverName, Map<String, String> options, SweepPlan plan,
                                  Path journalFile, boolean keepSamples, SweepEventListener listener,
                                  SweepControl control, Clock clock, AfterCompletion after) {
        RigDriver driver = drivers.find(driverName);
        Map<String, String> complete = RigOptionValues.of(driver, options).asMap();
        try (Rig rig = driver.open(complete)) {
            SweepEngine engine = new SweepEngine(rig);
            engine.check(plan);
            JournalHeader header = new JournalHeader(JournalHeader.FORMAT_VERSION, clock.instant(), driverName, complete,
                    rig.identity(), rig.acquisition().sampleRateHz(), rig.acquisition().channels(), plan,
                    keepSamples ? SAMPLES_FILE : "");
            SweepResult result;
            try (JournalWriter writer = JournalWriter.create(journalFile, header, clock)) {
                result = engine.run(plan, listener, control, writer);
            }
            if (result.completed()) {
                after.completed(rig, result);
            }
            return result;
        }
    }

    /**
     * Goes on with an interrupted sweep from its journal, appending to the same journal.
     *
     * @param drivers where to find the recorded driver
     * @param journalFile the journal
     * @param optionChanges driver options to use instead of the recorded ones (for example a new {@code port})
     * @param notices receives what the caller should tell the user: where reading stopped, what is resumed
     * @param listener progress events, the recorded steps reported first
     * @param control stop requests
     * @param clock the clock for the journal's times
     * @return the whole sweep
     * @throws RigException for an unreadable or finished journal, a missing driver, a different rig, or a plan the
     *         rig cannot run
     */
    public static SweepResult resume(RigDrivers drivers, Path journalFile, Map<String, String> optionChanges,
                                     Consumer<String> notices, SweepEventListener listener, SweepControl control,
                                     Clock clock) {
        return resume(drivers, journalFile, optionChanges, notices, listener, control, clock, AfterCompletion.NONE);
    }

    /**
     * Goes on with an interrupted sweep as {@link #resume(RigDrivers, Path, Map, Consumer, SweepEventListener,
     * SweepControl, Clock)} does and, when it runs to its end, hands the still-open rig to {@code after} before
     * closing it.
     *
     * @param drivers where to find the recorded driver
     * @param journalFile the journal
     * @param optionChanges driver options to use instead of the recorded ones
     * @param notices receives what the caller should tell the user
     * @param listener progress events, the recorded steps reported first
     * @param control stop requests
     * @param clock the clock for the journal's times
     * @param after what to do on the rig after the sweep completed (not called when it ended early again); what it
     *        throws reaches the caller after the rig is closed, and the journal keeps the whole sweep
     * @return the whole sweep
     */
    public static SweepResult resume(RigDrivers drivers, Path journalFile, Map<String, String> optionChanges,
                                     Consumer<String> notices, SweepEventListener listener, SweepControl control,
                                     Clock clock, AfterCompletion after) {
        JournalContents contents = JournalReader.read(journalFile);
        contents.warning().ifPresent(notices);
        JournalHeader header = contents.header();
        if (contents.finished()) {
            throw new RigException("journal " + journalFile + " records a sweep that ran to its end ("
                    + contents.steps().size() + " steps); there is nothing to resume");
        }
        RigDriver driver = drivers.find(header.driver());
        Map<String, String> options = new LinkedHashMap<>(header.options());
        for (Map.Entry<String, String> change : optionChanges.entrySet()) {
            if (!options.containsKey(change.getKey())) {
                throw new RigException("the " + header.driver() + " rig of journal " + journalFile + " has no option '"
                        + change.getKey() + "'; its options are " + String.join(", ", options.keySet()));
            }
            options.put(change.getKey(), change.getValue());
        }
        try (Rig rig = driver.open(RigOptionValues.of(driver, options).asMap())) {
            checkSameRig(journalFile, header, rig);
            SweepEngine engine = new SweepEngine(rig);
            engine.check(header.plan());
            notices.accept("resuming " + journalFile + " after " + contents.steps().size() + " completed step(s) on "
                    + rig.identity());
            SweepResult result;
            try (JournalWriter writer = JournalWriter.resume(contents, rig.identity(), clock)) {
                result = engine.resume(header.plan(), contents.completedSteps(), listener, control, writer);
            }
            if (result.completed()) {
                after.completed(rig, result);
            }
            return result;
        }
    }

    private static void checkSameRig(Path journalFile, JournalHeader header, Rig rig) {
        String where = "journal " + journalFile + " was recorded on ";
        if (!rig.identity().equals(header.identity())) {
            throw new RigException(where + "'" + header.identity() + "' but the rig now answers '" + rig.identity()
                    + "'; a sweep can only be resumed on the rig it started on");
        }
        if (rig.acquisition().sampleRateHz() != header.sampleRateHz()) {
            throw new RigException(where + "a rig sampling at " + header.sampleRateHz() + " Hz but the rig now samples at "
                    + rig.acquisition().sampleRateHz() + " Hz");
        }
        if (!rig.acquisition().channels().equals(header.channels())) {
            throw new RigException(where + "a rig with channels " + header.channels() + " but the rig now has "
                    + rig.acquisition().channels());
        }
    }
}
