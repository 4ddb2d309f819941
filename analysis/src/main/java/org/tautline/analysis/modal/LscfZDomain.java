package org.tautline.analysis.modal;

import org.hipparchus.complex.Complex;

/**
 * The z-domain mapping of the LSCF estimator between Laplace poles and polynomial roots.
 *
 * <p>The basis function of a line at w is Omega = exp(-j w Ts), that is Omega = exp(-s Ts) at
 * s = j w, so a root Omega_r of the denominator is the pole lambda = -ln(Omega_r)/Ts (Guillaume et
 * al., IMAC-XXI, 2003, from memory). The principal logarithm keeps |Im lambda| &lt;= pi/Ts.
 */
final class LscfZDomain {
    private LscfZDomain() {
    }

    /**
     * The basis value at one frequency.
     *
     * @param frequencyHz Hz
     * @param samplingIntervalS Ts, s
     * @return exp(-j 2 pi f Ts)
     */
    static Complex basisAt(double frequencyHz, double samplingIntervalS) {
        double theta = 2 * Math.PI * frequencyHz * samplingIntervalS;
        return new Complex(Math.cos(theta), -Math.sin(theta));
    }

    /**
     * The pole of a denominator root.
     *
     * @param root Omega_r
     * @param samplingIntervalS Ts, s
     * @return lambda = -ln(Omega_r)/Ts, rad/s
     */
    static Complex lambdaOf(Complex root, double samplingIntervalS) {
        return root.log().divide(-samplingIntervalS);
    }

    /**
     * The denominator root of a pole.
     *
     * @param lambda the pole, rad/s
     * @param samplingIntervalS Ts, s
     * @return Omega_r = exp(-lambda Ts)
     */
    static Complex rootOf(Complex lambda, double samplingIntervalS) {
        return lambda.multiply(-samplingIntervalS).exp();
    }
}
