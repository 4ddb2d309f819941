package org.tautline.driver.journal;

import java.nio.file.Path;
import java.time.Clock;
import java.util.Map;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;

import org.tautline.driver.RigException;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.RigDriver;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.spi.RigOptionValues;
import org.tautline.driver.sweep.SteppedSinePlan;
import org.tautline.driver.sweep.SteppedSineRunner;
import org.tautline.driver.sweep.SweepListener;
import org.tautline.driver.sweep.SweepRecord;

/**
 * Runs a sweep on a rig chosen by driver name with a journal, and resumes one from its journal.
 *
 * <p>A resume reads the journal (up to its last valid record), opens the rig again with the driver
 * and options the header recorded, refuses a rig whose identity, sample rate or channels differ from
 * the recorded ones, cuts the journal after its last valid record, appends a RESUMED record and runs
 * only the steps not yet done. The result is the whole sweep, the recorded steps first.
 */
public final class JournaledSweep {
    /** File name of the samples side file, beside the journal, when samples are kept. */
    public static final String SAMPLES_FILE = "journal.samples";

    private JournaledSweep() {
    }

    /**
     * Opens the rig, writes the journal header and runs the plan.
     *
     * @param drivers where to find the driver
     * @param driverName the driver, for example {@code sim}
     * @param options the driver's options as given (defaults are filled in and recorded)
     * @param plan the sweep
     * @param journalFile the journal to create; it must not exist
     * @param keepSamples true to keep every step's integration samples in {@value #SAMPLES_FILE} beside the journal
     * @param listener progress after every step
     * @param cancelRequested polled during the sweep
     * @param clock the clock for the journal's times
     * @return the sweep record
     * @throws RigException for a bad driver or option, a rig that cannot run the plan, or a fault
     */
    public static SweepRecord run(RigDrivers drivers, String driverName, Map<String, String> options, SteppedSinePlan plan,
                                  Path journalFile, boolean keepSamples, SweepListener listener,
                                  BooleanSupplier cancelRequested, Clock clock) {
        RigDriver driver = drivers.find(driverName);
        Map<String, String> complete = RigOptionValues.of(driver, options).asMap();
        try (Rig rig = driver.open(complete)) {
            SteppedSineRunner runner = new SteppedSineRunner(rig);
            runner.check(plan);
            JournalHeader header = new JournalHeader(JournalHeader.FORMAT_VERSION, clock.instant(), driverName, complete,
                    rig.identity(), rig.acquisition().sampleRateHz(), rig.acquisition().channels(), plan,
                    keepSamples ? SAMPLES_FILE : "");
            try (JournalWriter writer = JournalWriter.create(journalFile, header, clock)) {
                return runner.run(plan, listener, cancelRequested, writer);
            }
        }
    }

    /**
     * Goes on with an interrupted sweep from its journal, appending to the same journal.
     *
     * @param drivers where to find the recorded driver
     * @param journalFile the journal
     * @param notices receives what the caller should tell the user: where reading stopped, a finished journal
     * @param listener progress after every step, the recorded steps counted as done
     * @param cancelRequested polled during the sweep
     * @param clock the clock for the journal's times
     * @return the whole sweep; for a journal that already holds every step, its record, with no rig opened
     * @throws RigException for an unreadable journal, a missing driver, a different rig, or a fault
     */
    public static SweepRecord resume(RigDrivers drivers, Path journalFile, Consumer<String> notices,
                                     SweepListener listener, BooleanSupplier cancelRequested, Clock clock) {
        JournalContents contents = JournalReader.read(journalFile);
        contents.warning().ifPresent(notices);
        JournalHeader header = contents.header();
        if (contents.allStepsDone()) {
            notices.accept("journal " + journalFile + " already holds all " + header.plan().stepCount()
                    + " steps; nothing to resume");
            return contents.record();
        }
        RigDriver driver = drivers.find(header.driver());
        try (Rig rig = driver.open(header.options())) {
            checkSameRig(journalFile, header, rig);
            notices.accept("resuming " + journalFile + " at step " + (contents.steps().size() + 1) + " of "
                    + header.plan().stepCount() + " on " + rig.identity());
            try (JournalWriter writer = JournalWriter.resume(contents, rig.identity(), clock)) {
                return new SteppedSineRunner(rig).continueFrom(contents.record(), listener, cancelRequested, writer);
            }
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
