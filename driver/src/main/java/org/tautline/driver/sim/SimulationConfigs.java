package org.tautline.driver.sim;

import java.util.OptionalDouble;
import java.util.OptionalLong;

import org.tautline.analysis.specimen.EndCondition;
import org.tautline.driver.RigException;

/** Ready-made simulation scenarios. */
public final class SimulationConfigs {
    /**
     * The true tension of the demo wire as built, N: a little below the 150 N its (invented) data sheet states, so
     * that the demo reads a tension that differs from the stated one.
     */
    public static final double DEMO_TENSION_N = 146.5;
    /**
     * The lowest true tension the demo wire may be given, N: the slacker the wire, the more it moves where the shaker's
     * moving mass resonates with it (about 1.3 mm at 120 N and 1.4 mm at 110 N at the demo drive, against 1.1 mm as
     * built), and the demo stops at 1.5 mm.
     */
    public static final double DEMO_MIN_TENSION_N = 120.0;
    /**
     * The highest true tension the demo wire may be given, N: above about 186 N its 30th harmonic would pass the
     * simulation's limit of {@link SimulationConfig#NYQUIST_FRACTION} of the sample rate.
     */
    public static final double DEMO_MAX_TENSION_N = 180.0;

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
     * <p>L = 0.60 m, mu = 2.0e-3 kg/m, T = {@value #DEMO_TENSION_N} N (its stated, nominal tension is 150 N),
     * EI = 6.14e-4 N m^2 (a 0.5 mm steel core with E = 200 GPa), pinned ends, 30 harmonics; damping
     * 0.003 + 0.001 (100 Hz / f) + 0.0002 (f / 1000 Hz), about 0.35 % at the fundamental; polarisation split 0.7 %
     * (about one half-power bandwidth, as an asymmetric clamp can make it) with principal axis 1 at 25 degrees to
     * the drive; Kirchhoff-Carrier nonlinearity on with EA = 39 000 N (steel core). Stinger at 0.07 m,
     * non-contact displacement sensor at 0.43 m along the drive direction. Shaker: 0.02 kg, 2000 N/m,
     * 1.0 N s/m, Bl 3 N/A, 4 ohm, 0.1 % second and 0.05 % third harmonic. Noise 1e-6 N/sqrt(Hz) (a sensitive
     * piezoelectric force sensor: the heavy armature nearly pins the wire, so the force at resonance is small) and
     * 2e-10 m/sqrt(Hz); full scales 5 N and 2e-3 m on 24-bit ADCs (at the demo drive the rig's largest motion,
     * about 1.1 mm near 259 Hz where the shaker's moving mass on its stinger resonates with the wire, stays inside);
     * 50 Hz hum of 2e-9 m with 3 harmonics; 20 kS/s; drive limit 10 V. See {@link #DEMO_DRIVE_V} for the drive
     * level, and {@link #demoWire(long)} for the other specimens of its (invented) lot.
     *
     * @return the demo configuration, seed 1
     */
    public static SimulationConfig demoWire() {
        SimulatedSpecimen wire = new SimulatedSpecimen(0.60, 2.0e-3, DEMO_TENSION_N, 6.14e-4, EndCondition.PINNED, 30,
                DampingModel.of(0.003, 0.001, 100.0, 0.0002, 1000.0), 0.007, Math.toRadians(25.0), true, 39000.0);
        ShakerModel shaker = new ShakerModel(0.02, 2000.0, 1.0, 3.0, 4.0, 0.001, 0.0005);
        SensorSetup sensors = new SensorSetup(0.07, 0.43, ResponseSensor.DISPLACEMENT, 0.0, 0.0, 1e-6, 2e-10, 5.0,
                2e-3, 24, 50.0, 2e-9, 3);
        return new SimulationConfig(wire, shaker, sensors, SimulationConfig.DEFAULT_SAMPLE_RATE_HZ, 1L, 10.0);
    }

    /**
     * One specimen of the demo wire's invented lot: tension, mass per length, bending stiffness and damping drawn
     * with the part-to-part spread of {@link DemoWireLot}, on the same rig.
     *
     * @param seed the specimen's seed, also the seed of the sensor noise; the same seed gives the same specimen and
     *     the same samples
     * @return the drawn specimen on the demo rig
     */
    public static SimulationConfig demoWire(long seed) {
        SimulationConfig asBuilt = demoWire();
        return asBuilt.withSpecimen(DemoWireLot.draw(asBuilt.specimen(), seed)).withRandomSeed(seed);
    }

    /**
     * The demo wire as built or drawn from its lot, at its own tension or at a chosen one.
     *
     * @param seed empty for the demo wire as built with noise seed 1 ({@link #demoWire()}), or the seed of a
     *     specimen of its lot ({@link #demoWire(long)})
     * @param tensionN empty for the specimen's own tension, or the true tension to give it, N,
     *     {@value #DEMO_MIN_TENSION_N}..{@value #DEMO_MAX_TENSION_N} (a specimen that fails on purpose, for example)
     * @return the configuration
     * @throws RigException when the tension lies outside its range
     */
    public static SimulationConfig demoWire(OptionalLong seed, OptionalDouble tensionN) {
        SimulationConfig wire = seed.isPresent() ? demoWire(seed.getAsLong()) : demoWire();
        if (tensionN.isEmpty()) {
            return wire;
        }
        double t = tensionN.getAsDouble();
        if (!(t >= DEMO_MIN_TENSION_N && t <= DEMO_MAX_TENSION_N)) {
            throw new RigException("the demo wire's true tension must lie between " + Math.round(DEMO_MIN_TENSION_N)
                    + " and " + Math.round(DEMO_MAX_TENSION_N) + " N, got " + t + " N");
        }
        return wire.withSpecimen(wire.specimen().withTensionN(t));
    }

    /**
     * The demo wire driven at midspan, where every even harmonic has a node.
     *
     * @return the demo configuration with the stinger at L/2
     */
    public static SimulationConfig demoWireDrivenAtMidspan() {
        return drivenAtMidspan(demoWire());
    }

    /**
     * @param config a configuration
     * @return the same with the stinger at midspan, where every even harmonic has a node
     */
    public static SimulationConfig drivenAtMidspan(SimulationConfig config) {
        return config.withSensors(config.sensors().withForcingPositionM(config.specimen().lengthM() / 2.0));
    }
}
