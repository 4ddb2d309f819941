package org.tautline.app.qualify;

import org.tautline.analysis.modal.Mode;

/**
 * A fitted mode with its harmonic number.
 *
 * @param harmonic harmonic number n, or 0 when it is not obvious
 * @param mode the fitted natural frequency, damping ratio and modal constant (receptance, 1/kg)
 */
public record IdentifiedMode(int harmonic, Mode mode) {
}
