package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.analysis.solvers.LaguerreSolver;
import org.hipparchus.complex.Complex;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.SchurTransformer;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class LscfRootsTest {

    /**
     * c_0 .. c_31 of the monic order-32 LSCF denominator of a recorded simulated-rig sweep (seed 2, 200 to 720 Hz,
     * 430 steps), exactly as computed; the balanced companion matrix of this polynomial stalls the Schur iteration.
     */
    private static final double[] STALLING = {
            0x1.16ac34e0ff02ap0, 0x1.79a0958b6ab87p1, -0x1.1a5043d6fc914p-3,
            -0x1.db3f96a7b2d7ap3, -0x1.724345862ed03p5, -0x1.79d9172ec53f6p6,
            -0x1.354d1d743ffe3p7, -0x1.b152e3ac2ce09p7, -0x1.fff20def5fb5fp7,
            -0x1.ed0e9575b2461p7, -0x1.57d7d6dccbea6p7, -0x1.1ef900e6c45a8p5,
            0x1.0fc0cf42e8681p7, 0x1.32f5ae94de536p8, 0x1.aec115e1b9865p8,
            0x1.d4aed3e742cedp8, 0x1.922ffc38e7234p8, 0x1.e747360c9507dp7,
            0x1.1d7cfba9ce49bp5, -0x1.54c64d99cfca8p7, -0x1.4743151c56277p8,
            -0x1.98ecb60ccac5ep8, -0x1.99a84cb012039p8, -0x1.574bba5736d9p8,
            -0x1.e33dc5094e13dp7, -0x1.1477f22ec5cd7p7, -0x1.d18afc34a7d68p5,
            -0x1.0679365760daep3, 0x1.fb80060ac33p3, 0x1.433b86d1d1f27p4,
            0x1.bd21122c86248p3, 0x1.69b43baea58cfp2
    };

    @Test
    void findsTheRootsOfAPolynomialWhoseBalancedCompanionMatrixStallsTheSchurIteration() {
        // Without the fallback the fit of that sweep ended in Hipparchus's "convergence failed".
        assertThrows(MathIllegalStateException.class, () -> new SchurTransformer(MatrixUtils.createRealMatrix(
                balancedCompanion(STALLING))).getT(), "the recorded case stalls the balanced companion matrix");
        List<Complex> roots = LscfRoots.ofMonic(STALLING);
        assertEquals(STALLING.length, roots.size(), "a polynomial of degree n has n roots");
        // Reference: Hipparchus's Laguerre solver (a general-purpose polynomial root finder, unrelated to the
        // companion-matrix eigenvalues), polished from each of our roots; it must land on the same root.
        double[] all = new double[STALLING.length + 1];
        System.arraycopy(STALLING, 0, all, 0, STALLING.length);
        all[STALLING.length] = 1;
        LaguerreSolver laguerre = new LaguerreSolver(1e-14, 1e-14);
        Complex[] reference = laguerre.solveAllComplex(all, 0.5);
        List<Complex> unmatched = new ArrayList<>(List.of(reference));
        for (Complex r : roots) {
            Complex nearest = unmatched.stream().min((a, b) -> Double.compare(a.subtract(r).norm(),
                    b.subtract(r).norm())).orElseThrow();
            assertTrue(nearest.subtract(r).norm() <= 1e-6 * Math.max(1, r.norm()),
                    "root " + r + " agrees with Hipparchus's Laguerre root " + nearest);
            unmatched.remove(nearest);
        }
    }

    @Test
    void rootsOfAKnownPolynomialComeBackInConjugatePairs() {
        // (x^2 + 1)(x - 2)(x + 3) = x^4 + x^3 - 5x^2 + x - 6: roots +-j, 2, -3 (by expansion).
        List<Complex> roots = LscfRoots.ofMonic(new double[] {-6, 1, -5, 1});
        List<Complex> expected = List.of(new Complex(0, 1), new Complex(0, -1), new Complex(2), new Complex(-3));
        for (Complex e : expected) {
            assertTrue(roots.stream().anyMatch(r -> r.subtract(e).norm() < 1e-12), e + " is a root of " + roots);
        }
    }

    @Test
    void aChartSkipsAnOrderWhoseRootsCannotBeComputed() {
        // Truth: the poles the function gives; order 6 fails and is left out, order 8 is compared with order 4.
        StabilisationChart chart = StabilisationChart.build(50, 400, 4, 8, 2, order -> {
            if (order == 6) {
                throw new AnalysisException("the roots of a polynomial of degree 6 could not be computed");
            }
            return List.of(Pole.of(100 + order * 0.01, 0.01));
        }, null);
        assertEquals(List.of(4, 8), chart.orders(), "order 6 is not on the chart");
        assertEquals(List.of(6), chart.skippedOrders(), "order 6 is listed as skipped");
        assertEquals(StabilityClass.DAMPING, chart.pointsAt(8).get(0).stabilityClass(),
                "order 8 is classified against order 4 (0.04 % in f, same damping)");
        AnalysisException none = assertThrows(AnalysisException.class, () -> StabilisationChart.build(50, 400, 4, 8, 2,
                order -> {
                    throw new AnalysisException("singular at order " + order);
                }, null));
        assertEquals("no model order from 4 to 8 gave poles that could be computed; the first failure: singular at"
                + " order 4", none.getMessage());
    }

    private static double[][] balancedCompanion(double[] c) {
        int n = c.length;
        double[][] a = new double[n][n];
        for (int j = 0; j < n; j++) {
            a[0][j] = -c[n - 1 - j];
        }
        for (int i = 1; i < n; i++) {
            a[i][i - 1] = 1;
        }
        // The same Parlett-Reinsch balancing as LscfRoots (powers of two, so exact).
        boolean done = false;
        while (!done) {
            done = true;
            for (int i = 0; i < n; i++) {
                double col = 0;
                double row = 0;
                for (int j = 0; j < n; j++) {
                    if (j != i) {
                        col += Math.abs(a[j][i]);
                        row += Math.abs(a[i][j]);
                    }
                }
                if (col == 0 || row == 0) {
                    continue;
                }
                double g = row / 2;
                double f = 1;
                double s = col + row;
                while (col < g) {
                    f *= 2;
                    col *= 4;
                }
                g = row * 2;
                while (col > g) {
                    f /= 2;
                    col /= 4;
                }
                if ((col + row) / f < 0.95 * s) {
                    done = false;
                    for (int j = 0; j < n; j++) {
                        a[i][j] /= f;
                        a[j][i] *= f;
                    }
                }
            }
        }
        return a;
    }
}
