package org.tautline.analysis.specimen;

/**
 * A second, simpler tension estimate reported beside the main one.
 *
 * @param method the formula used and its source, in words
 * @param tensionN the tension it gives, N
 */
public record CrossCheck(String method, double tensionN) {
}
