package org.tautline.analysis.specimen;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class HarmonicNumberingTest {
    /** Fletcher 1964 pinned stiff string, checks.md check case: f0 = 142.389 Hz, B = 1.9379e-4. */
    private static double stiff(int n) {
        return StringPhysics.stiffStringFrequencyHz(n, 142.389, 1.9379e-4, EndCondition.PINNED);
    }

    @Test
    void numbersAStiffStringSeries() {
        double[] f = {stiff(1), stiff(2), stiff(3), stiff(4), stiff(5), stiff(6)};
        assertArrayEquals(new int[] {1, 2, 3, 4, 5, 6}, HarmonicNumbering.number(f, 0.02));
    }

    @Test
    void keepsNumbersRightWhenANodeRemovesHarmonicsThreeAndSix() {
        // Forcing at L/3 removes n = 3, 6 (point-force modal sum, checks.md).
        double[] f = {stiff(1), stiff(2), stiff(4), stiff(5), stiff(7)};
        assertArrayEquals(new int[] {1, 2, 4, 5, 7}, HarmonicNumbering.number(f, 0.02));
    }

    @Test
    void findsTheFundamentalWhenItIsMissing() {
        double[] f = {stiff(2), stiff(3), stiff(4), stiff(5), stiff(6)};
        assertArrayEquals(new int[] {2, 3, 4, 5, 6}, HarmonicNumbering.number(f, 0.02));
    }

    @Test
    void givesBothPolarisationsOfAHarmonicTheSameNumberAndLeavesAStrayPeakUnnumbered() {
        double[] f = {stiff(1), stiff(1) * 1.002, stiff(2), stiff(1) * 1.45, stiff(3)};
        int[] n = HarmonicNumbering.number(f, 0.02);
        assertEquals(1, n[0]);
        assertEquals(1, n[1]);
        assertEquals(2, n[2]);
        assertEquals(0, n[3], "a peak at " + f[3] + " Hz is no harmonic of " + f[0] + " Hz");
        assertEquals(3, n[4]);
    }

    @Test
    void rejectsANonPositiveFrequency() {
        AnalysisException e = assertThrows(AnalysisException.class,
                () -> HarmonicNumbering.number(new double[] {100, -5}, 0.02));
        assertEquals("frequency 1 must be positive and finite, got -5.0 Hz", e.getMessage());
    }
}
