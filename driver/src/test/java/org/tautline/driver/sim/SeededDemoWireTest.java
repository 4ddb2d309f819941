package org.tautline.driver.sim;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.function.ToDoubleFunction;

import org.hipparchus.distribution.continuous.ChiSquaredDistribution;
import org.junit.jupiter.api.Test;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/** The demo wire's lot: a seed draws one specimen, the same every time, with the documented spread. */
class SeededDemoWireTest {
    private static final SimulatedSpecimen AS_BUILT = SimulationConfigs.demoWire().specimen();

    private static SimulationConfig opened(Map<String, String> options) {
        try (Rig rig = new SimulatedRigDriver().open(options)) {
            return ((SimulatedRig) rig).truth().config();
        }
    }

    private static double[] samples(Map<String, String> options) {
        try (Rig rig = new SimulatedRigDriver().open(options)) {
            rig.exciter().setSine(230.0, 0.0);
            rig.exciter().setOutputEnabled(true);
            rig.exciter().rampTo(1.0, 0.01);
            SampleBlock block = rig.acquisition().read(2000);
            return block.samples()[1].clone();
        }
    }

    @Test
    void withoutASeedTheSimRigIsTheDemoWireAsBuiltWithNoiseSeedOne() {
        SimulationConfig config = opened(Map.of());
        assertEquals(SimulationConfigs.demoWire(), config);
        assertEquals(146.5, config.specimen().tensionN(), 0.0, "the demo wire is a little slacker than its stated 150 N");
        assertEquals(1L, config.randomSeed());
    }

    @Test
    void theSameSeedGivesTheSameSpecimenAndTheSameSamples() {
        assertEquals(SimulationConfigs.demoWire(7), opened(Map.of("seed", "7")));
        assertEquals(7L, opened(Map.of("seed", "7")).randomSeed(), "the seed also seeds the sensor noise");
        assertArrayEquals(samples(Map.of("seed", "7")), samples(Map.of("seed", "7")));
        assertNotEquals(SimulationConfigs.demoWire(7).specimen(), SimulationConfigs.demoWire(8).specimen());
        assertNotEquals(AS_BUILT, SimulationConfigs.demoWire(1).specimen(), "seed 1 is a drawn specimen, not the wire as"
                + " built");
        SimulatedSpecimen drawn = SimulationConfigs.demoWire(7).specimen();
        assertEquals(AS_BUILT.lengthM(), drawn.lengthM(), 0.0, "the span is the rig's");
        assertEquals(AS_BUILT.polarisationSplit(), drawn.polarisationSplit(), 0.0, "the clamp is the rig's");
        assertEquals(AS_BUILT.modeCount(), drawn.modeCount());
    }

    @Test
    void aScenarioAppliesToTheDrawnSpecimen() {
        SimulationConfig midspan = opened(Map.of("scenario", "demo-wire-midspan", "seed", "4"));
        assertEquals(SimulationConfigs.demoWire(4).specimen(), midspan.specimen());
        assertEquals(0.30, midspan.sensors().forcingPositionM(), 1e-12);
        SimulationConfig clean = opened(Map.of("scenario", "demo-wire-clean", "seed", "4", "tensionN", "170"));
        assertEquals(SimulationConfigs.demoWire(4).idealised().specimen().withTensionN(170.0), clean.specimen());
    }

    @Test
    void tensionNGivesTheTrueTensionAndKeepsTheRestOfTheSpecimen() {
        assertEquals(AS_BUILT.withTensionN(170.0), opened(Map.of("tensionN", "170")).specimen());
        assertEquals(SimulationConfigs.demoWire(3).specimen().withTensionN(125.5),
                opened(Map.of("seed", "3", "tensionN", " 125.5 ")).specimen());
        assertEquals(180.0, opened(Map.of("tensionN", "180")).specimen().tensionN(), 0.0, "the top of the range runs");
    }

    @Test
    void badOptionsAreRefusedWithTheOptionAndTheExpectationNamed() {
        SimulatedRigDriver sim = new SimulatedRigDriver();
        assertEquals("rig driver 'sim': option 'seed' must lie between 0 and 2147483647, got -1",
                assertThrows(RigException.class, () -> sim.open(Map.of("seed", "-1"))).getMessage());
        assertEquals("rig driver 'sim': option 'tensionN' must be none or a tension in N, got '150 N'",
                assertThrows(RigException.class, () -> sim.open(Map.of("tensionN", "150 N"))).getMessage());
        assertEquals("rig driver 'sim': option 'tensionN' must lie between 120 and 180 N, got '250'",
                assertThrows(RigException.class, () -> sim.open(Map.of("tensionN", "250"))).getMessage());
        assertEquals("rig driver 'sim': option 'tensionN' must lie between 120 and 180 N, got 'NaN'",
                assertThrows(RigException.class, () -> sim.open(Map.of("tensionN", "NaN"))).getMessage());
    }

    /**
     * Over 2000 seeds each drawn property scatters about the wire as built with the documented relative standard
     * deviation. References: for n values of a normal population, (n - 1) s^2 / sigma^2 follows the chi-square
     * distribution with n - 1 degrees of freedom, and the mean lies within 3.29 sigma / sqrt(n) of the population's
     * with 99.9 % probability (standard sampling theory, from memory); the quantiles come from Hipparchus's
     * ChiSquaredDistribution. The bounds are two-sided 99.9 % intervals, and the seeds are fixed.
     */
    @Test
    void drawsScatterWithTheDocumentedSpread() {
        checkSpread("tension", s -> s.tensionN() / AS_BUILT.tensionN() - 1, DemoWireLot.TENSION_REL_STD);
        checkSpread("mass per length", s -> s.linearDensityKgPerM() / AS_BUILT.linearDensityKgPerM() - 1,
                DemoWireLot.LINEAR_DENSITY_REL_STD);
        checkSpread("bending stiffness", s -> s.bendingStiffnessNm2() / AS_BUILT.bendingStiffnessNm2() - 1,
                DemoWireLot.BENDING_STIFFNESS_REL_STD);
        checkSpread("damping", s -> s.damping().dampingRatioAt(225.0) / AS_BUILT.damping().dampingRatioAt(225.0) - 1,
                DemoWireLot.DAMPING_REL_STD);
    }

    private static void checkSpread(String what, ToDoubleFunction<SimulatedSpecimen> deviation, double relStd) {
        int n = 2000;
        double sum = 0;
        double sumSquares = 0;
        for (int seed = 0; seed < n; seed++) {
            double d = deviation.applyAsDouble(SimulationConfigs.demoWire(seed).specimen());
            sum += d;
            sumSquares += d * d;
        }
        double mean = sum / n;
        double variance = (sumSquares - n * mean * mean) / (n - 1);
        ChiSquaredDistribution chi2 = new ChiSquaredDistribution(n - 1);
        double statistic = (n - 1) * variance / (relStd * relStd);
        assertTrue(statistic > chi2.inverseCumulativeProbability(0.0005)
                        && statistic < chi2.inverseCumulativeProbability(0.9995),
                what + ": relative std " + Math.sqrt(variance) + " over " + n + " seeds against the documented " + relStd
                        + " (chi-square 99.9 % interval of a sample variance, from memory)");
        assertTrue(Math.abs(mean) < 3.29 * relStd / Math.sqrt(n), what + ": mean relative deviation " + mean
                + " against 0 +/- 3.29 sigma/sqrt(n) (99.9 %, from memory)");
    }
}
