package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.tautline.driver.sim.SimulatedRig;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/**
 * Test helper: a serial rig and an in-process simulated rig given the same drive commands; every block the serial
 * rig returns must equal, sample for sample (float64 link), what the in-process rig computes for the same indices.
 * After a read that lost its data the in-process rig skips ahead to where the serial one stands.
 */
final class ReferenceRig implements AutoCloseable {
    private final Rig serial;
    private final SimulatedRig reference = new SimulatedRig(RigScript.CONFIG);
    private long verifiedSamples;

    /** @param serial the rig under test, on the virtual rig with {@link RigScript#CONFIG} */
    ReferenceRig(Rig serial) {
        this.serial = serial;
    }

    /** Sets the same sine on both. */
    void setSine(double frequencyHz, double amplitudeV) {
        serial.exciter().setSine(frequencyHz, amplitudeV);
        catchUp(serial.acquisition().nextSampleIndex());
        reference.exciter().setSine(frequencyHz, amplitudeV);
    }

    /** Switches both on and ramps both to the demo drive at 250 Hz. */
    void driveOn() {
        SerialLinks.driveOn(serial);
        SerialLinks.driveOn(reference);
    }

    /**
     * Reads on the serial rig and checks the samples; a {@link org.tautline.driver.RigDataLostException} passes through.
     *
     * @param n samples per channel
     * @return the checked block
     */
    SampleBlock readAndCheck(int n) {
        SampleBlock got = serial.acquisition().read(n);
        catchUp(got.firstSampleIndex());
        SampleBlock want = reference.acquisition().read(n);
        for (int c = 0; c < 2; c++) {
            assertArrayEquals(want.samples()[c], got.samples()[c], "channel " + c + " of the read from sample "
                    + got.firstSampleIndex() + ": the serial rig returned samples that are not the device's");
        }
        verifiedSamples += n;
        return got;
    }

    /** @return samples per channel verified so far */
    long verifiedSamples() {
        return verifiedSamples;
    }

    private void catchUp(long index) {
        long behind = index - reference.acquisition().nextSampleIndex();
        assertTrue(behind >= 0, "the serial rig went back to sample " + index);
        while (behind > 0) {
            int chunk = (int) Math.min(behind, 1 << 16);
            reference.acquisition().read(chunk);
            behind -= chunk;
        }
    }

    @Override
    public void close() {
        reference.close();
    }
}
