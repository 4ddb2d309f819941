package org.tautline.analysis.verdict;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.format.QuantityFormat;
import org.tautline.analysis.format.TextStyle;

class VerdictTest {
    // Decision rule: guard band U = 2 u (JCGM 100:2008, k = 2), conformity zones of ISO 14253-1:2017 (from memory).
    private static final Limit TENSION = Limit.between("tension", "tensionN", "N", 140, 160);
    private static final Limit FREQUENCY = Limit.atLeast("first mode", "f1Hz", "Hz", 140);

    @Test
    void passesWhenTheUncertaintyIntervalLiesInside() {
        Verdict verdict = Verdict.evaluate(new Specification("wire W-1", List.of(TENSION)),
                Map.of("tensionN", new Measurement(151.2, 0.4, "N")));
        assertEquals(Outcome.PASS, verdict.outcome());
        // U = 0.8 N to two significant digits and the value and margin to match (GUM 7.2.6, from memory).
        assertEquals(List.of("tension = (151.20 ± 0.80) N (k = 2) meets the limits 140 to 160 N (margin 8.80 N)"),
                verdict.reasons());
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
                "tension = (151.20 ± 0.80) N (k = 2) meets the limits 140 to 160 N (margin 8.80 N)"), undetermined.reasons());
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
        assertEquals("tension = (135.0 ± 2.0) N (k = 2) does not meet the limits 140 to 160 N (margin -5.0 N)",
                verdict.reasons().get(0));
    }

    @Test
    void cannotDecideWhenTheIntervalStraddlesABound() {
        Verdict verdict = Verdict.evaluate(new Specification("wire W-1", List.of(TENSION)),
                Map.of("tensionN", new Measurement(159.5, 0.5, "N")));
        assertEquals(Outcome.NOT_DETERMINABLE, verdict.outcome());
        assertEquals("tension = (159.5 ± 1.0) N (k = 2) cannot be judged against the limits 140 to 160 N (margin 0.5 N): "
                + "the uncertainty reaches across a limit", verdict.reasons().get(0));
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
                Limit.atMost("damping", "dampingRatio1", "", 0.01)));
        Verdict undecided = Verdict.evaluate(spec, Map.of("tensionN", new Measurement(150, 0.1, "N"),
                "dampingRatio1", new Measurement(0.002, 0.0001, "")));
        assertEquals(Outcome.NOT_DETERMINABLE, undecided.outcome());
        assertEquals(List.of("tension = (150.00 ± 0.20) N (k = 2) meets the limits 140 to 160 N (margin 10.00 N)",
                "no measured value for fundamental frequency",
                "damping ratio of harmonic 1 = 0.00200 ± 0.00020 (k = 2) meets the upper limit 0.01 (margin 0.00800)"),
                undecided.reasons());

        Verdict failed = Verdict.evaluate(spec, Map.of("tensionN", new Measurement(150, 0.1, "N"),
                "f1Hz", new Measurement(120, 0.01, "Hz")));
        assertEquals(Outcome.FAIL, failed.outcome());
        assertEquals("fundamental frequency = (120.000 ± 0.020) Hz (k = 2) does not meet the lower limit 140 Hz"
                + " (margin -20.000 Hz)", failed.reasons().get(1));
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
        assertEquals("tension was measured in kN, but the limit 'tension' is in N: the two cannot be compared",
                verdict.reasons().get(0));
        Verdict noUnit = Verdict.evaluate(new Specification("wire W-1", List.of(Limit.atMost("stiffness",
                "bendingStiffnessNm2", "N m^2", 1e-3))), Map.of("bendingStiffnessNm2", new Measurement(5e-4, 1e-5, "")));
        assertEquals("bending stiffness EI was measured without a unit, but the limit 'stiffness' is in N m²: the two"
                + " cannot be compared", noUnit.reasons().get(0));
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

    @Test
    void namesEveryFigureForPeopleAndWritesTheSameSentenceInAscii() {
        Verdict v = Verdict.evaluate(new Specification("wire W-1", List.of(
                        Limit.atMost("stiffness", "bendingStiffnessNm2", "N m^2", 1e-3),
                        Limit.atMost("level", "linearityShift1", "", 0.01))),
                Map.of("bendingStiffnessNm2", new Measurement(5.3e-4, 2e-5, "N m^2")),
                Map.of("linearityShift1", "the level check needs the rig"));
        // U = 4.0e-5 N m² to two significant digits, value and margin to its decimal place (GUM 7.2.6, from memory)
        assertEquals("bending stiffness EI = (530 ± 40) × 10⁻⁶ N m² (k = 2) meets the upper limit 0.001 N m²"
                + " (margin 470 × 10⁻⁶ N m²)", v.reasons().get(0));
        assertEquals("no measured value for shift of f1 between test levels: the level check needs the rig",
                v.reasons().get(1));
        QuantityFormat ascii = new QuantityFormat(TextStyle.ASCII);
        assertEquals("bending stiffness EI = (530 +/- 40)e-6 N m^2 (k = 2) meets the upper limit 0.001 N m^2"
                + " (margin 470e-6 N m^2)", LimitText.reason(v.results().get(0), ascii));
        assertEquals(v.reasons().get(1), LimitText.reason(v.results().get(1), ascii));
        assertEquals(v.reasons().get(0), LimitText.reason(v.results().get(0), LimitText.UNICODE),
                "the verdict keeps the Unicode sentence");

        for (Figure f : List.of(Figure.F1, Figure.TENSION, Figure.BENDING_STIFFNESS, Figure.INHARMONICITY,
                Figure.FORCING_POSITION, Figure.SENSOR_POSITION, Figure.FIT_RESIDUAL, Figure.RESONANCE_ERROR,
                Figure.LEVEL_SHIFT, Figure.damping(3))) {
            Specification spec = new Specification("all", List.of(Limit.atLeast(f.label(), f.key(), f.unit(), 0)));
            String measured = Verdict.evaluate(spec, Map.of(f.key(), new Measurement(1, 0.1, f.unit()))).reasons().get(0);
            String missing = Verdict.evaluate(spec, Map.of()).reasons().get(0);
            for (String reason : List.of(measured, missing)) {
                assertTrue(reason.contains(f.label()) && !reason.contains(f.key()), "named for people: " + reason);
            }
        }
    }
}
