package org.tautline.analysis.qualify;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.specimen.HarmonicAssignment;
import org.tautline.analysis.specimen.PatternFit;
import org.tautline.analysis.specimen.TensionEstimate;
import org.tautline.analysis.verdict.Measurement;
import org.tautline.analysis.verdict.Verdict;

/**
 * What a qualification found, from the FRF to the verdict, with the request it answers.
 *
 * @param request what it was computed from
 * @param receptance the measured FRF as receptance, m/N
 * @param synthesized the fitted modal model at the same lines, m/N
 * @param modal the modal fit (modes with standard errors, chart, quality)
 * @param modes the fitted modes with harmonic numbers and polarisations, in frequency order
 * @param harmonics the harmonic numbering, with the absent harmonics and why
 * @param tension tension and bending stiffness from the harmonic series, absent when no harmonic was numbered
 * @param participation measured against expected modal constants, absent with fewer than two harmonics
 * @param measurements every figure the verdict may judge, by key, each with its standard uncertainty
 * @param verdict the verdict against the specification, absent when the request has none
 * @param cautions why the result cannot be trusted as a whole, one plain sentence each: the request's own (a sweep
 *        stopped before its end), then the analysis's (modes that could not be numbered as the stated specimen's
 *        harmonics, a fit that does not explain the data); when there are any, the verdict is NOT_DETERMINABLE and
 *        says why
 */
public record Assessment(QualificationRequest request, Frf receptance, Frf synthesized, ModalEstimate modal,
                         List<QualifiedMode> modes, HarmonicAssignment harmonics, Optional<TensionEstimate> tension,
                         Optional<PatternFit> participation, Map<String, Measurement> measurements,
                         Optional<Verdict> verdict, List<String> cautions) {

    /** Copies the collections. */
    public Assessment {
        modes = List.copyOf(modes);
        cautions = List.copyOf(cautions);
        measurements = Collections.unmodifiableMap(new LinkedHashMap<>(measurements));
    }
}
