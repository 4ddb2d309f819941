package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.SortedMap;
import java.util.TreeMap;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class StabilisationChartTest {

    /** Hand-checked poles of three orders against the 1 % frequency / 5 % damping criteria (common practice). */
    private static SortedMap<Integer, List<Pole>> handCase() {
        SortedMap<Integer, List<Pole>> poles = new TreeMap<>();
        poles.put(2, List.of(Pole.of(100, 0.01)));
        // 100.5 vs 100: 0.5 % in f, 2 % in zeta -> DAMPING; 200 Hz has no neighbour within 1 % -> NEW.
        poles.put(4, List.of(Pole.of(100.5, 0.0102), Pole.of(200, 0.02)));
        // 100.4 vs 100.5: 0.1 %, zeta equal -> DAMPING (STABLE with agreeing modal constants);
        // 201 vs 200: 0.5 % in f but 50 % in zeta -> FREQUENCY; 300 Hz -> NEW.
        poles.put(6, List.of(Pole.of(100.4, 0.0102), Pole.of(201, 0.03), Pole.of(300, 0.01)));
        return poles;
    }

    private static List<StabilityClass> classes(StabilisationChart chart) {
        return chart.points().stream().map(StabilisationPoint::stabilityClass).toList();
    }

    @Test
    void classifiesAHandCheckedCaseWithoutModalConstants() {
        StabilisationChart chart = StabilisationChart.classify(50, 400, handCase(), null);
        assertEquals(List.of(StabilityClass.NEW, StabilityClass.DAMPING, StabilityClass.NEW, StabilityClass.DAMPING,
                StabilityClass.FREQUENCY, StabilityClass.NEW), classes(chart), "hand-checked classes (1 % f, 5 % zeta)");
        assertEquals(StabilityClass.DAMPING, chart.topClass(), "without a residue estimator DAMPING is the top class");
        assertEquals(List.of(2, 4, 6), chart.orders(), "orders");
        assertEquals(3, chart.pointsAt(6).size(), "points of order 6");
    }

    @Test
    void modalConstantsDecideBetweenDampingAndStable() {
        // Modal constants A: 1 at 100.5 Hz (order 4); 1.03 at 100.4 Hz is within 5 % -> STABLE, 1.2 is not.
        for (double later : new double[] {1.03, 1.2}) {
            StabilisationChart.ResidueEstimator estimator = poles -> poles.stream()
                    .map(p -> p.residueOf(new Complex(Math.abs(p.frequencyHz() - 100.4) < 1e-9 ? later : 1.0, 0)))
                    .toArray(Complex[]::new);
            StabilisationChart chart = StabilisationChart.classify(50, 400, handCase(), estimator);
            StabilityClass expected = later == 1.03 ? StabilityClass.STABLE : StabilityClass.DAMPING;
            assertEquals(expected, chart.points().get(3).stabilityClass(), "100.4 Hz pole with modal constant " + later);
            assertEquals(StabilityClass.STABLE, chart.topClass(), "a residue estimator makes STABLE the top class");
        }
    }

    @Test
    void buildRunsTheRequestedOrdersAndChecksThem() {
        Lscf lscf = new Lscf(ModalSynthesis.receptance(LscfTestData.oneMode(), LscfTestData.uniformLines(20, 400, 500)),
                20, 400, null, 20);
        StabilisationChart chart = StabilisationChart.build(lscf, 4, 20, 4, null);
        assertEquals(List.of(4, 8, 12, 16, 20), chart.orders(), "orders 4..20 step 4");
        for (int order : chart.orders()) {
            assertEquals(lscf.poles(order), chart.pointsAt(order).stream().map(StabilisationPoint::pole).toList(),
                    "the chart keeps LSCF's poles of order " + order);
        }
        assertEquals("stabilisation orders must satisfy 1 <= minOrder <= maxOrder <= 20 (the estimator's maxOrder) "
                + "with orderStep >= 1, got minOrder 2, maxOrder 24, orderStep 2",
                assertThrows(AnalysisException.class, () -> StabilisationChart.build(lscf, 2, 24, 2, null)).getMessage());
        StabilisationChart.ResidueEstimator wrong = poles -> new Complex[0];
        assertEquals("the residue estimator must return one residue for each of the 1 poles of order 4, got 0",
                assertThrows(AnalysisException.class, () -> StabilisationChart.build(lscf, 4, 8, 4, wrong)).getMessage());
    }
}
