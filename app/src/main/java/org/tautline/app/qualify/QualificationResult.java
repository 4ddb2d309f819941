package org.tautline.app.qualify;

import java.util.List;
import java.util.Optional;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.verdict.Verdict;
import org.tautline.driver.sweep.SweepRecord;

/**
 * Everything one qualification produced, from the sweep to the verdict.
 *
 * @param specimen what was stated about the specimen
 * @param sweep the completed steps
 * @param receptance the measured FRF as receptance, m/N
 * @param synthesized the fitted modal model at the same lines, m/N
 * @param modes fitted modes in frequency order, numbered where obvious
 * @param tension the tension estimate, absent when no fundamental was identified
 * @param verdict the verdict against the specification
 * @param wallTimeS wall-clock time of sweep and analysis, s
 */
public record QualificationResult(SpecimenDescription specimen, SweepRecord sweep, Frf receptance, Frf synthesized,
                                  List<IdentifiedMode> modes, Optional<TensionEstimate> tension, Verdict verdict,
                                  double wallTimeS) {

    /** Copies the mode list. */
    public QualificationResult {
        modes = List.copyOf(modes);
    }
}
