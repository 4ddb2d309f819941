package org.tautline.app.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.ModalSynthesis;
import org.tautline.analysis.modal.Mode;

/**
 * The weak-mode and out-of-band cases of the modal benchmark suite (invented data); see {@link ModalCaseSuite}.
 *
 * <p>A weak mode is a harmonic whose modal constant is small because the force or the sensor sits near one of its
 * nodes (phi_n(x) = sqrt(2/(mu L)) sin(n pi x/L) vanishes at x = k L/n): the point is moved off the node just so far
 * that the mode's own peak stands the named number of noise standard deviations above the noise.
 */
final class ModalCaseSuiteMore {
    private static final double L = ModalCaseBuilder.LENGTH_M;
    /** Weakest strong peak over the noise in these cases, dB. */
    private static final double PEAK_TO_NOISE_DB = 40;

    private ModalCaseSuiteMore() {
    }

    /** @return a string of six harmonics whose fourth stands 7 noise standard deviations high, stepped sine, mobility */
    static ModalCase weakFourthHarmonic() {
        long seed = 1501;
        FrfQuantity q = FrfQuantity.MOBILITY;
        ModalCaseBuilder b = new ModalCaseBuilder(seed);
        b.string(b.uniform(110, 150), b.logUniform(1e-4, 4e-4));
        double[] zeta = new double[7];
        for (int n = 1; n <= 6; n++) {
            zeta[n] = b.logUniform(1e-3, 3e-3);
        }
        double xf = L * b.uniform(0.08, 0.15);
        double node = 0.75 * L;
        b.positions(xf, node);
        double s = noise(b, zeta, q, List.of(1, 2, 3, 5, 6));
        double ratio = 7;
        b.positions(xf, node + offNode(b, 4, zeta[4], q, ratio * s, xf));
        List<double[]> regions = new ArrayList<>();
        double[] bandwidths = new double[6];
        for (int n = 1; n <= 6; n++) {
            Mode m = b.single(n, zeta[n]);
            regions.add(new double[] {m.frequencyHz(), m.frequencyHz()});
            bandwidths[n - 1] = 2 * zeta[n] * m.frequencyHz();
        }
        ModalCaseGrid grid = ModalCaseGrid.steppedAroundPeaks(0.8 * b.harmonicHz(1), 1.1 * b.harmonicHz(6), 600, regions,
                bandwidths, 6, 16);
        Frf frf = b.frf(grid, q, s);
        String description = String.format(Locale.ROOT, "six harmonics in one plane, damping ratio 0.001-0.003; the"
                        + " sensor sits near the 4th harmonic's node at 0.75 L, so its own peak stands %s noise standard"
                        + " deviations above the noise and the other peaks about %.0f dB; %s; %s; %s", number(ratio),
                PEAK_TO_NOISE_DB, q.label(), grid.description(), b.stringWords());
        return new ModalCase("weak 4th harmonic 7 noise standard deviations high (sensor near its node)", description,
                seed, b.modes(), frf, grid, s, grid.frequencyHz()[0], grid.frequencyHz()[grid.size() - 1], false,
                ModalCase.Claim.weakModes(new double[] {ratio}, new double[] {b.harmonicHz(4)}));
    }

    /** @return five harmonics whose 3rd and 5th stand 5 and 10 noise standard deviations high, uniform, accelerance */
    static ModalCase weakThirdAndFifthHarmonics() {
        long seed = 1502;
        FrfQuantity q = FrfQuantity.ACCELERANCE;
        ModalCaseBuilder b = new ModalCaseBuilder(seed);
        b.string(b.uniform(110, 140), b.logUniform(1e-4, 4e-4));
        double[] zeta = new double[6];
        for (int n = 1; n <= 5; n++) {
            zeta[n] = b.logUniform(2e-3, 5e-3);
        }
        double forceNode = L / 3;
        double sensorNode = 0.6 * L;
        b.positions(forceNode, sensorNode);
        double s = noise(b, zeta, q, List.of(1, 2, 4));
        double third = 5;
        double fifth = 10;
        // Each offset depends a little on the other point; a few rounds settle both to machine precision.
        for (int round = 0; round < 30; round++) {
            double xf = forceNode + offNode(b, 3, zeta[3], q, third * s, b.sensorAtM());
            b.positions(xf, b.sensorAtM());
            b.positions(xf, sensorNode + offNode(b, 5, zeta[5], q, fifth * s, xf));
        }
        for (int n = 1; n <= 5; n++) {
            b.single(n, zeta[n]);
        }
        ModalCaseGrid grid = ModalCaseGrid.uniform(0.8 * b.harmonicHz(1), 1.1 * b.harmonicHz(5),
                ModalCaseSuite.UNIFORM_LINES);
        Frf frf = b.frf(grid, q, s);
        String description = String.format(Locale.ROOT, "five harmonics in one plane, damping ratio 0.002-0.005; the"
                        + " force sits near the 3rd harmonic's node at L/3 and the sensor near the 5th's at 0.6 L, so"
                        + " their own peaks stand %s and %s noise standard deviations above the noise and the other"
                        + " peaks about %.0f dB; %s; %s; %s", number(third), number(fifth), PEAK_TO_NOISE_DB, q.label(),
                grid.description(), b.stringWords());
        return new ModalCase("weak 3rd and 5th harmonics 5 and 10 noise standard deviations high (force and sensor"
                + " near their nodes)", description, seed, b.modes(), frf, grid, s, grid.frequencyHz()[0],
                grid.frequencyHz()[grid.size() - 1], false, ModalCase.Claim.weakModes(new double[] {third, fifth},
                new double[] {b.harmonicHz(3), b.harmonicHz(5)}));
    }

    /** @return harmonics 3-14 as doublets measured alone, with harmonics 1-2 and 15-40 outside the lines; receptance */
    static ModalCase betweenStrongModesOutsideTheBand() {
        long seed = 1601;
        FrfQuantity q = FrfQuantity.RECEPTANCE;
        ModalCaseBuilder b = new ModalCaseBuilder(seed);
        b.string(b.uniform(50, 60), b.logUniform(5e-5, 2e-4));
        b.drawPositions(new double[] {0.03, 0.09}, new double[] {0.1, 0.45}, 3, 14, 0.2);
        List<Mode> modes = doubletString(b, 40);
        double lowHz = between(modes, 2);
        double highHz = between(modes, 14);
        ModalCaseGrid grid = ModalCaseGrid.uniform(lowHz, highHz, ModalCaseSuite.UNIFORM_LINES);
        return outOfBand(b, seed, q, grid, lowHz, highHz, false, "24 modes between strong modes below and above the"
                + " measured band", "harmonics 3-14, each as two polarisations (split 2-4 half-power bandwidths, damping"
                + " ratio 0.0015-0.004), measured alone: harmonics 1-2 lie below the lines and 15-40 above them");
    }

    /** @return a 30-harmonic string on log-spaced lines, fitted between harmonics 8 and 19; accelerance */
    static ModalCase subBandOfALongerString() {
        long seed = 1602;
        FrfQuantity q = FrfQuantity.ACCELERANCE;
        ModalCaseBuilder b = new ModalCaseBuilder(seed);
        b.string(b.uniform(40, 50), b.logUniform(5e-5, 2e-4));
        b.drawPositions(new double[] {0.03, 0.09}, new double[] {0.1, 0.45}, 8, 19, 0.2);
        List<Mode> modes = doubletString(b, 30);
        ModalCaseGrid grid = ModalCaseGrid.logSpaced(0.7 * modes.get(0).frequencyHz(),
                1.03 * modes.get(modes.size() - 1).frequencyHz(), 3000);
        return outOfBand(b, seed, q, grid, between(modes, 7), between(modes, 19), true, "24 modes fitted in a sub-band"
                + " of a 60-mode string", "harmonics 1-30, each as two polarisations (split 2-4 half-power bandwidths,"
                + " damping ratio 0.0015-0.004), all measured; the fit is asked for harmonics 8-19 only");
    }

    private static ModalCase outOfBand(ModalCaseBuilder b, long seed, FrfQuantity q, ModalCaseGrid grid, double lowHz,
                                       double highHz, boolean subBand, String name, String what) {
        List<Mode> modes = b.modes();
        List<Mode> inside = modes.stream().filter(m -> m.frequencyHz() >= lowHz && m.frequencyHz() <= highHz).toList();
        List<Mode> outside = modes.stream().filter(m -> m.frequencyHz() < lowHz || m.frequencyHz() > highHz).toList();
        double s = ModalCaseBuilder.noiseBelowWeakest(inside, q, PEAK_TO_NOISE_DB);
        Frf frf = b.frf(grid, q, s);
        double[] bandLines = java.util.Arrays.stream(grid.frequencyHz()).filter(f -> f >= lowHz && f <= highHz).toArray();
        Frf rest = ModalSynthesis.synthesize(outside, bandLines, q);
        double least = Double.POSITIVE_INFINITY;
        double most = 0;
        for (int i = 0; i < rest.size(); i++) {
            least = Math.min(least, rest.magnitude(i) / s);
            most = Math.max(most, rest.magnitude(i) / s);
        }
        String description = String.format(Locale.ROOT, "%s; fit band %.4g-%.4g Hz; on its %d lines the %d modes outside"
                        + " it add %.0f to %.0f noise standard deviations, and the best upper and lower residual terms"
                        + " (UR - LR/w^2) leave %.1f of them unexplained (RMS), so the bound, which takes those two terms"
                        + " for the modes outside, is optimistic here; noise %.0f dB below the weakest peak in the band;"
                        + " %s; %s; %s", what, lowHz, highHz, bandLines.length, outside.size(), least, most,
                leftoverAfterResidualTerms(rest, s), PEAK_TO_NOISE_DB, q.label(), grid.description(), b.stringWords());
        return new ModalCase(name, description, seed, modes, frf, grid, s, lowHz, highHz, subBand,
                ModalCase.Claim.none());
    }

    /**
     * The RMS, in noise standard deviations, of what the best upper and lower residual terms UR - LR/w^2 (Ewins,
     * Modal Testing, 2nd ed. 2000, ch. 4, from memory) leave of the out-of-band modes' response: a least-squares fit
     * of the two complex terms, read as receptance with the noise whitened line by line.
     */
    private static double leftoverAfterResidualTerms(Frf outside, double noiseStd) {
        int d = outside.quantity().derivativeOrder();
        int n = outside.size();
        double squares = 0;
        for (int part = 0; part < 2; part++) {
            double[] y = part == 0 ? outside.realParts() : outside.imaginaryParts();
            double a11 = 0;
            double a12 = 0;
            double a22 = 0;
            double b1 = 0;
            double b2 = 0;
            double[] x2 = new double[n];
            double[] weight = new double[n];
            for (int i = 0; i < n; i++) {
                double w = 2 * Math.PI * outside.frequencyHz(i);
                weight[i] = Math.pow(w, 2.0 * d) / (noiseStd * noiseStd);
                y[i] /= Math.pow(w, d);
                x2[i] = -1 / (w * w);
                a11 += weight[i];
                a12 += weight[i] * x2[i];
                a22 += weight[i] * x2[i] * x2[i];
                b1 += weight[i] * y[i];
                b2 += weight[i] * x2[i] * y[i];
            }
            double det = a11 * a22 - a12 * a12;
            double upper = (a22 * b1 - a12 * b2) / det;
            double lower = (a11 * b2 - a12 * b1) / det;
            for (int i = 0; i < n; i++) {
                double r = y[i] - upper - lower * x2[i];
                squares += weight[i] * r * r;
            }
        }
        return Math.sqrt(squares / n);
    }

    /** Harmonics 1..count as doublets, damping 0.0015-0.004, split 2-4 bandwidths; returns all modes sorted. */
    private static List<Mode> doubletString(ModalCaseBuilder b, int count) {
        for (int n = 1; n <= count; n++) {
            double zeta = b.logUniform(1.5e-3, 4e-3);
            double angle = b.uniform(25, 45);
            b.doublet(n, zeta, b.uniform(2, 4), b.coin() ? angle : 90 - angle, b.uniform(0.9, 1.1));
        }
        return b.modes();
    }

    /** The frequency half-way between the upper mode of harmonic k and the lower mode of k + 1 (doublet strings). */
    private static double between(List<Mode> modes, int k) {
        return 0.5 * (modes.get(2 * k - 1).frequencyHz() + modes.get(2 * k).frequencyHz());
    }

    /** The noise std that puts the weakest of the listed harmonics' peaks 40 dB above it, at the current positions. */
    private static double noise(ModalCaseBuilder b, double[] zeta, FrfQuantity q, List<Integer> harmonics) {
        List<Mode> strong = new ArrayList<>();
        for (int n : harmonics) {
            strong.add(new Mode(b.harmonicHz(n), zeta[n], new org.hipparchus.complex.Complex(b.modalConstant(n))));
        }
        return ModalCaseBuilder.noiseBelowWeakest(strong, q, PEAK_TO_NOISE_DB);
    }

    /**
     * How far off its node (at x = k L/n) a point must sit for harmonic n's own peak to reach the given height,
     * the other point held at {@code otherAtM}: |sin(n pi delta/L)| = |A| / (2/(mu L) |sin(n pi x_other/L)|).
     */
    private static double offNode(ModalCaseBuilder b, int n, double zeta, FrfQuantity q, double peak, double otherAtM) {
        double wn = 2 * Math.PI * b.harmonicHz(n);
        double constant = peak * 2 * zeta * wn * wn / Math.pow(wn, q.derivativeOrder());
        double other = 2 / (ModalCaseBuilder.MU_KG_PER_M * L) * Math.abs(Math.sin(n * Math.PI * otherAtM / L));
        return L / (n * Math.PI) * Math.asin(constant / other);
    }

    private static String number(double x) {
        return ModalCaseSuite.number(x);
    }
}
