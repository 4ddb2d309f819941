package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.frf.Frf;

/**
 * Whether a fitted model explains the measured FRF: the check a fit makes of itself after its repairs.
 *
 * <p>The residual is whitened by the noise of each line (the FRF's variance, or the estimate of {@link NoiseFloor})
 * and summed over {@value ModalResidualSearch#WINDOW} adjacent lines, the detector of {@link ModalResidualSearch}: for
 * a model that explains the data the sum is Gamma(5, 1) distributed and exceeds {@value ModalCandidate#THRESHOLD}
 * with probability 4e-9 (S. M. Kay, Fundamentals of Statistical Signal Processing: Detection Theory, 1998, ch. 2,
 * from memory), times the model's robust residual variance over the band when that exceeds 1 (the median of
 * |e_k|^2 over ln 2, see {@link ModalCandidate#scale}: a misfit must stand out of the misfit left elsewhere, as in the
 * tests that keep a mode). A window is unexplained when its sum exceeds that level and the misfit there is also material:
 * ||H - H_model|| over the window at least {@value #MATERIAL} of ||H|| there. A smaller misfit is within the
 * accuracy of a calibrated force and response chain (a few per cent, common practice; ISO 7626-1 asks for the
 * transducers' calibration to be known, not for better), and with a variance that counts only the random error it
 * is how the small nonlinearity of a real specimen at its largest motion shows; it is no sign of a missing mode, and
 * it moves no fitted mode by much. Windows within {@link ModeSelection#EDGE_GUARD} of the band edges are not judged,
 * as the search does not search them. Adjacent unexplained windows are reported as one place.
 */
final class FitCheck {
    /** Smallest misfit, relative to the response over the window, that counts as material. */
    static final double MATERIAL = 0.05;
    /**
     * Smallest misfit, relative to the response over the window, that is noted as a possible weak mode: under it the
     * misfit is within the accuracy a calibrated chain is usually trusted to (common practice), and as small as the
     * misfit a specimen's slight nonlinearity leaves at its largest motion.
     */
    static final double NOTED = 0.01;

    private FitCheck() {
    }

    /**
     * Why the model does not explain the data, or empty when it does.
     *
     * @param h the measured receptance
     * @param variance the noise variance of each line
     * @param lowHz lower edge of the fitted band, Hz
     * @param highHz upper edge, Hz
     * @param modes the model's modes
     * @param terms the model's residual terms
     * @param noiseEstimated true when the noise was estimated from the data rather than given with the FRF
     * @return one plain sentence, or empty
     */
    static Optional<String> unexplained(Frf h, double[] variance, double lowHz, double highHz, List<Mode> modes,
                                        ResidualTerms terms, boolean noiseEstimated) {
        List<Place> places = places(h, variance, lowHz, highHz, modes, terms);
        if (places.isEmpty()) {
            return Optional.empty();
        }
        Place worst = places.get(0);
        for (Place p : places) {
            if (p.relative() > worst.relative()) {
                worst = p;
            }
        }
        String others = places.size() == 1 ? "" : String.format(Locale.ROOT, " and at %d other place%s",
                places.size() - 1, places.size() == 2 ? "" : "s");
        return Optional.of(String.format(Locale.ROOT, "the fitted modes do not explain the measured response near %.4g Hz"
                + " (%.4g to %.4g Hz)%s: the misfit there is %.0f %% of the response and %.0f times the %s noise, and"
                + " neither more modes nor splitting a mode in two explained it, so a mode may be missing, two close"
                + " modes may have been fitted as one, or the measurement there may be disturbed", worst.worstHz(),
                worst.fromHz(), worst.toHz(), others, 100 * worst.relative(), worst.sigmas(),
                noiseEstimated ? "estimated" : "measured"));
    }

    /**
     * One stretch of adjacent unexplained windows.
     *
     * @param fromHz first line of the stretch, Hz
     * @param toHz last line, Hz
     * @param worstHz the middle line of the window whose whitened sum is largest, Hz
     * @param relative the largest misfit of a window over its response
     * @param sigmas the largest root-mean-square whitened residual of a window, in noise standard deviations
     */
    record Place(double fromHz, double toHz, double worstHz, double relative, double sigmas) {
    }

    /**
     * The unexplained stretches of the residual, in increasing frequency.
     *
     * @param h the measured receptance
     * @param variance the noise variance of each line
     * @param lowHz lower edge of the fitted band, Hz
     * @param highHz upper edge, Hz
     * @param modes the model's modes
     * @param terms the model's residual terms
     * @return the stretches, possibly none
     */
    static List<Place> places(Frf h, double[] variance, double lowHz, double highHz, List<Mode> modes,
                              ResidualTerms terms) {
        return places(h, variance, lowHz, highHz, modes, terms, true);
    }

    /**
     * Where the residual stands above the noise and the misfit is between {@value #NOTED} and {@value #MATERIAL} of the
     * response: not enough
     * to call the data unexplained, but a weak mode the fit did not take (one whose peak is a few per cent of the
     * response, a harmonic near a node of the force or the sensor) or a slight nonlinearity of the specimen, and worth
     * saying, since such a mode is then missing from the modes.
     *
     * @param h the measured receptance
     * @param variance the noise variance of each line
     * @param lowHz lower edge of the fitted band, Hz
     * @param highHz upper edge, Hz
     * @param modes the model's modes
     * @param terms the model's residual terms
     * @param noiseEstimated true when the noise was estimated from the data rather than given with the FRF
     * @return one plain sentence, or empty
     */
    static Optional<String> smallMisfit(Frf h, double[] variance, double lowHz, double highHz, List<Mode> modes,
                                        ResidualTerms terms, boolean noiseEstimated) {
        List<Place> places = places(h, variance, lowHz, highHz, modes, terms, false);
        if (places.isEmpty()) {
            return Optional.empty();
        }
        Place worst = places.get(0);
        for (Place p : places) {
            if (p.sigmas() > worst.sigmas()) {
                worst = p;
            }
        }
        StringBuilder where = new StringBuilder();
        for (Place p : places) {
            where.append(where.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.4g Hz", p.worstHz()));
        }
        return Optional.of(String.format(Locale.ROOT, "the fitted modes leave a small misfit that stands above the %s"
                + " noise near %s (at most %.1f %% of the response, %.0f times the noise): a weak mode that the fit did"
                + " not take (one whose peak is a few per cent of the response, as for a harmonic near a node of the"
                + " force or the sensor) or a slight nonlinearity of the specimen; any such mode is missing from the"
                + " modes", noiseEstimated ? "estimated" : "measured", where, 100 * worst.relative(), worst.sigmas()));
    }

    private static List<Place> places(Frf h, double[] variance, double lowHz, double highHz, List<Mode> modes,
                                      ResidualTerms terms, boolean material) {
        FitResidual fit = FitResidual.of(h, variance, modes, terms);
        double[] e2 = fit.whitenedSquares();
        Complex[] r = fit.residual();
        double guard = ModeSelection.EDGE_GUARD * (highHz - lowHz);
        int window = ModalResidualSearch.WINDOW;
        double[] inBand = java.util.stream.IntStream.range(0, e2.length)
                .filter(k -> h.frequencyHz(k) >= lowHz && h.frequencyHz(k) <= highHz).mapToDouble(k -> e2[k]).sorted()
                .toArray();
        double scale = inBand.length == 0 ? 1 : Math.max(1, inBand[inBand.length / 2] / Math.log(2));
        List<Place> places = new ArrayList<>();
        double[] open = null;
        for (int start = 0; start + window <= h.size(); start++) {
            double from = h.frequencyHz(start);
            double to = h.frequencyHz(start + window - 1);
            if (from < lowHz + guard || to > highHz - guard) {
                continue;
            }
            double sum = 0;
            double misfit = 0;
            double response = 0;
            for (int k = start; k < start + window; k++) {
                sum += e2[k];
                misfit += r[k].norm() * r[k].norm();
                response += h.magnitude(k) * h.magnitude(k);
            }
            double relative = Math.sqrt(misfit / response);
            if (!(sum > ModalCandidate.THRESHOLD * scale) || (relative >= MATERIAL) != material || relative < NOTED) {
                continue;
            }
            double middle = h.frequencyHz(start + window / 2);
            if (open != null && from <= open[1]) {
                open[1] = to;
                open[3] = Math.max(open[3], relative);
                if (sum > open[5]) {
                    open[2] = middle;
                    open[5] = sum;
                }
            } else {
                if (open != null) {
                    places.add(new Place(open[0], open[1], open[2], open[3], Math.sqrt(open[5] / window)));
                }
                open = new double[] {from, to, middle, relative, 0, sum};
            }
        }
        if (open != null) {
            places.add(new Place(open[0], open[1], open[2], open[3], Math.sqrt(open[5] / window)));
        }
        return places;
    }
}
