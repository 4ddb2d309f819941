package org.tautline.driver.sim;

import org.tautline.analysis.specimen.StringPhysics;
import org.tautline.driver.RigException;

/**
 * Everything the simulated rig needs: specimen, shaker, sensors, sample rate, random seed and drive limit.
 *
 * @param specimen the string
 * @param shaker the exciter
 * @param sensors transducer positions and acquisition
 * @param sampleRateHz acquisition sample rate, Hz, 1000..200000 (20000 in the demo)
 * @param randomSeed seed of the noise generators; the same seed gives the same samples
 * @param maxDriveV the largest peak drive voltage the exciter accepts, V
 */
public record SimulationConfig(SimulatedSpecimen specimen, ShakerModel shaker, SensorSetup sensors,
                               double sampleRateHz, long randomSeed, double maxDriveV) {
    private static final String WHERE = "SimulationConfig";

    /** Default acquisition sample rate, Hz. */
    public static final double DEFAULT_SAMPLE_RATE_HZ = 20000.0;

    /**
     * Every simulated mode must lie below this fraction of the sample rate: the stinger coupling is
     * solved once per sample, which needs each mode resolved in time (common practice for
     * time-stepping: several steps per period of the fastest mode).
     */
    public static final double NYQUIST_FRACTION = 0.4;

    /** Checks the fields and that both transducers sit strictly inside the span. */
    public SimulationConfig {
        Checks.present(WHERE, "specimen", specimen);
        Checks.present(WHERE, "shaker", shaker);
        Checks.present(WHERE, "sensors", sensors);
        Checks.range(WHERE, "sampleRateHz", sampleRateHz, 1000.0, 200000.0, "Hz");
        Checks.positive(WHERE, "maxDriveV", maxDriveV, "V");
        double lengthM = specimen.lengthM();
        requireInside("sensors.forcingPositionM", sensors.forcingPositionM(), lengthM);
        requireInside("sensors.sensorPositionM", sensors.sensorPositionM(), lengthM);
        double f0 = StringPhysics.mersenneFundamentalHz(lengthM, specimen.tensionN(), specimen.linearDensityKgPerM());
        double b = StringPhysics.inharmonicity(specimen.bendingStiffnessNm2(), specimen.tensionN(), lengthM);
        double highestHz = StringPhysics.stiffStringFrequencyHz(specimen.modeCount(), f0, b, specimen.ends())
                * (1 + specimen.polarisationSplit());
        if (!(highestHz < NYQUIST_FRACTION * sampleRateHz)) {
            throw new RigException(WHERE + ": the highest simulated mode (harmonic " + specimen.modeCount() + ", "
                    + Math.round(highestHz) + " Hz) must lie below " + NYQUIST_FRACTION + " of the sample rate ("
                    + Math.round(NYQUIST_FRACTION * sampleRateHz) + " Hz); simulate fewer modes or sample faster");
        }
        if (sensors.accelerometerMassKg() > 0
                && Math.abs(sensors.sensorPositionM() - sensors.forcingPositionM()) < 1e-6 * lengthM) {
            throw new RigException(WHERE + ": an accelerometer with mass cannot sit on the stinger at "
                    + sensors.forcingPositionM() + " m; move sensors.sensorPositionM at least " + 1e-6 * lengthM
                    + " m away or use accelerometerMassKg 0");
        }
    }

    private static void requireInside(String field, double positionM, double lengthM) {
        if (!(positionM > 0 && positionM < lengthM)) {
            throw new RigException(WHERE + "." + field + " must lie strictly inside the span 0.." + lengthM
                    + " m, got " + positionM + " m");
        }
    }

    /** @param newSpecimen specimen @return a copy with that specimen */
    public SimulationConfig withSpecimen(SimulatedSpecimen newSpecimen) {
        return new SimulationConfig(newSpecimen, shaker, sensors, sampleRateHz, randomSeed, maxDriveV);
    }

    /** @param newShaker shaker @return a copy with that shaker */
    public SimulationConfig withShaker(ShakerModel newShaker) {
        return new SimulationConfig(specimen, newShaker, sensors, sampleRateHz, randomSeed, maxDriveV);
    }

    /** @param newSensors sensors @return a copy with those sensors */
    public SimulationConfig withSensors(SensorSetup newSensors) {
        return new SimulationConfig(specimen, shaker, newSensors, sampleRateHz, randomSeed, maxDriveV);
    }

    /** @param seed random seed @return a copy with that seed */
    public SimulationConfig withRandomSeed(long seed) {
        return new SimulationConfig(specimen, shaker, sensors, sampleRateHz, seed, maxDriveV);
    }

    /** @param rateHz sample rate, Hz @return a copy with that sample rate */
    public SimulationConfig withSampleRateHz(double rateHz) {
        return new SimulationConfig(specimen, shaker, sensors, rateHz, randomSeed, maxDriveV);
    }

    /** @return a copy with no noise, no mains hum and no shaker distortion: the linear, clean reference case */
    public SimulationConfig idealised() {
        return new SimulationConfig(specimen.withGeometricNonlinearity(false), shaker.withoutDistortion(),
                sensors.withoutNoise(), sampleRateHz, randomSeed, maxDriveV);
    }
}
