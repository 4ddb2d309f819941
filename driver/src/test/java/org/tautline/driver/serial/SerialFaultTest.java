package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;

/** Faults that end a session, injected in the middle of a read: the read throws, the output goes off. */
@Timeout(value = 60)
class SerialFaultTest {
    /** Items into a read of 2048 samples (32 blocks of 64) at which the fault strikes. */
    private static final long MID_FETCH = 6;

    /** The fatal faults, how they are scheduled, and the kind each must surface as. */
    enum Fatal {
        AMPLIFIER_FAULT(Kind.DEVICE_ERROR, FaultSchedule.at(InjectedFault.AMPLIFIER_FAULT, MID_FETCH)),
        AMPLIFIER_FAULT_NOTICE_LOST(Kind.DEVICE_ERROR, FaultSchedule.at(InjectedFault.AMPLIFIER_FAULT, MID_FETCH)
                .and(FaultSchedule.at(InjectedFault.DROP_BYTES, MID_FETCH))),
        RESET(Kind.DEVICE_RESET, FaultSchedule.at(InjectedFault.RESET, MID_FETCH)),
        RESET_NOTICE_LOST(Kind.DEVICE_RESET, FaultSchedule.at(InjectedFault.RESET, MID_FETCH)
                .and(FaultSchedule.at(InjectedFault.DROP_BYTES, MID_FETCH))),
        LONG_STALL(Kind.TIMEOUT, new FaultSchedule(List.of(new FaultSchedule.Entry(MID_FETCH, InjectedFault.STALL,
                SerialLinks.SILENCE_MS + 1500)))),
        DISAPPEAR(Kind.PORT_GONE, FaultSchedule.at(InjectedFault.DISAPPEAR, MID_FETCH));

        final Kind kind;
        final FaultSchedule schedule;

        Fatal(Kind kind, FaultSchedule schedule) {
            this.kind = kind;
            this.schedule = schedule;
        }
    }

    @ParameterizedTest
    @EnumSource(Fatal.class)
    void aFatalFaultMidReadEndsTheReadAndTheOutputGoesOff(Fatal fault) {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), SerialLinks.quick())) {
            SerialLinks.driveOn(rig);
            rig.acquisition().read(256);
            server.schedule(fault.schedule);
            RigLinkException e = assertThrows(RigLinkException.class, () -> rig.acquisition().read(2048),
                    "a read hit by " + fault + " must never return its samples as good data");
            assertEquals(fault.kind, e.kind(), e.getMessage());
            assertTrue(e.getMessage().contains(server.hostPath()), e.getMessage());
            SerialRig.FaultRecord record = rig.fault();
            assertNotNull(record);
            assertEquals(fault.kind, record.fault().kind());
            assertFalse(rig.exciter().isOutputEnabled());
            assertFalse(server.outputEnabled(), "the device's output must be off");
            if (fault == Fatal.DISAPPEAR) {
                assertEquals(-1, record.offSentNanoTime(), "no port to command the output off on");
            } else {
                // Causality, not a time bound: the host's DRIVE:OUT OFF reached the device after the fault struck.
                long struck = SerialLinks.firstLogged(server, "fault", null, 0).nanoTime();
                VirtualRigLog.Entry off = SerialLinks.firstLogged(server, "recv", "DRIVE:OUT OFF", struck);
                System.out.printf("%s: DRIVE:OUT OFF reached the device %.1f ms after the host detected the fault"
                        + " (%.1f ms after the fault struck)%n", fault, (off.nanoTime() - record.detectedNanoTime()) / 1e6,
                        (off.nanoTime() - struck) / 1e6);
            }
            RigLinkException later = assertThrows(RigLinkException.class, () -> rig.acquisition().read(10));
            assertEquals(fault.kind, later.kind());
        }
    }

    @Test
    void theDeviceWatchdogSwitchesTheOutputOffWhenTheHostFallsSilent() throws InterruptedException {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), SerialLinks.quick().withWatchdogMs(200))) {
            SerialLinks.driveOn(rig);
            assertTrue(server.outputEnabled());
            while (server.outputEnabled()) {
                Thread.sleep(20);
            }
            assertTrue(server.log().stream().anyMatch(e -> e.text().equals("off watchdog expired after 200 ms without a"
                    + " command line")), server.log().toString());
            RigLinkException e = assertThrows(RigLinkException.class, () -> rig.acquisition().read(100));
            assertEquals(Kind.DEVICE_ERROR, e.kind());
            // The notice, or the status of the read when the read began before the notice was in.
            String byNotice = "the device switched its output off by itself (Watchdog expired after 200 ms: output"
                    + " switched off, fault 101) on " + server.hostPath() + "; expected no device fault during a"
                    + " session; check the amplifier and the rig, then reconnect";
            String byStatus = "the device's output went off by itself during ACQ:FETCH? 100 (fault 101, the watchdog"
                    + " expired) on " + server.hostPath() + "; expected the output to stay on until the host switches"
                    + " it off; check the amplifier and the rig";
            assertTrue(e.getMessage().equals(byNotice) || e.getMessage().equals(byStatus), e.getMessage());
        }
    }

    @Test
    void anAmplifierFaultBetweenReadsStopsTheNextDriveCommand() {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), SerialLinks.quick())) {
            SerialLinks.driveOn(rig);
            server.schedule(FaultSchedule.at(InjectedFault.DROP_BYTES, 0));
            server.amplifierFault();
            RigLinkException e = assertThrows(RigLinkException.class, () -> rig.exciter().setSine(251, 0.5));
            assertEquals(Kind.DEVICE_ERROR, e.kind(), e.getMessage());
            assertFalse(server.outputEnabled());
        }
    }

    @Test
    void theHandshakeReadsIdentityVersionAndChannels() {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), SerialLinks.quick())) {
            assertEquals("Tautline Virtual rig, serial SIM-1, firmware 2.0", rig.identity());
            assertEquals(2, rig.protocolVersion());
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
