package org.tautline.driver.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.tautline.driver.RigException;

class SimulationConfigLimitTest {

    @Test
    void refusesModesTooCloseToTheNyquistFrequency() {
        // Demo wire: f0 = sqrt(146.5/0.002)/1.2 = 225.5 Hz, B = pi^2 EI/(T L^2) = 1.149e-4 (Fletcher 1964), so harmonic
        // 60 lies at 60 f0 sqrt(1 + 3600 B) (1 + 0.007 split) = 16202 Hz, far above 0.4 x 20 kS/s.
        SimulationConfig demo = SimulationConfigs.demoWire();
        RigException e = assertThrows(RigException.class, () -> demo.withSpecimen(demo.specimen().withModeCount(60)));
        assertEquals("SimulationConfig: the highest simulated mode (harmonic 60, 16202 Hz) must lie below 0.4 of the"
                + " sample rate (8000 Hz); simulate fewer modes or sample faster", e.getMessage());
        assertEquals(30, demo.specimen().modeCount(), "the demo's 30 modes (7.2 kHz at the top) fit");
    }
}
