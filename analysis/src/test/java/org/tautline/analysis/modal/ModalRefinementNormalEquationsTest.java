package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.hipparchus.analysis.differentiation.DSFactory;
import org.hipparchus.analysis.differentiation.DerivativeStructure;
import org.hipparchus.analysis.differentiation.FiniteDifferencesDifferentiator;
import org.hipparchus.analysis.differentiation.UnivariateDifferentiableFunction;
import org.hipparchus.complex.Complex;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.RealMatrix;
import org.junit.jupiter.api.Test;

/**
 * The normal equations the refinement steps from ({@link ModalRefinementModel#normalEquations}), accumulated line by
 * line without storing the Jacobian, against references built from general-purpose parts.
 *
 * <p>J^T J is checked against Hipparchus 4.0.2's matrix product of the transposed Jacobian with itself
 * ({@link RealMatrix#transposeMultiply}); the gradient J^T r against the numerical derivative of the cost
 * ||target - model(p)||^2, whose derivative is -2 J^T r (the Gauss-Newton gradient; Nocedal and Wright, Numerical
 * Optimization, 2nd ed. 2006, ch. 10, from memory), taken with Hipparchus's {@link FiniteDifferencesDifferentiator}
 * (7-point central stencil) one parameter at a time. The model holds real and complex modes, both residual terms and a
 * fixed pole beyond the band, so every kind of column is covered. The values are an invented close pair near 200 Hz,
 * a third mode and a pole beyond the band's top.
 */
class ModalRefinementNormalEquationsTest {
    private static ModalRefinementModel model(boolean realModes) {
        int m = 300;
        double[] w = new double[m];
        double[] weight = new double[m];
        for (int k = 0; k < m; k++) {
            w[k] = 2 * Math.PI * (150 + 0.5 * k);
            weight[k] = 1e12 * (1 + 0.3 * Math.sin(k));
        }
        List<Mode> modes = List.of(new Mode(200, 0.004, new Complex(3.0, realModes ? 0 : 0.4)),
                new Mode(201.5, 0.003, new Complex(-1.5, realModes ? 0 : -0.2)),
                new Mode(260, 0.01, new Complex(5.0, realModes ? 0 : 0.7)));
        ResidualTerms terms = new ResidualTerms(new Complex(1e-7, 2e-8), new Complex(0.05, -0.01),
                List.of(new Mode(320, 0.01, new Complex(40, 3))));
        return new ModalRefinementModel(w, weight, modes, terms, realModes, true, true, 1e-5);
    }

    /** A point away from the start (so no residual vanishes) and a target with some misfit. */
    private static double[] point(ModalRefinementModel model) {
        double[] p = model.start();
        for (int j = 0; j < p.length; j++) {
            p[j] += 1e-3 * Math.cos(3 * j + 1);
        }
        return p;
    }

    private static double[] target(ModalRefinementModel model) {
        double[] t = model.values(model.start(), new double[model.valueCount()]);
        for (int i = 0; i < t.length; i++) {
            t[i] += 0.5 * Math.sin(7 * i);
        }
        return t;
    }

    @Test
    void productOfTheJacobianWithItselfMatchesAGeneralMatrixProduct() {
        for (boolean real : new boolean[] {true, false}) {
            ModalRefinementModel model = model(real);
            double[] p = point(model);
            int n = p.length;
            double[][] a = new double[n][n];
            double[] g = new double[n];
            double[] values = new double[model.valueCount()];
            model.normalEquations(p, target(model), values, a, g);
            double[][] columns = model.jacobianColumns(p, null);
            // Hipparchus: J (rows = values, columns = parameters) built from the columns, then J^T J.
            RealMatrix jacobian = new Array2DRowRealMatrix(columns).transpose();
            RealMatrix reference = jacobian.transposeMultiply(jacobian);
            for (int j = 0; j < n; j++) {
                for (int l = j; l < n; l++) {
                    double scale = Math.sqrt(reference.getEntry(j, j) * reference.getEntry(l, l));
                    assertEquals(reference.getEntry(j, l), a[j][l], 1e-12 * scale, "J^T J at " + j + ", " + l);
                }
            }
            double[] plain = model.values(p, new double[model.valueCount()]);
            for (int i = 0; i < values.length; i++) {
                assertEquals(plain[i], values[i], 1e-12 * (1 + Math.abs(plain[i])), "model value " + i);
            }
        }
    }

    @Test
    void gradientIsMinusHalfTheNumericalDerivativeOfTheCost() {
        DSFactory factory = new DSFactory(1, 1);
        for (boolean real : new boolean[] {true, false}) {
            ModalRefinementModel model = model(real);
            double[] p = point(model);
            double[] target = target(model);
            int n = p.length;
            double[][] a = new double[n][n];
            double[] g = new double[n];
            model.normalEquations(p, target, new double[model.valueCount()], a, g);
            for (int j = 0; j < n; j++) {
                int index = j;
                UnivariateDifferentiableFunction cost = new FiniteDifferencesDifferentiator(7, 1e-6).differentiate(
                        (double x) -> {
                            double[] q = p.clone();
                            q[index] = x;
                            double[] v = model.values(q, new double[model.valueCount()]);
                            double sum = 0;
                            for (int i = 0; i < v.length; i++) {
                                sum += (target[i] - v[i]) * (target[i] - v[i]);
                            }
                            return sum;
                        });
                DerivativeStructure at = cost.value(factory.variable(0, p[j]));
                double numeric = -0.5 * at.getPartialDerivative(1);
                assertEquals(numeric, g[j], 1e-5 * (Math.abs(numeric) + Math.sqrt(a[j][j])),
                        (real ? "real" : "complex") + " modes, gradient " + j);
            }
        }
    }
}
