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

    /**
     * Switches the output off at once, from any thread, even while another thread is inside a command or a read.
     *
     * <p>This is the emergency path of a stop (an interrupt signal, a closing window): it must not wait for
     * a lock that a read or a command holds, must return within about 100 ms, and must never throw. Where the
     * rig cannot do that it returns false, and the sweep switches the output off at its next check (before
     * the next block). After a true return {@link #isOutputEnabled()} answers false and the output stays off
     * until {@link #setOutputEnabled(boolean) setOutputEnabled(true)}.
     *
     * @return true when the off command was issued, false when this rig has no such path
     */
    default boolean switchOffNow() {
        return false;
    }
}
