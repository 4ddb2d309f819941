package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
 * The modal fit checks itself: it says when its model does not explain the data, and only then.
 *
 * <p>Data: exact modal sums A/(w_n^2 - w^2 + 2 j zeta w_n w) (Ewins, Modal Testing, 2nd ed. 2000, ch. 2, from memory)
 * of pinned stiff-string doublets, f_n = n f0 sqrt(1 + B n^2) (Fletcher, JASA 36:203, 1964, from memory), plus
 * circular complex Gaussian noise of the variance the FRF carries; fixed seeds. The bound on each parameter is
 * {@link CramerRaoBound}'s, the reference the estimator is held to.
 */
class FitSelfCheckTest {
    private static final double F0_HZ = 150;
    private static final double B = 3e-4;
    private static final double ZETA = 0.003;

    /** Harmonics 1..top, each as two polarisations split by one half-power bandwidth, the second a fifth as strong. */
    private static List<Mode> doublets(int top) {
        List<Mode> modes = new ArrayList<>();
        for (int n = 1; n <= top; n++) {
            double f = n * F0_HZ * Math.sqrt(1 + B * n * n);
            double a = 800 * (n % 2 == 0 ? -1 : 1);
            modes.add(new Mode(f, ZETA, new Complex(a)));
            modes.add(new Mode(f * (1 + 2 * ZETA), ZETA, new Complex(a / 5)));
        }
        return modes;
    }

    /** The receptance of all modes on the lines with noise of the given variance; the FRF carries that variance. */
    private static Frf measured(List<Mode> modes, double[] lines, double noiseVariance, long seed) {
        Frf clean = ModalSynthesis.receptance(modes, lines);
        double[] re = clean.realParts();
        double[] im = clean.imaginaryParts();
        Random random = new Random(seed);
        double s = Math.sqrt(noiseVariance / 2);
        for (int i = 0; i < lines.length; i++) {
            re[i] += s * random.nextGaussian();
            im[i] += s * random.nextGaussian();
        }
        double[] variance = new double[lines.length];
        Arrays.fill(variance, noiseVariance);
        return Frf.of(lines, re, im, FrfQuantity.RECEPTANCE).withVariance(variance);
    }

    private static double peakVariance(List<Mode> modes, double snr) {
        double weakest = Double.POSITIVE_INFINITY;
        for (Mode m : modes) {
            double w = m.angularFrequencyRadPerS();
            weakest = Math.min(weakest, m.modalConstant().norm() / (2 * m.dampingRatio() * w * w));
        }
        return weakest * weakest / snr;
    }

    @Test
    void aWeakModeUnderTheMaterialityLevelIsEitherFittedOrNamedInAWarning() {
        // Two strong modes of the same sign make an antiresonance between them; a mode there whose peak is 1.5 % of
        // the response (a harmonic near a node of the sensor) stands 20 noise deviations high: the bound determines
        // it, but the fit adds modes only from 2 % of the response on. It must not go unmentioned.
        Mode weak = new Mode(300, ZETA, new Complex(0.037));
        List<Mode> all = List.of(new Mode(200, ZETA, new Complex(800)), weak, new Mode(400, ZETA, new Complex(800)));
        double[] lines = LscfTestData.uniformLines(150, 450, 3000);
        double w = weak.angularFrequencyRadPerS();
        double peak = weak.modalConstant().norm() / (2 * ZETA * w * w);
        Frf h = measured(all, lines, (peak / 20) * (peak / 20), 11);
        ModalEstimate estimate = ModalEstimator.defaults().estimate(h);
        boolean fitted = estimate.plainModes().stream().anyMatch(m -> Math.abs(m.frequencyHz() - 300) < 1);
        boolean named = estimate.warnings().stream().filter(s -> s.contains("small misfit"))
                .flatMap(s -> java.util.regex.Pattern.compile("([0-9.]+) Hz").matcher(s).results())
                .anyMatch(r -> Math.abs(Double.parseDouble(r.group(1)) - 300) < 1);
        assertTrue(fitted || named, "the weak mode at 300 Hz is fitted or named: " + estimate.warnings());
        assertEquals(Optional.empty(), estimate.unexplained(), "a misfit of 1.5 % is no reason to give up the fit");
    }

    @Test
    void strongModesAloneLeaveNoSmallMisfitWarning() {
        List<Mode> all = List.of(new Mode(200, ZETA, new Complex(800)), new Mode(400, ZETA, new Complex(800)));
        double[] lines = LscfTestData.uniformLines(150, 450, 3000);
        Frf h = measured(all, lines, peakVariance(all, 1e6), 12);
        ModalEstimate estimate = ModalEstimator.defaults().estimate(h);
        assertTrue(estimate.warnings().stream().noneMatch(s -> s.contains("small misfit")), estimate.warnings().toString());
    }

    @Test
    void aDoubletAtTheTopOfTheBandBesideAStrongModeBeyondItIsSplitWithinItsBounds() {
        // Four doublets in the band, the fifth harmonic's doublet 4 % above its top: the upper residual alone cannot
        // follow it, and the highest doublet is where the old fit merged poles. 40 dB above the noise.
        List<Mode> all = doublets(5);
        double top = all.get(8).frequencyHz() * 0.96;
        double[] lines = LscfTestData.uniformLines(0.7 * F0_HZ, top, 3000);
        double variance = peakVariance(all.subList(0, 8), 1e4);
        Frf h = measured(all, lines, variance, 5);
        ModalEstimate estimate = ModalEstimator.defaults().estimate(h);
        List<Mode> inBand = all.subList(0, 8);
        assertEquals(Optional.empty(), estimate.unexplained(), "a model that explains the data raises no caution");
        assertEquals(inBand.size(), estimate.modes().size(), "every in-band mode, no more: " + estimate.plainModes());
        double[] noise = new double[lines.length];
        Arrays.fill(noise, variance);
        List<FittedMode> bound = CramerRaoBound.of(inBand, lines, noise, true);
        for (int i = 0; i < inBand.size(); i++) {
            Mode truth = inBand.get(i);
            FittedMode fit = estimate.modes().get(i);
            // Determinable: the bound on damping is under 5 % of it (the bench's criterion).
            assertTrue(bound.get(i).dampingRatioStd() < 0.05 * truth.dampingRatio(), "mode " + i + " determinable");
            double zf = (fit.mode().frequencyHz() - truth.frequencyHz()) / bound.get(i).frequencyStdHz();
            double zd = (fit.mode().dampingRatio() - truth.dampingRatio()) / bound.get(i).dampingRatioStd();
            assertTrue(Math.abs(zf) < 5 && Math.abs(zd) < 5, "mode " + i + " at " + truth.frequencyHz()
                    + " Hz within 5 Cramer-Rao bounds: f " + zf + ", zeta " + zd);
        }
    }

    @Test
    void aModelWithoutAStrongModeIsReportedAsNotExplainingTheData() {
        // The truncated model: the true modes but one polarisation; the residual there is that mode itself.
        List<Mode> all = doublets(3);
        double[] lines = LscfTestData.uniformLines(0.7 * F0_HZ, 3.6 * F0_HZ, 2000);
        double variance = peakVariance(all, 1e4);
        Frf h = measured(all, lines, variance, 11);
        double[] noise = NoiseFloor.of(h);
        double low = lines[0];
        double high = lines[lines.length - 1];
        assertEquals(Optional.empty(), FitCheck.unexplained(h, noise, low, high, all, ResidualTerms.NONE, false),
                "the true model explains its data");
        List<Mode> truncated = new ArrayList<>(all);
        Mode missing = truncated.remove(2);
        Optional<String> why = FitCheck.unexplained(h, noise, low, high, truncated, ResidualTerms.NONE, false);
        assertTrue(why.isPresent(), "a model without the mode at " + missing.frequencyHz() + " Hz");
        List<FitCheck.Place> places = FitCheck.places(h, noise, low, high, truncated, ResidualTerms.NONE);
        double halfPowerHz = 2 * ZETA * missing.frequencyHz();
        assertTrue(places.stream().anyMatch(p -> Math.abs(p.worstHz() - missing.frequencyHz()) < halfPowerHz),
                "the worst misfit lies within a half-power bandwidth of the missing mode: " + places);
        assertTrue(why.get().startsWith("the fitted modes do not explain the measured response near "), why.get());
    }

    @Test
    void aDisturbedStretchOfLinesThatNoModeFitsMakesTheFitSaySo() {
        // Three adjacent lines between two harmonics pushed 30 % off: no resonance, a disturbed measurement.
        List<Mode> all = doublets(3);
        double[] lines = LscfTestData.uniformLines(0.7 * F0_HZ, 3.6 * F0_HZ, 2000);
        double variance = peakVariance(all, 1e4);
        Frf clean = measured(all, lines, variance, 13);
        double[] re = clean.realParts();
        double[] im = clean.imaginaryParts();
        int at = 900;
        for (int k = at; k < at + 3; k++) {
            re[k] *= 1.3;
            im[k] *= 1.3;
        }
        Frf disturbed = Frf.of(lines, re, im, FrfQuantity.RECEPTANCE).withVariance(clean.variance().orElseThrow());
        ModalEstimate clear = ModalEstimator.defaults().estimate(clean);
        ModalEstimate estimate = ModalEstimator.defaults().estimate(disturbed);
        assertEquals(Optional.empty(), clear.unexplained(), "the undisturbed FRF is explained");
        assertTrue(estimate.unexplained().isPresent(), "the disturbed lines are not: " + estimate.warnings());
        assertTrue(estimate.warnings().contains(estimate.unexplained().get()), "the reason is among the warnings");
        List<FitCheck.Place> places = FitCheck.places(disturbed, NoiseFloor.of(disturbed), estimate.bandLowHz(),
                estimate.bandHighHz(), estimate.plainModes(), estimate.residualTerms());
        assertTrue(places.stream().anyMatch(p -> p.worstHz() >= lines[at - 3] && p.worstHz() <= lines[at + 5]),
                "the worst window of a place covers the disturbed lines from " + lines[at] + " Hz: " + places);
    }
}
