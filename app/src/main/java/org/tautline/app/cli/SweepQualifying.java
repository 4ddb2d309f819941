package org.tautline.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Optional;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.qualify.ResultText;
import org.tautline.app.qualify.RigQualification;
import org.tautline.app.report.ResultFile;
import org.tautline.app.report.RunDirectory;
import org.tautline.app.trace.DataFile;
import org.tautline.driver.journal.JournaledSweep;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepResult;

/**
 * What {@code sweep} and {@code resume} do with the stated specimen once the sweep ran to its end: qualify it on the
 * rig it ran on (the fit, then the level check or why there is none, {@link RigQualification}), write the run folder's
 * {@code result.json} beside {@code frf.csv} with the SHA-256 of {@code frf.csv} ({@link ResultFile}, as
 * {@code demo --out} does) and print the verdict. A sweep that ended early is not fitted: its FRF lacks the steps
 * not run, and {@code resume} completes it first.
 */
final class SweepQualifying implements JournaledSweep.AfterCompletion {
    private final Optional<FitInputs.Stated> stated;
    private final SweepControl control;
    private final PrintWriter err;
    private Optional<QualificationResult> result = Optional.empty();
    private String failure = "";

    /**
     * @param stated the specimen and limits; empty when none were stated (the FRF is then left for a later fit)
     * @param control the sweep's stop requests, which also stop the level check
     * @param err where to say what is done
     */
    SweepQualifying(Optional<FitInputs.Stated> stated, SweepControl control, PrintWriter err) {
        this.stated = stated;
        this.control = control;
        this.err = err;
    }

    @Override
    public void completed(Rig rig, SweepResult sweep) {
        if (stated.isEmpty()) {
            return;
        }
        err.println("tautline: the sweep is complete; fitting its FRF and judging the specimen");
        err.flush();
        try {
            result = Optional.of(RigQualification.of(rig, sweep, stated.get().specimen(), stated.get().specification(),
                    control, notice -> {
                        err.println("tautline: " + notice);
                        err.flush();
                    }, System.nanoTime()));
        } catch (RuntimeException e) {
            failure = e.getMessage() == null ? "an unexpected internal error that gave no description" : e.getMessage();
        }
    }

    /** @return the qualification, once a completed sweep has been qualified */
    Optional<QualificationResult> result() {
        return result;
    }

    /**
     * Writes {@code result.json} beside the run's {@code frf.csv} (already written), naming its SHA-256; the file is
     * written whole or not at all.
     *
     * @param runDir the run folder
     * @throws IOException when the file cannot be written
     */
    void writeResult(Path runDir) throws IOException {
        if (result.isEmpty()) {
            return;
        }
        Path file = runDir.resolve(RunDirectory.RESULT);
        Path part = runDir.resolve(RunDirectory.RESULT + ".part");
        ResultFile.write(part, result.get(), DataFile.sha256(Files.readAllBytes(runDir.resolve(RunDirectory.FRF))));
        Files.move(part, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        err.println("tautline: wrote " + file + " (the result, naming " + RunDirectory.FRF + " by its SHA-256)");
    }

    /**
     * @param sweep the sweep
     * @param runDir the run folder
     * @return why there is no result, one plain sentence; empty when there is one
     */
    Optional<String> whyNoResult(SweepResult sweep, Path runDir) {
        if (result.isPresent()) {
            return Optional.empty();
        }
        if (!sweep.completed()) {
            return Optional.of("No verdict: the run is incomplete (" + sweep.steps().size() + " steps measured, the sweep "
                    + sweep.status().label() + "), so its FRF was not fitted and no " + RunDirectory.RESULT + " was"
                    + " written" + (stated.isPresent() ? "; 'tautline resume " + runDir + "' completes it, then fits it"
                    + " and judges the specimen as recorded in " + RunDirectory.SPECIMEN : "")
                    + ".");
        }
        if (stated.isEmpty()) {
            return Optional.of("No --specimen was given, so the FRF was not fitted here; 'tautline fit --frf " + runDir
                    .resolve(RunDirectory.FRF) + " --specimen S.json' or 'tautline report " + runDir + "' (with "
                    + RunDirectory.SPECIMEN + " in the folder) will fit it later, without a level check.");
        }
        return Optional.of("No verdict: the sweep is complete, but its FRF could not be fitted (" + failure + "); "
                + RunDirectory.FRF + " and the journal are kept.");
    }

    /**
     * @param sweepStatus the exit status of the sweep alone
     * @return the verdict's exit status when the sweep was qualified ({@link ExitCodes#of}), not determinable when a
     *         completed sweep could not be, otherwise the sweep's own
     */
    int exitCode(SweepResult sweep, int sweepStatus) {
        if (result.isPresent()) {
            return ExitCodes.of(result.get().verdict());
        }
        if (sweep.completed() && stated.isPresent()) {
            return ExitCodes.VERDICT_NOT_DETERMINABLE;
        }
        return sweepStatus;
    }

    /**
     * The qualification as text, after the sweep's summary: the result as {@code fit} prints it (and why there is no
     * level check when there is none), or why there is no result; nothing for a sweep that ended early with no
     * specimen stated, whose summary already says how to go on.
     *
     * @param sweep the sweep
     * @param runDir the run folder
     * @return the text, ending in a line break; empty when there is nothing to add
     */
    String text(SweepResult sweep, Path runDir) {
        if (result.isEmpty()) {
            return sweep.completed() || stated.isPresent() ? whyNoResult(sweep, runDir).orElseThrow() + "\n" : "";
        }
        QualificationResult r = result.get();
        String why = r.assessment().request().whyNoLevelCheck();
        return "\n" + ResultText.format(r, Optional.empty()) + (r.linearity().isEmpty() && !why.isEmpty()
                ? "Level check: none; " + why + ".\n" : "");
    }

    /** @param summary the sweep's JSON summary, given {@code result} (the result file's JSON, or null) and why not */
    void addTo(ObjectNode summary, SweepResult sweep, Path runDir) {
        if (result.isPresent()) {
            summary.set("result", ResultFile.json(result.get()));
        } else {
            summary.putNull("result");
            summary.put("whyNoResult", whyNoResult(sweep, runDir).orElseThrow());
        }
    }
}
