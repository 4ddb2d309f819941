package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.Random;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/**
 * A fit over part of the lines finds the modes well inside that part as the fit over all of them does.
 *
 * <p>Data: an exact modal sum A/(w_n^2 - w^2 + 2 j zeta w_n w) (Ewins, Modal Testing, 2nd ed. 2000, ch. 2, from
 * memory) of a pinned stiff string, f_n = n f0 sqrt(1 + B n^2) (Fletcher, JASA 36:203, 1964, from memory), each
 * harmonic as two polarisations one half-power bandwidth apart, with circular complex Gaussian noise of the variance
 * the FRF carries (fixed seed); and the simulated rig's recorded sweep of the demo wire (an invented specimen). The
 * reference for each mode is the truth where it is known, with the Cramer-Rao bound of {@link CramerRaoBound} as the
 * scale, and the full-band fit on the recorded sweep.
 */
class SubBandFitTest {
    private static final double F0_HZ = 120;
    private static final double ZETA = 0.004;

    private static List<Mode> string(int harmonics) {
        List<Mode> modes = new ArrayList<>();
        for (int n = 1; n <= harmonics; n++) {
            double f = n * F0_HZ * Math.sqrt(1 + 2e-4 * n * n);
            double a = 600 * Math.sin(n * Math.PI * 0.11) * Math.sin(n * Math.PI * 0.63) / 0.3;
            modes.add(new Mode(f, ZETA, new Complex(a)));
            modes.add(new Mode(f * (1 + 2 * ZETA), ZETA, new Complex(a / 4)));
        }
        return modes;
    }

    @Test
    void aSubBandFindsTheModesWellInsideItAsTheTruthHasThem() {
        List<Mode> all = string(8);
        double[] lines = LscfTestData.uniformLines(0.6 * F0_HZ, 8.6 * F0_HZ, 4000);
        Frf clean = ModalSynthesis.receptance(all, lines);
        double peak = 0;
        for (int i = 0; i < lines.length; i++) {
            peak = Math.max(peak, clean.magnitude(i));
        }
        double variance = Math.pow(peak * 1e-3, 2);
        double[] re = clean.realParts();
        double[] im = clean.imaginaryParts();
        Random random = new Random(21);
        for (int i = 0; i < lines.length; i++) {
            re[i] += Math.sqrt(variance / 2) * random.nextGaussian();
            im[i] += Math.sqrt(variance / 2) * random.nextGaussian();
        }
        double[] v = new double[lines.length];
        Arrays.fill(v, variance);
        Frf h = Frf.of(lines, re, im, FrfQuantity.RECEPTANCE).withVariance(v);
        // Harmonics 3 to 5 inside, strong harmonics 2 and 6 just outside each edge.
        double low = 2.5 * F0_HZ;
        double high = 5.6 * F0_HZ;
        ModalEstimate part = ModalEstimator.defaults().withBand(low, high).estimate(h);
        List<Mode> inside = all.stream().filter(m -> m.frequencyHz() > low && m.frequencyHz() < high).toList();
        assertEquals(Optional.empty(), part.unexplained(), "the sub-band is explained: " + part.warnings());
        assertEquals(inside.size(), part.modes().size(), "every mode inside, no more: " + part.plainModes());
        List<FittedMode> bound = CramerRaoBound.of(all, lines, v, true);
        for (int i = 0; i < inside.size(); i++) {
            Mode truth = inside.get(i);
            FittedMode fit = part.modes().get(i);
            FittedMode b = bound.get(all.indexOf(truth));
            double zf = (fit.mode().frequencyHz() - truth.frequencyHz()) / b.frequencyStdHz();
            double zd = (fit.mode().dampingRatio() - truth.dampingRatio()) / b.dampingRatioStd();
            // The bound is that of the full band with every mode known; the sub-band knows less, so allow 6 bounds.
            assertTrue(Math.abs(zf) < 6 && Math.abs(zd) < 6, "mode at " + truth.frequencyHz() + " Hz: f " + zf
                    + " bounds, zeta " + zd + " bounds (Cramer-Rao)");
            assertTrue(Double.isFinite(fit.frequencyStdHz()) && fit.frequencyStdHz() > 0, "a finite standard error");
        }
    }

    @Test
    void theRecordedDemoWireGivesItsFundamentalDoubletInANarrowBandAsInTheWholeSweep() throws IOException {
        // The seed-2 specimen of the demo wire, swept 200 to 720 Hz: its fundamental's two polarisations near 230.5
        // and 232.1 Hz. A band of 215 to 245 Hz, about 10 half-power bandwidths, once gave no mode at all.
        Frf h = ModalEstimatorRecordedTest.recorded("sim-seed2-200-720Hz.csv");
        ModalEstimate whole = ModalEstimator.defaults().estimate(h);
        ModalEstimate part = ModalEstimator.defaults().withBand(215, 245).estimate(h);
        List<FittedMode> reference = whole.modes().stream().filter(m -> m.mode().frequencyHz() < 245).toList();
        assertEquals(2, reference.size(), "the whole sweep's fundamental doublet: " + whole.plainModes());
        assertEquals(2, part.modes().size(), "both polarisations in the band: " + part.plainModes() + part.warnings());
        assertEquals(Optional.empty(), part.unexplained(), part.warnings().toString());
        for (int i = 0; i < 2; i++) {
            FittedMode a = reference.get(i);
            FittedMode b = part.modes().get(i);
            double combined = Math.hypot(a.frequencyStdHz(), b.frequencyStdHz());
            assertTrue(Math.abs(a.mode().frequencyHz() - b.mode().frequencyHz()) < 4 * combined, "polarisation " + i
                    + ": " + b.mode().frequencyHz() + " Hz in the band, " + a.mode().frequencyHz()
                    + " Hz over the sweep, within 4 combined standard errors (" + combined + " Hz)");
        }
    }
}
