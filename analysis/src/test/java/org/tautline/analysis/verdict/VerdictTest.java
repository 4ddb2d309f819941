package org.tautline.analysis.verdict;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class VerdictTest {
    // Decision rule: guard band U = 2 u (JCGM 100:2008, k = 2), conformity zones of ISO 14253-1:2017 (from memory).
    private static final Limit TENSION = Limit.between("tension", "tensionN", "N", 140, 160);
    private static final Limit FREQUENCY = Limit.atLeast("first mode", "f1Hz", "Hz", 140);

    @Test
    void passesWhenTheUncertaintyIntervalLiesInside() {
        Verdict verdict = Verdict.evaluate(new Specification("wire W-1", List.of(TENSION)),
                Map.of("tensionN", new Measurement(151.2, 0.4, "N")));
        assertEquals(Outcome.PASS, verdict.outcome());
        assertEquals(List.of("tensionN = 151.2 ± 0.8 N (k = 2) meets 140 .. 160 N (margin 8.8 N)"), verdict.reasons());
        LimitResult result = verdict.results().get(0);
        assertEquals(8.8, result.margin(), 1e-12, "margin = 160 - 151.2, distance to the nearest bound");
        assertEquals(0.8, result.expandedUncertainty(), 1e-15, "U = k u with k = 2 (JCGM 100:2008)");
    }

    @Test
    void aMeasurementThatCannotBeTrustedGivesNoVerdictWhateverTheFiguresSay() {
        Verdict pass = Verdict.evaluate(new Specification("wire W-1", List.of(TENSION)),
                Map.of("tensionN", new Measurement(151.2, 0.4, "N")));
        Verdict undetermined = pass.undetermined("not determinable: the sweep stopped before its end");
        assertEquals(Outcome.NOT_DETERMINABLE, undetermined.outcome());
        assertEquals(List.of("not determinable: the sweep stopped before its end",
                "tensionN = 151.2 ± 0.8 N (k = 2) meets 140 .. 160 N (margin 8.8 N)"), undetermined.reasons());
        assertEquals(pass.results(), undetermined.results(), "the limit results are kept for the record");
        Verdict fail = Verdict.evaluate(new Specification("wire W-1", List.of(TENSION)),
                Map.of("tensionN", new Measurement(135, 1, "N")));
        assertEquals(Outcome.NOT_DETERMINABLE, fail.undetermined("the fit missed modes").outcome(),
                "a FAIL from an untrustworthy measurement is not confident either");
        assertThrows(AnalysisException.class, () -> pass.undetermined(" "));
    }

    @Test
    void failsWhenTheUncertaintyIntervalLiesWhollyOutside() {
        Verdict verdict = Verdict.evaluate(new Specification("wire W-1", List.of(TENSION)),
                Map.of("tensionN", new Measurement(135, 1, "N")));
        assertEquals(Outcome.FAIL, verdict.outcome());
        assertEquals("tensionN = 135 ± 2 N (k = 2) does not meet 140 .. 160 N (margin -5 N)", verdict.reasons().get(0));
    }

    @Test
    void cannotDecideWhenTheIntervalStraddlesABound() {
        Verdict verdict = Verdict.evaluate(new Specification("wire W-1", List.of(TENSION)),
                Map.of("tensionN", new Measurement(159.5, 0.5, "N")));
        assertEquals(Outcome.NOT_DETERMINABLE, verdict.outcome());
        assertEquals("tensionN = 159.5 ± 1 N (k = 2) cannot be judged against 140 .. 160 N (margin 0.5 N): "
                + "the uncertainty is too large to decide", verdict.reasons().get(0));
    }

    @Test
    void justOutsideByLessThanTheUncertaintyIsNotAFail() {
        Verdict verdict = Verdict.evaluate(new Specification("wire W-1", List.of(TENSION)),
                Map.of("tensionN", new Measurement(160.5, 0.5, "N")));
        assertEquals(Outcome.NOT_DETERMINABLE, verdict.outcome(), "160.5 - 1 lies inside: ISO 14253-1 uncertainty range");
    }

    @Test
    void aMissingFigureIsNotDeterminableAndAFailDominates() {
        Specification spec = new Specification("wire W-1", List.of(TENSION, FREQUENCY,
                Limit.atMost("damping", "zeta1", "", 0.01)));
        Verdict undecided = Verdict.evaluate(spec, Map.of("tensionN", new Measurement(150, 0.1, "N"),
                "zeta1", new Measurement(0.002, 0.0001, "")));
        assertEquals(Outcome.NOT_DETERMINABLE, undecided.outcome());
        assertEquals(List.of("tensionN = 150 ± 0.2 N (k = 2) meets 140 .. 160 N (margin 10 N)",
                "no measured value for f1Hz",
                "zeta1 = 0.002 ± 0.0002 (k = 2) meets at most 0.01 (margin 0.008)"), undecided.reasons());

        Verdict failed = Verdict.evaluate(spec, Map.of("tensionN", new Measurement(150, 0.1, "N"),
                "f1Hz", new Measurement(120, 0.01, "Hz")));
        assertEquals(Outcome.FAIL, failed.outcome());
        assertEquals("f1Hz = 120 ± 0.02 Hz (k = 2) does not meet at least 140 Hz (margin -20 Hz)", failed.reasons().get(1));
        assertEquals(Outcome.NOT_DETERMINABLE, failed.results().get(2).outcome());
    }

    @Test
    void allInsideGivesPassOverall() {
        Specification spec = new Specification("wire W-1", List.of(TENSION, FREQUENCY));
        Verdict verdict = Verdict.evaluate(spec, Map.of("tensionN", new Measurement(150, 0.1, "N"),
                "f1Hz", new Measurement(142.4, 0.01, "Hz")));
        assertEquals(Outcome.PASS, verdict.outcome());
    }

    @Test
    void aUnitMismatchIsNotDeterminable() {
        Verdict verdict = Verdict.evaluate(new Specification("wire W-1", List.of(TENSION)),
                Map.of("tensionN", new Measurement(0.15, 0.001, "kN")));
        assertEquals(Outcome.NOT_DETERMINABLE, verdict.outcome());
        assertEquals("tensionN was measured in 'kN' but the limit 'tension' is in 'N'", verdict.reasons().get(0));
    }

    @Test
    void limitValidationSaysWhatIsWrong() {
        assertEquals("limit 'tension' needs a lower or an upper bound, got neither",
                assertThrows(AnalysisException.class,
                        () -> new Limit("tension", "tensionN", "N", Double.NaN, Double.NaN)).getMessage());
        assertEquals("limit 'tension' lower bound 160.0 N must be below its upper bound 140.0 N",
                assertThrows(AnalysisException.class,
                        () -> Limit.between("tension", "tensionN", "N", 160, 140)).getMessage());
        assertEquals("limit 'tension' lower bound 150.0 N must be below its upper bound 150.0 N",
                assertThrows(AnalysisException.class,
                        () -> Limit.between("tension", "tensionN", "N", 150, 150)).getMessage());
        assertEquals("limit 'tension' needs the key of the figure it applies to, for example tensionN",
                assertThrows(AnalysisException.class, () -> Limit.atLeast("tension", " ", "N", 1)).getMessage());
        assertEquals("limit 'tension' bounds must be finite numbers or NaN for no bound, got -Infinity .. 160.0",
                assertThrows(AnalysisException.class,
                        () -> Limit.between("tension", "tensionN", "N", Double.NEGATIVE_INFINITY, 160)).getMessage());
        assertEquals("a standard uncertainty must be zero or a positive finite number, got -0.1",
                assertThrows(AnalysisException.class, () -> new Measurement(1, -0.1, "N")).getMessage());
        assertEquals("specification 'wire W-1' needs at least one limit, got none",
                assertThrows(AnalysisException.class, () -> new Specification("wire W-1", List.of())).getMessage());
    }
}
