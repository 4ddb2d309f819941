package org.tautline.analysis.specimen;

/**
 * One harmonic's measured and expected modal constant.
 *
 * @param harmonic harmonic number n
 * @param measuredModalConstant real part of the measured modal constant, summed over the polarisations of a doublet, 1/kg
 * @param measuredStd its standard error, 1/kg
 * @param expectedModalConstant (2/(mu L)) sin(n pi x_f/L) sin(n pi x_s/L) cos(sensor angle) at the stated setup, 1/kg
 */
public record ParticipationEntry(int harmonic, double measuredModalConstant, double measuredStd,
                                 double expectedModalConstant) {
}
