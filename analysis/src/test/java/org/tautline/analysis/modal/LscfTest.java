package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;

class LscfTest {

    @Test
    void onePoleHasNegativeRealPartAndTheTrueDamping() {
        // Truth: Pole.of(f, zeta) = -zeta w_n + j w_n sqrt(1 - zeta^2) (Ewins 2000, ch. 2, from memory);
        // a stable mode must come back with Re(lambda) < 0 through lambda = -ln(Omega_r)/Ts.
        Mode mode = LscfTestData.oneMode().get(0);
        Frf h = ModalSynthesis.receptance(List.of(mode), LscfTestData.uniformLines(20, 400, 500));
        Lscf lscf = new Lscf(h, 20, 400, null, 12);
        List<Pole> poles = lscf.poles(12);
        Pole p = LscfTestData.nearest(poles, mode);
        Pole truth = Pole.of(mode.frequencyHz(), mode.dampingRatio());
        assertTrue(p.real() < 0, "a stable mode has Re(lambda) < 0, got " + p);
        assertEquals(truth.real(), p.real(), 1e-6 * Math.abs(truth.real()), "Re(lambda) = -zeta w_n (Ewins)");
        assertEquals(truth.imag(), p.imag(), 1e-9 * truth.imag(), "Im(lambda) = w_d (Ewins)");
        assertEquals(1 / (2 * 400.0), lscf.samplingIntervalS(), 0, "Ts = 1/(2 bandHighHz) as documented");
    }

    @Test
    void zDomainMappingRoundTripsAndPutsStablePolesOutsideTheUnitCircle() {
        // Omega = exp(-s Ts) at s = j w (Guillaume et al. 2003, from memory): on the axis |Omega| = 1, a
        // stable pole (Re < 0) maps to |Omega| = exp(zeta w_n Ts) > 1, and -ln(Omega)/Ts inverts it.
        double ts = 1e-3;
        Pole pole = Pole.of(123.4, 0.02);
        Complex root = LscfZDomain.rootOf(pole.lambda(), ts);
        assertEquals(Math.exp(0.02 * 2 * Math.PI * 123.4 * ts), root.norm(), 1e-14, "|Omega_r| = exp(zeta w_n Ts)");
        Complex back = LscfZDomain.lambdaOf(root, ts);
        assertEquals(0, back.subtract(pole.lambda()).norm(), 1e-12 * pole.angularFrequencyRadPerS(), "round trip");
        Complex onAxis = LscfZDomain.basisAt(123.4, ts);
        assertEquals(1, onAxis.norm(), 1e-15, "|exp(-j w Ts)| = 1");
        assertEquals(0, onAxis.subtract(LscfZDomain.rootOf(new Complex(0, 2 * Math.PI * 123.4), ts)).norm(), 1e-15,
                "basis = root of a pole on the j w axis");
    }

    @Test
    void oneModeIsExactOnUniformAndLogLines() {
        // Truth: the modes synthesised by ModalSynthesis (Ewins 2000 modal sum, from memory).
        List<Mode> modes = LscfTestData.oneMode();
        checkEveryOrder(modes, LscfTestData.uniformLines(20, 400, 500), 20, 400, 10, 1e-6, 1e-6);
        checkEveryOrder(modes, LscfTestData.logLines(20, 400, 500), 20, 400, 10, 1e-6, 1e-6);
    }

    @Test
    void threeModesAreExactOnUniformAndLogLines() {
        // Truth: ModalSynthesis of the three modes (Ewins 2000, from memory); measured worst errors over
        // orders 20..64 were 2.5e-8 in frequency and 7.8e-7 in damping.
        List<Mode> modes = LscfTestData.threeModes();
        checkEveryOrder(modes, LscfTestData.uniformLines(20, 600, 1000), 20, 600, 20, 1e-6, 2e-6);
        checkEveryOrder(modes, LscfTestData.logLines(20, 600, 1000), 20, 600, 20, 1e-6, 2e-6);
    }

    @Test
    void eightModesWithAPairOneHalfPowerBandwidthApartAreFound() {
        // Truth: ModalSynthesis (Ewins 2000, from memory). The pair f2 = f1 (1 + 2 zeta) limits the damping
        // accuracy: its two close roots are sensitive to rounding in the normal equations (measured worst
        // 3.5e-5 over orders 44..64; the isolated modes stay near 1e-6).
        List<Mode> modes = LscfTestData.eightModes();
        checkEveryOrder(modes, LscfTestData.uniformLines(20, 1000, 4000), 20, 1000, 44, 1e-6, 1e-4);
        checkEveryOrder(modes, LscfTestData.logLines(20, 1000, 4000), 20, 1000, 44, 1e-6, 1e-4);
    }

    private static void checkEveryOrder(List<Mode> modes, double[] lines, double low, double high, int fromOrder,
                                        double frequencyTolerance, double dampingTolerance) {
        Frf h = ModalSynthesis.receptance(modes, lines);
        Lscf lscf = new Lscf(h, low, high, null, 64);
        for (int order = fromOrder; order <= 64; order += 2) {
            List<Pole> poles = lscf.poles(order);
            for (Mode m : modes) {
                Pole p = LscfTestData.nearest(poles, m);
                assertTrue(LscfTestData.frequencyError(p, m) <= frequencyTolerance, "frequency of the " + m.frequencyHz()
                        + " Hz mode at order " + order + ": " + p.frequencyHz() + " Hz (ModalSynthesis truth)");
                assertTrue(LscfTestData.dampingError(p, m) <= dampingTolerance, "damping of the " + m.frequencyHz()
                        + " Hz mode at order " + order + ": " + p.dampingRatio() + " vs " + m.dampingRatio());
            }
        }
    }

    @Test
    void zeroWeightsActLikeMissingLines() {
        // Definition of the weighted equation error c_k (N - H D) (Guillaume et al. 2003, from memory): a line
        // with c_k = 0 contributes nothing, so zeroing every other line equals dropping those lines. Noisy
        // data (1 % relative, seed 7) make the poles depend on which lines are used.
        List<Mode> modes = LscfTestData.threeModes();
        double[] lines = LscfTestData.uniformLines(20, 600, 1001);
        Frf all = LscfTestData.withRelativeNoise(ModalSynthesis.receptance(modes, lines), 0.01, 7);
        double[] weights = new double[lines.length];
        double[] keptLines = new double[(lines.length + 1) / 2];
        double[] keptRe = new double[keptLines.length];
        double[] keptIm = new double[keptLines.length];
        for (int i = 0; i < lines.length; i += 2) {
            weights[i] = 3.0;
            keptLines[i / 2] = lines[i];
            keptRe[i / 2] = all.value(i).getReal();
            keptIm[i / 2] = all.value(i).getImaginary();
        }
        Frf kept = Frf.of(keptLines, keptRe, keptIm, all.quantity());
        int order = 12;
        List<Pole> weighted = new Lscf(all, 20, 600, weights, order).poles(order);
        List<Pole> dropped = new Lscf(kept, 20, 600, null, order).poles(order);
        List<Pole> unweighted = new Lscf(all, 20, 600, null, order).poles(order);
        double largestChange = 0;
        for (Mode m : modes) {
            Pole a = LscfTestData.nearest(weighted, m);
            Pole b = LscfTestData.nearest(dropped, m);
            assertEquals(0, a.lambda().subtract(b.lambda()).norm(), 1e-9 * b.angularFrequencyRadPerS(),
                    "pole of the " + m.frequencyHz() + " Hz mode, zero weights vs dropped lines");
            Pole c = LscfTestData.nearest(unweighted, m);
            largestChange = Math.max(largestChange, c.lambda().subtract(b.lambda()).norm() / b.angularFrequencyRadPerS());
        }
        assertTrue(largestChange > 1e-7, "using all lines must move the noisy poles, moved " + largestChange);
    }

    @Test
    void aFlatResponseHasNoPoles() {
        // A constant H is N(Omega)/1 with N constant: the numerator alone fits it and no denominator is defined.
        Lscf lscf = new Lscf(LscfTestData.flat(LscfTestData.uniformLines(20, 1000, 400), 2.5e-4), 20, 1000, null, 32);
        for (int order = 2; order <= 32; order += 2) {
            assertEquals(List.of(), lscf.poles(order), "flat response, order " + order);
        }
    }

    @Test
    void reportsTooFewLinesABandWithoutLinesAndAZeroResponse() {
        Frf h = ModalSynthesis.receptance(LscfTestData.oneMode(), LscfTestData.uniformLines(20, 400, 200));
        // Lines 20 + 380 i/199 Hz inside 100 .. 120 Hz: i = 42 .. 52, that is 11 lines; order 20 needs 21.
        assertEquals("the pole search of model order 20 needs at least 21 frequency lines in the band 100.0 .. 120.0 Hz,"
                + " got 11",
                assertThrows(AnalysisException.class, () -> new Lscf(h, 100, 120, null, 20)).getMessage());
        assertEquals("the pole search band 500.0 .. 600.0 Hz holds no line of the FRF, whose lines span 20.0 .. 400.0 Hz",
                assertThrows(AnalysisException.class, () -> new Lscf(h, 500, 600, null, 4)).getMessage());
        assertEquals("the pole search needs a band from 0 Hz or more up to a higher finite frequency, got 300.0 .. 200.0"
                + " Hz",
                assertThrows(AnalysisException.class, () -> new Lscf(h, 300, 200, null, 4)).getMessage());
        Frf zero = LscfTestData.flat(LscfTestData.uniformLines(20, 400, 200), 0);
        assertEquals("the pole search found a zero response (or zero weights) at every one of the 200 lines in the band"
                + " 20.0 .. 400.0 Hz: there is nothing to fit",
                assertThrows(AnalysisException.class, () -> new Lscf(zero, 20, 400, null, 4)).getMessage());
        Lscf lscf = new Lscf(h, 20, 400, null, 8);
        assertEquals("the pole search's model order must lie in 1 .. 8 (the highest order this estimator was built for),"
                + " got 10",
                assertThrows(AnalysisException.class, () -> lscf.poles(10)).getMessage());
    }

    @Test
    void measuresTheTimeOfAFullChartOn4000Lines() {
        // Timing is reported, not asserted: the chart to order 64 on 4000 lines should take well under 1 s.
        Frf h = ModalSynthesis.receptance(LscfTestData.eightModes(), LscfTestData.logLines(20, 1000, 4000));
        long best = Long.MAX_VALUE;
        int selected = 0;
        for (int run = 0; run < 5; run++) {
            long start = System.nanoTime();
            StabilisationChart chart = StabilisationChart.build(new Lscf(h, 20, 1000, null, 64), 2, 64, 2, null);
            selected = ModeSelection.automatic(chart).size();
            best = Math.min(best, System.nanoTime() - start);
        }
        System.out.printf("LSCF chart 2..64 step 2 + mode selection on 4000 lines: best of 5 runs %.1f ms%n", best / 1e6);
        assertEquals(8, selected, "the eight synthesised modes (ModalSynthesis truth)");
    }
}
