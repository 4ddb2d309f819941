package org.tautline.driver.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.tautline.analysis.signal.SineFit;
import org.tautline.analysis.signal.SinePhasor;

/**
 * Settle detection against the closed-form response of a single-degree-of-freedom oscillator started at rest
 * under a harmonic force.
 *
 * <p>Reference: the total response of a viscously damped SDOF system to F cos(w t) from x(0) = 0, x'(0) = 0
 * is the steady state X cos(w t - phi), X = (F/k)/sqrt((1 - r^2)^2 + (2 zeta r)^2), tan phi = 2 zeta r/(1 - r^2),
 * plus the free transient exp(-zeta w_n t)(A cos w_d t + B sin w_d t) whose constants meet the initial
 * conditions (S. S. Rao, Mechanical Vibrations, 5th ed. 2011, sec. 3.6 and 4.x, from memory; also D. J.
 * Inman, Engineering Vibration). The transient's envelope sqrt(A^2 + B^2) exp(-zeta w_n t) is known
 * exactly, so the test can say how much transient is left when the detector says settled.
 */
class SettleDetectorTest {
    private static final double FS = 10000.0;

    @ParameterizedTest(name = "f_n 100 Hz, zeta {0}, drive {1} Hz")
    @CsvSource({"0.005, 100.5", "0.005, 101", "0.005, 95", "0.002, 100.2", "0.01, 120", "0.005, 100"})
    void saysSettledOnlyWhenTheTransientIsWithinTheTolerance(double zeta, double driveHz) {
        double fn = 100.0;
        double wn = 2 * Math.PI * fn;
        double w = 2 * Math.PI * driveHz;
        double wd = wn * Math.sqrt(1 - zeta * zeta);
        double r = w / wn;
        double x = 1.0 / Math.hypot(1 - r * r, 2 * zeta * r); // F/k = 1
        double phi = Math.atan2(2 * zeta * r, 1 - r * r);
        double a = -x * Math.cos(phi);
        double b = (-x * w * Math.sin(phi) + zeta * wn * a) / wd;
        double envelope0 = Math.hypot(a, b);
        double tau = 1 / (zeta * wn);
        double tolerance = 0.01;

        int cycles = SettleDetector.blockCycles(tau, driveHz);
        int n = (int) Math.round(cycles * FS / driveHz);
        double blockS = n / FS;
        SettleDetector detector = new SettleDetector(tolerance, tau, blockS);
        long sample = 0;
        while (!detector.done()) {
            double[] y = new double[n];
            for (int i = 0; i < n; i++) {
                double t = (sample + i) / FS;
                y[i] = x * Math.cos(w * t - phi) + Math.exp(-zeta * wn * t) * (a * Math.cos(wd * t) + b * Math.sin(wd * t));
            }
            SinePhasor fit = SineFit.threeParameter(y, FS, driveHz);
            // Refer each block's phasor to t = 0: a block's fit takes its own first sample as time origin.
            Complex common = fit.phasor().multiply(new Complex(Math.cos(w * sample / FS), -Math.sin(w * sample / FS)));
            sample += n;
            detector.feed(common, fit.amplitudeStd(), blockS);
        }
        double settledAtS = sample / FS;
        double leftRelative = envelope0 * Math.exp(-settledAtS / tau) / x;
        assertEquals(SettleState.SETTLED, detector.state(), "the phasors converge on a clean linear response");
        assertTrue(leftRelative <= tolerance, "transient left when settled: " + leftRelative + " of the steady state"
                + " (Rao, SDOF total response, from memory), tolerance " + tolerance);
        // Not a wasteful wait either: no more than the cap ln(1/tol) tau times CAP_FACTOR (4.6 tau to 1 %, common practice).
        assertTrue(settledAtS <= SettleDetector.CAP_FACTOR * Math.log(1 / tolerance) * tau,
                "settled after " + settledAtS / tau + " tau");
    }

    @org.junit.jupiter.api.Test
    void aSmallChangeSettlesInAFewBlocks() {
        double tau = 0.3;
        SettleDetector detector = new SettleDetector(0.01, tau, tau / 2);
        Complex steady = new Complex(1.0, 0.5);
        // A transient of 0.2 % of the steady state, decaying with tau: already within the 1 % tolerance.
        for (int k = 0; k < 3; k++) {
            detector.feed(steady.add(new Complex(0.002 * Math.exp(-k * 0.5), 0)), 0.0, tau / 2);
        }
        assertEquals(SettleState.SETTLED, detector.state());
    }
}
