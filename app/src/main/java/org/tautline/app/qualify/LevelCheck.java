package org.tautline.app.qualify;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.function.Consumer;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.modal.ModeSelection;
import org.tautline.analysis.modal.Pole;
import org.tautline.analysis.modal.StabilisationChart;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.qualify.Qualifier;
import org.tautline.analysis.specimen.LevelledMode;
import org.tautline.analysis.specimen.LinearityCheck;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Figure;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.sweep.LevelMode;
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
 *
 * <p>The backbone's prediction is for one polarisation moving in the plane of the drive. When the drive lies between
 * the wire's principal axes it excites both polarisations of harmonic 1; the second stretches the wire too, and the
 * sensor sees only the drive's component of the first, so the measured shift comes out above the prediction (about
 * 20 % above it for the demo wire, whose axis is 25 degrees from the drive, where with the drive along an axis the two
 * agree within 1 %). The comparison says so when the fit finds that second polarisation.
 */
public final class LevelCheck {
    /** The second pass's drive, as a multiple of the plan's. */
    public static final double LEVEL_RATIO = 3.0;
    /** The least ratio of the two levels for which the check is run. */
    public static final double MIN_LEVEL_RATIO = 1.5;
    private static final int STEPS = 60;
    private static final double HALF_BAND = 0.02;
    /**
     * The least modal constant, as a share of the dominant polarisation's, at which the other polarisation of harmonic 1
     * is said to stretch the wire beyond the one-polarisation prediction: 0.05, about 13 degrees between the drive and
     * a principal axis (the modal constants along the drive go as cos^2 and sin^2 of that angle). Our choice.
     */
    static final double OTHER_POLARISATION_SHARE = 0.05;

    private LevelCheck() {
    }

    /**
     * The level check's plan: two drive levels across f1, under the main plan's limits.
     *
     * @param main the main plan (settling, integration, drive, limits); it must be a one-level drive plan
     * @param f1Hz the fundamental, Hz
     * @param maxDriveV the rig's drive limit, V
     * @return the plan
     * @throws RigException for a force-controlled plan
     */
    public static SweepPlan plan(SweepPlan main, double f1Hz, double maxDriveV) {
        if (main.levelMode() == LevelMode.FORCE) {
            throw new RigException("the level check sweeps the fundamental at two drive levels in"
                    + " volts; a force-controlled plan's levels are forces, so it has no level check of this kind");
        }
        double driveV = main.levels().get(0);
        double highV = Math.min(Math.min(LEVEL_RATIO * driveV, maxDriveV), main.limits().driveV());
        return new SweepPlan(f1Hz * (1 - HALF_BAND), f1Hz * (1 + HALF_BAND), STEPS, main.settle(),
                main.integrationCycles(), main.levelMode(), List.of(driveV, highV), main.limits(),
                org.tautline.driver.sweep.SweepDirection.UP, Optional.empty(), main.initialDampingRatio(),
                main.levelTolerance(), main.initialDriveV(), main.driveRateVPerS(), main.rampS(), main.harmonicOrder());
    }

    /**
     * The level check's figure, or why there is none.
     *
     * @param result the comparison of the two levels; empty when the check was not run or gave no figure
     * @param whyNone why there is none, one plain sentence for the report and the limit on the shift; empty with a
     *        figure
     */
    public record Outcome(Optional<LinearityResult> result, String whyNone) {
        static Outcome none(String why) {
            return new Outcome(Optional.empty(), why);
        }
    }

    /**
     * Runs the level check's sweep on a connected rig and compares harmonic 1, saying why when there is no figure.
     * Nothing is excited when a stop was asked for, when the main plan holds the force (the check steps the drive) or
     * when the drive limit leaves no room for the second level.
     *
     * @param rig the rig (the same as the main run's)
     * @param result the main qualification, which gives f1 and the tension
     * @param main the main plan
     * @param listener progress of the sweep
     * @param control stop requests
     * @param notices told, in words, just before the rig is excited again
     * @return the comparison, or why there is none
     */
    public static Outcome attempt(Rig rig, QualificationResult result, SweepPlan main, SweepEventListener listener,
                                  SweepControl control, Consumer<String> notices) {
        Optional<QualifiedMode> f1 = Qualifier.dominant(result.modes(), 1);
        Optional<String> missing = missingInputs(f1, result);
        if (missing.isPresent()) {
            return Outcome.none(missing.get());
        }
        Optional<String> failing = alreadyFailing(result);
        if (failing.isPresent()) {
            return Outcome.none(failing.get());
        }
        if (main.levelMode() == LevelMode.FORCE) {
            return Outcome.none("the sweep held the force at a set level and the level check steps the drive voltage,"
                    + " so it was not run; a plan with a second force level gives it from its own passes");
        }
        double f = f1.get().mode().frequencyHz();
        double exciterV = rig.exciter().maxAmplitudeV();
        SweepPlan plan = plan(main, f, exciterV);
        double lowV = plan.levels().get(0);
        if (plan.levels().get(1) < MIN_LEVEL_RATIO * lowV) {
            // The drive limit leaves no room for a second level far enough above the first to show a shift.
            boolean exciterBinds = exciterV < main.limits().driveV();
            return Outcome.none(String.format(Locale.ROOT, "the %s (%s V) leaves no room for a second drive level at"
                    + " least %s times the sweep's %s V, so the level check was not run; a drive limit of %s V or more"
                    + " allows it", exciterBinds ? "exciter's limit" : "drive limit", number(Math.min(exciterV,
                    main.limits().driveV())), number(MIN_LEVEL_RATIO), number(lowV), number(MIN_LEVEL_RATIO * lowV)));
        }
        if (control.stopRequested()) {
            return Outcome.none("a stop was asked for (" + control.reason() + ") before the level check, so it was not"
                    + " run");
        }
        notices.accept(String.format(Locale.ROOT, "level check: sweeping the fundamental (%s Hz, +/- 2 %%) again at %s V"
                + " and %s V", number(f), number(lowV), number(plan.levels().get(1))));
        SweepResult sweep = new SweepEngine(rig).run(plan, listener, control, SweepJournal.NONE);
        if (!sweep.completed()) {
            return Outcome.none("the level check's sweep " + sweep.status().label() + " (" + sweep.reason() + ")");
        }
        return compare(result, f, sweep.passes().get(0), sweep.passes().get(1), "V");
    }

    /**
     * Why the level check is not run on a specimen that already fails another limit, or empty: the verdict is FAIL
     * whatever the shift, and the check would drive a failing specimen (a wire tensioned out of range, say) three times
     * harder for nothing.
     */
    static Optional<String> alreadyFailing(QualificationResult result) {
        return result.verdict().flatMap(v -> v.results().stream()
                .filter(r -> r.outcome() == org.tautline.analysis.verdict.Outcome.FAIL
                        && !r.limit().figureKey().equals(Figure.LEVEL_SHIFT.key()))
                .findFirst())
                .map(r -> "the specimen already fails its " + r.limit().name() + " limit, so the level check was not"
                        + " run: it could not change the verdict and would drive a failing specimen three times harder");
    }

    /**
     * The level check from the sweep's own passes, for a plan with two or more levels: harmonic 1 in the first pass at
     * the lowest level against the first at the highest, in the plan's first direction. Nothing is excited.
     *
     * @param result the main qualification (of the sweep's first pass), which gives f1 and the tension
     * @param sweep the completed sweep
     * @return the comparison, or why there is none
     */
    public static Outcome fromPasses(QualificationResult result, SweepResult sweep) {
        Optional<QualifiedMode> f1 = Qualifier.dominant(result.modes(), 1);
        Optional<String> missing = missingInputs(f1, result);
        if (missing.isPresent()) {
            return Outcome.none(missing.get());
        }
        SweepPlan plan = sweep.plan();
        SweepPass low = null;
        SweepPass high = null;
        for (SweepPass pass : sweep.passes()) {
            if (pass.direction() != plan.passDirection(0)) {
                continue;
            }
            if (low == null || pass.level() < low.level()) {
                low = pass;
            }
            if (high == null || pass.level() > high.level()) {
                high = pass;
            }
        }
        String unit = plan.levelMode() == LevelMode.FORCE ? "N" : "V";
        if (low == null || high.level() < MIN_LEVEL_RATIO * low.level()) {
            return Outcome.none(String.format(Locale.ROOT, "the sweep's levels (%s) are not %s times apart or more, too"
                    + " close for the level check", String.join(", ", plan.levels().stream().map(l -> number(l) + " "
                    + unit).toList()), number(MIN_LEVEL_RATIO)));
        }
        return compare(result, f1.get().mode().frequencyHz(), low, high, unit);
    }

    private static Optional<String> missingInputs(Optional<QualifiedMode> f1, QualificationResult result) {
        if (f1.isEmpty()) {
            return Optional.of("harmonic 1 was not found in the sweep, so there was no fundamental to compare at two"
                    + " levels");
        }
        if (result.tension().isEmpty()) {
            return Optional.of("the tension could not be read from the sweep, and the level check needs it to predict"
                    + " the shift of f1");
        }
        return Optional.empty();
    }

    private static Outcome compare(QualificationResult result, double f1Hz, SweepPass lowPass, SweepPass highPass,
                                   String unit) {
        Reading low = level(result, f1Hz, lowPass, unit);
        if (low.mode().isEmpty()) {
            return Outcome.none(low.whyNone());
        }
        Reading high = level(result, f1Hz, highPass, unit);
        if (high.mode().isEmpty()) {
            return Outcome.none(high.whyNone());
        }
        LinearityResult linearity = new LinearityCheck().compare(result.specimen(), result.tension().get().tensionN(),
                List.of(low.mode().get()), List.of(high.mode().get()));
        Reading seen = high.otherPolarisation().isPresent() ? high : low;
        Optional<FittedMode> other = seen.otherPolarisation();
        if (other.isEmpty() || Double.isNaN(linearity.shifts().get(0).predictedRelativeShift())) {
            return new Outcome(Optional.of(linearity), "");
        }
        List<String> findings = new java.util.ArrayList<>(linearity.findings());
        findings.add(String.format(Locale.ROOT, "the prediction counts one polarisation of harmonic 1, moving along the"
                + " drive; the level check also found its second polarisation at %s Hz (modal constant %s %% of the"
                + " first's), which stretches the wire too, so a measured shift somewhat above the prediction is"
                + " expected (with the drive along one of the wire's principal axes the two agree)",
                number(other.get().mode().frequencyHz()), number(Math.round(100 * other.get().mode().modalConstant()
                        .norm() / seen.mode().get().mode().mode().modalConstant().norm()))));
        return new Outcome(Optional.of(new LinearityResult(linearity.shifts(), linearity.linear(), findings)), "");
    }

    /**
     * Harmonic 1 at one level, or why it could not be read.
     *
     * @param mode harmonic 1's dominant polarisation with its modal amplitude
     * @param otherPolarisation the other polarisation of harmonic 1, when the fit found it with a modal constant at
     *        least {@value #OTHER_POLARISATION_SHARE} of the dominant one's
     * @param whyNone why there is no reading, empty with one
     */
    private record Reading(Optional<LevelledMode> mode, Optional<FittedMode> otherPolarisation, String whyNone) {
        static Reading none(String why) {
            return new Reading(Optional.empty(), Optional.empty(), why);
        }
    }

    /** A figure for a sentence: at most four significant digits, no trailing zeros. */
    private static String number(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(4)).stripTrailingZeros().toPlainString();
    }

    /**
     * Harmonic 1 at one level. The pass's FRF is fitted from the main fit's modes in the pass's band as starting poles
     * (refined jointly with the modal constants, {@link ModalEstimator#refit}): the fundamental's doublet is then
     * resolved as the main fit resolved it, where a fit from scratch of the narrow band may merge its two polarisations
     * into one mode at a frequency neither has. A fit that leaves the response unexplained gives no figure.
     */
    private static Reading level(QualificationResult main, double f1Hz, SweepPass pass, String unit) {
        String at = "the level check's sweep at " + number(pass.level()) + " " + unit;
        Frf frf = pass.toFrf();
        double lowHz = frf.frequencyHz(0);
        double highHz = frf.frequencyHz(frf.size() - 1);
        List<Pole> seeds = main.modal().modes().stream().map(FittedMode::mode)
                .filter(m -> m.frequencyHz() >= lowHz && m.frequencyHz() <= highHz)
                .map(m -> Pole.of(m.frequencyHz(), m.dampingRatio())).toList();
        ModalEstimate estimate;
        try {
            estimate = ModalEstimator.defaults().refit(frf, ModeSelection.of(seeds), StabilisationChart.classify(lowHz,
                    highHz, new TreeMap<>(Map.of(Math.max(1, 2 * seeds.size()), seeds)), null));
        } catch (AnalysisException e) {
            return Reading.none(at + " could not be fitted (" + e.getMessage() + ")");
        }
        if (estimate.unexplained().isPresent()) {
            return Reading.none(at + " was not explained by its fit, so f1 is not known well enough"
                    + " there to compare the levels: " + estimate.unexplained().get());
        }
        Optional<FittedMode> strongest = estimate.modes().stream()
                .filter(m -> Math.abs(m.mode().frequencyHz() / f1Hz - 1) < 0.005)
                .max((a, b) -> Double.compare(a.mode().modalConstant().norm(), b.mode().modalConstant().norm()));
        if (strongest.isEmpty()) {
            return Reading.none(String.format(Locale.ROOT, "harmonic 1 was not found within 0.5 %% of"
                    + " %s Hz in %s, so the two levels could not be compared", number(f1Hz), at));
        }
        double fn = strongest.get().mode().frequencyHz();
        SweepPoint nearest = pass.points().get(0);
        for (SweepPoint p : pass.points()) {
            if (Math.abs(p.frequencyHz() - fn) < Math.abs(nearest.frequencyHz() - fn)) {
                nearest = p;
            }
        }
        Specimen specimen = main.specimen();
        double shapeAtSensor = Math.abs(Math.sin(Math.PI * specimen.sensorPositionM() / specimen.lengthM()));
        double strongestNorm = strongest.get().mode().modalConstant().norm();
        Optional<FittedMode> other = estimate.modes().stream().filter(m -> m != strongest.get())
                .filter(m -> m.mode().modalConstant().norm() >= OTHER_POLARISATION_SHARE * strongestNorm)
                .max((a, b) -> Double.compare(a.mode().modalConstant().norm(), b.mode().modalConstant().norm()));
        return new Reading(Optional.of(new LevelledMode(1, strongest.get(), nearest.responseAmplitude() / shapeAtSensor)),
                other, "");
    }
}
