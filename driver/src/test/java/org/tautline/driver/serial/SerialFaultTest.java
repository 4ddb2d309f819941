package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;
import org.tautline.driver.sweep.SweepStatus;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepResult;

@Timeout(value = 120)
class SerialFaultTest {
    /** Faults the link cannot recover from, and the kind each must surface as. */
    enum Fatal {
        CRC_TWICE(Kind.CRC, s -> s.corruptBlock(2)),
        BLOCK_AND_RESEND_LOST(Kind.SEQUENCE_GAP, s -> s.loseBlock(2)),
        STALL(Kind.TIMEOUT, s -> s.stall(3000)),
        RESET(Kind.DEVICE_RESET, VirtualRigServer::reset),
        AMPLIFIER_FAULT(Kind.DEVICE_ERROR, VirtualRigServer::amplifierFault),
        GARBLED_REPLY(Kind.PROTOCOL, VirtualRigServer::garbleNextReply),
        DISAPPEAR(Kind.PORT_GONE, VirtualRigServer::disappear);

        final Kind kind;
        final Consumer<VirtualRigServer> inject;

        Fatal(Kind kind, Consumer<VirtualRigServer> inject) {
            this.kind = kind;
            this.inject = inject;
        }
    }

    /** Faults a re-request or resynchronisation recovers from. */
    enum Recoverable {
        CRC_ONCE(s -> s.corruptBlock(1)),
        BLOCK_LOST(s -> s.loseBlock(1)),
        BYTES_DROPPED(s -> s.dropBytes(7)),
        GARBAGE_BEFORE_BLOCK(s -> s.insertGarbage("zz#9\u0001\u0002#1x\n%%".getBytes(StandardCharsets.ISO_8859_1))),
        SHORT_STALL(s -> s.stall(100));

        final Consumer<VirtualRigServer> inject;

        Recoverable(Consumer<VirtualRigServer> inject) {
            this.inject = inject;
        }
    }

    private static final int FAULT_AFTER_STEP = 10;

    private static SerialLinkSettings quick() {
        return SerialLinkSettings.defaults().withFormat(SampleFormat.FLOAT64_LE).withReplyTimeoutMs(400)
                .withBlockTimeoutMs(400);
    }

    @ParameterizedTest
    @EnumSource(Fatal.class)
    void aFatalFaultSurfacesAsItsKindSwitchesTheOutputOffAndKeepsTheCompletedSteps(Fatal fault) {
        List<SweepPoint> reference = SerialSweepTest.inProcess().points();
        List<SweepPoint> seen = new ArrayList<>();
        try (VirtualRigServer server = VirtualRigServer.startOnPty(SerialSweepTest.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), quick())) {
            SweepResult stopped = SerialSweepTest.sweep(rig, SerialSweepTest.plan(), p -> {
                if (!p.completed()) {
                    return;
                }
                seen.add(p.point());
                if (p.stepNumber() == FAULT_AFTER_STEP) {
                    fault.inject.accept(server);
                }
            });
            assertEquals(SweepStatus.FAULT, stopped.status(), stopped.reason());
            assertEquals(seen.size(), stopped.points().size(), "the sweep keeps every completed step");
            assertTrue(stopped.reason().contains(server.hostPath()), stopped.reason());
            SerialRig.FaultRecord record = rig.fault();
            assertNotNull(record);
            assertEquals(fault.kind, record.fault().kind(), record.fault().getMessage());
            assertFalse(rig.exciter().isOutputEnabled());
            // The steps done before the fault are kept, and are those of the in-process sweep.
            assertTrue(seen.size() >= FAULT_AFTER_STEP && seen.size() < reference.size(), "steps " + seen.size());
            for (int i = 0; i < seen.size(); i++) {
                assertEquals(reference.get(i).response(), seen.get(i).response(), "step " + i);
            }
            if (fault == Fatal.DISAPPEAR) {
                assertEquals(-1, record.offSentNanoTime(), "no port to command the output off on");
            } else {
                long arrived = firstOffCommandAfter(server, record.detectedNanoTime());
                double ms = (arrived - record.detectedNanoTime()) / 1e6;
                assertTrue(ms >= 0 && ms < 100, fault + ": DRIVE:OUT OFF reached the device " + ms
                        + " ms after the fault was detected; the safety rule asks for under 100 ms");
            }
            assertFalse(server.outputEnabled(), "the device's output must be off");
            RigLinkException later = assertThrows(RigLinkException.class, () -> rig.acquisition().read(10));
            assertEquals(fault.kind, later.kind());
        }
    }

    private static long firstOffCommandAfter(VirtualRigServer server, long nanoTime) {
        for (VirtualRigServer.LogEntry entry : server.log()) {
            if (entry.nanoTime() >= nanoTime && entry.event().equals("command DRIVE:OUT OFF")) {
                return entry.nanoTime();
            }
        }
        throw new AssertionError("the device never received DRIVE:OUT OFF after the fault; log " + server.log());
    }

    @ParameterizedTest
    @EnumSource(Recoverable.class)
    void aRecoverableFaultIsRepairedAndTheSweepStillEqualsTheInProcessOne(Recoverable fault) {
        SweepResult reference = SerialSweepTest.inProcess();
        try (VirtualRigServer server = VirtualRigServer.startOnPty(SerialSweepTest.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), quick())) {
            SweepResult record = SerialSweepTest.sweep(rig, SerialSweepTest.plan(), p -> {
                if (p.completed() && p.stepNumber() == FAULT_AFTER_STEP) {
                    fault.inject.accept(server);
                }
            });
            assertTrue(record.completed());
            assertNull(rig.fault());
            for (int i = 0; i < reference.points().size(); i++) {
                assertEquals(reference.points().get(i).response(), record.points().get(i).response(), "step " + i);
            }
            switch (fault) {
                case CRC_ONCE, BLOCK_LOST, BYTES_DROPPED -> assertEquals(1, rig.blocksRecovered());
                case GARBAGE_BEFORE_BLOCK -> assertTrue(rig.strayByteEvents() > 0);
                case SHORT_STALL -> assertEquals(0, rig.blocksRecovered());
            }
            assertFalse(server.outputEnabled());
        }
    }

    @Test
    void theDeviceWatchdogSwitchesTheOutputOffWhenTheHostFallsSilent() throws InterruptedException {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(SerialSweepTest.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), quick().withWatchdogMs(200))) {
            rig.exciter().setSine(250, 0.5);
            rig.exciter().setOutputEnabled(true);
            assertTrue(server.outputEnabled());
            Thread.sleep(600);
            assertFalse(server.outputEnabled(), "the watchdog should have switched the output off");
            assertTrue(server.log().stream().anyMatch(e -> e.event().startsWith("output off: watchdog expired after 200 ms")),
                    server.log().toString());
            RigLinkException e = assertThrows(RigLinkException.class, () -> rig.acquisition().read(100));
            assertEquals(Kind.DEVICE_ERROR, e.kind());
            assertEquals("the device's watchdog switched the output off ('!WDOG 200') on " + server.hostPath()
                    + "; expected a command within the watchdog time", e.getMessage());
        }
    }

    @Test
    void theHandshakeReadsIdentityVersionAndChannelsAndARefusedSettingIsADeviceError() {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(SerialSweepTest.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), quick())) {
            assertEquals("Tautline Virtual rig, serial SIM-1, firmware 1.0", rig.identity());
            assertEquals(1, rig.protocolVersion());
            assertEquals(0, rig.bootCount());
            assertEquals(20000.0, rig.acquisition().sampleRateHz());
            assertEquals("force", rig.acquisition().channels().get(0).quantity());
            assertEquals("displacement", rig.acquisition().channels().get(1).quantity());
            // Source: 5 N full scale over 2^23 counts of a 24-bit converter (SimulationConfigs.demoWire).
            assertEquals(5.0 / (1 << 23), rig.sensitivity(0), 0.0);
            assertEquals(10.0, rig.exciter().maxAmplitudeV());
            assertEquals(0, rig.acquisition().read(3000).firstSampleIndex());
            assertEquals(3000, rig.acquisition().nextSampleIndex());
            assertEquals(0.15, rig.acquisition().rigTimeS(), 1e-15);
        }
    }
}
