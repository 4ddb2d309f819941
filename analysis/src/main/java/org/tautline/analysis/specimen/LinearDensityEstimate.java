package org.tautline.analysis.specimen;

/**
 * Linear density read from a harmonic series at a known tension.
 *
 * @param linearDensityKgPerM mu, kg/m
 * @param linearDensityStdKgPerM standard error of mu from the fit and the tension's uncertainty, kg/m
 */
public record LinearDensityEstimate(double linearDensityKgPerM, double linearDensityStdKgPerM) {
}
