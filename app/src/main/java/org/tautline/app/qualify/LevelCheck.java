package org.tautline.app.qualify;

import java.util.List;
import java.util.Optional;
import java.util.function.BooleanSupplier;

import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.specimen.LevelledMode;
import org.tautline.analysis.specimen.LinearityCheck;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.sweep.SteppedSinePlan;
import org.tautline.driver.sweep.SteppedSineRunner;
import org.tautline.driver.sweep.SweepListener;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepRecord;

/**
 * Checks that the fundamental does not move with the test level: two short sweeps across it, at the
 * plan's drive and at a higher one, compared by the Kirchhoff-Carrier backbone (see {@link LinearityCheck}).
 *
 * <p>Each sweep covers f1 (1 +/- 2 %), which holds both polarisations of a doublet split by up to a
 * few half-power bandwidths, with the main plan's settling and integration. The modal amplitude a
 * of harmonic 1 is the response amplitude at the step nearest its natural frequency divided by
 * |sin(pi x_s/L)| (the mode shape at the sensor).
 */
public final class LevelCheck {
    /** The second run's drive, as a multiple of the plan's. */
    public static final double LEVEL_RATIO = 3.0;
    private static final int STEPS = 60;
    private static final double HALF_BAND = 0.02;

    private LevelCheck() {
    }

    /**
     * Runs the two short sweeps on a connected rig and compares harmonic 1.
     *
     * @param rig the rig (the same as the main run's)
     * @param result the main qualification, which gives f1 and the tension
     * @param plan the main plan (settling, integration, drive)
     * @param listener progress of the two sweeps
     * @param cancelRequested polled during the sweeps
     * @return the comparison, absent when harmonic 1 or the tension is unknown or a sweep was stopped
     */
    public static Optional<LinearityResult> run(Rig rig, QualificationResult result, SteppedSinePlan plan,
                                                SweepListener listener, BooleanSupplier cancelRequested) {
        Optional<QualifiedMode> f1 = Qualification.dominant(result.modes(), 1);
        if (f1.isEmpty() || result.tension().isEmpty()) {
            return Optional.empty();
        }
        double f = f1.get().mode().frequencyHz();
        double highV = Math.min(LEVEL_RATIO * plan.driveAmplitudeV(), rig.exciter().maxAmplitudeV());
        Optional<LevelledMode> low = level(rig, result.specimen(), f, plan, plan.driveAmplitudeV(), listener, cancelRequested);
        Optional<LevelledMode> high = low.isEmpty() ? Optional.empty()
                : level(rig, result.specimen(), f, plan, highV, listener, cancelRequested);
        if (low.isEmpty() || high.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new LinearityCheck().compare(result.specimen(), result.tension().get().tensionN(),
                List.of(low.get()), List.of(high.get())));
    }

    private static Optional<LevelledMode> level(Rig rig, Specimen specimen, double f1Hz, SteppedSinePlan main,
                                                double driveV, SweepListener listener, BooleanSupplier cancel) {
        SteppedSinePlan plan = new SteppedSinePlan(f1Hz * (1 - HALF_BAND), f1Hz * (1 + HALF_BAND), STEPS,
                main.settleCycles(), main.minSettleS(), main.integrationCycles(), driveV, main.rampS(), main.harmonicOrder());
        SweepRecord sweep = new SteppedSineRunner(rig).run(plan, listener, cancel);
        if (!sweep.completed()) {
            return Optional.empty();
        }
        ModalEstimate estimate = ModalEstimator.defaults().estimate(sweep.toFrf());
        Optional<FittedMode> strongest = estimate.modes().stream()
                .filter(m -> Math.abs(m.mode().frequencyHz() / f1Hz - 1) < 0.005)
                .max((a, b) -> Double.compare(a.mode().modalConstant().norm(), b.mode().modalConstant().norm()));
        if (strongest.isEmpty()) {
            return Optional.empty();
        }
        double fn = strongest.get().mode().frequencyHz();
        SweepPoint nearest = sweep.points().get(0);
        for (SweepPoint p : sweep.points()) {
            if (Math.abs(p.frequencyHz() - fn) < Math.abs(nearest.frequencyHz() - fn)) {
                nearest = p;
            }
        }
        double shapeAtSensor = Math.abs(Math.sin(Math.PI * specimen.sensorPositionM() / specimen.lengthM()));
        return Optional.of(new LevelledMode(1, strongest.get(), nearest.responseAmplitude() / shapeAtSensor));
    }
}
