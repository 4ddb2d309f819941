package org.tautline.app.qualify;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.modal.ModeSelection;
import org.tautline.analysis.qualify.Assessment;
import org.tautline.analysis.qualify.QualificationRequest;
import org.tautline.analysis.qualify.Qualifier;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Specification;
import org.tautline.analysis.verdict.Verdict;
import org.tautline.driver.sweep.SweepResult;

/**
 * The application's side of a qualification: it builds the {@link QualificationRequest} from a sweep or a file and
 * hands it to the analysis ({@link Qualifier}), which does all the computing.
 *
 * <p>What the application adds is what only it knows: a sweep that stopped before its end is a caution on the whole
 * result, and an FRF read from a file has no level check because that needs the rig.
 */
public final class Qualification {
    /** Why an analysis of an FRF file alone has no level-check figure. */
    static final String LEVEL_CHECK_NEEDS_THE_RIG = "the level check needs the rig (it sweeps the fundamental at two"
            + " drive levels), so an FRF file alone cannot give it; the run's result.json holds it when the rig ran it";

    private Qualification() {
    }

    /**
     * Analyses a completed sweep.
     *
     * @param specimen what was stated about the specimen
     * @param sweep the sweep record
     * @param specification the limits to judge against
     * @param wallStartNs {@link System#nanoTime()} when the qualification started
     * @return the result
     */
    public static QualificationResult analyse(Specimen specimen, SweepResult sweep, Specification specification,
                                              long wallStartNs) {
        return analyse(specimen, sweep.toFrf(), Optional.of(sweep), ModalEstimator.defaults(), Optional.of(specification),
                wallStartNs);
    }

    /**
     * Analyses an FRF.
     *
     * @param specimen what was stated about the specimen
     * @param frf the measured FRF, any quantity
     * @param sweep the sweep it came from, if any
     * @param estimator the modal estimator (band, mode form)
     * @param specification the limits to judge against, if any
     * @param wallStartNs {@link System#nanoTime()} when the qualification started
     * @return the result
     */
    public static QualificationResult analyse(Specimen specimen, Frf frf, Optional<SweepResult> sweep,
                                              ModalEstimator estimator, Optional<Specification> specification,
                                              long wallStartNs) {
        QualificationRequest request = QualificationRequest.of(specimen, frf, specification).withEstimator(estimator);
        if (sweep.isEmpty()) {
            request = request.withoutLevelCheck(LEVEL_CHECK_NEEDS_THE_RIG);
        }
        Optional<SweepResult> incomplete = sweep.filter(s -> !s.completed());
        if (incomplete.isPresent()) {
            SweepResult s = incomplete.get();
            request = request.withCaution("the sweep " + s.status().label() + " before its end (" + s.reason()
                    + "), so its FRF lacks the steps not run");
        }
        return new QualificationResult(Qualifier.qualify(request), sweep, secondsSince(wallStartNs));
    }

    /**
     * Qualifies a modal fit recorded with a run (its result file) without fitting the FRF again: the request is made as
     * the run's was (its level check, or why it had none, and the record's cautions) and the recorded modes are
     * numbered and judged ({@link Qualifier#ofFit}).
     *
     * @param specimen what was stated about the specimen
     * @param frf the FRF the fit was made from
     * @param modal the recorded fit
     * @param specification the limits to judge against, if any
     * @param levelCheck the recorded level check, if any
     * @param whyNoLevelCheck why there is none, as recorded; empty for the plain "not measured"
     * @param recordCautions what the record said against trusting the result
     * @param wallTimeS the recorded wall time of the qualification, s
     * @return the result
     */
    public static QualificationResult ofRecordedFit(Specimen specimen, Frf frf, ModalEstimate modal,
                                                    Optional<Specification> specification,
                                                    Optional<LinearityResult> levelCheck, String whyNoLevelCheck,
                                                    List<String> recordCautions, double wallTimeS) {
        QualificationRequest request = QualificationRequest.of(specimen, frf, specification);
        if (levelCheck.isPresent()) {
            request = request.withLevelCheck(levelCheck.get());
        } else if (!whyNoLevelCheck.isEmpty()) {
            request = request.withoutLevelCheck(whyNoLevelCheck);
        }
        for (String caution : recordCautions) {
            request = request.withCaution(caution);
        }
        return new QualificationResult(Qualifier.ofFit(request, modal), Optional.empty(), wallTimeS);
    }

    /**
     * Fits a result again with a pole choice edited by hand, and redoes everything downstream (see
     * {@link Qualifier#refit}); a level check of the earlier result is kept and its shift judged again.
     *
     * @param previous the result whose FRF and stabilisation chart are refitted
     * @param selection the poles to fit
     * @param specification the limits to judge against, if any
     * @param wallStartNs {@link System#nanoTime()} when the refit started
     * @return the new result
     */
    public static QualificationResult refit(QualificationResult previous, ModeSelection selection,
                                            Optional<Specification> specification, long wallStartNs) {
        return new QualificationResult(Qualifier.refit(previous.assessment(), selection, specification),
                previous.sweep(), secondsSince(wallStartNs));
    }

    /**
     * Adds a level check to a result: its relative shift of f1 joins the figures and the verdict is judged again.
     *
     * @param result the qualification
     * @param linearity the comparison of two test levels
     * @param specification the limits, if any
     * @return the result with the level check
     */
    public static QualificationResult withLinearity(QualificationResult result, LinearityResult linearity,
                                                    Optional<Specification> specification) {
        return new QualificationResult(Qualifier.withLevelCheck(result.assessment(), linearity, specification),
                result.sweep(), result.wallTimeS());
    }

    /**
     * Says why a result has no level check: the limit on the shift of f1, if any, is judged "not measured" with that
     * reason, and the result file records it. The modes are numbered and judged again from the same fit (not fitted
     * again).
     *
     * @param result the qualification, without a level check
     * @param why why there is none, one plain sentence
     * @param specification the limits, if any
     * @return the result saying why it has no level check
     */
    public static QualificationResult withoutLevelCheck(QualificationResult result, String why,
                                                        Optional<Specification> specification) {
        QualificationRequest request = result.assessment().request().withSpecification(specification)
                .withoutLevelCheck(why);
        return new QualificationResult(Qualifier.ofFit(request, result.assessment().modal()), result.sweep(),
                result.wallTimeS());
    }

    /**
     * Adds cautions that come from outside the FRF (an instrument whose calibration had run out): the verdict, if
     * any, becomes not determinable with each caution as a reason, before the limits' own; the figures stay as they
     * are, for the record.
     *
     * @param result the qualification
     * @param cautions plain sentences; none leaves the result as it is
     * @return the result with the cautions
     */
    public static QualificationResult withCautions(QualificationResult result, List<String> cautions) {
        if (cautions.isEmpty()) {
            return result;
        }
        Assessment a = result.assessment();
        Optional<Verdict> verdict = a.verdict();
        for (int i = cautions.size() - 1; i >= 0; i--) {
            String why = "not determinable: " + cautions.get(i);
            verdict = verdict.map(v -> v.undetermined(why));
        }
        List<String> all = new ArrayList<>(a.cautions());
        all.addAll(cautions);
        return new QualificationResult(new Assessment(a.request(), a.receptance(), a.synthesized(), a.modal(), a.modes(),
                a.harmonics(), a.tension(), a.participation(), a.measurements(), verdict, all), result.sweep(),
                result.wallTimeS());
    }

    private static double secondsSince(long startNs) {
        return (System.nanoTime() - startNs) * 1e-9;
    }
}
