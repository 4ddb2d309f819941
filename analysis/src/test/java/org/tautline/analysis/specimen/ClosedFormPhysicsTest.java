package org.tautline.analysis.specimen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class ClosedFormPhysicsTest {
    // checks.md check case: steel, rho 7850 kg/m^3, d 1 mm, L 1 m, T 500 N, E 200 GPa.
    private static final double MU = StringPhysics.linearDensityKgPerM(7850, 1e-3);
    private static final double EI = StringPhysics.bendingStiffnessNm2(200e9, 1e-3);

    @Test
    void clampedCharacteristicEquationGivesTheCheckValues() {
        // checks.md [computed]: roots of the clamped beam-string characteristic equation, 143.676/287.435/431.362 Hz.
        double[] expected = {143.676, 287.435, 431.362};
        for (int n = 1; n <= 3; n++) {
            assertEquals(expected[n - 1], ClampedStiffString.frequencyHz(n, 1, 500, EI, MU), 1e-3,
                    "exact clamped f" + n + " (checks.md, computed from the clamped beam-string equation)");
        }
    }

    @Test
    void clampedEquationTendsToTheClampedBeamWithoutTension() {
        // Clamped-clamped Euler beam, beta1 L = 4.730041 (Blevins, Formulas for Natural Frequency, table 8-1, from memory).
        double f = ClampedStiffString.frequencyHz(1, 1, 1e-9, EI, MU);
        double beam = 4.730041 * 4.730041 * Math.sqrt(EI / MU) / (2 * Math.PI);
        assertEquals(beam, f, 1e-5 * beam, "clamped beam limit beta L = 4.730041 (Blevins, from memory)");
    }

    @Test
    void fletcherClampedApproximationAgreesWithTheExactRootsForSmallB() {
        // Fletcher, JASA 36:203 (1964), approximate clamped formula; good to O(B^1.5) for B n^2 << 1 (from memory).
        double f0 = StringPhysics.mersenneFundamentalHz(1, 500, MU);
        double b = StringPhysics.inharmonicity(EI, 500, 1);
        for (int n = 1; n <= 3; n++) {
            double exact = ClampedStiffString.frequencyHz(n, 1, 500, EI, MU);
            double approx = StringPhysics.stiffStringFrequencyHz(n, f0, b, EndCondition.CLAMPED);
            assertEquals(exact, approx, 2e-5 * exact, "Fletcher 1964 approximate clamped f" + n + " vs exact roots");
        }
    }

    @Test
    void zuiFormulaAgreesWithTheExactClampedSolutionAcrossXi() {
        // Zui, Shinke & Namita, J. Struct. Eng. 122:651 (1996), from memory: the paper's accuracy is recalled
        // only as "a few per cent"; we check 3 %, and Mersenne's law's +163 % at xi = 6 and +0.4 % at xi = 1000
        // from checks.md [computed].
        for (double xi : new double[] {2, 4, 6, 10, 16, 17, 25, 60, 200, 1000, 5000}) {
            double tension = xi * xi * EI;
            double f1 = ClampedStiffString.frequencyHz(1, 1, tension, EI, MU);
            double zui = ZuiCableFormula.tensionN(f1, 1, MU, EI);
            assertEquals(tension, zui, 0.03 * tension, "Zui et al. 1996 (from memory) at xi = " + xi);
        }
        double f6 = ClampedStiffString.frequencyHz(1, 1, 36 * EI, EI, MU);
        assertEquals(1.63, StringPhysics.mersenneTensionN(f6, 1, 1, MU) / (36 * EI) - 1, 0.005,
                "Mersenne error at xi = 6 (checks.md, computed)");
        double f1000 = ClampedStiffString.frequencyHz(1, 1, 1e6 * EI, EI, MU);
        assertEquals(0.004, StringPhysics.mersenneTensionN(f1000, 1, 1, MU) / (1e6 * EI) - 1, 0.0005,
                "Mersenne error at xi = 1000 (checks.md, computed)");
    }

    @Test
    void moteMovingStringFactor() {
        // Mote 1965 (from memory, checks.md): f_n = n/(2L) c (1 - v^2/c^2), c = sqrt(T/mu).
        double c = Math.sqrt(500 / MU);
        double v = 0.3 * c;
        double expected = 3 / 2.0 * c * (1 - 0.09);
        assertEquals(expected, MovingBelt.frequencyHz(3, 1, 500, MU, v), 1e-9 * expected, "Mote 1965 f3 at v = 0.3 c");
        assertEquals(500, MovingBelt.tensionN(expected, 3, 1, MU, v), 1e-9 * 500, "inverse of Mote's formula");
        assertEquals("belt speed 300.0 m/s must be below the wave speed " + c + " m/s",
                assertThrows(AnalysisException.class, () -> MovingBelt.frequencyFactor(300, 500, MU)).getMessage());
    }

    @Test
    void irvineFirstSymmetricInPlaneMode() {
        // checks.md [computed] from Irvine & Caughey 1974 / Irvine 1981 (from memory): tan(w/2) = w/2 - (4/l^2)(w/2)^3.
        assertEquals(1.000411, CableSag.firstSymmetricFrequencyRatio(0.01), 1e-6, "Irvine, lambda^2 = 0.01 (checks.md)");
        assertEquals(1.040200, CableSag.firstSymmetricFrequencyRatio(1), 1e-6, "Irvine, lambda^2 = 1 (checks.md)");
        assertEquals(1.151823, CableSag.firstSymmetricFrequencyRatio(4), 1e-6, "Irvine, lambda^2 = 4 (checks.md)");
        assertEquals(2.0, CableSag.firstSymmetricFrequencyRatio(4 * Math.PI * Math.PI), 1e-9,
                "Irvine crossover lambda^2 = 4 pi^2 (checks.md)");
        double w = Math.PI * CableSag.firstSymmetricFrequencyRatio(0.1);
        double residual = Math.tan(w / 2) - (w / 2 - 4 / 0.1 * Math.pow(w / 2, 3));
        assertTrue(Math.abs(residual) < 1e-8 * Math.abs(Math.tan(w / 2)), "root satisfies Irvine's tan form, residual " + residual);
    }

    @Test
    void sagParameterOfATautWireIsSmallAndOfAHeavySlackSpanLarge() {
        // lambda^2 = (m g L cos th/H)^2 L/(H L_e/EA), Irvine 1981 (from memory): scales as L^3/H^3 at fixed EA.
        double ea = 200e9 * Math.PI * 1e-6 / 4;
        double taut = CableSag.lambdaSquared(MU, 1, 0, 500, ea);
        double slack = CableSag.lambdaSquared(MU, 100, 0, 50, ea);
        double g = CableSag.STANDARD_GRAVITY;
        assertEquals(Math.pow(MU * g / 500, 2) * ea / 500, taut, 1e-6 * taut, "Irvine lambda^2 for a 1 m span");
        assertTrue(slack > CableSag.WARNING_LAMBDA_SQUARED, "100 m span at 50 N has lambda^2 = " + slack);
    }
}
