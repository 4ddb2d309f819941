package org.tautline.driver.sim;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;

class AccelerometerTest {

    private static SimulationConfig withAccelerometer(double massKg) {
        SimulationConfig demo = SimulationConfigs.demoWire().idealised();
        return demo.withSensors(demo.sensors().withResponseSensor(ResponseSensor.ACCELERATION, massKg, 500.0, 0.0));
    }

    @Test
    void masslessAccelerometerMeasuresAccelerance() {
        SimulatedRig rig = new SimulatedRig(withAccelerometer(0.0));
        for (double f : new double[] {300, 800}) {
            Complex measured = FrfProbe.measure(rig, f, 1.0, 2.0, 50).frf();
            double w = 2 * Math.PI * f;
            // Source: accelerance = -w^2 receptance for harmonic motion (Ewins 2000, from memory).
            Complex expected = rig.truth().receptanceAt(f).multiply(-w * w);
            double error = measured.subtract(expected).norm() / expected.norm();
            assertTrue(error < 0.01, "accelerance at " + f + " Hz should be -w^2 H (Ewins 2000, from memory),"
                    + " error " + error);
        }
    }

    @Test
    void accelerometerMassLowersTheResonance() {
        double massKg = 2e-4;
        SimulatedRig light = new SimulatedRig(withAccelerometer(0.0));
        SimulatedRig heavy = new SimulatedRig(withAccelerometer(massKg));
        double f1 = light.truth().modes().get(0).mode().frequencyHz();
        double phi = org.tautline.analysis.specimen.StringPhysics.modeShape(1, 0.43, 0.60, 2.0e-3);
        // Source: Rayleigh's quotient with the unloaded mode shape, f' = f / sqrt(1 + m phi(x_s)^2)
        // (Lord Rayleigh, The Theory of Sound, 1877, from memory).
        double loadedHz = f1 / Math.sqrt(1 + massKg * phi * phi);
        double unloaded = FrfProbe.measure(light, loadedHz, 1.0, 2.0, 50).frf().norm();
        double loaded = FrfProbe.measure(heavy, loadedHz, 1.0, 2.0, 50).frf().norm();
        assertTrue(Double.isFinite(loaded) && loaded > 3 * unloaded, "a 0.2 g accelerometer should pull the"
                + " fundamental down to about " + loadedHz + " Hz (Rayleigh, from memory): |A/F| there unloaded "
                + unloaded + ", loaded " + loaded);
    }
}
