package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.function.Consumer;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.tautline.driver.RigDataLostException;

/** Link faults the host recovers from: by a re-request, a retry, or at worst a read that loses its data. */
@Timeout(value = 60)
class SerialRecoveryTest {
    /** Faults a re-request or retry repairs without losing a sample. */
    enum Repaired {
        CRC_ONCE(s -> s.corruptBlock(1)),
        BLOCK_LOST(s -> s.loseBlock(1)),
        BYTES_DROPPED_FROM_A_BLOCK(s -> s.dropBytes(7)),
        GARBAGE_BEFORE_A_BLOCK(s -> s.insertGarbage("zz#9\u0001\u0002#1x\n%%".getBytes(StandardCharsets.ISO_8859_1))),
        SHORT_STALL(s -> s.stall(60)),
        GARBLED_STATUS(VirtualRigServer::garbleNextReply),
        BYTES_DROPPED_FROM_A_STATUS(s -> s.schedule(FaultSchedule.at(InjectedFault.DROP_BYTES, 16))),
        BYTES_DROPPED_INSIDE_A_STATUS(s -> s.schedule(FaultSchedule.at(InjectedFault.DROP_BYTES, 16, 33)));

        final Consumer<VirtualRigServer> inject;

        Repaired(Consumer<VirtualRigServer> inject) {
            this.inject = inject;
        }
    }

    @ParameterizedTest
    @EnumSource(Repaired.class)
    void aRepairableFaultLosesNoSample(Repaired fault) {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), SerialLinks.quick());
             ReferenceRig both = new ReferenceRig(rig)) {
            both.driveOn();
            both.readAndCheck(512);
            fault.inject.accept(server);
            both.readAndCheck(1024);
            both.setSine(252, RigScript.DRIVE_V);
            both.readAndCheck(1024);
            assertNull(rig.fault());
            assertTrue(rig.exciter().isOutputEnabled());
            switch (fault) {
                // At least the damaged block; on a busy machine a slow block may be asked for again as well.
                case CRC_ONCE, BLOCK_LOST, BYTES_DROPPED_FROM_A_BLOCK -> assertTrue(rig.blocksRecovered() >= 1);
                case GARBAGE_BEFORE_A_BLOCK -> assertTrue(rig.strayByteEvents() > 0);
                default -> assertTrue(server.log().stream().anyMatch(e -> e.kind().equals("fault")), server.log().toString());
            }
        }
    }

    @Test
    void err102OnAReRequestLosesTheReadAtOnceAndTheNextReadIsGoodAndContiguous() {
        // A block timeout of 20 s: the read can only end quickly by acting on the !ERR itself.
        SerialLinkSettings patient = SerialLinks.quick().withBlockTimeoutMs(20_000);
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), patient);
             ReferenceRig both = new ReferenceRig(rig)) {
            both.driveOn();
            both.readAndCheck(256);
            server.schedule(FaultSchedule.at(InjectedFault.CORRUPT_BLOCK, 3).and(FaultSchedule.at(
                    InjectedFault.FORGET_HISTORY, 3)));
            long start = System.nanoTime();
            RigDataLostException e = assertThrows(RigDataLostException.class, () -> rig.acquisition().read(1024));
            long thrown = System.nanoTime();
            assertTrue(e.getMessage().startsWith("samples were lost on " + server.hostPath() + ": the device could not"
                    + " resend data block "), e.getMessage());
            assertTrue(e.getMessage().contains("(102,\"Block "), e.getMessage());
            VirtualRigLog.Entry err = SerialLinks.firstLogged(server, "notice", null, start);
            assertTrue(err.text().startsWith("!ERR 102,"), err.text());
            VirtualRigLog.Entry abort = SerialLinks.firstLogged(server, "recv", "ACQ:ABORT", err.nanoTime());
            System.out.printf("!ERR 102: the host sent ACQ:ABORT %.1f ms after the device sent the notice; the read"
                    + " threw %.1f ms after it began%n", (abort.nanoTime() - err.nanoTime()) / 1e6, (thrown - start) / 1e6);
            long next = rig.acquisition().nextSampleIndex();
            assertTrue(next > 256 + 3 * 64, "the cursor moved past the lost samples: " + next);
            assertEquals(next, both.readAndCheck(1024).firstSampleIndex(), "the next read starts where the device stands");
            both.readAndCheck(100);
            assertNull(rig.fault());
        }
    }

    @Test
    void aBlockDamagedTwiceOrLostTwiceLosesTheReadAndTheLinkStaysUsable() {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), SerialLinks.quick());
             ReferenceRig both = new ReferenceRig(rig)) {
            both.driveOn();
            server.corruptBlock(2);
            assertThrows(RigDataLostException.class, () -> both.readAndCheck(1024));
            both.readAndCheck(1024);
            server.loseBlock(2);
            RigDataLostException e = assertThrows(RigDataLostException.class, () -> both.readAndCheck(1024));
            assertTrue(e.getMessage().contains("did not arrive within"), e.getMessage());
            both.setSine(251, RigScript.DRIVE_V);
            both.readAndCheck(1024);
            assertNull(rig.fault());
            assertTrue(server.outputEnabled());
        }
    }
}
