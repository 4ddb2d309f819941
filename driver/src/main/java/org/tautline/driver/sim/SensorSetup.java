package org.tautline.driver.sim;

import org.tautline.driver.RigException;

/**
 * Where the stinger and the response transducer sit and what the acquisition adds to their signals.
 *
 * <p>Both channels get white Gaussian noise of the given one-sided density (per-sample standard
 * deviation density sqrt(fs/2)), then an ADC of {@code adcBits} bits that clips at plus or minus
 * full scale and rounds to its step 2 fullScale / 2^bits. The response channel also picks up mains
 * hum: harmonic k = 1..mainsHarmonicCount at k mainsHz with amplitude mainsAmplitude / k (harmonics
 * at or above half the sample rate are left out, as an anti-alias filter would remove them). Positions
 * are checked against the specimen length by {@link SimulationConfig}.
 *
 * @param forcingPositionM stinger position x_f along the span, m
 * @param sensorPositionM response transducer position x_s, m
 * @param responseSensor what the response channel measures
 * @param accelerometerMassKg accelerometer mass added at x_s, kg; 0 for {@link ResponseSensor#DISPLACEMENT}
 * @param sensorAngleRad sensing direction relative to the drive direction, rad
 * @param forceNoiseDensity force channel noise, N/sqrt(Hz)
 * @param responseNoiseDensity response channel noise, m/sqrt(Hz) or m/s^2/sqrt(Hz)
 * @param forceFullScale force channel full scale, N
 * @param responseFullScale response channel full scale, m or m/s^2
 * @param adcBits ADC resolution, 8..32 bits
 * @param mainsHz mains frequency, Hz
 * @param mainsAmplitude mains hum amplitude on the response channel (fundamental), m or m/s^2; 0 for none
 * @param mainsHarmonicCount number of hum harmonics including the fundamental, 0..20
 */
public record SensorSetup(double forcingPositionM, double sensorPositionM, ResponseSensor responseSensor,
                          double accelerometerMassKg, double sensorAngleRad, double forceNoiseDensity,
                          double responseNoiseDensity, double forceFullScale, double responseFullScale, int adcBits,
                          double mainsHz, double mainsAmplitude, int mainsHarmonicCount) {
    private static final String WHERE = "SensorSetup";

    /** Checks every field; see the record components for the expected ranges. */
    public SensorSetup {
        Checks.positive(WHERE, "forcingPositionM", forcingPositionM, "m");
        Checks.positive(WHERE, "sensorPositionM", sensorPositionM, "m");
        Checks.present(WHERE, "responseSensor", responseSensor);
        Checks.nonNegative(WHERE, "accelerometerMassKg", accelerometerMassKg, "kg");
        if (responseSensor == ResponseSensor.DISPLACEMENT && accelerometerMassKg != 0) {
            throw new RigException(WHERE + ".accelerometerMassKg must be 0 for a non-contact DISPLACEMENT sensor, got "
                    + accelerometerMassKg);
        }
        Checks.finite(WHERE, "sensorAngleRad", sensorAngleRad, "rad");
        Checks.nonNegative(WHERE, "forceNoiseDensity", forceNoiseDensity, "N/sqrt(Hz)");
        Checks.nonNegative(WHERE, "responseNoiseDensity", responseNoiseDensity, "units/sqrt(Hz)");
        Checks.positive(WHERE, "forceFullScale", forceFullScale, "N");
        Checks.positive(WHERE, "responseFullScale", responseFullScale, "m or m/s^2");
        Checks.intRange(WHERE, "adcBits", adcBits, 8, 32);
        Checks.positive(WHERE, "mainsHz", mainsHz, "Hz");
        Checks.nonNegative(WHERE, "mainsAmplitude", mainsAmplitude, "m or m/s^2");
        Checks.intRange(WHERE, "mainsHarmonicCount", mainsHarmonicCount, 0, 20);
    }

    /** @param positionM new stinger position, m @return a copy with the stinger there */
    public SensorSetup withForcingPositionM(double positionM) {
        return new SensorSetup(positionM, sensorPositionM, responseSensor, accelerometerMassKg, sensorAngleRad,
                forceNoiseDensity, responseNoiseDensity, forceFullScale, responseFullScale, adcBits, mainsHz,
                mainsAmplitude, mainsHarmonicCount);
    }

    /** @param positionM new response transducer position, m @return a copy with the transducer there */
    public SensorSetup withSensorPositionM(double positionM) {
        return new SensorSetup(forcingPositionM, positionM, responseSensor, accelerometerMassKg, sensorAngleRad,
                forceNoiseDensity, responseNoiseDensity, forceFullScale, responseFullScale, adcBits, mainsHz,
                mainsAmplitude, mainsHarmonicCount);
    }

    /**
     * @param newForceFullScale force full scale, N
     * @param newResponseFullScale response full scale, m or m/s^2
     * @return a copy with those ADC ranges
     */
    public SensorSetup withFullScales(double newForceFullScale, double newResponseFullScale) {
        return new SensorSetup(forcingPositionM, sensorPositionM, responseSensor, accelerometerMassKg, sensorAngleRad,
                forceNoiseDensity, responseNoiseDensity, newForceFullScale, newResponseFullScale, adcBits, mainsHz,
                mainsAmplitude, mainsHarmonicCount);
    }

    /**
     * @param sensor response transducer kind
     * @param massKg its added mass, kg (0 for DISPLACEMENT)
     * @param newResponseFullScale response full scale in the new unit
     * @param newResponseNoiseDensity response noise density in the new unit
     * @return a copy with that transducer; mains hum is kept in the new unit's numbers
     */
    public SensorSetup withResponseSensor(ResponseSensor sensor, double massKg, double newResponseFullScale,
                                          double newResponseNoiseDensity) {
        return new SensorSetup(forcingPositionM, sensorPositionM, sensor, massKg, sensorAngleRad, forceNoiseDensity,
                newResponseNoiseDensity, forceFullScale, newResponseFullScale, adcBits, mainsHz, mainsAmplitude,
                mainsHarmonicCount);
    }

    /** @return a copy with zero noise on both channels and no mains hum (quantisation stays) */
    public SensorSetup withoutNoise() {
        return new SensorSetup(forcingPositionM, sensorPositionM, responseSensor, accelerometerMassKg, sensorAngleRad,
                0.0, 0.0, forceFullScale, responseFullScale, adcBits, mainsHz, 0.0, 0);
    }
}
