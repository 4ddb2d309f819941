package org.tautline.analysis.qualify;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Specification;

/**
 * Everything a qualification is computed from, fixed when it is made: what was stated about the specimen, the
 * measured FRF, how to fit it, the limits, the level check when one was run, and what the record itself says
 * against trusting it.
 *
 * <p>Immutable: a caller that builds one from a form or from files can hand it to a worker thread and change the
 * form afterwards without changing the qualification.
 *
 * @param specimen what was stated about the specimen
 * @param frf the measured FRF, any quantity
 * @param estimator the modal estimator (band, mode form)
 * @param specification the limits to judge against, absent for an analysis without a verdict
 * @param levelCheck the fundamental at two drive levels, absent when no level check was run
 * @param whyNoLevelCheck why a level check is absent, for the limit on its figure; empty for the plain "not
 *        measured"
 * @param recordCautions what the record says against trusting the result as a whole (a sweep that stopped before
 *        its end), one plain sentence each; any caution makes the verdict NOT_DETERMINABLE with it as the reason
 */
public record QualificationRequest(Specimen specimen, Frf frf, ModalEstimator estimator,
                                   Optional<Specification> specification, Optional<LinearityResult> levelCheck,
                                   String whyNoLevelCheck, List<String> recordCautions) {

    /** Checks that nothing is missing and copies the cautions. */
    public QualificationRequest {
        Objects.requireNonNull(specimen, "specimen");
        Objects.requireNonNull(frf, "frf");
        Objects.requireNonNull(estimator, "estimator");
        Objects.requireNonNull(specification, "specification");
        Objects.requireNonNull(levelCheck, "levelCheck");
        Objects.requireNonNull(whyNoLevelCheck, "whyNoLevelCheck");
        recordCautions = List.copyOf(recordCautions);
        for (String caution : recordCautions) {
            if (caution.isBlank()) {
                throw new AnalysisException("a caution must say why the result cannot be trusted; got a blank one");
            }
        }
    }

    /**
     * A request with the default estimator, no level check and no caution.
     *
     * @param specimen what was stated about the specimen
     * @param frf the measured FRF
     * @param specification the limits, if any
     * @return the request
     */
    public static QualificationRequest of(Specimen specimen, Frf frf, Optional<Specification> specification) {
        return new QualificationRequest(specimen, frf, ModalEstimator.defaults(), specification, Optional.empty(), "",
                List.of());
    }

    /**
     * @param other the modal estimator to fit with
     * @return this request fitted with {@code other}
     */
    public QualificationRequest withEstimator(ModalEstimator other) {
        return new QualificationRequest(specimen, frf, other, specification, levelCheck, whyNoLevelCheck,
                recordCautions);
    }

    /**
     * @param limits the limits to judge against, if any
     * @return this request judged against {@code limits}
     */
    public QualificationRequest withSpecification(Optional<Specification> limits) {
        return new QualificationRequest(specimen, frf, estimator, limits, levelCheck, whyNoLevelCheck, recordCautions);
    }

    /**
     * @param check the level check that was run
     * @return this request with the level check
     */
    public QualificationRequest withLevelCheck(LinearityResult check) {
        return new QualificationRequest(specimen, frf, estimator, specification, Optional.of(check), "", recordCautions);
    }

    /**
     * @param why why there is no level check, one plain sentence
     * @return this request without a level check, saying why
     */
    public QualificationRequest withoutLevelCheck(String why) {
        return new QualificationRequest(specimen, frf, estimator, specification, Optional.empty(), why, recordCautions);
    }

    /**
     * @param caution what the record says against trusting the result, one plain sentence
     * @return this request with the caution added
     */
    public QualificationRequest withCaution(String caution) {
        List<String> more = new ArrayList<>(recordCautions);
        more.add(caution);
        return new QualificationRequest(specimen, frf, estimator, specification, levelCheck, whyNoLevelCheck, more);
    }
}
