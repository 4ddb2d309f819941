package org.tautline.driver.spi;

/**
 * A connected rig: an exciter and an acquisition with a force channel and a response channel.
 *
 * <p>Channel 0 is the force at the drive point; channel 1 the response. {@link #close()} must
 * switch the excitation off, whatever state the rig is in.
 */
public interface Rig extends AutoCloseable {

    /** @return a one-line identity, for example maker, model, serial number, firmware */
    String identity();

    /** @return the drive side */
    Exciter exciter();

    /** @return the measuring side */
    Acquisition acquisition();

    /** Switches the excitation off and releases the rig. Never throws for a rig already closed. */
    @Override
    void close();
}
