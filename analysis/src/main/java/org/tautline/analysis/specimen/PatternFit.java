package org.tautline.analysis.specimen;

import java.util.List;

/**
 * How the measured modal constants compare with the stated setup, and the positions they imply.
 *
 * <p>The pattern of (2/(mu L)) sin(n pi x_f/L) sin(n pi x_s/L) is unchanged by x -> L - x at both
 * points and by swapping x_f and x_s, so the positions are only known up to these; of the four
 * equivalent pairs the one nearest the stated setup is reported.
 *
 * @param entries per-harmonic measured and expected constants
 * @param statedScale common scale (calibration and sign) fitted at the stated positions
 * @param statedReducedChiSquare misfit per degree of freedom at the stated positions with that scale
 * @param forcingPositionM x_f implied by the pattern, m
 * @param forcingPositionStdM its standard error, m
 * @param sensorPositionM x_s implied by the pattern, m
 * @param sensorPositionStdM its standard error, m
 * @param fittedScale common scale fitted with the positions
 * @param fittedReducedChiSquare misfit per degree of freedom with the fitted positions
 * @param effectiveLinearDensityKgPerM mu / |fitted scale|: the density implied if the calibration is right, kg/m
 * @param forcingMismatch whether x_f differs from the stated one by more than the tolerance
 * @param sensorMismatch whether x_s differs from the stated one by more than the tolerance
 * @param findings the result in words
 */
public record PatternFit(List<ParticipationEntry> entries, double statedScale, double statedReducedChiSquare,
                         double forcingPositionM, double forcingPositionStdM, double sensorPositionM,
                         double sensorPositionStdM, double fittedScale, double fittedReducedChiSquare,
                         double effectiveLinearDensityKgPerM, boolean forcingMismatch, boolean sensorMismatch,
                         List<String> findings) {

    /** Copies the lists so that the record stays immutable. */
    public PatternFit {
        entries = List.copyOf(entries);
        findings = List.copyOf(findings);
    }
}
