package org.tautline.app.bench;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Mode;

/** The modal benchmark's matching and figures are consistent on a few trials (no timing is asserted). */
class ModalBenchmarkTest {

    private static Mode mode(double frequencyHz, double dampingRatio) {
        return new Mode(frequencyHz, dampingRatio, Complex.ONE);
    }

    @Test
    void matchesOneToOneWithinOneHalfPowerBandwidth() {
        // Half-power bandwidths 2 zeta f: 2 Hz at 100 Hz, 2.04 Hz at 102 Hz, 6 Hz at 300 Hz.
        List<Mode> truth = List.of(mode(100, 0.01), mode(102, 0.01), mode(300, 0.01));
        List<Mode> estimates = List.of(mode(101.2, 0.01), mode(101.4, 0.01), mode(307, 0.01), mode(500, 0.01));
        // 101.4 is nearest 102 (0.29 bandwidths) and takes it; 101.2 then goes to 100 (0.6); 307 is 1.17 from 300.
        assertArrayEquals(new int[] {0, 1, -1}, ModalBenchmarkTally.match(truth, estimates));
        assertArrayEquals(new int[] {-1}, ModalBenchmarkTally.match(List.of(mode(100, 0.01)), List.of()));
    }

    @Test
    void countsMissedAndSpuriousModesAndNormalisesErrorsByTheBound() {
        List<Mode> truth = List.of(mode(100, 0.01), mode(200, 0.01));
        List<FittedMode> bounds = List.of(new FittedMode(truth.get(0), 0.01, 1e-4, Complex.ZERO),
                new FittedMode(truth.get(1), 0.02, 1e-4, Complex.ZERO));
        List<FittedMode> estimates = new ArrayList<>();
        estimates.add(new FittedMode(mode(100.03, 0.0104), 0, 0, Complex.ZERO));
        estimates.add(new FittedMode(mode(150, 0.01), 0, 0, Complex.ZERO));
        ModalBenchmarkTally tally = new ModalBenchmarkTally();
        tally.add(truth, bounds, estimates);
        tally.addFailure(truth);
        ModalBenchmark.SpacingFigures f = tally.figures(false);
        assertEquals(2, f.trials());
        assertEquals(1, f.failedFits());
        assertEquals(4, f.trueModes());
        assertEquals(1, f.matched());
        assertEquals(3, f.missed(), "200 Hz missed in the first trial, both in the failed one");
        assertEquals(1, f.spurious(), "150 Hz matches nothing");
        assertEquals(3.0, f.frequencyErrorPerBound(), 1e-9, "0.03 Hz over a bound of 0.01 Hz");
        assertEquals(4.0, f.dampingErrorPerBound(), 1e-9, "4e-4 over a bound of 1e-4");
    }

    @Test
    void drawsEightToTenModesOnFourThousandLinesWithTheirNoise() {
        SplittableRandom random = new SplittableRandom(5L);
        for (int i = 0; i < 6; i++) {
            SyntheticStringCase c = SyntheticStringCase.draw(random, i % 2 == 1);
            assertTrue(c.truth().size() >= 8 && c.truth().size() <= 10, "modes " + c.truth().size());
            assertEquals(SyntheticStringCase.LINES, c.frf().size());
            assertTrue(c.snrDb() >= 30 && c.snrDb() <= 50, "SNR " + c.snrDb());
            assertEquals(c.noiseVariance(), c.frf().variance().orElseThrow()[0], 0);
            List<FittedMode> bounds = ModalBenchmark.bounds(c);
            assertEquals(c.truth().size(), bounds.size());
            for (FittedMode b : bounds) {
                assertTrue(b.frequencyStdHz() > 0 && b.dampingRatioStd() > 0, "bound " + b);
            }
        }
    }

    @Test
    void figuresOfAFewTrialsAddUp() {
        List<long[]> calls = new ArrayList<>();
        ModalBenchmark.Figures f = ModalBenchmark.run(3, 42L, (done, total) -> calls.add(new long[] {done, total}));
        assertEquals(7, calls.size(), "one call per trial and one for the timed fit");
        assertArrayEquals(new long[] {7, 7}, calls.get(6));
        assertEquals(6, f.trials());
        for (ModalBenchmark.SpacingFigures s : List.of(f.uniform(), f.steppedSine())) {
            assertEquals(3, s.trials());
            assertTrue(s.trueModes() >= 24 && s.trueModes() <= 30, "true modes " + s.trueModes());
            assertEquals(s.trueModes(), s.matched() + s.missed());
            assertTrue(s.worstFrequencyErrorPerBound() >= s.frequencyErrorPerBound());
            assertTrue(s.worstDampingErrorPerBound() >= s.dampingErrorPerBound());
        }
        assertTrue(f.uniform().steppedSine() == false && f.steppedSine().steppedSine());
        int matched = f.uniform().matched() + f.steppedSine().matched();
        assertEquals(Math.sqrt((f.uniform().frequencySquares() + f.steppedSine().frequencySquares()) / matched),
                f.frequencyErrorPerBound(), 1e-12);
        // Seeded, so these are fixed: the fit finds every mode but two and nothing else, at about the bound. The two
        // are a known gap (issue 14, left open): the third-harmonic doublet of the second uniform trial (598.8 and
        // 609.4 Hz) has modal constants of 0.5-0.7 1/kg, the sensor near its node, against 300-2800 for the other
        // modes; the bound determines them (damping to 0.6 %), but their peaks are under the 2 % of the response below
        // which the search for missing modes adds nothing and the fit check does not call the data unexplained. The
        // tension fit does not use them.
        assertTrue(f.missed() <= 2, "missed " + f.missed());
        assertEquals(0, f.spurious());
        assertTrue(f.frequencyErrorPerBound() < 1.5 && f.dampingErrorPerBound() < 2,
                "error/CRLB " + f.frequencyErrorPerBound() + ", " + f.dampingErrorPerBound());
        assertTrue(f.medianFitS() > 0 && f.medianFitS() <= f.maxFitS() && f.timedFitS() > 0);
        assertEquals(SyntheticStringCase.LINES, f.timedFitLines());
        String text = ModalBenchmark.text(f);
        assertTrue(text.startsWith("modal benchmark: 6 trials (seed 42)"), text);
        assertTrue(text.contains("overall: " + f.missed() + " missed, 0 spurious"), text);
    }

    @Test
    void refusesZeroTrials() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ModalBenchmark.run(0, 1L, null));
        assertEquals("the modal benchmark needs at least 1 trial per spacing, got 0", e.getMessage());
    }
}
