package org.tautline.analysis.modal;

import java.util.List;
import java.util.Optional;

/**
 * The outcome of a modal fit: the modes with their standard errors and what they rest on.
 *
 * @param modes fitted modes in increasing frequency, with standard errors (empty when the data hold no mode)
 * @param residualTerms fitted upper and lower residual terms (receptance)
 * @param residualTermsStd standard errors of the residual terms' real and imaginary parts
 * @param quality how well the model follows the data; absent when no mode was found
 * @param chart the stabilisation chart the poles were chosen from
 * @param selection the poles chosen from the chart (automatically, or as edited)
 * @param bandLowHz lowest frequency fitted, Hz
 * @param bandHighHz highest frequency fitted, Hz
 * @param warnings plain sentences about anything a technician should know (a refinement that did not converge, ...)
 * @param unexplained why the model does not explain the measured FRF after the fit's own search for missing poles,
 *        one plain sentence (also among the warnings); empty when the residual is what the noise explains. A
 *        qualification treats it as a reason the result cannot be trusted.
 */
public record ModalEstimate(List<FittedMode> modes, ResidualTerms residualTerms, ResidualTerms residualTermsStd,
                            Optional<FitQuality> quality, StabilisationChart chart, ModeSelection selection,
                            double bandLowHz, double bandHighHz, List<String> warnings, Optional<String> unexplained) {

    /** Copies the lists. */
    public ModalEstimate {
        modes = List.copyOf(modes);
        warnings = List.copyOf(warnings);
    }

    /** @return the fitted modes without their standard errors */
    public List<Mode> plainModes() {
        return modes.stream().map(FittedMode::mode).toList();
    }
}
