package org.tautline.analysis.specimen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class TensionEstimatorTest {
    // checks.md check case: steel, rho 7850 kg/m^3, d 1 mm, L 1 m, T 500 N, E 200 GPa (music wire preset).
    private static final Specimen PINNED = Specimen.roundWire("c1", Material.MUSIC_WIRE, 1e-3, 1, EndCondition.PINNED,
            0.29, 0.13, 500);
    private static final Specimen CLAMPED = Specimen.roundWire("c2", Material.MUSIC_WIRE, 1e-3, 1,
            EndCondition.CLAMPED, 0.29, 0.13, 500);
    private static final double EI = StringPhysics.bendingStiffnessNm2(200e9, 1e-3);
    private final TensionEstimator estimator = new TensionEstimator();

    private static List<NumberedFrequency> printed(double... hz) {
        List<NumberedFrequency> out = new ArrayList<>();
        for (int n = 1; n <= hz.length; n++) {
            out.add(new NumberedFrequency(n, hz[n - 1], 0.0005 / Math.sqrt(3)));
        }
        return out;
    }

    @Test
    void fletcherPinnedCheckValuesGiveTheirTensionAndStiffness() {
        // checks.md [computed] from Fletcher 1964: pinned f1..f3 = 142.402/284.888/427.538 Hz at T 500 N, E 200 GPa.
        TensionEstimate e = estimator.estimate(PINNED, printed(142.402, 284.888, 427.538));
        assertEquals(TensionMethod.PINNED_LINE_FIT, e.method());
        assertEquals(500, e.tensionN(), 0.01, "T from Fletcher's pinned check values (checks.md)");
        assertEquals(EI, e.bendingStiffnessNm2(), 0.02 * EI, "EI = E pi d^4/64 from the same values (checks.md)");
        assertEquals(1.9379e-4, e.inharmonicityB(), 0.02 * 1.9379e-4, "B = 1.9379e-4 (checks.md, Fletcher 1964)");
    }

    @Test
    void exactClampedCheckValuesGiveTheirTension() {
        // checks.md [computed]: exact clamped 143.676/287.435/431.362 Hz at T 500 N, E 200 GPa.
        TensionEstimate e = estimator.estimate(CLAMPED, printed(143.676, 287.435, 431.362));
        assertEquals(TensionMethod.CLAMPED_EXACT_FIT, e.method());
        assertEquals(500, e.tensionN(), 0.05, "T from the exact clamped check values (checks.md)");
        assertEquals(EI, e.bendingStiffnessNm2(), 0.05 * EI, "EI from the exact clamped check values (checks.md)");
        CrossCheck fletcher = e.crossChecks().get(1);
        assertTrue(fletcher.method().startsWith("Fletcher 1964"), fletcher.method());
        assertEquals(500, fletcher.tensionN(), 0.5, "Fletcher's approximate clamped formula as a cross-check");
        CrossCheck zui = e.crossChecks().get(2);
        assertTrue(zui.method().endsWith("(Zui, Shinke & Namita 1996)"), zui.method());
        assertEquals(500, zui.tensionN(), 0.03 * 500, "Zui et al. 1996 (from memory) within 3 %");
        assertEquals(4 * 6.1654e-3 * 143.676 * 143.676, e.crossChecks().get(0).tensionN(), 0.01,
                "Mersenne's law from f1 (checks.md)");
    }

    @Test
    void stiffPinnedSeriesWithNoiseBeatsMersenneFromTheFundamental() {
        // Fletcher 1964 pinned stiff string at T 100 N: B = 9.7e-4; 15 harmonics, frequency std 1e-5 relative.
        Specimen s = PINNED;
        double tension = 100;
        double f0 = StringPhysics.mersenneFundamentalHz(1, tension, s.linearDensityKgPerM());
        double b = StringPhysics.inharmonicity(EI, tension, 1);
        Random random = new Random(11);
        List<NumberedFrequency> series = new ArrayList<>();
        for (int n = 1; n <= 15; n++) {
            double f = StringPhysics.stiffStringFrequencyHz(n, f0, b, EndCondition.PINNED);
            series.add(new NumberedFrequency(n, f * (1 + 1e-5 * random.nextGaussian()), 1e-5 * f));
        }
        TensionEstimate e = estimator.estimate(s, series);
        double fitMiss = Math.abs(e.tensionN() / tension - 1);
        double mersenneMiss = Math.abs(e.crossChecks().get(0).tensionN() / tension - 1);
        assertTrue(fitMiss < 0.005, "whole-series fit within 0.5 % (Fletcher 1964), missed by " + fitMiss);
        assertTrue(mersenneMiss > 5 * fitMiss, "Mersenne from f1 misses by " + mersenneMiss + ", fit by " + fitMiss);
        assertTrue(Math.abs(e.bendingStiffnessNm2() - EI) < 4 * e.bendingStiffnessStdNm2(),
                "EI " + e.bendingStiffnessNm2() + " +- " + e.bendingStiffnessStdNm2() + " vs " + EI);
        double muRel = s.linearDensityStdKgPerM() / s.linearDensityKgPerM();
        assertTrue(e.tensionStdN() >= muRel * e.tensionN(), "tension std includes the density's " + muRel);
    }

    @Test
    void stiffClampedSeriesWithNoiseWithinHalfAPerCent() {
        // Exact clamped roots at T 100 N (xi = L sqrt(T/EI) = 101); Mersenne from f1 is then ~4 % high.
        double tension = 100;
        double mu = CLAMPED.linearDensityKgPerM();
        Random random = new Random(12);
        List<NumberedFrequency> series = new ArrayList<>();
        for (int n = 1; n <= 12; n++) {
            double f = ClampedStiffString.frequencyHz(n, 1, tension, EI, mu);
            series.add(new NumberedFrequency(n, f * (1 + 2e-5 * random.nextGaussian()), 2e-5 * f));
        }
        TensionEstimate e = estimator.estimate(CLAMPED, series);
        assertEquals(tension, e.tensionN(), 0.005 * tension, "exact clamped fit within 0.5 %");
        assertTrue(Math.abs(e.crossChecks().get(0).tensionN() / tension - 1) > 0.02, "Mersenne from f1 misses by > 2 %");
        assertTrue(Math.abs(e.tensionN() - tension) < 4 * e.tensionStdN(), "error within 4 sigma: " + e);
    }

    @Test
    void movingBeltFrequenciesAreCorrectedByMotesFactor() {
        // Mote 1965 (from memory): f_n = n/(2L) c (1 - v^2/c^2); here v = 0.2 c on the pinned stiff wire.
        double mu = PINNED.linearDensityKgPerM();
        double c = Math.sqrt(500 / mu);
        double factor = 1 - 0.04;
        List<NumberedFrequency> series = new ArrayList<>();
        for (int n = 1; n <= 6; n++) {
            double f = StringPhysics.stiffStringFrequencyHz(n, c / 2, StringPhysics.inharmonicity(EI, 500, 1),
                    EndCondition.PINNED);
            series.add(new NumberedFrequency(n, f * factor, 1e-4));
        }
        TensionEstimate moving = estimator.estimate(PINNED.withBeltSpeedMPerS(0.2 * c), series);
        assertEquals(500, moving.tensionN(), 0.01, "tension of the moving belt (Mote's factor)");
        assertTrue(moving.warnings().get(0).startsWith("frequencies corrected for the belt speed"), moving.warnings().toString());
        TensionEstimate ignored = estimator.estimate(PINNED, series);
        assertEquals(500 * factor * factor, ignored.tensionN(), 0.01, "ignoring the speed reads T (1 - v^2/c^2)^2");
    }

    @Test
    void warnsOfSagOnALongSlackSpanOnly() {
        // Irvine 1981 (from memory): lambda^2 of a 1 m wire at 500 N is ~1e-6; a 60 m span at 30 N is far above 0.1.
        Specimen taut = PINNED;
        TensionEstimate t = estimator.estimate(taut, printed(142.402, 284.888, 427.538));
        assertTrue(t.warnings().stream().noneMatch(w -> w.startsWith("sag")), t.warnings().toString());
        Specimen span = Specimen.roundWire("span", Material.MUSIC_WIRE, 1e-3, 60, EndCondition.PINNED, 20, 7, 30);
        double f0 = span.nominalFundamentalHz();
        List<NumberedFrequency> series = List.of(new NumberedFrequency(1, f0, 1e-4), new NumberedFrequency(2, 2 * f0, 1e-4));
        TensionEstimate s = estimator.estimate(span, series);
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("the cable's sag parameter (Irvine 1981) is ")), s.warnings().toString());
    }

    @Test
    void poorFitOfClampedFrequenciesToPinnedModelIsReported() {
        List<NumberedFrequency> series = new ArrayList<>();
        for (int n = 1; n <= 10; n++) {
            series.add(new NumberedFrequency(n, ClampedStiffString.frequencyHz(n, 1, 100, EI,
                    PINNED.linearDensityKgPerM()), 1e-3));
        }
        TensionEstimate e = estimator.estimate(PINNED, series);
        assertTrue(e.reducedChiSquare() > TensionEstimator.POOR_FIT_CHI_SQUARE, "reduced chi-square " + e.reducedChiSquare());
        assertTrue(e.warnings().get(0).startsWith("the harmonic series fits the stiff-string model with pinned ends poorly"),
                e.warnings().toString());
    }

    @Test
    void linearDensityFromAKnownTension() {
        // Inverse of Fletcher's pinned formula: checks.md values at T = 500 N give mu = 6.1654e-3 kg/m.
        LinearDensityEstimate mu = estimator.linearDensity(PINNED, printed(142.402, 284.888, 427.538), 500, 0.5);
        assertEquals(6.1654e-3, mu.linearDensityKgPerM(), 0.00005e-3, "mu (checks.md Mersenne check case)");
        assertEquals(6.1654e-3 * 1e-3, mu.linearDensityStdKgPerM(), 6.1654e-3 * 2e-4, "std dominated by the 0.1 % tension");
        LinearDensityEstimate single = estimator.linearDensity(CLAMPED, List.of(new NumberedFrequency(2, 287.435, 1e-3)),
                500, 0);
        assertEquals(6.1654e-3, single.linearDensityKgPerM(), 0.0001e-3, "mu from the exact clamped f2 (checks.md)");
    }

    @Test
    void singleHarmonicUsesTheStatedStiffness() {
        TensionEstimate e = estimator.estimate(PINNED, List.of(new NumberedFrequency(2, 284.888, 0.0005)));
        assertEquals(TensionMethod.SINGLE_HARMONIC, e.method());
        assertEquals(500, e.tensionN(), 0.005, "T from Fletcher's pinned f2 with the stated EI (checks.md)");
        TensionEstimate c = estimator.estimate(CLAMPED, List.of(new NumberedFrequency(3, 431.362, 0.0005)));
        assertEquals(500, c.tensionN(), 0.005, "T from the exact clamped f3 with the stated EI (checks.md)");
    }

    @Test
    void rejectsAnEmptySeries() {
        assertEquals("at least one numbered frequency is needed to estimate tension, got none",
                assertThrows(AnalysisException.class, () -> estimator.estimate(PINNED, List.of())).getMessage());
    }
}
