package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.tautline.driver.RigDataLostException;

/**
 * 200 injected faults of each recoverable kind at seeded random moments during short reads and drive commands:
 * every read either returns the device's exact samples or throws {@link RigDataLostException}; nothing is fatal.
 */
@Timeout(value = 180)
class SerialSoakTest {
    private static final int FAULTS_PER_KIND = 200;
    /** Mean items between two faults of one kind; with four kinds, a fault every 3 items or so. */
    private static final int MEAN_GAP_ITEMS = 12;

    @Test
    void twoHundredFaultsOfEachRecoverableKindNeverEndTheSessionNorCorruptARead() {
        SerialLinkSettings settings = SerialLinkSettings.defaults().withFormat(SampleFormat.FLOAT64_LE)
                .withBlockSamples(32).withBlockTimeoutMs(40).withReplyTimeoutMs(3000);
        Map<InjectedFault, Integer> parameters = new EnumMap<>(InjectedFault.class);
        parameters.put(InjectedFault.DROP_BYTES, 7);
        parameters.put(InjectedFault.CORRUPT_BLOCK, 0);
        parameters.put(InjectedFault.LOSE_BLOCK, 0);
        parameters.put(InjectedFault.STALL, 30);
        FaultSchedule schedule = new FaultSchedule(List.of());
        long seed = 20240611;
        for (Map.Entry<InjectedFault, Integer> p : parameters.entrySet()) {
            schedule = schedule.and(FaultSchedule.spread(p.getKey(), p.getValue(), FAULTS_PER_KIND, 3, MEAN_GAP_ITEMS,
                    seed++));
        }
        long start = System.nanoTime();
        int reads = 0;
        int lost = 0;
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), settings);
             ReferenceRig both = new ReferenceRig(rig)) {
            both.driveOn();
            server.schedule(schedule);
            while (server.pendingFaults() > 0 && reads < 5000) {
                if (reads % 8 == 7) {
                    both.setSine(245 + reads % 11, RigScript.DRIVE_V);
                }
                try {
                    both.readAndCheck(96 + reads % 5 * 7);
                } catch (RigDataLostException e) {
                    lost++;
                }
                reads++;
            }
            for (InjectedFault f : parameters.keySet()) {
                assertEquals(FAULTS_PER_KIND, server.injected(f), f + " faults injected");
            }
            assertNull(rig.fault(), "no recoverable fault may end the session");
            assertTrue(rig.exciter().isOutputEnabled() && server.outputEnabled(), "the drive stayed on throughout");
            System.out.printf("soak: %d faults of each of %s in %d reads (%d lost their data and were repeatable,"
                    + " %d blocks recovered by re-requests, %d samples per channel verified) in %.1f s%n",
                    FAULTS_PER_KIND, parameters.keySet(), reads, lost, rig.blocksRecovered(), both.verifiedSamples(),
                    (System.nanoTime() - start) / 1e9);
            assertTrue(rig.blocksRecovered() >= FAULTS_PER_KIND / 2, "re-requests repair faults: "
                    + rig.blocksRecovered() + " blocks recovered");
        }
    }
}
