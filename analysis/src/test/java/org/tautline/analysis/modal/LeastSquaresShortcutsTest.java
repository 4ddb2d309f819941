package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;

import org.hipparchus.complex.Complex;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.junit.jupiter.api.Test;

/**
 * The two shortcuts the fit takes in linear algebra, against Hipparchus 4.0.2's general QR decomposition as the
 * reference: the residual of a least-squares system with two columns tried beside a factored one
 * ({@link LsfdLeastSquares.Factor#residualWith}), and (J^T J)^-1 from the normal equations of a well-conditioned model
 * ({@link WellConditionedInverse}). The systems are built from invented poles and lines.
 */
class LeastSquaresShortcutsTest {
    private static double[][] columns(int m, int p, long seed) {
        java.util.Random random = new java.util.Random(seed);
        double[][] c = new double[p][m];
        for (int j = 0; j < p; j++) {
            for (int i = 0; i < m; i++) {
                c[j][i] = random.nextGaussian() + (j == 1 ? 0.9 * c[0][i] : 0);
            }
        }
        return c;
    }

    /** min ||A x - b||^2 by Hipparchus's QR. */
    private static double reference(double[][] columns, double[] b) {
        RealMatrix a = new Array2DRowRealMatrix(columns).transpose();
        RealVector rhs = new ArrayRealVector(b);
        RealVector x = new QRDecomposition(a).getSolver().solve(rhs);
        RealVector r = a.operate(x).subtract(rhs);
        return r.dotProduct(r);
    }

    @Test
    void residualWithTwoColumnsTriedBesideAFactorMatchesAWholeQrSolve() {
        int m = 400;
        double[][] held = columns(m, 12, 7);
        double[][] extra = columns(m, 2, 8);
        double[] b = columns(m, 1, 9)[0];
        for (int i = 0; i < m; i++) {
            b[i] += 0.3 * held[3][i] - 0.2 * extra[1][i];
        }
        double[][] all = new double[14][];
        for (int j = 0; j < 12; j++) {
            all[j] = held[j].clone();
        }
        all[12] = extra[0].clone();
        all[13] = extra[1].clone();
        double withExtra = reference(all, b);
        double heldOnly = reference(java.util.Arrays.copyOf(held, 12), b);
        double[][] copy = new double[12][];
        for (int j = 0; j < 12; j++) {
            copy[j] = held[j].clone();
        }
        LsfdLeastSquares.Factor factor = LsfdLeastSquares.factor(copy, b);
        assertEquals(heldOnly, factor.residual(), 1e-9 * heldOnly);
        assertEquals(withExtra, factor.residualWith(extra), 1e-9 * withExtra);
        // The factor is not changed by a try: a second try gives the same.
        assertEquals(withExtra, factor.residualWith(extra), 1e-9 * withExtra);
    }

    @Test
    void inverseFromTheNormalEquationsMatchesTheInverseFromQrOfAWellConditionedModel() {
        int m = 600;
        double[] w = new double[m];
        double[] weight = new double[m];
        for (int k = 0; k < m; k++) {
            w[k] = 2 * Math.PI * (100 + 0.25 * k);
            weight[k] = 1e14;
        }
        List<Mode> modes = List.of(new Mode(140, 0.005, new Complex(2.0, 0)), new Mode(190, 0.004, new Complex(-1.0, 0)));
        ModalRefinementModel model = new ModalRefinementModel(w, weight, modes,
                new ResidualTerms(new Complex(1e-7, 0), new Complex(0.02, 0)), true, true, true, 1e-5);
        double[] point = model.start();
        double[] target = model.values(point, new double[model.valueCount()]);
        double[][] fast = WellConditionedInverse.of(model, point, target);
        assertNotNull(fast, "two well separated modes are well conditioned");
        RealMatrix j = new Array2DRowRealMatrix(model.jacobianColumns(point, null)).transpose();
        RealMatrix r = new QRDecomposition(j).getR().getSubMatrix(0, point.length - 1, 0, point.length - 1);
        RealMatrix rInverse = new QRDecomposition(r).getSolver().getInverse();
        RealMatrix reference = rInverse.multiply(rInverse.transpose());
        for (int a = 0; a < point.length; a++) {
            for (int b = 0; b < point.length; b++) {
                double scale = Math.sqrt(reference.getEntry(a, a) * reference.getEntry(b, b));
                assertEquals(reference.getEntry(a, b), fast[a][b], 1e-6 * scale, "(J^T J)^-1 at " + a + ", " + b);
            }
        }
    }

    @Test
    void aModelWhoseModesNearlyMergeIsLeftToTheQr() {
        int m = 300;
        double[] w = new double[m];
        double[] weight = new double[m];
        for (int k = 0; k < m; k++) {
            w[k] = 2 * Math.PI * (180 + 0.1 * k);
            weight[k] = 1e14;
        }
        // Two modes 1e-7 of their frequency apart: the same column twice, to working accuracy of the normal equations.
        List<Mode> modes = List.of(new Mode(195, 0.004, new Complex(1.0, 0)),
                new Mode(195 * (1 + 1e-7), 0.004, new Complex(1.0, 0)));
        ModalRefinementModel model = new ModalRefinementModel(w, weight, modes, ResidualTerms.NONE, true, false, false,
                1e-5);
        double[] point = model.start();
        assertNull(WellConditionedInverse.of(model, point, model.values(point, new double[model.valueCount()])));
    }
}
