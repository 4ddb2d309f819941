package org.tautline.driver.sim;

import org.tautline.analysis.specimen.EndCondition;

/** Ready-made simulation scenarios. */
public final class SimulationConfigs {
    /**
     * Recommended peak drive for the demo wire, V: at the fundamental about 41 micrometres at the sensor
     * and 53 at midspan (Kirchhoff-Carrier frequency shift about 2e-6), and force SNR above 40 dB over
     * 1 s records at the first six resonances. Below about 150 Hz the shaker's own suspension resonance
     * (near 50 Hz) moves the wire more; start sweeps above it.
     */
    public static final double DEMO_DRIVE_V = 1.0;

    private SimulationConfigs() {
    }

    /**
     * A polymer-jacketed steel tie wire on a bench rig: a scenario invented for the demo, not a real product.
     *
     * <p>L = 0.60 m, mu = 2.0e-3 kg/m, T = 150 N, EI = 6.14e-4 N m^2 (a 0.5 mm steel core with
     * E = 200 GPa), pinned ends, 30 harmonics; damping 0.003 + 0.001 (100 Hz / f) + 0.0002 (f / 1000 Hz),
     * about 0.35 % at the fundamental; polarisation split 0.7 % (about one half-power bandwidth, as an
     * asymmetric clamp can make it) with principal axis 1 at 25 degrees to
     * the drive; Kirchhoff-Carrier nonlinearity on with EA = 39 000 N (steel core). Stinger at 0.07 m,
     * non-contact displacement sensor at 0.43 m along the drive direction. Shaker: 0.02 kg, 2000 N/m,
     * 1.0 N s/m, Bl 3 N/A, 4 ohm, 0.1 % second and 0.05 % third harmonic. Noise 1e-6 N/sqrt(Hz) (a sensitive
     * piezoelectric force sensor: the heavy armature nearly pins the wire, so the force at resonance is small) and
     * 2e-10 m/sqrt(Hz); full scales 5 N and 2e-3 m on 24-bit ADCs (at the demo drive the rig's largest motion,
     * about 1 mm near 262 Hz where the shaker's moving mass on its stinger resonates with the wire, stays inside); 50 Hz hum of 2e-9 m with 3
     * harmonics; 20 kS/s; drive limit 10 V. See {@link #DEMO_DRIVE_V} for the drive level.
     *
     * @return the demo configuration, seed 1
     */
    public static SimulationConfig demoWire() {
        SimulatedSpecimen wire = new SimulatedSpecimen(0.60, 2.0e-3, 150.0, 6.14e-4, EndCondition.PINNED, 30,
                DampingModel.of(0.003, 0.001, 100.0, 0.0002, 1000.0), 0.007, Math.toRadians(25.0), true, 39000.0);
        ShakerModel shaker = new ShakerModel(0.02, 2000.0, 1.0, 3.0, 4.0, 0.001, 0.0005);
        SensorSetup sensors = new SensorSetup(0.07, 0.43, ResponseSensor.DISPLACEMENT, 0.0, 0.0, 1e-6, 2e-10, 5.0,
                2e-3, 24, 50.0, 2e-9, 3);
        return new SimulationConfig(wire, shaker, sensors, SimulationConfig.DEFAULT_SAMPLE_RATE_HZ, 1L, 10.0);
    }

    /**
     * The demo wire driven at midspan, where every even harmonic has a node.
     *
     * @return the demo configuration with the stinger at L/2
     */
    public static SimulationConfig demoWireDrivenAtMidspan() {
        SimulationConfig demo = demoWire();
        return demo.withSensors(demo.sensors().withForcingPositionM(demo.specimen().lengthM() / 2.0));
    }
}
