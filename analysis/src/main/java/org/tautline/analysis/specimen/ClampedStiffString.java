package org.tautline.analysis.specimen;

import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.tautline.analysis.AnalysisException;

/**
 * Exact natural frequencies of a tensioned beam (a stiff string) with both ends clamped.
 *
 * <p>Euler-Bernoulli beam under tension T: EI w'''' - T w'' + mu w_tt = 0. A harmonic solution
 * e^{sx} e^{j w t} needs EI s^4 - T s^2 - mu w^2 = 0, whose roots are s = +-alpha (real) and
 * s = +-j beta, with alpha^2 - beta^2 = T/EI and mu w^2 = EI beta^4 + T beta^2. The clamped end
 * conditions w = w' = 0 at x = 0 and x = L leave a non-trivial solution only where
 * <pre>  2 alpha beta (1 - cosh(alpha L) cos(beta L)) + (alpha^2 - beta^2) sinh(alpha L) sin(beta L) = 0,</pre>
 * the frequency equation of the clamped beam with axial force (from memory as given in vibration
 * handbooks, e.g. R. D. Blevins, Formulas for Natural Frequency and Mode Shape, 1979; re-derived
 * here from the 4x4 boundary determinant). With T = 0 it reduces to the clamped beam,
 * cosh cos = 1; with EI -> 0 to Mersenne's string. It is solved divided by alpha^2 cosh(alpha L), so
 * nothing overflows: 2r(sech(alpha L) - cos q) + (1 - r^2) tanh(alpha L) sin q = 0, q = beta L,
 * r = beta/alpha. The n-th root has q in (n pi, (n + 1) pi), where the left side changes sign.
 */
public final class ClampedStiffString {
    private static final int MAX_EVALUATIONS = 500;

    private ClampedStiffString() {
    }

    /**
     * Natural frequency of harmonic n of the clamped tensioned beam.
     *
     * @param harmonic n, 1 or more
     * @param lengthM L, m
     * @param tensionN T, N, positive
     * @param bendingStiffnessNm2 EI, N m^2, positive (use Mersenne's law for EI = 0)
     * @param linearDensityKgPerM mu, kg/m
     * @return f_n, Hz
     */
    public static double frequencyHz(int harmonic, double lengthM, double tensionN, double bendingStiffnessNm2,
                                     double linearDensityKgPerM) {
        if (harmonic < 1) {
            throw new AnalysisException("harmonic must be 1 or more, got " + harmonic);
        }
        requirePositive("lengthM", lengthM);
        requirePositive("tensionN", tensionN);
        requirePositive("bendingStiffnessNm2", bendingStiffnessNm2);
        requirePositive("linearDensityKgPerM", linearDensityKgPerM);
        double tOverEi = tensionN / bendingStiffnessNm2;
        double low = harmonic * Math.PI;
        double high = (harmonic + 1) * Math.PI;
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-15, 1e-14 * high, 1e-300, 5);
        double q = solver.solve(MAX_EVALUATIONS, x -> scaledDeterminant(x, lengthM, tOverEi), low, high);
        double beta = q / lengthM;
        double omega = beta * Math.sqrt((bendingStiffnessNm2 * beta * beta + tensionN) / linearDensityKgPerM);
        return omega / (2.0 * Math.PI);
    }

    /**
     * The non-dimensional stiffness parameter xi = L sqrt(T/EI) used by cable formulas (Zui et al. 1996).
     *
     * @param lengthM L, m
     * @param tensionN T, N
     * @param bendingStiffnessNm2 EI, N m^2
     * @return xi
     */
    public static double stiffnessParameter(double lengthM, double tensionN, double bendingStiffnessNm2) {
        requirePositive("lengthM", lengthM);
        requirePositive("tensionN", tensionN);
        requirePositive("bendingStiffnessNm2", bendingStiffnessNm2);
        return lengthM * Math.sqrt(tensionN / bendingStiffnessNm2);
    }

    private static double scaledDeterminant(double q, double lengthM, double tOverEi) {
        double beta = q / lengthM;
        double alpha = Math.sqrt(beta * beta + tOverEi);
        double alphaL = alpha * lengthM;
        double r = beta / alpha;
        double sech = alphaL > 700 ? 0.0 : 1.0 / Math.cosh(alphaL);
        return 2.0 * r * (sech - Math.cos(q)) + (1.0 - r * r) * Math.tanh(alphaL) * Math.sin(q);
    }

    private static void requirePositive(String name, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new AnalysisException(name + " must be a positive finite number, got " + value);
        }
    }
}
