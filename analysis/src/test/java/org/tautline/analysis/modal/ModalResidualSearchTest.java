package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Random;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/** The residual search adds a mode the fit left out, and nothing when the residual is noise. */
class ModalResidualSearchTest {
    private static final double NOISE_VARIANCE = 1e-12;

    /** A doublet two half-power bandwidths apart, the second a quarter as strong, plus circular noise. */
    private static Frf doublet(long seed, List<Mode> truth) {
        double[] f = LscfTestData.uniformLines(80, 120, 2000);
        Frf clean = ModalSynthesis.receptance(truth, f);
        double[] re = clean.realParts();
        double[] im = clean.imaginaryParts();
        Random random = new Random(seed);
        double s = Math.sqrt(NOISE_VARIANCE / 2);
        for (int i = 0; i < f.length; i++) {
            re[i] += s * random.nextGaussian();
            im[i] += s * random.nextGaussian();
        }
        double[] variance = new double[f.length];
        Arrays.fill(variance, NOISE_VARIANCE);
        return Frf.of(f, re, im, FrfQuantity.RECEPTANCE).withVariance(variance);
    }

    private static ModalRefinementResult refine(Frf h, List<Mode> start, ModalRefinementOptions options) {
        return ModalRefinement.refine(h, start, ResidualTerms.NONE, options);
    }

    @Test
    void addsTheWeakPartnerOfADoubletAndNothingMore() {
        // zeta 0.002 at 100 Hz: half-power bandwidth 0.4 Hz, partner 0.8 Hz above; peaks ~ 1e-3 and 2.5e-4 m/N.
        List<Mode> truth = List.of(new Mode(100, 0.002, new Complex(1600)), new Mode(100.8, 0.002, new Complex(400)));
        ModalRefinementOptions options = ModalRefinementOptions.defaults().withRealModes(true).withUpperResidual(true)
                .withLowerResidual(true);
        for (long seed = 1; seed <= 3; seed++) {
            Frf h = doublet(seed, truth);
            ModalRefinementResult one = refine(h, truth.subList(0, 1), options);
            ModalResidualSearch.Outcome found = ModalResidualSearch.search(h, 80, 120, one, options);
            assertEquals(1, found.added().size(), "seed " + seed + ": the partner, and only it");
            List<FittedMode> modes = found.refined().modes();
            assertEquals(2, modes.size());
            Mode partner = modes.get(1).mode();
            double z = (partner.frequencyHz() - 100.8) / modes.get(1).frequencyStdHz();
            assertTrue(Math.abs(z) < 5, "seed " + seed + ": partner " + partner + " is " + z + " standard errors off");

            ModalRefinementResult both = refine(h, truth, options);
            assertEquals(List.of(), ModalResidualSearch.search(h, 80, 120, both, options).added(),
                    "seed " + seed + ": the full model leaves only noise");
        }
    }

    @Test
    void addsBothModesOfAPairTheFitLeftOut() {
        // A pair 2.6 half-power bandwidths apart (zeta 0.002 near 105 Hz: 0.42 Hz), equally strong, neither fitted.
        List<Mode> truth = List.of(new Mode(90, 0.003, new Complex(2000)), new Mode(105, 0.002, new Complex(800)),
                new Mode(106.1, 0.002, new Complex(800)));
        ModalRefinementOptions options = ModalRefinementOptions.defaults().withRealModes(true).withUpperResidual(true)
                .withLowerResidual(true);
        for (long seed = 1; seed <= 3; seed++) {
            Frf h = doublet(seed, truth);
            ModalRefinementResult one = refine(h, truth.subList(0, 1), options);
            ModalResidualSearch.Outcome found = ModalResidualSearch.search(h, 80, 120, one, options);
            List<FittedMode> modes = found.refined().modes().stream()
                    .sorted(java.util.Comparator.comparingDouble(m -> m.mode().frequencyHz())).toList();
            assertEquals(3, modes.size(), "seed " + seed + ": the pair, and only it, added to " + modes);
            for (int r = 1; r < 3; r++) {
                double z = (modes.get(r).mode().frequencyHz() - truth.get(r).frequencyHz()) / modes.get(r).frequencyStdHz();
                assertTrue(Math.abs(z) < 5, "seed " + seed + ": mode " + modes.get(r).mode() + " is " + z
                        + " standard errors from " + truth.get(r));
            }
        }
    }
}
