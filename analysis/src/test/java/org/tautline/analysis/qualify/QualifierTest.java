package org.tautline.analysis.qualify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.ModalSynthesis;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.HarmonicShift;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.verdict.Limit;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.Outcome;
import org.tautline.analysis.verdict.Specification;

/**
 * The analysis entry point on an invented pinned stiff wire whose receptance is written from textbook formulas:
 * f_n = n f0 sqrt(1 + B n^2), f0 = sqrt(T/mu)/(2L) (Mersenne's law), B = pi^2 EI/(T L^2) (H. Fletcher, JASA 36:203,
 * 1964, from memory); modal constants 2 sin(n pi x_f/L) sin(n pi x_s/L)/(mu L) (modal superposition with
 * mass-normalised pinned-string modes, a standard result). Noise 0.1 % of |H|, fixed seed.
 */
class QualifierTest {
    private static final double LENGTH_M = 0.8;
    private static final double MU_KG_PER_M = 1.5e-3;
    private static final double TENSION_N = 120.0;
    private static final double EI_NM2 = 4e-4;
    private static final double XF_M = 0.09;
    private static final double XS_M = 0.53;
    private static final double ZETA = 0.003;
    private static final Specimen STATED = new Specimen("QT-7 (invented)", LENGTH_M, MU_KG_PER_M, 0.01 * MU_KG_PER_M,
            EI_NM2, 0.1 * EI_NM2, EndCondition.PINNED, XF_M, XS_M, TENSION_N, 0.0, 0.0, 30000.0, Optional.empty());
    private static final Specification LIMITS = new Specification("invented limits", "A", List.of(
            Limit.between("tension", Figure.TENSION.key(), "N", 110.0, 130.0),
            Limit.between("fundamental frequency", Figure.F1.key(), "Hz", 100.0, 200.0),
            Limit.atMost("shift of f1 between test levels", Figure.LEVEL_SHIFT.key(), "", 1e-3)));
    private static Frf frf;
    private static Assessment plain;

    private static double textbookFrequencyHz(int n) {
        double f0 = Math.sqrt(TENSION_N / MU_KG_PER_M) / (2 * LENGTH_M);
        double b = Math.PI * Math.PI * EI_NM2 / (TENSION_N * LENGTH_M * LENGTH_M);
        return n * f0 * Math.sqrt(1 + b * n * n);
    }

    @BeforeAll
    static void qualifyOnce() {
        List<Mode> modes = new ArrayList<>();
        for (int n = 1; n <= 8; n++) {
            double a = 2 * Math.sin(n * Math.PI * XF_M / LENGTH_M) * Math.sin(n * Math.PI * XS_M / LENGTH_M)
                    / (MU_KG_PER_M * LENGTH_M);
            modes.add(new Mode(textbookFrequencyHz(n), ZETA, new Complex(a)));
        }
        int lines = 1200;
        double[] f = new double[lines];
        for (int i = 0; i < lines; i++) {
            f[i] = 100 + i * (560.0 - 100) / (lines - 1);
        }
        Frf exact = ModalSynthesis.receptance(modes, f);
        double[] re = exact.realParts();
        double[] im = exact.imaginaryParts();
        Random noise = new Random(7);
        for (int i = 0; i < lines; i++) {
            double sigma = 1e-3 * exact.magnitude(i);
            re[i] += sigma * noise.nextGaussian();
            im[i] += sigma * noise.nextGaussian();
        }
        frf = Frf.of(f, re, im, FrfQuantity.RECEPTANCE);
        plain = Qualifier.qualify(QualificationRequest.of(STATED, frf, Optional.of(LIMITS)));
    }

    @Test
    void findsTheTextbookTensionAndFundamentalWithTheirUncertainties() {
        Assessment a = plain;
        double f1 = a.measurements().get(Figure.F1.key()).value();
        assertEquals(textbookFrequencyHz(1), f1, 1e-3 * f1, "f1 against Fletcher's stiff-string formula");
        double tension = a.measurements().get(Figure.TENSION.key()).value();
        double tensionStd = a.measurements().get(Figure.TENSION.key()).standardUncertainty();
        assertTrue(tensionStd > 0, "a tension with its uncertainty");
        assertEquals(TENSION_N, tension, 3 * tensionStd + 1e-3 * TENSION_N, "tension against Mersenne's law");
        assertEquals(List.of(1, 2, 3), a.modes().stream().map(QualifiedMode::harmonic).toList(), "three harmonics in band");
        assertSame(frf, a.request().frf(), "the assessment answers its own request");
    }

    @Test
    void aLevelCheckAbsentForAStatedReasonLeavesItsLimitUndeterminedWithThatReason() {
        LimitResult shift = limit(plain, Figure.LEVEL_SHIFT);
        assertEquals(Outcome.NOT_DETERMINABLE, shift.outcome());
        assertEquals(Outcome.NOT_DETERMINABLE, plain.verdict().orElseThrow().outcome());

        String why = "no second drive level was run on this fixture";
        Assessment checked = Qualifier.withLevelCheck(plain, levelCheck(2e-4), Optional.of(LIMITS));
        assertEquals(Outcome.PASS, checked.verdict().orElseThrow().outcome(), checked.verdict().toString());
        assertEquals(plain.modes(), checked.modes(), "a level check changes no fitted mode");

        Assessment explained = Qualifier.qualify(QualificationRequest.of(STATED, frf, Optional.of(LIMITS))
                .withoutLevelCheck(why));
        assertTrue(limit(explained, Figure.LEVEL_SHIFT).reason().contains(why), limit(explained, Figure.LEVEL_SHIFT).reason());
    }

    @Test
    void aLevelCheckInTheRequestIsJudgedLikeOneAddedAfterwards() {
        Assessment inRequest = Qualifier.qualify(QualificationRequest.of(STATED, frf, Optional.of(LIMITS))
                .withLevelCheck(levelCheck(5e-3)));
        Assessment added = Qualifier.withLevelCheck(plain, levelCheck(5e-3), Optional.of(LIMITS));
        assertEquals(Outcome.FAIL, inRequest.verdict().orElseThrow().outcome(), "a 0.5 % shift exceeds 0.1 % by far");
        assertEquals(added.verdict(), inRequest.verdict());
        assertEquals(added.measurements(), inRequest.measurements());
    }

    @Test
    void aCautionOfTheRecordMakesTheVerdictNotDeterminableWithItFirst() {
        String caution = "the sweep was stopped before its end, so its FRF lacks the steps not run";
        Assessment a = Qualifier.withLevelCheck(Qualifier.qualify(QualificationRequest.of(STATED, frf,
                Optional.of(LIMITS)).withCaution(caution)), levelCheck(2e-4), Optional.of(LIMITS));
        assertEquals(Outcome.NOT_DETERMINABLE, a.verdict().orElseThrow().outcome());
        assertEquals("not determinable: " + caution, a.verdict().get().reasons().get(0));
        assertEquals(List.of(caution), a.cautions());
    }

    @Test
    void aFitThatCannotExplainTheDataMakesTheVerdictNotDeterminableWithItsReason() {
        // Three adjacent lines between the first two harmonics pushed 30 % off: no mode fits them, so the fit says so
        // and its reason leads the verdict; the undisturbed FRF raised no caution (aLevelCheck... above PASS).
        double[] re = frf.realParts();
        double[] im = frf.imaginaryParts();
        int at = 250;
        for (int k = at; k < at + 3; k++) {
            re[k] *= 1.3;
            im[k] *= 1.3;
        }
        Frf disturbed = Frf.of(frf.frequenciesHz(), re, im, FrfQuantity.RECEPTANCE);
        Assessment a = Qualifier.withLevelCheck(Qualifier.qualify(QualificationRequest.of(STATED, disturbed,
                Optional.of(LIMITS))), levelCheck(2e-4), Optional.of(LIMITS));
        String why = a.modal().unexplained().orElseThrow();
        assertTrue(why.startsWith("the fitted modes do not explain the measured response near "), why);
        assertEquals(List.of(why), a.cautions());
        assertEquals(Outcome.NOT_DETERMINABLE, a.verdict().orElseThrow().outcome());
        assertEquals("not determinable: " + why, a.verdict().get().reasons().get(0));
        assertEquals(List.of(), plain.cautions(), "the undisturbed FRF is explained");
    }

    @Test
    void aRequestIsFixedWhenMadeAndRefusesBlankCautions() {
        List<String> cautions = new ArrayList<>(List.of("one"));
        QualificationRequest r = new QualificationRequest(STATED, frf, QualificationRequest.of(STATED, frf,
                Optional.empty()).estimator(), Optional.empty(), Optional.empty(), "", cautions);
        cautions.add("two");
        assertEquals(List.of("one"), r.recordCautions(), "the request keeps its own copy");
        assertThrows(UnsupportedOperationException.class, () -> r.recordCautions().add("three"));
        assertThrows(AnalysisException.class, () -> r.withCaution(" "));
        assertFalse(Qualifier.qualify(r).verdict().isPresent(), "no specification, no verdict");
    }

    @Test
    void aStatedTensionFarFromTheMeasuredOneIsACautionNotAFail() {
        Specimen wrongTension = new Specimen(STATED.id(), LENGTH_M, MU_KG_PER_M, STATED.linearDensityStdKgPerM(),
                EI_NM2, STATED.bendingStiffnessStdNm2(), EndCondition.PINNED, XF_M, XS_M, 12.0, 0.0, 0.0, 30000.0,
                Optional.empty());
        Assessment a = Qualifier.qualify(QualificationRequest.of(wrongTension, frf, Optional.of(LIMITS)));
        assertEquals(Outcome.NOT_DETERMINABLE, a.verdict().orElseThrow().outcome(), a.verdict().toString());
        assertEquals(1, a.cautions().size(), a.cautions().toString());
    }

    private static LinearityResult levelCheck(double relativeShift) {
        double f1 = textbookFrequencyHz(1);
        return new LinearityResult(List.of(new HarmonicShift(1, f1, f1 * (1 + relativeShift), relativeShift, 1e-5,
                Double.NaN, relativeShift > 1e-3)), relativeShift <= 1e-3, List.of());
    }

    private static LimitResult limit(Assessment a, Figure figure) {
        return a.verdict().orElseThrow().results().stream().filter(r -> r.limit().figureKey().equals(figure.key()))
                .findFirst().orElseThrow();
    }
}
