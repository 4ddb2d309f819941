package org.tautline.driver.spi;

/**
 * The drive side of a rig: a sine source feeding the shaker amplifier.
 *
 * <p>Frequency changes are phase-continuous. Amplitude is the peak drive voltage. Implementations
 * keep the output off until {@link #setOutputEnabled(boolean)} turns it on.
 */
public interface Exciter {

    /**
     * Sets the sine at once, keeping the phase continuous.
     *
     * @param frequencyHz drive frequency, Hz
     * @param amplitudeV peak drive voltage, V, at most {@link #maxAmplitudeV()}
     */
    void setSine(double frequencyHz, double amplitudeV);

    /**
     * Ramps the amplitude linearly to a new value over a time measured in rig seconds.
     *
     * <p>Returns once the ramp has been commanded; the ramp runs in rig time as samples are acquired
     * (a simulated rig advances its own clock through the ramp before returning).
     *
     * @param amplitudeV target peak drive voltage, V
     * @param durationS ramp duration, s (0 = step)
     */
    void rampTo(double amplitudeV, double durationS);

    /** @param enabled true to connect the source to the amplifier, false to disconnect it */
    void setOutputEnabled(boolean enabled);

    /** @return true while the output is on */
    boolean isOutputEnabled();

    /** @return the largest peak drive voltage the exciter accepts, V */
    double maxAmplitudeV();
}
