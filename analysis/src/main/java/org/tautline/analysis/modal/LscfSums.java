package org.tautline.analysis.modal;

/**
 * The Toeplitz sums from which the single-FRF LSCF normal equations of every order are built.
 *
 * <p>For one FRF H_k on lines with z-domain basis Omega_k = exp(-j w_k Ts) and weights c_k, the
 * blocks of the LSCF normal equations depend only on r - s (P. Guillaume, P. Verboven, S. Vanlanduit,
 * H. Van der Auweraer, B. Peeters, "A poly-reference implementation of the least-squares complex
 * frequency-domain estimator", IMAC-XXI, 2003, from memory):
 * R_rs = Re sum c_k^2 Omega_k^(s-r), S_rs = -Re sum c_k^2 H_k Omega_k^(s-r),
 * T_rs = Re sum c_k^2 |H_k|^2 Omega_k^(s-r). With theta_k = w_k Ts and m = s - r,
 * Re(H Omega^m) = Re(H) cos(m theta) + Im(H) sin(m theta), so four real sums per m suffice.
 * They are computed once for the highest order; each lower order takes the leading sub-blocks.
 *
 * <p>Weights and response are scaled first so that sum c_k^2 = 1 and sum c_k^2 |H_k|^2 = 1; this
 * leaves the poles unchanged and keeps the normal equations near unit size.
 */
final class LscfSums {
    private final double[] rSum;
    private final double[] tSum;
    private final double[] qCos;
    private final double[] qSin;

    private LscfSums(double[] rSum, double[] tSum, double[] qCos, double[] qSin) {
        this.rSum = rSum;
        this.tSum = tSum;
        this.qCos = qCos;
        this.qSin = qSin;
    }

    /**
     * Accumulates the sums for orders up to {@code maxOrder}.
     *
     * @param thetaRad w_k Ts per line, rad
     * @param re Re H_k
     * @param im Im H_k
     * @param weightSquared c_k^2 per line, not all zero
     * @param responseScale a scale s with sum c_k^2 |H_k/s|^2 = 1
     * @param maxOrder the highest denominator degree n
     * @return the sums for m = 0..n
     */
    static LscfSums of(double[] thetaRad, double[] re, double[] im, double[] weightSquared, double responseScale,
                       int maxOrder) {
        int size = maxOrder + 1;
        double[] rSum = new double[size];
        double[] tSum = new double[size];
        double[] qCos = new double[size];
        double[] qSin = new double[size];
        double weightTotal = 0;
        for (double w2 : weightSquared) {
            weightTotal += w2;
        }
        for (int k = 0; k < thetaRad.length; k++) {
            double w2 = weightSquared[k] / weightTotal;
            if (w2 == 0) {
                continue;
            }
            double hr = re[k] / responseScale;
            double hi = im[k] / responseScale;
            double h2 = hr * hr + hi * hi;
            double stepCos = Math.cos(thetaRad[k]);
            double stepSin = Math.sin(thetaRad[k]);
            double c = 1;
            double s = 0;
            for (int m = 0; m < size; m++) {
                rSum[m] += w2 * c;
                tSum[m] += w2 * h2 * c;
                qCos[m] += w2 * hr * c;
                qSin[m] += w2 * hi * s;
                // cos/sin of (m + 1) theta by one rotation; the rounding error grows only as m eps.
                double nextCos = c * stepCos - s * stepSin;
                s = s * stepCos + c * stepSin;
                c = nextCos;
            }
        }
        return new LscfSums(rSum, tSum, qCos, qSin);
    }

    /** @return the highest order these sums serve */
    int maxOrder() {
        return rSum.length - 1;
    }

    /**
     * R of one order.
     *
     * @param order denominator degree n
     * @return the (n+1) x (n+1) block R_rs = Re sum c^2 Omega^(s-r)
     */
    double[][] r(int order) {
        return symmetricToeplitz(rSum, order);
    }

    /**
     * T of one order.
     *
     * @param order denominator degree n
     * @return the (n+1) x (n+1) block T_rs = Re sum c^2 |H|^2 Omega^(s-r)
     */
    double[][] t(int order) {
        return symmetricToeplitz(tSum, order);
    }

    /**
     * S of one order.
     *
     * @param order denominator degree n
     * @return the (n+1) x (n+1) block S_rs = -Re sum c^2 H Omega^(s-r)
     */
    double[][] s(int order) {
        double[][] out = new double[order + 1][order + 1];
        for (int r = 0; r <= order; r++) {
            for (int col = 0; col <= order; col++) {
                int m = col - r;
                // Re(H Omega^m) = Re H cos(m theta) + Im H sin(m theta); sin is odd in m, cos even.
                out[r][col] = m >= 0 ? -(qCos[m] + qSin[m]) : -(qCos[-m] - qSin[-m]);
            }
        }
        return out;
    }

    private static double[][] symmetricToeplitz(double[] sums, int order) {
        double[][] out = new double[order + 1][order + 1];
        for (int r = 0; r <= order; r++) {
            for (int col = 0; col <= order; col++) {
                out[r][col] = sums[Math.abs(col - r)];
            }
        }
        return out;
    }
}
