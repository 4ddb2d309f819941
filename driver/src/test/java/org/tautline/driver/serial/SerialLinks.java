package org.tautline.driver.serial;

import org.tautline.driver.spi.Rig;

/** Test helper: link settings for fault tests, and log look-ups. */
final class SerialLinks {
    /** Silence that counts as a fault in {@link #quick()}, ms: the serial driver's default, ample on a busy machine. */
    static final int SILENCE_MS = 2000;

    private SerialLinks() {
    }

    /** @return float64 blocks of 64 samples, 300 ms block timeout, {@value #SILENCE_MS} ms silence timeout */
    static SerialLinkSettings quick() {
        return SerialLinkSettings.defaults().withFormat(SampleFormat.FLOAT64_LE).withBlockSamples(64)
                .withBlockTimeoutMs(300).withReplyTimeoutMs(SILENCE_MS);
    }

    /** Sine at 250 Hz, output on, ramp to the demo drive. */
    static void driveOn(Rig rig) {
        rig.exciter().setSine(250, 0.0);
        rig.exciter().setOutputEnabled(true);
        rig.exciter().rampTo(RigScript.DRIVE_V, 0.01);
    }

    /**
     * @param server the server
     * @param kind an entry kind
     * @param text the exact text, or null for any
     * @param afterNanoTime the earliest {@link System#nanoTime()}
     * @return the first such entry
     */
    static VirtualRigLog.Entry firstLogged(VirtualRigServer server, String kind, String text, long afterNanoTime) {
        for (VirtualRigLog.Entry e : server.log()) {
            if (e.nanoTime() >= afterNanoTime && e.kind().equals(kind) && (text == null || e.text().equals(text))) {
                return e;
            }
        }
        throw new AssertionError("no '" + kind + " " + text + "' in the virtual rig's log after " + afterNanoTime
                + ": " + server.log());
    }
}
