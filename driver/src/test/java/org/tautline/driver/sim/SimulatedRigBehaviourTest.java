package org.tautline.driver.sim;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.SampleBlock;

class SimulatedRigBehaviourTest {

    /** Frequency of the largest |X/F| on a rising sweep of 0.1 % steps around f1. */
    private static double peakFrequencyHz(SimulationConfig config, double driveV) {
        SimulatedRig rig = new SimulatedRig(config);
        double f1 = rig.truth().modes().get(0).mode().frequencyHz();
        double best = 0;
        double bestHz = 0;
        rig.exciter().setSine(0.99 * f1, driveV);
        rig.exciter().setOutputEnabled(true);
        rig.acquisition().read(40000);
        for (int k = -10; k <= 20; k++) {
            double f = f1 * (1 + 0.001 * k);
            double h = FrfProbe.measure(rig, f, driveV, 1.0, 40).frf().norm();
            if (h > best) {
                best = h;
                bestHz = f;
            }
        }
        return bestHz;
    }

    @Test
    void largeAmplitudesHardenTheResonanceAndSmallOnesDoNot() {
        SimulationConfig demo = SimulationConfigs.demoWire().idealised();
        // An exaggerated axial stiffness so the hardening shows within the drive limit.
        SimulatedSpecimen stiff = new SimulatedSpecimen(0.60, 2.0e-3, 150.0, 6.14e-4,
                demo.specimen().ends(), 30, demo.specimen().damping(), 0.0015, Math.toRadians(25.0), true, 1.17e6);
        SimulationConfig nonlinear = demo.withSpecimen(stiff);
        SimulationConfig linear = demo.withSpecimen(stiff.withGeometricNonlinearity(false));
        double linearPeak = peakFrequencyHz(linear, 10.0);
        double smallPeak = peakFrequencyHz(nonlinear, 0.05);
        double largePeak = peakFrequencyHz(nonlinear, 10.0);
        // Source: Kirchhoff-Carrier backbone w/w0 ~ 1 + (3/32)(EA/T0)(k a)^2 (checks.md; hardening).
        assertEquals(linearPeak, smallPeak, 1e-9, "at 0.05 V the Kirchhoff-Carrier term must not move the peak"
                + " (checks.md, Kirchhoff-Carrier backbone)");
        assertTrue(largePeak > linearPeak * 1.002, "at 10 V the peak must rise (hardening, checks.md"
                + " Kirchhoff-Carrier backbone): linear " + linearPeak + " Hz, large " + largePeak + " Hz");
    }

    @Test
    void sameSeedGivesTheSameSamplesAndAnotherSeedDoesNot() {
        SimulationConfig demo = SimulationConfigs.demoWire();
        double[][] first = run(new SimulatedRig(demo));
        double[][] again = run(new SimulatedRig(demo));
        double[][] other = run(new SimulatedRig(demo.withRandomSeed(2L)));
        assertArrayEquals(first[0], again[0], "force samples with the same seed");
        assertArrayEquals(first[1], again[1], "response samples with the same seed");
        assertFalse(java.util.Arrays.equals(first[0], other[0]), "another seed gives other force noise");
    }

    private static double[][] run(SimulatedRig rig) {
        rig.exciter().setSine(300.0, SimulationConfigs.DEMO_DRIVE_V);
        rig.exciter().setOutputEnabled(true);
        SampleBlock block = rig.acquisition().read(4000);
        assertEquals(0L, block.firstSampleIndex());
        return block.samples();
    }

    @Test
    void countsClippedSamples() {
        SimulationConfig demo = SimulationConfigs.demoWire();
        SimulatedRig normal = new SimulatedRig(demo);
        run(normal);
        assertEquals(0L, normal.clippedSampleCount(), "demo drive stays inside the demo full scales");
        SimulatedRig tight = new SimulatedRig(demo.withSensors(demo.sensors().withFullScales(5.0, 1e-6)));
        double[][] samples = run(tight);
        assertTrue(tight.clippedSampleCount(1) > 100, "1 um full scale clips a response of several um");
        assertEquals(0L, tight.clippedSampleCount(0));
        double max = java.util.Arrays.stream(samples[1]).max().orElseThrow();
        // A 24-bit ADC's top code is full scale minus one step (IEEE Std 1241 terms, from memory).
        assertEquals(1e-6 * (1 - Math.scalb(1.0, -23)), max, 1e-18, "clipped samples sit at the top code");
    }

    @Test
    void rejectsDriveAboveTheLimitWithTheValueAndTheLimit() {
        SimulatedRig rig = new SimulatedRig(SimulationConfigs.demoWire());
        RigException e = assertThrows(RigException.class, () -> rig.exciter().setSine(300.0, 12.0));
        assertEquals("drive amplitude 12.0 V exceeds the rig limit of 10.0 V (maxDriveV)", e.getMessage());
        RigException ramp = assertThrows(RigException.class, () -> rig.exciter().rampTo(10.5, 0.1));
        assertEquals("drive amplitude 10.5 V exceeds the rig limit of 10.0 V (maxDriveV)", ramp.getMessage());
        assertEquals(10.0, rig.exciter().maxAmplitudeV());
    }

    @Test
    void rejectsBadConfigurationNamingFieldValueAndExpectation() {
        RigException e = assertThrows(RigException.class, () -> new DampingModel(-0.1, 0, 0, 100));
        assertEquals("DampingModel.constantRatio must be zero or a positive finite number, got -0.1", e.getMessage());
        SimulationConfig demo = SimulationConfigs.demoWire();
        RigException outside = assertThrows(RigException.class,
                () -> demo.withSensors(demo.sensors().withSensorPositionM(0.7)));
        assertEquals("SimulationConfig.sensors.sensorPositionM must lie strictly inside the span 0..0.6 m, got 0.7 m",
                outside.getMessage());
    }

    @Test
    void rampRunsTheRigClockAndOutputOffLetsTheRigRingDown() {
        SimulatedRig rig = new SimulatedRig(SimulationConfigs.demoWire().idealised());
        rig.exciter().setSine(300.0, 0.0);
        assertFalse(rig.exciter().isOutputEnabled(), "output starts off");
        rig.exciter().setOutputEnabled(true);
        rig.exciter().rampTo(1.0, 0.5);
        assertEquals(10000L, rig.acquisition().nextSampleIndex(), "a 0.5 s ramp advances the clock 10000 samples");
        assertEquals(0.5, rig.acquisition().rigTimeS(), 1e-12);
        double driven = FrfProbe.measure(rig, 300.0, 1.0, 1.0, 30).force.amplitude();
        rig.exciter().setOutputEnabled(false);
        double first = rms(rig.acquisition().read(200).samples()[1]);
        rig.acquisition().read(40000);
        double later = rms(rig.acquisition().read(200).samples()[1]);
        assertTrue(first > 0 && later < 0.05 * first, "with the output off the response rings down: " + first
                + " m then " + later + " m rms; driven force was " + driven + " N");
        rig.close();
        assertFalse(rig.exciter().isOutputEnabled(), "close switches the output off");
        rig.close();
        assertTrue(rig.identity().endsWith("seed 1"), rig.identity());
    }

    @Test
    void identityTellsTheWireAsBuiltFromADrawnSpecimenWithTheSameNoiseSeed() {
        String asBuilt = new SimulatedRigDriver().open(Map.of()).identity();
        String drawn = new SimulatedRigDriver().open(Map.of("seed", "1")).identity();
        assertTrue(asBuilt.contains("146.5 N"), asBuilt);
        assertTrue(asBuilt.endsWith("seed 1") && drawn.endsWith("seed 1"), asBuilt + " / " + drawn);
        assertNotEquals(asBuilt, drawn, "a journal of one specimen must not resume on another");
        assertEquals(asBuilt, new SimulatedRigDriver().open(Map.of("seed", "none")).identity());
    }

    private static double rms(double[] x) {
        double s = 0;
        for (double v : x) {
            s += v * v;
        }
        return Math.sqrt(s / x.length);
    }
}
