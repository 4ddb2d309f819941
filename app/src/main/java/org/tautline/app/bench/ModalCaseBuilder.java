package org.tautline.app.bench;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.ModalSynthesis;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.StringPhysics;

/**
 * Builds the invented stiff-string FRFs of the modal benchmark suite; mutable, one per case.
 *
 * <p>The string is pinned (Fletcher, JASA 36:203, 1964, from memory: f_n = n f0 sqrt(1 + B n^2)), forced at x_f and
 * sensed at x_s in the direction of the force. A harmonic's modal constant is phi_n(x_f) phi_n(x_s) with
 * phi_n(x) = sqrt(2/(mu L)) sin(n pi x/L) (mass-normalised modes of a taut string); when it appears as a
 * polarisation doublet, the two orthogonal planes share it as cos^2 and sin^2 of the angle between the force and
 * one of them. Noise: circular complex Gaussian, each part N(0, s^2/2), s^2 the per-line variance.
 */
final class ModalCaseBuilder {
    /** Vibrating length, m (invented). */
    static final double LENGTH_M = 0.6;
    /** Mass per length, kg/m (invented: a steel wire of about 0.4 mm). */
    static final double MU_KG_PER_M = 1.0e-3;

    private final SplittableRandom random;
    private double fundamentalHz;
    private double inharmonicity;
    private double forceAtM;
    private double sensorAtM;
    private final List<Mode> modes = new ArrayList<>();

    /** @param seed the case's seed: every draw of the case, noise included, comes from it */
    ModalCaseBuilder(long seed) {
        this.random = new SplittableRandom(seed);
    }

    /**
     * Sets the string.
     *
     * @param mersenneFundamentalHz f0 of the string without stiffness, Hz
     * @param inharmonicityB Fletcher's B
     * @return this
     */
    ModalCaseBuilder string(double mersenneFundamentalHz, double inharmonicityB) {
        this.fundamentalHz = mersenneFundamentalHz;
        this.inharmonicity = inharmonicityB;
        return this;
    }

    /** @return true or false, drawn with equal chance */
    boolean coin() {
        return random.nextBoolean();
    }

    /** @return a value drawn uniformly between the two */
    double uniform(double low, double high) {
        return low + (high - low) * random.nextDouble();
    }

    /** @return a value drawn log-uniformly between the two */
    double logUniform(double low, double high) {
        return Math.exp(uniform(Math.log(low), Math.log(high)));
    }

    /**
     * Places the force and the sensor.
     *
     * @param forceAtM x_f, m
     * @param sensorAtM x_s, m
     * @return this
     */
    ModalCaseBuilder positions(double forceAtM, double sensorAtM) {
        this.forceAtM = forceAtM;
        this.sensorAtM = sensorAtM;
        return this;
    }

    /**
     * Draws positions in the given ranges (fractions of the length) until every listed harmonic has
     * |sin(n pi x/L)| of at least {@code awayFromNodes} at both points.
     *
     * @param force fraction range of x_f
     * @param sensor fraction range of x_s
     * @param fromHarmonic first harmonic checked
     * @param toHarmonic last harmonic checked
     * @param awayFromNodes the least |sin| accepted
     * @return this
     */
    ModalCaseBuilder drawPositions(double[] force, double[] sensor, int fromHarmonic, int toHarmonic,
                                   double awayFromNodes) {
        for (int attempt = 0; attempt < 100_000; attempt++) {
            double xf = LENGTH_M * uniform(force[0], force[1]);
            double xs = LENGTH_M * uniform(sensor[0], sensor[1]);
            boolean ok = true;
            for (int n = fromHarmonic; n <= toHarmonic && ok; n++) {
                ok = Math.abs(Math.sin(n * Math.PI * xf / LENGTH_M)) >= awayFromNodes
                        && Math.abs(Math.sin(n * Math.PI * xs / LENGTH_M)) >= awayFromNodes;
            }
            if (ok) {
                return positions(xf, xs);
            }
        }
        throw new IllegalStateException("no force and sensor positions keep harmonics " + fromHarmonic + ".." + toHarmonic
                + " " + awayFromNodes + " away from their nodes");
    }

    /** @return f_n of harmonic n, Hz */
    double harmonicHz(int n) {
        return StringPhysics.stiffStringFrequencyHz(n, fundamentalHz, inharmonicity, EndCondition.PINNED);
    }

    /** @return phi_n(x_f) phi_n(x_s), 1/kg */
    double modalConstant(int n) {
        return StringPhysics.modeShape(n, forceAtM, LENGTH_M, MU_KG_PER_M)
                * StringPhysics.modeShape(n, sensorAtM, LENGTH_M, MU_KG_PER_M);
    }

    /**
     * Adds harmonic n in one plane only.
     *
     * @param n the harmonic
     * @param dampingRatio its zeta
     * @return the mode added
     */
    Mode single(int n, double dampingRatio) {
        Mode m = new Mode(harmonicHz(n), dampingRatio, new Complex(modalConstant(n)));
        modes.add(m);
        return m;
    }

    /**
     * Adds harmonic n as two polarisations: the lower at f_n with {@code dampingRatio}, the upper
     * {@code splitBandwidths} half-power bandwidths (2 zeta f_n) higher with {@code upperDampingFactor} times the
     * damping; the planes lie at {@code angleDeg} to the force, the lower one taking cos^2 of the modal constant.
     *
     * @return the two modes, lower first
     */
    List<Mode> doublet(int n, double dampingRatio, double splitBandwidths, double angleDeg, double upperDampingFactor) {
        double fn = harmonicHz(n);
        double a = modalConstant(n);
        double share = Math.pow(Math.cos(Math.toRadians(angleDeg)), 2);
        Mode lower = new Mode(fn, dampingRatio, new Complex(a * share));
        Mode upper = new Mode(fn + splitBandwidths * 2 * dampingRatio * fn, upperDampingFactor * dampingRatio,
                new Complex(a * (1 - share)));
        modes.add(lower);
        modes.add(upper);
        return List.of(lower, upper);
    }

    /** @return the modes so far, increasing in frequency */
    List<Mode> modes() {
        List<Mode> sorted = new ArrayList<>(modes);
        sorted.sort(Comparator.comparingDouble(Mode::frequencyHz));
        return sorted;
    }

    /** @return the force position, m */
    double forceAtM() {
        return forceAtM;
    }

    /** @return the sensor position, m */
    double sensorAtM() {
        return sensorAtM;
    }

    /**
     * The noise std that puts the weakest of the given modes' own peaks {@code peakToNoiseDb} above it.
     *
     * @param among the modes considered
     * @param quantity the FRF's quantity
     * @param peakToNoiseDb 20 log10(peak/s)
     * @return s in the quantity's units
     */
    static double noiseBelowWeakest(List<Mode> among, FrfQuantity quantity, double peakToNoiseDb) {
        double weakest = among.stream().mapToDouble(m -> ModalCase.ownPeak(m, quantity)).min().orElseThrow();
        return weakest / Math.pow(10, peakToNoiseDb / 20);
    }

    /**
     * The exact FRF of the modes on the grid plus the noise.
     *
     * @param grid the lines
     * @param quantity the quantity
     * @param noiseStd s, in the quantity's units
     * @return the noisy FRF carrying s^2 per line
     */
    Frf frf(ModalCaseGrid grid, FrfQuantity quantity, double noiseStd) {
        Frf clean = ModalSynthesis.synthesize(modes(), grid.frequencyHz(), quantity);
        double[] re = clean.realParts();
        double[] im = clean.imaginaryParts();
        double[] variance = new double[re.length];
        double perPart = noiseStd / Math.sqrt(2);
        for (int i = 0; i < re.length; i++) {
            re[i] += perPart * random.nextGaussian();
            im[i] += perPart * random.nextGaussian();
            variance[i] = noiseStd * noiseStd;
        }
        return Frf.of(grid.frequencyHz(), re, im, quantity).withVariance(variance);
    }

    /** @return "f0 123.4 Hz, B 2.1e-04, force at 0.071 L, sensor at 0.634 L" */
    String stringWords() {
        return String.format(Locale.ROOT, "pinned stiff string f0 %.4g Hz, B %.2g, force at %.3f L, sensor at %.3f L",
                fundamentalHz, inharmonicity, forceAtM / LENGTH_M, sensorAtM / LENGTH_M);
    }
}
