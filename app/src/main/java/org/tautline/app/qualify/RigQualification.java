package org.tautline.app.qualify;

import java.util.Optional;
import java.util.function.Consumer;

import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Specification;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepResult;

/**
 * Qualifies a completed sweep on the rig it ran on, as {@code sweep} and {@code resume} do when given the specimen:
 * the fit of the first pass's FRF, then the level check, or why there is none (recorded in the result).
 *
 * <p>A plan with two or more levels holds its own level check (its passes, {@link LevelCheck#fromPasses}); a one-level
 * drive plan gets one more sweep of the fundamental at a second drive level on the same rig, within the plan's limits
 * ({@link LevelCheck#attempt}), when its drive limit leaves room for it.
 */
public final class RigQualification {
    private RigQualification() {
    }

    /**
     * @param rig the rig the sweep ran on, still open, output off
     * @param sweep the completed sweep
     * @param specimen what was stated about the specimen
     * @param specification the limits to judge against, if any
     * @param control stop requests: a stop asked for before or during the level check ends it, and the result says so
     * @param notices told, in words, before the rig is excited again
     * @param wallStartNs {@link System#nanoTime()} when the qualification started
     * @return the result, with the level check or why there is none
     */
    public static QualificationResult of(Rig rig, SweepResult sweep, Specimen specimen,
                                         Optional<Specification> specification, SweepControl control,
                                         Consumer<String> notices, long wallStartNs) {
        QualificationResult result = Qualification.analyse(specimen, sweep.toFrf(), Optional.of(sweep),
                ModalEstimator.defaults(), specification, wallStartNs);
        LevelCheck.Outcome check = sweep.plan().levels().size() > 1 ? LevelCheck.fromPasses(result, sweep)
                : LevelCheck.attempt(rig, result, sweep.plan(), SweepEventListener.NONE, control, notices);
        return check.result().isPresent() ? Qualification.withLinearity(result, check.result().get(), specification)
                : Qualification.withoutLevelCheck(result, check.whyNone(), specification);
    }
}
