package org.tautline.app.qualify;

import java.util.List;
import java.util.Optional;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.specimen.HarmonicAssignment;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.specimen.PatternFit;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.specimen.TensionEstimate;
import org.tautline.analysis.verdict.Measurement;
import org.tautline.analysis.verdict.Verdict;
import org.tautline.driver.sweep.SweepResult;

/**
 * Everything one qualification produced, from the FRF to the verdict.
 *
 * @param specimen what was stated about the specimen
 * @param sweep the sweep the FRF came from, absent for an FRF read from a file
 * @param receptance the measured FRF as receptance, m/N
 * @param synthesized the fitted modal model at the same lines, m/N
 * @param modal the modal fit (modes with standard errors, chart, quality)
 * @param modes the fitted modes with harmonic numbers and polarisations, in frequency order
 * @param harmonics the harmonic numbering, with the absent harmonics and why
 * @param tension tension and bending stiffness from the harmonic series, absent when no harmonic was numbered
 * @param participation measured against expected modal constants, absent with fewer than two harmonics
 * @param linearity the fundamental at two test levels, absent when no level check was run
 * @param measurements every figure the verdict may judge, by key
 * @param verdict the verdict against the specification, absent when no specification was given
 * @param wallTimeS wall-clock time of the qualification, s
 * @param cautions why the result cannot be trusted as a whole, one plain sentence each (a sweep stopped before
 *        its end, modes that could not be numbered as the stated specimen's harmonics, a fit that does not explain
 *        the data); when there are any, the verdict is NOT_DETERMINABLE and says why
 */
public record QualificationResult(Specimen specimen, Optional<SweepResult> sweep, Frf receptance, Frf synthesized,
                                  ModalEstimate modal, List<QualifiedMode> modes, HarmonicAssignment harmonics,
                                  Optional<TensionEstimate> tension, Optional<PatternFit> participation,
                                  Optional<LinearityResult> linearity, java.util.Map<String, Measurement> measurements,
                                  Optional<Verdict> verdict, double wallTimeS, List<String> cautions) {

    /** Copies the collections. */
    public QualificationResult {
        modes = List.copyOf(modes);
        cautions = List.copyOf(cautions);
        measurements = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(measurements));
    }
}
