package org.tautline.app.qualify;

/**
 * Tension read back from the measured modes.
 *
 * @param tensionN estimated tension, N
 * @param tensionStdN standard uncertainty, N
 * @param fromHarmonic harmonic whose frequency was used
 * @param method how it was obtained, in words
 */
public record TensionEstimate(double tensionN, double tensionStdN, int fromHarmonic, String method) {
}
