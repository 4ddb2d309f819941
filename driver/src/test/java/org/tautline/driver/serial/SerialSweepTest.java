package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.tautline.driver.spi.SampleBlock;

@Timeout(value = 120)
class SerialSweepTest {
    /** 30 steps across the first mode of the demo wire (about 250 Hz), 0.1 s settle, 0.05 s kept. */
    private static List<SampleBlock> script(SerialRig rig) {
        return RigScript.steppedSine(rig, 235, 265, 30, 2000, 1000);
    }

    @Test
    void float64StepsOverThePtyEqualTheInProcessStepsExactly() {
        List<SampleBlock> reference = RigScript.inProcess(235, 265, 30, 2000, 1000);
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(),
                     SerialLinkSettings.defaults().withFormat(SampleFormat.FLOAT64_LE))) {
            List<SampleBlock> serial = script(rig);
            assertEquals(reference.size(), serial.size());
            for (int i = 0; i < serial.size(); i++) {
                assertEquals(reference.get(i).firstSampleIndex(), serial.get(i).firstSampleIndex(), "step " + i);
                for (int c = 0; c < 2; c++) {
                    assertArrayEquals(reference.get(i).samples()[c], serial.get(i).samples()[c], "step " + i);
                }
            }
            assertFalse(server.outputEnabled());
            assertNull(rig.fault());
        }
    }

    @Test
    void float32StepsDifferFromTheInProcessStepsByBinary32RoundingOnly() {
        List<SampleBlock> reference = RigScript.inProcess(235, 265, 30, 2000, 1000);
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath())) {
            List<SampleBlock> serial = script(rig);
            for (int i = 0; i < serial.size(); i++) {
                for (int c = 0; c < 2; c++) {
                    double[] want = reference.get(i).samples()[c];
                    double[] got = serial.get(i).samples()[c];
                    for (int k = 0; k < want.length; k++) {
                        // IEEE 754-2008: rounding to binary32 changes a value by at most half an ulp of the result.
                        assertTrue(Math.abs(got[k] - want[k]) <= Math.ulp((float) want[k]) / 2,
                                "step " + i + ", channel " + c + ", sample " + k + ": " + got[k] + " vs " + want[k]);
                    }
                }
            }
        }
    }
}
