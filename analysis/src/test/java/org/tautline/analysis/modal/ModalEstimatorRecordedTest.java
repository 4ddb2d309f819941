package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfCsvReader;

/** The whole modal fit on FRFs recorded from the simulated rig (an invented specimen), where it once broke. */
class ModalEstimatorRecordedTest {

    static Frf recorded(String name) throws IOException {
        try (InputStream in = ModalEstimatorRecordedTest.class.getResourceAsStream(name)) {
            assertNotNull(in, "test resource " + name);
            return FrfCsvReader.read(in, name).frf();
        }
    }

    @Test
    void fitsTheSweepWhoseOrder32DenominatorStalledTheSchurIteration() throws IOException {
        // The simulated rig's seed-2 specimen, swept 200 to 720 Hz in 430 steps; its file names the truth:
        // 153.67 N, 0.00200926 kg/m, EI 0.000613533 N m^2, pinned ends, 0.60 m span (the sim's own wire).
        ModalEstimate estimate = ModalEstimator.defaults().estimate(recorded("sim-seed2-200-720Hz.csv"));
        double f0 = Math.sqrt(153.67 / 0.00200926) / (2 * 0.60);
        double b = Math.PI * Math.PI * 0.000613533 / (153.67 * 0.60 * 0.60);
        for (int n = 1; n <= 3; n++) {
            // Pinned stiff string, f_n = n f0 sqrt(1 + B n^2), B = pi^2 EI/(T L^2) (Fletcher, JASA 36:203, 1964,
            // from memory); the second polarisation lies about 0.7 % above and may be the one found too.
            double expected = n * f0 * Math.sqrt(1 + b * n * n);
            boolean found = estimate.plainModes().stream()
                    .anyMatch(m -> Math.abs(m.frequencyHz() / expected - 1) < 2e-3);
            assertTrue(found, "harmonic " + n + " near " + expected + " Hz (Fletcher) among " + estimate.plainModes());
        }
    }
}
