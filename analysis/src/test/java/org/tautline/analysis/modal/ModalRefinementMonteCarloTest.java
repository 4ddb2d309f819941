package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.frf.Frf;

/**
 * Seeded Monte Carlo checks of the refinement's standard errors.
 *
 * <p>Reference: the sample scatter of estimates over independent noise records, and the Cramer-Rao bound
 * (Kay 1993; Pintelon and Schoukens 2012, from memory), which an efficient estimator attains at high SNR.
 * 200 trials estimate a standard deviation to about 1/sqrt(400) = 5 %, hence the 20 % tolerance.
 */
class ModalRefinementMonteCarloTest {
    private static final int TRIALS = 200;

    @Test
    void oneComplexModeWithKnownVariance() {
        List<Mode> truth = LsfdTestData.modes(1, true);
        check(truth, LsfdTestData.lines(70, 90, 201), 1e4, true, 11L);
    }

    @Test
    void closePairWithKnownVariance() {
        List<Mode> all = LsfdTestData.modes(8, false);
        check(all.subList(2, 4), LsfdTestData.lines(110, 135, 251), 1e4, true, 12L);
    }

    @Test
    void oneComplexModeWithTheVarianceEstimatedFromTheResidual() {
        check(LsfdTestData.modes(1, true), LsfdTestData.lines(70, 90, 201), 1e4, false, 13L);
    }

    private static void check(List<Mode> truth, double[] f, double snr, boolean attachVariance, long seed) {
        boolean real = truth.get(0).modalConstant().getImaginary() == 0;
        Frf clean = LsfdTestData.receptance(truth, ResidualTerms.NONE, f);
        double peak = 0;
        for (int i = 0; i < clean.size(); i++) {
            peak = Math.max(peak, clean.magnitude(i));
        }
        double s2 = peak * peak / snr;
        ModalRefinementOptions options = ModalRefinementOptions.defaults().withRealModes(real);
        int n = truth.size();
        double[][] fs = new double[n][TRIALS];
        double[][] zs = new double[n][TRIALS];
        double[][] as = new double[n][TRIALS];
        double[][] reported = new double[n][3];
        Random random = new Random(seed);
        long t0 = System.nanoTime();
        for (int t = 0; t < TRIALS; t++) {
            Frf h = LsfdTestData.noisy(clean, s2, random, attachVariance);
            ModalRefinementResult fit = ModalRefinement.refine(h, truth, ResidualTerms.NONE, options);
            for (int r = 0; r < n; r++) {
                FittedMode m = fit.modes().get(r);
                fs[r][t] = m.mode().frequencyHz();
                zs[r][t] = m.mode().dampingRatio();
                as[r][t] = m.mode().modalConstant().getReal();
                reported[r][0] += m.frequencyStdHz() / TRIALS;
                reported[r][1] += m.dampingRatioStd() / TRIALS;
                reported[r][2] += m.modalConstantStd().getReal() / TRIALS;
            }
        }
        System.out.printf("Monte Carlo, %d modes, %d lines, %d trials: %.1f ms a fit%n", n, f.length, TRIALS,
                (System.nanoTime() - t0) / 1e6 / TRIALS);
        double[] variance = new double[f.length];
        Arrays.fill(variance, s2);
        List<FittedMode> bound = CramerRaoBound.of(truth, ResidualTerms.NONE, f, variance, options);
        String label = n + " modes, variance " + (attachVariance ? "known" : "estimated");
        for (int r = 0; r < n; r++) {
            double[] scatter = {std(fs[r]), std(zs[r]), std(as[r])};
            double[] crb = {bound.get(r).frequencyStdHz(), bound.get(r).dampingRatioStd(),
                    bound.get(r).modalConstantStd().getReal()};
            String[] names = {"f", "zeta", "Re A"};
            for (int q = 0; q < 3; q++) {
                System.out.printf("  mode %d %s: reported/scatter %.3f, bound/scatter %.3f%n", r, names[q],
                        reported[r][q] / scatter[q], crb[q] / scatter[q]);
                assertEquals(1.0, reported[r][q] / scatter[q], 0.2,
                        "reported std of " + names[q] + " of mode " + r + " against the Monte Carlo scatter, " + label);
                assertEquals(1.0, crb[q] / scatter[q], 0.2,
                        "Cramer-Rao bound of " + names[q] + " of mode " + r + " against the scatter, " + label);
            }
        }
    }

    private static double std(double[] x) {
        double mean = Arrays.stream(x).average().orElseThrow();
        double sum = 0;
        for (double v : x) {
            sum += (v - mean) * (v - mean);
        }
        return Math.sqrt(sum / (x.length - 1));
    }
}
