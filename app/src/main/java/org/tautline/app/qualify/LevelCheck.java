package org.tautline.app.qualify;

import java.util.List;
import java.util.Optional;

import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.qualify.Qualifier;
import org.tautline.analysis.specimen.LevelledMode;
import org.tautline.analysis.specimen.LinearityCheck;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEngine;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepJournal;
import org.tautline.driver.sweep.SweepPass;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepResult;

/**
 * Checks that the fundamental does not move with the test level: one more sweep of the engine across it, with two
 * passes, at the plan's drive and at a higher one, compared by the Kirchhoff-Carrier backbone (see
 * {@link LinearityCheck}).
 *
 * <p>The sweep covers f1 (1 +/- 2 %), which holds both polarisations of a doublet split by up to a few half-power
 * bandwidths, with the main plan's settling, integration and safety limits: the higher level is capped at the
 * plan's drive limit, and every block of both passes is checked against the same limits as the main sweep. The
 * modal amplitude a of harmonic 1 is the response amplitude at the step nearest its natural frequency divided by
 * |sin(pi x_s/L)| (the mode shape at the sensor).
 */
public final class LevelCheck {
    /** The second pass's drive, as a multiple of the plan's. */
    public static final double LEVEL_RATIO = 3.0;
    /** The least ratio of the two levels for which the check is run. */
    public static final double MIN_LEVEL_RATIO = 1.5;
    private static final int STEPS = 60;
    private static final double HALF_BAND = 0.02;

    private LevelCheck() {
    }

    /**
     * The level check's plan: two drive levels across f1, under the main plan's limits.
     *
     * @param main the main plan (settling, integration, drive, limits); it must be a one-level drive plan
     * @param f1Hz the fundamental, Hz
     * @param maxDriveV the rig's drive limit, V
     * @return the plan
     */
    public static SweepPlan plan(SweepPlan main, double f1Hz, double maxDriveV) {
        double driveV = main.levels().get(0);
        double highV = Math.min(Math.min(LEVEL_RATIO * driveV, maxDriveV), main.limits().driveV());
        return new SweepPlan(f1Hz * (1 - HALF_BAND), f1Hz * (1 + HALF_BAND), STEPS, main.settle(),
                main.integrationCycles(), main.levelMode(), List.of(driveV, highV), main.limits(),
                org.tautline.driver.sweep.SweepDirection.UP, Optional.empty(), main.initialDampingRatio(),
                main.levelTolerance(), main.initialDriveV(), main.driveRateVPerS(), main.rampS(), main.harmonicOrder());
    }

    /**
     * Runs the level check's sweep on a connected rig and compares harmonic 1.
     *
     * @param rig the rig (the same as the main run's)
     * @param result the main qualification, which gives f1 and the tension
     * @param main the main plan
     * @param listener progress of the sweep
     * @param control stop requests
     * @return the comparison, absent when harmonic 1 or the tension is unknown, the drive limit leaves no room for a
     *         second level {@value #MIN_LEVEL_RATIO} times the first, or the sweep did not run to its end
     */
    public static Optional<LinearityResult> run(Rig rig, QualificationResult result, SweepPlan main,
                                                SweepEventListener listener, SweepControl control) {
        Optional<QualifiedMode> f1 = Qualifier.dominant(result.modes(), 1);
        if (f1.isEmpty() || result.tension().isEmpty()) {
            return Optional.empty();
        }
        double f = f1.get().mode().frequencyHz();
        SweepPlan plan = plan(main, f, rig.exciter().maxAmplitudeV());
        if (plan.levels().get(1) < MIN_LEVEL_RATIO * plan.levels().get(0)) {
            // The drive limit leaves no room for a second level far enough above the first to show a shift.
            return Optional.empty();
        }
        SweepResult sweep = new SweepEngine(rig).run(plan, listener, control, SweepJournal.NONE);
        if (!sweep.completed()) {
            return Optional.empty();
        }
        Optional<LevelledMode> low = level(result.specimen(), f, sweep.passes().get(0));
        Optional<LevelledMode> high = level(result.specimen(), f, sweep.passes().get(1));
        if (low.isEmpty() || high.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new LinearityCheck().compare(result.specimen(), result.tension().get().tensionN(),
                List.of(low.get()), List.of(high.get())));
    }

    private static Optional<LevelledMode> level(Specimen specimen, double f1Hz, SweepPass pass) {
        ModalEstimate estimate = ModalEstimator.defaults().estimate(pass.toFrf());
        Optional<FittedMode> strongest = estimate.modes().stream()
                .filter(m -> Math.abs(m.mode().frequencyHz() / f1Hz - 1) < 0.005)
                .max((a, b) -> Double.compare(a.mode().modalConstant().norm(), b.mode().modalConstant().norm()));
        if (strongest.isEmpty()) {
            return Optional.empty();
        }
        double fn = strongest.get().mode().frequencyHz();
        SweepPoint nearest = pass.points().get(0);
        for (SweepPoint p : pass.points()) {
            if (Math.abs(p.frequencyHz() - fn) < Math.abs(nearest.frequencyHz() - fn)) {
                nearest = p;
            }
        }
        double shapeAtSensor = Math.abs(Math.sin(Math.PI * specimen.sensorPositionM() / specimen.lengthM()));
        return Optional.of(new LevelledMode(1, strongest.get(), nearest.responseAmplitude() / shapeAtSensor));
    }
}
