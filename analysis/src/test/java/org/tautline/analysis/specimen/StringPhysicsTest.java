package org.tautline.analysis.specimen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class StringPhysicsTest {
    // checks.md check case: steel, rho 7850 kg/m^3, d 1 mm, L 1 m, T 500 N, E 200 GPa.
    private static final double MU = StringPhysics.linearDensityKgPerM(7850, 1e-3);
    private static final double F0 = StringPhysics.mersenneFundamentalHz(1, 500, MU);
    private static final double EI = StringPhysics.bendingStiffnessNm2(200e9, 1e-3);
    private static final double B = StringPhysics.inharmonicity(EI, 500, 1);

    @Test
    void mersenneCheckCase() {
        // Mersenne's law f1 = sqrt(T/mu)/(2L); values [computed] in checks.md, rounded as printed.
        assertEquals(6.1654e-3, MU, 0.00005e-3, "mu = rho pi d^2/4 (checks.md Mersenne check case, computed)");
        assertEquals(142.389, F0, 0.0005, "f1 = 142.389 Hz (checks.md, computed from Mersenne's law)");
    }

    @Test
    void mersenneTensionInvertsTheFrequency() {
        // T = 4 mu L^2 (f_n/n)^2 (Mersenne's law): the printed f1 = 142.389 Hz gives 500 N to its rounding.
        assertEquals(500, StringPhysics.mersenneTensionN(142.389, 1, 1, MU), 500 * 2 * 0.0005 / 142.389,
                "tension from f1 = 142.389 Hz (checks.md, Mersenne's law)");
        assertEquals(500, StringPhysics.mersenneTensionN(3 * F0, 3, 1, MU), 1e-9,
                "tension from the third harmonic of an ideal string (Mersenne's law)");
        assertEquals("harmonic must be 1 or more, got 0",
                assertThrows(AnalysisException.class, () -> StringPhysics.mersenneTensionN(100, 0, 1, MU)).getMessage());
    }

    @Test
    void fletcherPinnedStiffString() {
        // Fletcher, JASA 36:203 (1964): B = pi^3 E d^4/(64 T L^2), f_n = n f0 sqrt(1 + B n^2); checks.md [computed].
        assertEquals(1.9379e-4, B, 0.00005e-4, "B = 1.9379e-4 (checks.md, Fletcher 1964)");
        double[] expected = {142.402, 284.888, 427.538};
        for (int n = 1; n <= 3; n++) {
            assertEquals(expected[n - 1], StringPhysics.stiffStringFrequencyHz(n, F0, B, EndCondition.PINNED), 0.0005,
                    "pinned f" + n + " (checks.md, Fletcher 1964 JASA 36:203)");
        }
    }

    @Test
    void fletcherClampedApproximationIsWithinATenthOfAPercentOfTheExactRoots() {
        // Exact clamped values: roots of the clamped beam-string characteristic equation, checks.md [computed].
        double[] exact = {143.676, 287.435, 431.362};
        for (int n = 1; n <= 3; n++) {
            double approx = StringPhysics.stiffStringFrequencyHz(n, F0, B, EndCondition.CLAMPED);
            assertEquals(exact[n - 1], approx, 1e-3 * exact[n - 1],
                    "clamped f" + n + " within 0.1 % of the exact root (checks.md; Fletcher 1964 approximation)");
        }
    }

    @Test
    void midspanForcingRemovesTheEvenModesAndAThirdSpanRemovesTheThirds() {
        // checks.md point-force entry [seen]: H = sum phi_n(x_f) phi_n(x_r)/(...), phi_n = sqrt(2/(mu L)) sin(n pi x/L);
        // a mode with a node at the forcing point is absent.
        double scale = 2 / MU;
        for (int n = 1; n <= 6; n++) {
            double atMidspan = StringPhysics.modeShape(n, 0.13, 1, MU) * StringPhysics.modeShape(n, 0.5, 1, MU);
            double atThird = StringPhysics.modeShape(n, 0.13, 1, MU) * StringPhysics.modeShape(n, 1.0 / 3, 1, MU);
            double expectedMid = scale * Math.sin(n * Math.PI * 0.13) * Math.sin(n * Math.PI / 2);
            double expectedThird = scale * Math.sin(n * Math.PI * 0.13) * Math.sin(n * Math.PI / 3);
            assertEquals(expectedMid, atMidspan, 1e-12 * scale, "midspan modal constant, mode " + n + " (checks.md)");
            assertEquals(expectedThird, atThird, 1e-12 * scale, "third-span modal constant, mode " + n + " (checks.md)");
            if (n % 2 == 0) {
                assertEquals(0, atMidspan, 1e-12 * scale, "even mode " + n + " vanishes for midspan forcing (checks.md)");
            } else {
                assertEquals(scale * Math.abs(Math.sin(n * Math.PI * 0.13)), Math.abs(atMidspan), 1e-12 * scale,
                        "odd mode " + n + " present at full strength for midspan forcing");
            }
            if (n % 3 == 0) {
                assertEquals(0, atThird, 1e-12 * scale, "mode " + n + " vanishes for forcing at L/3 (checks.md)");
            } else {
                assertEquals(true, Math.abs(atThird) > 0.1 * scale * Math.abs(Math.sin(n * Math.PI * 0.13)),
                        "mode " + n + " present for forcing at L/3");
            }
        }
        assertEquals("position must lie on the span 0..1.0 m, got 1.5 m",
                assertThrows(AnalysisException.class, () -> StringPhysics.modeShape(1, 1.5, 1, MU)).getMessage());
    }
}
