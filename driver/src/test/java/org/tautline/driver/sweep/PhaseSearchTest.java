package org.tautline.driver.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import java.util.TreeSet;
import java.util.function.DoubleFunction;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/**
 * The phase search on the receptance of one viscously damped mode, H = A/(w_r^2 - w^2 + 2 j zeta w_r w) (D. J. Ewins,
 * Modal Testing, 2nd ed. 2000, ch. 2, from memory), written out here rather than taken from the project.
 *
 * <p>Its phase falls by 180 degrees through the mode, fastest at w_r where d(phase)/df = -1/(zeta f_r); it has fallen
 * by 10 % (18 degrees) where (f_r - f)/(zeta f_r) = 1/tan(18 deg) = 3.078 and by 90 % at the mirror point [derived
 * from the formula]. The mode is one like the demo wire's fundamental (the wire at 150 N), 228.23 Hz at zeta 0.35 %,
 * on the 35 coarse steps of the example plan (150-800 Hz), which fall 222.41 and 233.63 Hz either side of it.
 */
class PhaseSearchTest {
    private static final double FR_HZ = 228.23;
    private static final double ZETA = 0.0035;
    private static final double RELATIVE_STD = 1e-4;

    private static Complex mode(double f, double frHz, double zeta, double a) {
        double w = 2 * Math.PI * f;
        double wr = 2 * Math.PI * frHz;
        return new Complex(a, 0).divide(new Complex(wr * wr - w * w, 2 * zeta * wr * w));
    }

    private static Frf frf(double[] f, DoubleFunction<Complex> h) {
        double[] sorted = f.clone();
        Arrays.sort(sorted);
        double[] re = new double[sorted.length];
        double[] im = new double[sorted.length];
        double[] variance = new double[sorted.length];
        for (int i = 0; i < sorted.length; i++) {
            Complex v = h.apply(sorted[i]);
            re[i] = v.getReal();
            im[i] = v.getImaginary();
            variance[i] = 2 * Math.pow(v.norm() * RELATIVE_STD, 2);
        }
        return Frf.of(sorted, re, im, FrfQuantity.RECEPTANCE).withVariance(variance);
    }

    private static double[] coarse() {
        return AdaptiveModeFindingTest.examplePlan(0.005).coarseFrequenciesHz();
    }

    @Test
    void aSharpModeBetweenTwoCoarseStepsShowsInThePhaseThoughNeitherStepIsAPeak() {
        double[] f = coarse();
        Frf h = frf(f, x -> mode(x, FR_HZ, ZETA, 1));
        int above = 0;
        while (f[above] < FR_HZ) {
            above++;
        }
        double below = h.magnitude(above - 1);
        double next = h.magnitude(above);
        assertFalse(next > 1.5 * below && next > 1.5 * h.magnitude(above + 1) || below > 1.5 * next
                && below > 1.5 * h.magnitude(above - 2), "neither straddling step stands 1.5 times above both neighbours");

        List<double[]> windows = PhaseSearch.windows(h, f[0], f[f.length - 1]);

        assertEquals(1, windows.size(), "one window");
        assertEquals(f[above - 1], windows.get(0)[0], 0.0, "from the step below the mode");
        assertEquals(f[above], windows.get(0)[1], 0.0, "to the step above it");
    }

    @Test
    void theSearchEndsAboutAQuarterBandwidthApartWhereThePhaseTurnsFastest() {
        TreeSet<Double> steps = new TreeSet<>();
        for (double x : coarse()) {
            steps.add(x);
        }
        int added = 0;
        for (int round = 0; round < AdaptivePlanner.MAX_SEARCH_ROUNDS; round++) {
            double[] split = PhaseSearch.splits(frf(toArray(steps), x -> mode(x, FR_HZ, ZETA, 1)), 150, 800, 0.002);
            if (split.length == 0) {
                break;
            }
            for (double x : split) {
                steps.add(x);
            }
            added += split.length;
        }
        double below = steps.floor(FR_HZ);
        double above = steps.ceiling(FR_HZ);
        // A 30 degree fall at the steepest slope 1/(zeta f_r) rad/Hz spans (pi/6) zeta f_r = 0.52 zeta f_r.
        assertTrue(above - below <= Math.PI / 6 * ZETA * FR_HZ, "the interval at the resonance is "
                + (above - below) + " Hz wide, at most 0.52 zeta f_r (derived from the phase slope)");
        assertTrue(added < 30, "the search took " + added + " steps");
        assertEquals(0, PhaseSearch.splits(frf(toArray(steps), x -> mode(x, FR_HZ, ZETA, 1)), 150, 800, 0.002).length);
    }

    @Test
    void theRegionSpansTheTenToNinetyPercentFallAndEstimatesTheDamping() {
        TreeSet<Double> steps = new TreeSet<>();
        for (double x : coarse()) {
            steps.add(x);
        }
        double half = ZETA * FR_HZ;
        for (int i = -200; i <= 200; i++) {
            steps.add(FR_HZ + i * 0.05 * half);
        }

        List<PhaseSearch.Region> regions = PhaseSearch.regions(frf(toArray(steps), x -> mode(x, FR_HZ, ZETA, 1)), 150, 800, 0.002);

        assertEquals(1, regions.size());
        PhaseSearch.Region r = regions.get(0);
        assertEquals(FR_HZ - 3.078 * half, r.lowHz(), 0.05 * half, "10 % of the fall: 3.078 half-widths below");
        assertEquals(FR_HZ + 3.078 * half, r.highHz(), 0.05 * half, "90 % of the fall: 3.078 half-widths above");
        assertEquals(ZETA, r.dampingRatio(), 0.01 * ZETA, "damping from the steepest interval");
        assertEquals(FR_HZ, r.peakHz(), 0.05 * half);
    }

    @Test
    void aDoubletOneBandwidthApartIsOneRegionHoldingBothModes() {
        double second = FR_HZ * 1.007;
        DoubleFunction<Complex> h = x -> mode(x, FR_HZ, ZETA, 1).add(mode(x, second, ZETA, 0.22));
        TreeSet<Double> steps = new TreeSet<>();
        for (double x : coarse()) {
            steps.add(x);
        }
        for (int round = 0; round < AdaptivePlanner.MAX_SEARCH_ROUNDS; round++) {
            double[] split = PhaseSearch.splits(frf(toArray(steps), h), 150, 800, 0.002);
            for (double x : split) {
                steps.add(x);
            }
        }

        List<PhaseSearch.Region> regions = PhaseSearch.regions(frf(toArray(steps), h), 150, 800, 0.002);

        assertEquals(1, regions.size(), "one band for the pair");
        assertTrue(regions.get(0).lowHz() < FR_HZ && regions.get(0).highHz() > second, "the band "
                + regions.get(0) + " holds both modes");
    }

    @Test
    void aFlatNoisyResponseAsksForNothing() {
        SplittableRandom random = new SplittableRandom(7);
        double[] f = coarse();
        double[] phaseNoise = new double[f.length];
        for (int i = 0; i < f.length; i++) {
            phaseNoise[i] = 3 * RELATIVE_STD * random.nextGaussian();
        }
        Frf h = frf(f, x -> Complex.valueOf(1e-4).multiply(Complex.I.multiply(phaseNoise[Arrays.binarySearch(f, x)])
                .exp()));

        assertTrue(PhaseSearch.windows(h, 150, 800).isEmpty());
        assertEquals(0, PhaseSearch.splits(h, 150, 800, 0.002).length);
        assertTrue(PhaseSearch.regions(h, 150, 800, 0.002).isEmpty());
    }

    private static double[] toArray(TreeSet<Double> steps) {
        return steps.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
