package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.atomic.AtomicLong;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.tautline.driver.spi.SampleBlock;

/** The emergency switch-off from another thread while the rig's own thread is inside a long read. */
@Timeout(value = 60)
class SwitchOffNowTest {
    /** A read of 8192 float64 samples of 2 channels: about 1.4 s on a paced line of 921600 baud. */
    private static final int LONG_READ = 8192;

    @Test
    void switchOffNowDuringALongReadPutsDriveOutOffOnTheWireBeforeTheReadReturns() throws Exception {
        VirtualRigSettings paced = VirtualRigSettings.of(921600).withPacing(true);
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, paced);
             SerialRig rig = SerialRig.open(server.hostPath(), SerialLinks.quick().withBlockSamples(1024))) {
            SerialLinks.driveOn(rig);
            long before = server.itemsSent();
            AtomicLong readReturned = new AtomicLong();
            CompletableFuture<SampleBlock> read = CompletableFuture.supplyAsync(() -> {
                SampleBlock b = rig.acquisition().read(LONG_READ);
                readReturned.set(System.nanoTime());
                return b;
            });
            while (server.itemsSent() < before + 2 && !read.isDone()) {
                Thread.sleep(1);
            }
            long called = System.nanoTime();
            boolean issued = rig.exciter().switchOffNow();
            long returned = System.nanoTime();
            assertTrue(issued, "the off command was written");
            assertFalse(rig.exciter().isOutputEnabled(), "the host side counts the output off at once");
            SampleBlock block = read.get();
            assertEquals(LONG_READ, block.samples()[0].length, "the read in progress completes");
            VirtualRigLog.Entry off = SerialLinks.firstLogged(server, "recv", "DRIVE:OUT OFF", called);
            assertTrue(off.nanoTime() < readReturned.get(), "DRIVE:OUT OFF reached the device before the read returned");
            assertFalse(server.outputEnabled());
            assertNull(rig.fault(), "an emergency stop is not a link fault");
            System.out.printf("switchOffNow: returned after %.2f ms; DRIVE:OUT OFF received by the device %.2f ms after"
                    + " the call; the read returned %.0f ms later%n", (returned - called) / 1e6,
                    (off.nanoTime() - called) / 1e6, (readReturned.get() - off.nanoTime()) / 1e6);
        }
    }

    @Test
    void afterSwitchOffNowARampIsNotSentAndSwitchingOnWorksAgain() {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), SerialLinks.quick())) {
            SerialLinks.driveOn(rig);
            assertTrue(rig.exciter().switchOffNow());
            long after = System.nanoTime();
            rig.exciter().rampTo(0.0, 0.02);
            rig.acquisition().read(100);
            assertTrue(server.log().stream().noneMatch(e -> e.nanoTime() > after && e.text().startsWith("DRIVE:RAMP")),
                    "no ramp on an output that is off: " + server.log());
            assertFalse(server.outputEnabled());
            rig.exciter().setOutputEnabled(true);
            assertTrue(server.outputEnabled());
            assertTrue(rig.exciter().isOutputEnabled());
        }
    }

    @Test
    void switchOffNowOnAClosedRigAnswersFalseWithoutThrowing() {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600)) {
            SerialRig rig = SerialRig.open(server.hostPath(), SerialLinks.quick());
            rig.close();
            assertFalse(rig.exciter().switchOffNow());
            assertFalse(rig.exciter().isOutputEnabled());
        }
    }
}
