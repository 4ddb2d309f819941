package org.tautline.analysis.specimen;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.format.QuantityFormat;
import org.tautline.analysis.format.TextStyle;

/**
 * Estimates tension and bending stiffness from a whole numbered harmonic series.
 *
 * <p>Pinned ends: (f_n/n)^2 = T/(4 mu L^2) + (pi^2 EI/(4 mu L^4)) n^2 (H. Fletcher, J. Acoust. Soc.
 * Am. 36:203, 1964) is fitted as a weighted straight line in n^2. Clamped ends: the exact roots of
 * the clamped beam-string frequency equation ({@link ClampedStiffString}) are fitted by
 * Levenberg-Marquardt, with Fletcher's approximate clamped formula and the first-mode formula of Zui,
 * Shinke and Namita (1996, from memory; {@link ZuiCableFormula}) as cross-checks. Weights are the
 * modes' frequency standard errors; the linear density's uncertainty is added to that of T and EI.
 * A moving belt's frequencies are lowered by Mote's factor 1 - v^2/c^2 (Mote 1965;
 * {@link MovingBelt}), applied in the fit with c^2 = T/mu of the current estimate. Irvine's sag
 * parameter is checked against {@link CableSag#WARNING_LAMBDA_SQUARED} when EA is known. A reduced
 * chi-square above {@value #POOR_FIT_CHI_SQUARE} is reported as a poor fit (our threshold).
 */
public final class TensionEstimator {
    /** Reduced chi-square above which the fit is reported as poor. */
    public static final double POOR_FIT_CHI_SQUARE = 3.0;
    private static final int BELT_PASSES = 50;
    /** How warnings write numbers: GUM 7.2.6 rounding, one ±, Unicode units (outputs put them in their own style). */
    private static final QuantityFormat WORDS = new QuantityFormat(TextStyle.UNICODE);

    private final double inclinationRad;

    /** An estimator for a horizontal span. */
    public TensionEstimator() {
        this(0.0);
    }

    private TensionEstimator(double inclinationRad) {
        this.inclinationRad = inclinationRad;
    }

    /**
     * Sets the inclination of the span's chord to the horizontal, used by the sag check.
     *
     * @param angleRad -pi/2..pi/2, default 0
     * @return a new estimator
     */
    public TensionEstimator withInclinationRad(double angleRad) {
        if (!(Math.abs(angleRad) <= Math.PI / 2)) {
            throw new AnalysisException("inclination must lie in -pi/2..pi/2 rad, got " + angleRad);
        }
        return new TensionEstimator(angleRad);
    }

    /**
     * Estimates T and EI.
     *
     * @param specimen the specimen (length, mu, ends, belt speed, EA for the sag check)
     * @param series numbered frequencies, at least one
     * @return the estimate
     */
    public TensionEstimate estimate(Specimen specimen, List<NumberedFrequency> series) {
        requireSeries(series);
        double mu = specimen.linearDensityKgPerM();
        double muStd = specimen.linearDensityStdKgPerM();
        double length = specimen.lengthM();
        List<String> warnings = new ArrayList<>();
        List<CrossCheck> checks = new ArrayList<>();
        SpecificFit fit = fitSpecific(specimen, series);
        double tau;
        double eta;
        double tension;
        double tensionStd;
        double ei;
        double eiStd;
        double b;
        double bStd;
        TensionMethod method;
        double chi2 = Double.NaN;
        if (fit == null) {
            method = TensionMethod.SINGLE_HARMONIC;
            ei = specimen.bendingStiffnessNm2();
            eiStd = specimen.bendingStiffnessStdNm2();
            eta = ei / mu;
            NumberedFrequency only = series.get(0);
            tau = singleHarmonicTau(specimen, only.harmonic(), only.frequencyHz(), eta);
            double tauStd = Math.abs(singleHarmonicTau(specimen, only.harmonic(),
                    only.frequencyHz() + only.frequencyStdHz(), eta)
                    - singleHarmonicTau(specimen, only.harmonic(), only.frequencyHz() - only.frequencyStdHz(), eta)) / 2;
            tension = mu * tau;
            tensionStd = Math.hypot(tau * muStd, mu * tauStd);
            b = StringPhysics.inharmonicity(ei, tension, length);
            bStd = b * Math.hypot(eiStd / Math.max(ei, Double.MIN_VALUE), tensionStd / tension);
        } else {
            method = specimen.ends() == EndCondition.PINNED ? TensionMethod.PINNED_LINE_FIT : TensionMethod.CLAMPED_EXACT_FIT;
            tau = fit.tau;
            eta = fit.eta;
            chi2 = fit.reducedChiSquare;
            tension = mu * tau;
            tensionStd = Math.sqrt(tau * tau * muStd * muStd + mu * mu * fit.varTau);
            ei = mu * eta;
            eiStd = Math.sqrt(eta * eta * muStd * muStd + mu * mu * fit.varEta);
            b = Math.PI * Math.PI * eta / (tau * length * length);
            double relVar = fit.varTau / (tau * tau) - 2 * fit.covTauEta / (tau * eta)
                    + (eta != 0 ? fit.varEta / (eta * eta) : 0);
            bStd = eta != 0 ? Math.abs(b) * Math.sqrt(Math.max(relVar, 0)) : Math.PI * Math.PI * Math.sqrt(fit.varEta)
                    / (tau * length * length);
            if (chi2 > POOR_FIT_CHI_SQUARE) {
                warnings.add(String.format(Locale.ROOT, "the harmonic series fits the stiff-string model with %s ends"
                        + " poorly (reduced chi-square %.2f): check the end condition and the harmonic numbering",
                        specimen.ends().label(), chi2));
            }
            if (ei < 0) {
                warnings.add("the fitted bending stiffness is negative, " + WORDS.withUncertainty(ei, eiStd, "N m^2")
                        + ": the series shows no measurable stiffness");
            }
        }
        addCrossChecks(specimen, series, tau, eta, checks);
        addWarnings(specimen, tension, warnings);
        return new TensionEstimate(tension, tensionStd, ei, eiStd, b, method, chi2, checks, warnings);
    }

    /**
     * Estimates the linear density from the series at a known tension (the inverse problem).
     *
     * @param specimen the specimen; its stated mu is used only as a starting value
     * @param series numbered frequencies, at least one
     * @param tensionN the known tension, N
     * @param tensionStdN its standard uncertainty, N
     * @return mu with its standard error
     */
    public LinearDensityEstimate linearDensity(Specimen specimen, List<NumberedFrequency> series, double tensionN,
                                               double tensionStdN) {
        requireSeries(series);
        if (!(tensionN > 0) || !(tensionStdN >= 0)) {
            throw new AnalysisException("known tension must be positive with a non-negative uncertainty, got "
                    + tensionN + " ± " + tensionStdN + " N");
        }
        SpecificFit fit = fitSpecific(specimen, series);
        if (fit != null) {
            double mu = tensionN / fit.tau;
            return new LinearDensityEstimate(mu, Math.hypot(tensionStdN / fit.tau,
                    tensionN * Math.sqrt(fit.varTau) / (fit.tau * fit.tau)));
        }
        NumberedFrequency only = series.get(0);
        double mu = specimen.linearDensityKgPerM();
        double tau = 0;
        for (int pass = 0; pass < BELT_PASSES; pass++) {
            tau = singleHarmonicTau(specimen, only.harmonic(), only.frequencyHz(), specimen.bendingStiffnessNm2() / mu);
            mu = tensionN / tau;
        }
        double eta = specimen.bendingStiffnessNm2() / mu;
        double tauStd = Math.abs(singleHarmonicTau(specimen, only.harmonic(), only.frequencyHz() + only.frequencyStdHz(),
                eta) - singleHarmonicTau(specimen, only.harmonic(), only.frequencyHz() - only.frequencyStdHz(), eta)) / 2;
        return new LinearDensityEstimate(mu, Math.hypot(tensionStdN / tau, tensionN * tauStd / (tau * tau)));
    }

    private SpecificFit fitSpecific(Specimen specimen, List<NumberedFrequency> series) {
        long distinct = series.stream().mapToInt(NumberedFrequency::harmonic).distinct().count();
        if (distinct < 2) {
            return null;
        }
        double v2 = specimen.beltSpeedMPerS() * specimen.beltSpeedMPerS();
        double length = specimen.lengthM();
        SpecificFit line = SpecificFit.pinnedLine(series, length, 1.0);
        double factor = 1.0;
        for (int pass = 0; pass < BELT_PASSES && v2 > 0; pass++) {
            double next = beltFactor(v2, line.tau);
            if (Math.abs(next - factor) < 1e-15) {
                break;
            }
            factor = next;
            line = SpecificFit.pinnedLine(series, length, factor);
        }
        if (specimen.ends() == EndCondition.PINNED) {
            return line;
        }
        double etaStart = line.eta > 0 ? line.eta : 1e-5 * line.tau * length * length / (Math.PI * Math.PI);
        return SpecificFit.nonlinear(series, (n, tau, eta) -> ClampedStiffString.frequencyHz(n, length, tau, eta, 1.0),
                line.tau, etaStart, tau -> beltFactor(v2, tau));
    }

    private static double beltFactor(double v2, double tau) {
        if (!(tau > v2)) {
            throw new AnalysisException("belt speed " + Math.sqrt(v2) + " m/s is not below the wave speed "
                    + Math.sqrt(Math.max(tau, 0)) + " m/s the frequencies imply");
        }
        return 1.0 - v2 / tau;
    }

    private double singleHarmonicTau(Specimen specimen, int n, double frequencyHz, double eta) {
        double length = specimen.lengthM();
        double v2 = specimen.beltSpeedMPerS() * specimen.beltSpeedMPerS();
        double factor = 1.0;
        double tau = 0;
        for (int pass = 0; pass < BELT_PASSES; pass++) {
            double f = frequencyHz / factor;
            double perHarmonic = f / n;
            double pinned = 4 * length * length * perHarmonic * perHarmonic - Math.PI * Math.PI * eta * n * n
                    / (length * length);
            if (specimen.ends() == EndCondition.PINNED || eta == 0) {
                tau = pinned;
            } else {
                double high = 4 * length * length * perHarmonic * perHarmonic;
                double low = high * 1e-9;
                double beam = ClampedStiffString.frequencyHz(n, length, low, eta, 1.0);
                if (beam >= f) {
                    throw new AnalysisException(String.format(Locale.ROOT, "harmonic %d at %.6g Hz is below the "
                            + "clamped beam's own frequency %.6g Hz at the stated EI: no tension fits", n, f, beam));
                }
                tau = new BracketingNthOrderBrentSolver(1e-14 * high, 1e-13, 1e-300, 5).solve(500,
                        t -> ClampedStiffString.frequencyHz(n, length, t, eta, 1.0) - f, low, high);
            }
            if (!(tau > 0)) {
                throw new AnalysisException(String.format(Locale.ROOT, "harmonic %d at %.6g Hz is below the "
                        + "stated bending stiffness alone: no positive tension fits", n, frequencyHz));
            }
            if (v2 == 0) {
                break;
            }
            factor = beltFactor(v2, tau);
        }
        return tau;
    }

    private static void addCrossChecks(Specimen specimen, List<NumberedFrequency> series, double tau, double eta,
                                       List<CrossCheck> checks) {
        double mu = specimen.linearDensityKgPerM();
        double length = specimen.lengthM();
        double v = specimen.beltSpeedMPerS();
        NumberedFrequency lowest = series.stream().min(Comparator.comparingInt(NumberedFrequency::harmonic))
                .orElseThrow();
        checks.add(new CrossCheck("Mersenne's law from harmonic " + lowest.harmonic()
                + (v > 0 ? ", moving string (Mote 1965)" : ""),
                MovingBelt.tensionN(lowest.frequencyHz(), lowest.harmonic(), length, mu, v)));
        if (specimen.ends() != EndCondition.CLAMPED) {
            return;
        }
        double v2 = v * v;
        long distinct = series.stream().mapToInt(NumberedFrequency::harmonic).distinct().count();
        if (distinct >= 2 && eta > 0) {
            SpecificFit approx = SpecificFit.nonlinear(series, (n, t, e) -> {
                double b = Math.PI * Math.PI * e / (t * length * length);
                return StringPhysics.stiffStringFrequencyHz(n, Math.sqrt(t) / (2 * length), b, EndCondition.CLAMPED);
            }, tau, eta, t -> beltFactor(v2, t));
            checks.add(new CrossCheck("Fletcher 1964 approximate clamped formula, fitted to the series",
                    mu * approx.tau));
        }
        double ei = specimen.bendingStiffnessNm2() > 0 ? specimen.bendingStiffnessNm2() : mu * eta;
        NumberedFrequency first = series.stream().filter(p -> p.harmonic() == 1).findFirst().orElse(null);
        if (first != null && ei > 0) {
            double f1 = first.frequencyHz() / beltFactor(v2, tau);
            checks.add(new CrossCheck("first-mode formula for cables with bending stiffness (Zui, Shinke & Namita 1996)",
                    ZuiCableFormula.tensionN(f1, length, mu, ei)));
        }
    }

    private void addWarnings(Specimen specimen, double tension, List<String> warnings) {
        double v = specimen.beltSpeedMPerS();
        if (v > 0) {
            warnings.add("frequencies corrected for the belt speed of " + WORDS.value(v, "m/s") + " by Mote's factor"
                    + " 1 - v²/c² = " + WORDS.number(MovingBelt.frequencyFactor(v, tension, specimen.linearDensityKgPerM())));
        }
        if (specimen.axialStiffnessN() > 0) {
            double lambda2 = CableSag.lambdaSquared(specimen.linearDensityKgPerM(), specimen.lengthM(), inclinationRad,
                    tension, specimen.axialStiffnessN());
            if (lambda2 > CableSag.WARNING_LAMBDA_SQUARED) {
                warnings.add("the cable's sag parameter (Irvine 1981) is " + String.format(Locale.ROOT, "%.3g", lambda2)
                        + ", above " + WORDS.number(CableSag.WARNING_LAMBDA_SQUARED) + ": sag stiffens the symmetric"
                        + " in-plane modes, so tension read from odd harmonics is high; prefer the even (antisymmetric) or"
                        + " out-of-plane modes");
            }
        } else {
            warnings.add("axial stiffness EA not stated: the cable's sag was not checked");
        }
    }

    private static void requireSeries(List<NumberedFrequency> series) {
        if (series == null || series.isEmpty()) {
            throw new AnalysisException("at least one numbered frequency is needed to estimate tension, got none");
        }
    }
}
