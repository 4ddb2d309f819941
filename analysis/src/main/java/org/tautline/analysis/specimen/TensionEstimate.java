package org.tautline.analysis.specimen;

import java.util.List;

/**
 * Tension and bending stiffness read from a harmonic series, with standard errors.
 *
 * <p>Standard errors combine the fit (weighted by the modes' frequency standard errors) and the
 * stated uncertainty of the linear density; a fitted EI is the specimen's stated EI, with its
 * stated uncertainty, when only one harmonic is available ({@link TensionMethod#SINGLE_HARMONIC}).
 *
 * @param tensionN tension T, N
 * @param tensionStdN standard error of T, N
 * @param bendingStiffnessNm2 bending stiffness EI, N m^2
 * @param bendingStiffnessStdNm2 standard error of EI, N m^2
 * @param inharmonicityB Fletcher's B = pi^2 EI/(T L^2)
 * @param method how the estimate was made
 * @param reducedChiSquare chi-square per degree of freedom of the fit, {@code NaN} with no degree of freedom
 * @param crossChecks simpler estimates for comparison
 * @param warnings what the reader of the result should know (sag, poor fit, corrections applied)
 */
public record TensionEstimate(double tensionN, double tensionStdN, double bendingStiffnessNm2,
                              double bendingStiffnessStdNm2, double inharmonicityB, TensionMethod method,
                              double reducedChiSquare, List<CrossCheck> crossChecks, List<String> warnings) {

    /** Copies the lists so that the record stays immutable. */
    public TensionEstimate {
        crossChecks = List.copyOf(crossChecks);
        warnings = List.copyOf(warnings);
    }
}
