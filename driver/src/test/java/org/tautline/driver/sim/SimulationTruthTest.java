package org.tautline.driver.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.StringPhysics;

class SimulationTruthTest {

    @Test
    void naturalFrequenciesFollowFletcherForThePinnedSteelCheckCase() {
        double diameterM = 1e-3;
        double mu = StringPhysics.linearDensityKgPerM(7850.0, diameterM);
        double ei = StringPhysics.bendingStiffnessNm2(200e9, diameterM);
        SimulationConfig demo = SimulationConfigs.demoWire();
        SimulatedSpecimen steel = new SimulatedSpecimen(1.0, mu, 500.0, ei, EndCondition.PINNED, 3,
                demo.specimen().damping(), 0.0015, 0.0, false, 0.0);
        SimulationConfig config = demo.withSpecimen(steel)
                .withSensors(demo.sensors().withForcingPositionM(0.07).withSensorPositionM(0.43));
        List<TrueMode> modes = SimulationTruth.of(config).modes();
        double[] expectedHz = {142.402, 284.888, 427.538};
        for (int n = 1; n <= 3; n++) {
            TrueMode first = modes.get(2 * (n - 1));
            // Source: checks.md check case, computed from Fletcher, JASA 36:203 (1964).
            assertEquals(expectedHz[n - 1], first.mode().frequencyHz(), 6e-4,
                    "pinned stiff-string f" + n + " (Fletcher 1964, checks.md check case)");
            assertEquals(1, first.polarisation());
            TrueMode second = modes.get(2 * (n - 1) + 1);
            assertEquals(first.mode().frequencyHz() * 1.0015, second.mode().frequencyHz(), 1e-9,
                    "polarisation 2 sits polarisationSplit above polarisation 1");
        }
    }

    @Test
    void modalConstantsAreModeShapeProductsTimesProjections() {
        SimulationConfig demo = SimulationConfigs.demoWire();
        SimulationTruth truth = SimulationTruth.of(demo);
        double l = 0.60;
        double mu = 2.0e-3;
        double a = Math.toRadians(25.0);
        TrueMode m3p1 = truth.modes().get(4);
        TrueMode m3p2 = truth.modes().get(5);
        // Source: checks.md "Point force": phi_n = sqrt(2/(mu L)) sin(n pi x/L); polarisation projections cos^2, sin^2.
        double product = 2.0 / (mu * l) * Math.sin(3 * Math.PI * 0.07 / l) * Math.sin(3 * Math.PI * 0.43 / l);
        assertEquals(product * Math.cos(a) * Math.cos(a), m3p1.mode().modalConstant().getReal(),
                1e-12 * Math.abs(product), "harmonic 3, polarisation 1 (checks.md, Point force)");
        assertEquals(product * Math.sin(a) * Math.sin(a), m3p2.mode().modalConstant().getReal(),
                1e-12 * Math.abs(product), "harmonic 3, polarisation 2 (checks.md, Point force)");
        double zeta = 0.003 + 0.001 * 100.0 / m3p1.mode().frequencyHz() + 0.0002 * m3p1.mode().frequencyHz() / 1000.0;
        assertEquals(zeta, m3p1.mode().dampingRatio(), 1e-15, "damping model evaluated at the mode's frequency");
    }
}
