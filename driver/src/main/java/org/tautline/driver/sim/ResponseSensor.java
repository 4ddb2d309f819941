package org.tautline.driver.sim;

/** What the simulated response transducer measures. */
public enum ResponseSensor {
    /** A non-contact displacement probe: no added mass, samples in m. */
    DISPLACEMENT,
    /** An accelerometer fixed to the specimen: adds its mass at the sensor point, samples in m/s^2. */
    ACCELERATION
}
