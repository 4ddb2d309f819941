package org.tautline.app.qualify;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.qualify.Assessment;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.specimen.HarmonicAssignment;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.specimen.PatternFit;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.specimen.TensionEstimate;
import org.tautline.analysis.verdict.Measurement;
import org.tautline.analysis.verdict.Verdict;
import org.tautline.driver.sweep.SweepResult;

/**
 * One qualification as the application keeps it: the {@link Assessment} the analysis computed, the sweep its FRF
 * came from, and how long it took. The accessors read through to the assessment.
 *
 * @param assessment what the analysis found, with the request it answers
 * @param sweep the sweep the FRF came from, absent for an FRF read from a file
 * @param wallTimeS wall-clock time of the qualification, s
 */
public record QualificationResult(Assessment assessment, Optional<SweepResult> sweep, double wallTimeS) {

    /** @return what was stated about the specimen */
    public Specimen specimen() {
        return assessment.request().specimen();
    }

    /** @return the measured FRF as receptance, m/N */
    public Frf receptance() {
        return assessment.receptance();
    }

    /** @return the fitted modal model at the same lines, m/N */
    public Frf synthesized() {
        return assessment.synthesized();
    }

    /** @return the modal fit (modes with standard errors, chart, quality) */
    public ModalEstimate modal() {
        return assessment.modal();
    }

    /** @return the fitted modes with harmonic numbers and polarisations, in frequency order */
    public List<QualifiedMode> modes() {
        return assessment.modes();
    }

    /** @return the harmonic numbering, with the absent harmonics and why */
    public HarmonicAssignment harmonics() {
        return assessment.harmonics();
    }

    /** @return tension and bending stiffness from the harmonic series, absent when no harmonic was numbered */
    public Optional<TensionEstimate> tension() {
        return assessment.tension();
    }

    /** @return measured against expected modal constants, absent with fewer than two harmonics */
    public Optional<PatternFit> participation() {
        return assessment.participation();
    }

    /** @return the fundamental at two test levels, absent when no level check was run */
    public Optional<LinearityResult> linearity() {
        return assessment.request().levelCheck();
    }

    /** @return every figure the verdict may judge, by key */
    public Map<String, Measurement> measurements() {
        return assessment.measurements();
    }

    /** @return the verdict against the specification, absent when no specification was given */
    public Optional<Verdict> verdict() {
        return assessment.verdict();
    }

    /**
     * @return why the result cannot be trusted as a whole, one plain sentence each; when there are any, the verdict
     *         is NOT_DETERMINABLE and says why
     */
    public List<String> cautions() {
        return assessment.cautions();
    }
}
