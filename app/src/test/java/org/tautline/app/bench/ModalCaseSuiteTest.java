package org.tautline.app.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.ModalSynthesis;
import org.tautline.analysis.modal.Mode;

/** The modal suite's cases are built the same every time and hold what their names say (no fit is run). */
class ModalCaseSuiteTest {
    private static final List<ModalCase> SUITE = ModalCaseSuite.all();

    @Test
    void buildsTheSameCasesFromTheSameSeeds() {
        List<ModalCase> again = ModalCaseSuite.all();
        assertTrue(SUITE.size() >= 12, "at least 12 cases, got " + SUITE.size());
        assertEquals(SUITE.size(), again.size());
        Set<String> names = new HashSet<>();
        Set<Long> seeds = new HashSet<>();
        for (int i = 0; i < SUITE.size(); i++) {
            ModalCase a = SUITE.get(i);
            ModalCase b = again.get(i);
            assertEquals(a.name(), b.name());
            assertEquals(a.modes(), b.modes(), a.name());
            assertEquals(a.frf(), b.frf(), "same seed, same noisy FRF: " + a.name());
            assertTrue(names.add(a.name()), "names are unique: " + a.name());
            assertTrue(seeds.add(a.seed()), "each case has its own seed: " + a.name());
            assertFalse(a.name().matches(".*[A-Z]{2,}_[A-Z].*") || a.description().matches(".*[A-Z]{2,}_[A-Z].*"),
                    "no constant names in words: " + a.name());
        }
    }

    @Test
    void doubletCasesCoverEverySplitAndDampingWithTheNamedSplit() {
        Set<String> covered = new HashSet<>();
        for (ModalCase c : SUITE) {
            ModalCase.Claim claim = c.claim();
            if (Double.isNaN(claim.splitBandwidths())) {
                continue;
            }
            List<Mode> modes = c.modes();
            assertEquals(0, modes.size() % 2, c.name());
            for (int i = 0; i < modes.size(); i += 2) {
                Mode lower = modes.get(i);
                Mode upper = modes.get(i + 1);
                // The split is counted in half-power bandwidths 2 zeta f of the lower mode (Ewins 2000, from memory).
                double split = (upper.frequencyHz() - lower.frequencyHz()) / (2 * lower.dampingRatio() * lower.frequencyHz());
                assertEquals(claim.splitBandwidths(), split, 1e-9, c.name() + ", pair at " + lower.frequencyHz() + " Hz");
                assertEquals(claim.dampingRatio(), lower.dampingRatio(), 0, c.name());
                assertEquals(1.0, upper.dampingRatio() / lower.dampingRatio(), 0.1 + 1e-12, c.name());
            }
            assertTrue(c.name().contains(ModalCaseSuite.number(claim.splitBandwidths()) + " half-power bandwidth"), c.name());
            assertTrue(c.name().contains("damping ratio " + ModalCaseSuite.number(claim.dampingRatio())), c.name());
            covered.add(claim.splitBandwidths() + "/" + claim.dampingRatio());
        }
        for (double zeta : new double[] {1e-2, 1e-3, 1e-4}) {
            for (double split : new double[] {0.5, 1, 2, 5}) {
                assertTrue(covered.contains(split + "/" + zeta), "a doublet case at " + split + " bandwidths, zeta " + zeta);
            }
        }
    }

    @Test
    void weakModesStandTheNamedNumberOfNoiseDeviationsHigh() {
        int weak = 0;
        for (ModalCase c : SUITE) {
            double[] ratios = c.claim().weakModePeaksToNoise();
            double[] where = c.claim().weakModesHz();
            for (int k = 0; k < ratios.length; k++) {
                Mode m = modeAt(c.modes(), where[k]);
                // Peak of the mode's own term at w_n: |A| w_n^d/(2 zeta w_n^2) (Ewins 2000, ch. 2, from memory).
                double measured = ModalCase.peakToNoise(m, c.quantity(), c.noiseStd());
                assertEquals(ratios[k], measured, 1e-6 * ratios[k], c.name());
                assertTrue(measured >= 5 - 1e-9 && measured <= 10 + 1e-9, "5 to 10 noise deviations: " + measured);
                assertTrue(c.name().contains(ModalCaseSuite.number(ratios[k])), c.name());
                weak++;
            }
        }
        assertTrue(weak >= 2, "weak modes in the suite: " + weak);
    }

    @Test
    void noiseIsCircularWithTheRecordedVariance() {
        for (ModalCase c : SUITE) {
            Frf clean = ModalSynthesis.synthesize(c.modes(), c.frf().frequenciesHz(), c.quantity());
            double[] variance = c.frf().variance().orElseThrow();
            double re = 0;
            double im = 0;
            for (int i = 0; i < clean.size(); i++) {
                double dr = c.frf().value(i).getReal() - clean.value(i).getReal();
                double di = c.frf().value(i).getImaginary() - clean.value(i).getImaginary();
                re += dr * dr / variance[i];
                im += di * di / variance[i];
                assertEquals(c.noiseStd() * c.noiseStd(), variance[i], 0, c.name());
            }
            int n = clean.size();
            // Circular complex Gaussian: E|e|^2 = s^2, each part s^2/2. The mean of n squares has relative std
            // sqrt(2/n) per part (chi-square), at most 5 % here; 5 of those is the tolerance.
            double tolerance = 5 * Math.sqrt(2.0 / n);
            assertEquals(0.5, re / n, 0.5 * tolerance, c.name() + ": real part carries half the variance");
            assertEquals(0.5, im / n, 0.5 * tolerance, c.name() + ": imaginary part carries half the variance");
        }
    }

    @Test
    void coversEveryQuantityBothGridsAndSaysWhichInWords() {
        Set<FrfQuantity> quantities = EnumSet.noneOf(FrfQuantity.class);
        int uniform = 0;
        int stepped = 0;
        for (ModalCase c : SUITE) {
            quantities.add(c.quantity());
            assertTrue(c.description().contains("; " + c.quantity().label() + ";"), c.description());
            double[] f = c.frf().frequenciesHz();
            double first = f[1] - f[0];
            double largestDeparture = 0;
            for (int i = 1; i < f.length; i++) {
                largestDeparture = Math.max(largestDeparture, Math.abs(f[i] - f[i - 1] - first) / first);
            }
            if (c.grid().uniform()) {
                uniform++;
                assertEquals(ModalCaseSuite.UNIFORM_LINES, f.length, c.name());
                assertTrue(largestDeparture < 1e-6, c.name() + ": equally spaced");
                assertTrue(c.description().contains("uniform, 4000 lines"), c.description());
            } else {
                stepped++;
                assertTrue(largestDeparture > 0.1, c.name() + ": not equally spaced");
                assertTrue(c.description().contains("stepped sine, " + f.length + " "), c.description());
            }
            for (Mode m : c.modesInBand()) {
                // Every mode to be found has at least two lines in its half-power band f_n (1 +- zeta).
                long inside = java.util.Arrays.stream(f)
                        .filter(x -> Math.abs(x - m.frequencyHz()) <= m.dampingRatio() * m.frequencyHz()).count();
                assertTrue(inside >= 2, c.name() + ": " + inside + " lines in the half-power band of " + m);
            }
        }
        assertEquals(EnumSet.allOf(FrfQuantity.class), quantities);
        assertTrue(uniform >= 2 && stepped >= 2, "uniform " + uniform + ", stepped " + stepped);
    }

    @Test
    void manyModeCasesHaveStrongModesOnBothSidesOfTheBand() {
        int cases = 0;
        for (ModalCase c : SUITE) {
            List<Mode> inside = c.modesInBand();
            if (inside.size() < 20) {
                continue;
            }
            cases++;
            List<Mode> below = c.modes().stream().filter(m -> m.frequencyHz() < c.fitLowHz()).toList();
            List<Mode> above = c.modes().stream().filter(m -> m.frequencyHz() > c.fitHighHz()).toList();
            assertFalse(below.isEmpty() || above.isEmpty(), c.name() + ": modes below and above the band");
            double[] lines = java.util.Arrays.stream(c.frf().frequenciesHz())
                    .filter(f -> f >= c.fitLowHz() && f <= c.fitHighHz()).toArray();
            for (List<Mode> side : List.of(below, above)) {
                Frf rest = ModalSynthesis.synthesize(side, lines, c.quantity());
                double most = 0;
                for (int i = 0; i < rest.size(); i++) {
                    most = Math.max(most, rest.magnitude(i));
                }
                assertTrue(most > 3 * c.noiseStd(), c.name() + ": the modes on one side add " + most / c.noiseStd()
                        + " noise deviations at most");
            }
            assertEquals(c.subBand(), c.frf().frequencyHz(0) < c.fitLowHz(), c.name());
        }
        assertTrue(cases >= 2, "cases of 20 or more modes: " + cases);
    }

    private static Mode modeAt(List<Mode> modes, double frequencyHz) {
        return modes.stream().filter(m -> m.frequencyHz() == frequencyHz).findFirst().orElseThrow();
    }

    @Test
    void suiteFiguresOfOneCaseAddUp() {
        ModalSuiteBenchmark.Figures f = ModalSuiteBenchmark.run("DOUBLETS 5 half-power bandwidths apart, damping ratio"
                + " 0.0001", 1, null);
        assertEquals(1, f.cases().size());
        ModalSuiteBenchmark.CaseFigures c = f.cases().get(0);
        ModalCaseScore s = c.score();
        assertEquals(8, s.modes());
        assertEquals(s.modes(), s.truth().size());
        long found = s.truth().stream().filter(ModalCaseScore.TrueMode::found).count();
        assertEquals(s.modes(), found + s.missedDeterminable() + s.missedOther());
        assertEquals(s.fitted(), found + s.spuriousDeterminable() + s.spuriousOther());
        assertEquals(s.frequencyErrorPerBound(), c.frequencyErrorPerBound(), 0);
        String text = ModalSuiteText.of(f);
        assertTrue(text.contains(" 1. doublets 5 half-power bandwidths apart, damping ratio 0.0001"), text);
        assertTrue(text.contains("cases meeting every target: "), text);
        for (FrfQuantity q : FrfQuantity.values()) {
            assertFalse(text.contains(q.name()), "no constant names: " + text);
        }
    }
}
