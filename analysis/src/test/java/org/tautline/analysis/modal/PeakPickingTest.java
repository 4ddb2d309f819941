package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.StringPhysics;

class PeakPickingTest {
    // Stiff steel string of checks.md: rho 7850 kg/m^3, d 1 mm, L 1 m, T 500 N, E 200 GPa, pinned ends.
    private static final double MU = StringPhysics.linearDensityKgPerM(7850, 1e-3);
    private static final double F0 = StringPhysics.mersenneFundamentalHz(1, 500, MU);
    private static final double B = StringPhysics.inharmonicity(StringPhysics.bendingStiffnessNm2(200e9, 1e-3), 500, 1);
    private static final double ZETA = 0.004;

    /** Six modes; point force at 0.07 m, response at 0.13 m: A_n = phi_n(x_f) phi_n(x_r) (checks.md, point force). */
    private static List<Mode> sixModes() {
        List<Mode> modes = new ArrayList<>();
        for (int n = 1; n <= 6; n++) {
            double a = StringPhysics.modeShape(n, 0.07, 1, MU) * StringPhysics.modeShape(n, 0.13, 1, MU);
            modes.add(new Mode(StringPhysics.stiffStringFrequencyHz(n, F0, B, EndCondition.PINNED), ZETA,
                    new Complex(a, 0)));
        }
        return modes;
    }

    /** Stepped-sine lines 0.2 % apart: about 4 lines per half-power band at zeta 0.4 %. */
    private static double[] steppedSineLines() {
        List<Double> lines = new ArrayList<>();
        for (double f = 120.3; f < 900; f *= 1.002) {
            lines.add(f);
        }
        return lines.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static Frf withNoise(Frf clean, Random random, double[] noiseStd) {
        int n = clean.size();
        double[] re = new double[n];
        double[] im = new double[n];
        for (int i = 0; i < n; i++) {
            // Circular complex Gaussian: each part has variance s^2/2, so E|noise|^2 = s^2.
            re[i] = clean.value(i).getReal() + noiseStd[i] * random.nextGaussian() / Math.sqrt(2);
            im[i] = clean.value(i).getImaginary() + noiseStd[i] * random.nextGaussian() / Math.sqrt(2);
        }
        return Frf.of(clean.frequenciesHz(), re, im, clean.quantity());
    }

    private static void assertFindsTheSixModes(Frf measured, List<Mode> truth, String what) {
        List<PeakEstimate> found = PeakPicking.estimate(measured);
        assertEquals(6, found.size(), what + ": six modes, no spurious ones; found " + PeakPicking.modes(found));
        for (int k = 0; k < 6; k++) {
            Mode estimate = found.get(k).mode();
            Mode mode = truth.get(k);
            assertTrue(found.get(k).fitted(), what + ": mode " + (k + 1) + " from the local fit");
            assertEquals(mode.frequencyHz(), estimate.frequencyHz(), 1e-3 * mode.frequencyHz(),
                    what + ": f" + (k + 1) + " within 0.1 % of Fletcher 1964 pinned stiff-string value");
            assertEquals(mode.dampingRatio(), estimate.dampingRatio(), 0.05 * mode.dampingRatio(),
                    what + ": zeta" + (k + 1) + " within 5 %");
            assertEquals(0, estimate.modalConstant().subtract(mode.modalConstant()).norm(),
                    0.05 * mode.modalConstant().norm(), what + ": modal constant " + (k + 1) + " within 5 %");
        }
    }

    @Test
    void findsAllSixModesOfAStiffStringAt40DbPerLine() {
        // Response-level control keeps the response, hence the SNR, about constant per line: noise 1 % of |H|.
        List<Mode> truth = sixModes();
        Frf clean = ModalSynthesis.receptance(truth, steppedSineLines());
        double[] s = new double[clean.size()];
        for (int i = 0; i < s.length; i++) {
            s[i] = clean.magnitude(i) * Math.pow(10, -40.0 / 20);
        }
        assertFindsTheSixModes(withNoise(clean, new Random(7L), s), truth, "SNR 40 dB per line");
    }

    @Test
    void findsAllSixModesWithAConstantNoiseFloor40DbBelowTheSmallestPeak() {
        List<Mode> truth = sixModes();
        Frf clean = ModalSynthesis.receptance(truth, steppedSineLines());
        double smallestPeak = Double.POSITIVE_INFINITY;
        for (Mode m : truth) {
            smallestPeak = Math.min(smallestPeak, m.receptanceAt(m.frequencyHz()).norm());
        }
        double[] s = new double[clean.size()];
        java.util.Arrays.fill(s, smallestPeak * Math.pow(10, -40.0 / 20));
        assertFindsTheSixModes(withNoise(clean, new Random(11L), s), truth, "noise floor 40 dB below smallest peak");
    }

    @Test
    void noiseFreeMobilityGivesTheModesAlmostExactly() {
        List<Mode> truth = sixModes();
        Frf clean = ModalSynthesis.synthesize(truth, steppedSineLines(), FrfQuantity.MOBILITY);
        List<PeakEstimate> found = PeakPicking.estimate(clean);
        assertEquals(6, found.size(), "six modes");
        for (int k = 0; k < 6; k++) {
            assertEquals(truth.get(k).frequencyHz(), found.get(k).mode().frequencyHz(), 1e-5 * truth.get(k).frequencyHz(),
                    "noise-free f" + (k + 1) + " (Fletcher 1964 pinned), residual of the other modes only");
        }
        assertTrue(ModalSynthesis.normalisedResidual(clean, PeakPicking.modes(found)) < 0.01,
                "the six estimated modes reproduce the FRF within 1 %");
    }

    @Test
    void forcingAtAThirdOfTheSpanLeavesOutModesThreeAndSix() {
        // checks.md point-force entry [seen]: a node at the forcing point (x_f = L/3) removes n = 3, 6.
        List<Mode> truth = new ArrayList<>();
        for (int n = 1; n <= 6; n++) {
            double a = StringPhysics.modeShape(n, 1.0 / 3, 1, MU) * StringPhysics.modeShape(n, 0.13, 1, MU);
            truth.add(new Mode(StringPhysics.stiffStringFrequencyHz(n, F0, B, EndCondition.PINNED), ZETA,
                    new Complex(a, 0)));
        }
        Frf clean = ModalSynthesis.receptance(truth, steppedSineLines());
        double[] s = new double[clean.size()];
        for (int i = 0; i < s.length; i++) {
            s[i] = clean.magnitude(i) * Math.pow(10, -40.0 / 20);
        }
        List<PeakEstimate> found = PeakPicking.estimate(withNoise(clean, new Random(5L), s));
        int[] present = {1, 2, 4, 5};
        assertEquals(4, found.size(), "modes 1, 2, 4, 5 only; found " + PeakPicking.modes(found));
        for (int k = 0; k < 4; k++) {
            double expected = truth.get(present[k] - 1).frequencyHz();
            assertEquals(expected, found.get(k).mode().frequencyHz(), 1e-3 * expected, "mode " + present[k]);
        }
    }

    @Test
    void reportsNothingOnPureNoise() {
        Random random = new Random(3L);
        for (int trial = 0; trial < 20; trial++) {
            double[] f = steppedSineLines();
            double[] re = new double[f.length];
            double[] im = new double[f.length];
            for (int i = 0; i < f.length; i++) {
                re[i] = 1e-6 * random.nextGaussian();
                im[i] = 1e-6 * random.nextGaussian();
            }
            Frf noise = Frf.of(f, re, im, FrfQuantity.RECEPTANCE);
            assertEquals(List.of(), PeakPicking.estimate(noise), "white noise trial " + trial + " has no resonance");
        }
    }

    @Test
    void aFlatResponseHasNoPeaks() {
        double[] f = steppedSineLines();
        double[] re = new double[f.length];
        java.util.Arrays.fill(re, 2e-4);
        assertEquals(List.of(), PeakPicking.estimate(Frf.of(f, re, new double[f.length], FrfQuantity.RECEPTANCE)),
                "constant receptance");
    }

    @Test
    void refusesTooFewLines() {
        Frf four = Frf.of(new double[] {1, 2, 3, 4}, new double[] {1, 2, 1, 0}, new double[4], FrfQuantity.RECEPTANCE);
        assertEquals("peak picking needs at least 5 frequency lines, got 4 (Frf[RECEPTANCE, 4 lines, 1.0..4.0 Hz])",
                assertThrows(AnalysisException.class, () -> PeakPicking.estimate(four)).getMessage());
    }
}
