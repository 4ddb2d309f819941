package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;

class ModalRefinementTest {
    private static final double[] LINES = LsfdTestData.lines(20, 300, 1401);

    /** Start 0.3 % off in f (alternating sign), 20 % in zeta, 20 % in A; residual terms 20 % off. */
    private static List<Mode> perturbed(List<Mode> truth) {
        List<Mode> start = new ArrayList<>();
        for (int i = 0; i < truth.size(); i++) {
            Mode m = truth.get(i);
            double sign = i % 2 == 0 ? 1 : -1;
            start.add(new Mode(m.frequencyHz() * (1 + sign * 0.003), m.dampingRatio() * (1 - sign * 0.2),
                    m.modalConstant().multiply(1 + sign * 0.2)));
        }
        return start;
    }

    @Test
    void convergesToTheExactModelOfOneThreeAndEightModesFromAPerturbedStart() {
        // Reference: noise-free receptance from the modal sum (Ewins 2000, ch. 2, from memory) plus UR - LR/w^2;
        // the least-squares minimum is the generating model, cost zero.
        ResidualTerms startResiduals = new ResidualTerms(LsfdTestData.RESIDUALS.upper().multiply(0.8),
                LsfdTestData.RESIDUALS.lower().multiply(1.2));
        for (boolean complex : new boolean[] {false, true}) {
            for (int count : new int[] {1, 3, 8}) {
                List<Mode> truth = LsfdTestData.modes(count, complex);
                Frf h = LsfdTestData.receptance(truth, LsfdTestData.RESIDUALS, LINES);
                ModalRefinementOptions options = ModalRefinementOptions.defaults().withRealModes(!complex)
                        .withUpperResidual(true).withLowerResidual(true);
                long t0 = System.nanoTime();
                ModalRefinementResult fit = ModalRefinement.refine(h, perturbed(truth), startResiduals, options);
                String label = count + (complex ? " complex" : " real") + " modes";
                System.out.printf("refinement %s, %d lines: %d iterations, %.1f ms%n", label, LINES.length,
                        fit.iterations(), (System.nanoTime() - t0) / 1e6);
                for (int i = 0; i < count; i++) {
                    Mode got = fit.modes().get(i).mode();
                    Mode want = truth.get(i);
                    assertEquals(want.frequencyHz(), got.frequencyHz(), 1e-6 * want.frequencyHz(), "f of mode " + i + ", " + label);
                    assertEquals(want.dampingRatio(), got.dampingRatio(), 1e-6 * want.dampingRatio(),
                            "zeta of mode " + i + ", " + label);
                }
                assertTrue(LsfdTestData.relativeModalConstantError(
                        fit.modes().stream().map(FittedMode::mode).toList(), truth) < 1e-6, "modal constants, " + label);
                assertTrue(LsfdTestData.relative(fit.residualTerms().upper(), LsfdTestData.RESIDUALS.upper()) < 1e-6,
                        "UR, " + label);
                assertTrue(LsfdTestData.relative(fit.residualTerms().lower(), LsfdTestData.RESIDUALS.lower()) < 1e-6,
                        "LR, " + label);
                assertFalse(fit.varianceKnown(), "no variance attached");
                assertTrue(fit.iterations() >= 1, "at least one iteration from a perturbed start");
            }
        }
    }

    @Test
    void manyLinesOfEightModes() {
        // design.md: an FRF may hold up to 100,000 lines; LSFD runs on all of them, the refinement here on 10,000
        // (its cost grows linearly with lines). Same analytic reference as above; timings printed only.
        List<Mode> truth = LsfdTestData.modes(8, true);
        LsfdOptions lsfdOptions = LsfdOptions.defaults().withUpperResidual(true).withLowerResidual(true);
        for (int count : new int[] {100_000, 10_000}) {
            Frf h = LsfdTestData.receptance(truth, LsfdTestData.RESIDUALS, LsfdTestData.lines(20, 300, count));
            long t0 = System.nanoTime();
            LsfdResult start = Lsfd.fit(h, LsfdTestData.poles(truth), lsfdOptions);
            long t1 = System.nanoTime();
            System.out.printf("%d lines, 8 complex modes + UR + LR: LSFD %.0f ms%n", count, (t1 - t0) / 1e6);
            assertTrue(LsfdTestData.relativeModalConstantError(start.modes(), truth) < 1e-6,
                    "LSFD modal constants on " + count + " lines");
            if (count > 10_000) {
                continue;
            }
            ModalRefinementResult fit = ModalRefinement.refine(h, perturbed(truth), start.residualTerms(),
                    ModalRefinementOptions.of(lsfdOptions));
            System.out.printf("%d lines, 8 complex modes + UR + LR: refinement %.0f ms (%d iterations)%n", count,
                    (System.nanoTime() - t1) / 1e6, fit.iterations());
            assertTrue(LsfdTestData.relativeModalConstantError(fit.modes().stream().map(FittedMode::mode).toList(),
                    truth) < 1e-6, "refined modal constants on " + count + " lines");
            for (int i = 0; i < 8; i++) {
                assertEquals(truth.get(i).frequencyHz(), fit.modes().get(i).mode().frequencyHz(),
                        1e-6 * truth.get(i).frequencyHz(), "f of mode " + i + " on " + count + " lines");
            }
        }
    }

    @Test
    void lsfdThenRefinementIsAConsistentChain() {
        // LSFD with perturbed poles gives the start constants; the refinement then finds the generating model.
        List<Mode> truth = LsfdTestData.modes(3, true);
        Frf h = LsfdTestData.receptance(truth, ResidualTerms.NONE, LINES);
        List<Pole> poles = LsfdTestData.poles(perturbed(truth));
        LsfdResult start = Lsfd.fit(h, poles, LsfdOptions.defaults());
        ModalRefinementResult fit = ModalRefinement.refine(h, start.modes(), start.residualTerms(),
                ModalRefinementOptions.of(LsfdOptions.defaults()));
        for (int i = 0; i < 3; i++) {
            assertEquals(truth.get(i).frequencyHz(), fit.modes().get(i).mode().frequencyHz(), 1e-6 * truth.get(i).frequencyHz(),
                    "frequency after LSFD and refinement");
        }
        assertTrue(fit.cost() < 1e-20 * LINES.length, "cost of an exact fit is round-off, got " + fit.cost());
    }

    @Test
    void reportsNonConvergenceAndBadStarts() {
        List<Mode> truth = LsfdTestData.modes(8, true);
        Frf h = LsfdTestData.receptance(truth, ResidualTerms.NONE, LINES);
        ModalRefinementOptions one = ModalRefinementOptions.defaults().withMaxIterations(1);
        AnalysisException e = assertThrows(AnalysisException.class,
                () -> ModalRefinement.refine(h, perturbed(truth), ResidualTerms.NONE, one));
        assertEquals("modal refinement did not converge within 1 iterations (8 modes, 1401 lines); start closer (LSFD "
                + "with poles from the stabilisation chart) or raise maxIterations", e.getMessage());
        List<Mode> undamped = List.of(new Mode(80, 0, Complex.ONE));
        assertEquals("modal refinement start mode 0 (80.0 Hz) has damping ratio 0.0; damping is refined on a log scale "
                        + "and needs a positive start",
                assertThrows(AnalysisException.class, () -> ModalRefinement.refine(h, undamped, ResidualTerms.NONE,
                        ModalRefinementOptions.defaults())).getMessage());
        List<Mode> imaginary = List.of(new Mode(80, 0.01, Complex.I));
        assertEquals("modal refinement start mode 0 (80.0 Hz) has modal constant (0.0, 1.0) with a zero real part; "
                        + "start from a non-zero value, for example from LSFD",
                assertThrows(AnalysisException.class, () -> ModalRefinement.refine(h, imaginary, ResidualTerms.NONE,
                        ModalRefinementOptions.defaults().withRealModes(true))).getMessage());
        assertEquals("modal refinement has 4 real unknowns and 2 lines (4 real values): without the FRF's variance it "
                        + "needs at least one real value more to estimate the noise; widen the band or attach the variance",
                assertThrows(AnalysisException.class, () -> ModalRefinement.refine(h, truth.subList(0, 1),
                        ResidualTerms.NONE, ModalRefinementOptions.defaults().withBandHz(80, 80.2))).getMessage());
        assertEquals("modal refinement maxIterations must be at least 1, got 0",
                assertThrows(AnalysisException.class, () -> ModalRefinementOptions.defaults().withMaxIterations(0))
                        .getMessage());
    }

    @Test
    void reportsADegenerateModelOfTwoCoincidentModes() {
        // Two identical modes make the Jacobian's columns equal: the split between them is not identifiable.
        List<Mode> truth = LsfdTestData.modes(1, false);
        Frf h = LsfdTestData.receptance(truth, ResidualTerms.NONE, LINES);
        Mode half = new Mode(80, 0.01, new Complex(truth.get(0).modalConstant().getReal() / 2));
        AnalysisException e = assertThrows(AnalysisException.class, () -> ModalRefinement.refine(h, List.of(half, half),
                ResidualTerms.NONE, ModalRefinementOptions.defaults().withRealModes(true)));
        assertTrue(e.getMessage().startsWith("modal refinement is degenerate at the solution: the scaled Jacobian has "
                + "condition number "), e.getMessage());
        assertTrue(e.getMessage().endsWith(" (limit 1.0E12) for 6 unknowns; two modes have merged or a parameter has no "
                + "effect on the 1401 lines"), e.getMessage());
    }
}
