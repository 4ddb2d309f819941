package org.tautline.driver.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.ModalEstimator;

/**
 * One resonance an adaptive sweep is refining: where it is thought to be, and the steps it asks for next.
 *
 * <p>Spacing follows the half-power bandwidth 2 zeta f_r, the width over which the FRF of a mode carries
 * its information about f_r and zeta (D. J. Ewins, Modal Testing: Theory, Practice and Application, 2nd ed.,
 * Research Studies Press 2000, ch. 4, from memory). The first refinement places steps a quarter of a
 * bandwidth apart over +-1.5 bandwidths; further rounds halve the spacing (to a sixteenth at most) over
 * +-1 bandwidth, where the phase of the FRF turns and the information on f_r and zeta lies, until
 * the local modal fit's standard errors meet the targets. Before a fit exists the bandwidth comes from
 * the plan's initial damping ratio; the peak is first located by steps of half a bandwidth around the
 * first guess, extended until the largest response lies inside them.
 */
final class ResonanceTracker {
    /** Half-width of the local fit band, in bandwidths. */
    static final double FIT_HALF_WIDTH_BANDWIDTHS = 4.0;
    /** Updates (locating and refining) before a resonance is given up. */
    static final int MAX_UPDATES = 6;

    private double frequencyHz;
    private double dampingRatio;
    private boolean located;
    private int round;
    private int updates;
    private int failedFits;
    private Optional<FittedMode> fit = Optional.empty();
    private String lastFitProblem = "";

    ResonanceTracker(double frequencyGuessHz, double dampingGuess) {
        this.frequencyHz = frequencyGuessHz;
        this.dampingRatio = dampingGuess;
    }

    double frequencyHz() {
        return frequencyHz;
    }

    double dampingRatio() {
        return dampingRatio;
    }

    Optional<FittedMode> fit() {
        return fit;
    }

    String lastFitProblem() {
        return lastFitProblem;
    }

    /** @return true once the peak has been placed and refinement has begun */
    boolean located() {
        return located;
    }

    boolean exhausted() {
        return updates >= MAX_UPDATES;
    }

    /** @return the time constant 1/(zeta w_r), s */
    double tauS() {
        return 1.0 / (dampingRatio * 2 * Math.PI * frequencyHz);
    }

    private double bandwidthHz() {
        return 2 * dampingRatio * frequencyHz;
    }

    /**
     * The next batch of steps, increasing; steps within an eighth of the spacing of a step done are left out.
     *
     * @param done frequencies already measured, Hz
     * @return the batch (may be empty when the grid is already covered)
     */
    double[] nextBatch(List<SweepPoint> done) {
        double b = bandwidthHz();
        double spacing;
        double halfWidth;
        if (!located) {
            spacing = b / 2;
            halfWidth = 2 * b;
        } else {
            spacing = b / (4 << Math.min(round, 2));
            halfWidth = round == 0 ? 1.5 * b : b;
        }
        List<Double> batch = new ArrayList<>();
        int k = (int) Math.floor(halfWidth / spacing);
        for (int i = -k; i <= k; i++) {
            double f = frequencyHz + i * spacing;
            if (f > 0 && !near(done, f, spacing / 8)) {
                batch.add(f);
            }
        }
        return batch.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static boolean near(List<SweepPoint> done, double f, double within) {
        for (SweepPoint p : done) {
            if (Math.abs(p.frequencyHz() - f) <= within) {
                return true;
            }
        }
        return false;
    }

    /**
     * Takes the steps measured so far: moves the peak guess while locating, fits once located.
     *
     * @param frf the sweep's FRF so far (all points, increasing frequency)
     * @param frequencyRelStd target relative standard error of f
     * @param dampingRelStd target relative standard error of zeta
     * @return true when the targets are met
     */
    boolean update(Frf frf, double frequencyRelStd, double dampingRelStd) {
        double b = bandwidthHz();
        updates++;
        if (!located) {
            int best = largestNear(frf, frequencyHz - 2.01 * b, frequencyHz + 2.01 * b);
            double bestHz = frf.frequencyHz(best);
            located = Math.abs(bestHz - frequencyHz) < 1.01 * b;
            frequencyHz = bestHz;
            return false;
        }
        round++;
        // A fit that finds nothing (a close pair of modes, a first bandwidth guessed too wide) tries a wider band next.
        double low = frequencyHz - FIT_HALF_WIDTH_BANDWIDTHS * (1 + failedFits) * b;
        double high = frequencyHz + FIT_HALF_WIDTH_BANDWIDTHS * (1 + failedFits) * b;
        try {
            List<FittedMode> modes = ModalEstimator.defaults().withBand(low, high).estimate(frf).modes();
            FittedMode nearest = null;
            for (FittedMode m : modes) {
                if (nearest == null || Math.abs(m.mode().frequencyHz() - frequencyHz)
                        < Math.abs(nearest.mode().frequencyHz() - frequencyHz)) {
                    nearest = m;
                }
            }
            if (nearest == null || Math.abs(nearest.mode().frequencyHz() - frequencyHz) > 2 * b) {
                lastFitProblem = String.format(java.util.Locale.ROOT, "no mode found in %.2f .. %.2f Hz", low, high);
                failedFits++;
                return false;
            }
            fit = Optional.of(nearest);
            frequencyHz = nearest.mode().frequencyHz();
            dampingRatio = Math.max(1e-5, nearest.mode().dampingRatio());
            return nearest.frequencyStdHz() / frequencyHz <= frequencyRelStd
                    && nearest.dampingRatioStd() / nearest.mode().dampingRatio() <= dampingRelStd;
        } catch (AnalysisException e) {
            lastFitProblem = e.getMessage();
            failedFits++;
            return false;
        }
    }

    private static int largestNear(Frf frf, double low, double high) {
        int best = -1;
        for (int i = 0; i < frf.size(); i++) {
            double f = frf.frequencyHz(i);
            if (f >= low && f <= high && (best < 0 || frf.magnitude(i) > frf.magnitude(best))) {
                best = i;
            }
        }
        return best;
    }

    /**
     * Peaks of a coarse pass: points above both neighbours by a factor 1.5 (flat regions give none), with a
     * first guess of the natural frequency from the two largest points around each, assuming the mode
     * dominates there: |H| ~ A / |w_r^2 - w^2| on either side gives
     * w_r^2 = (|H_a| w_a^2 + |H_b| w_b^2) / (|H_a| + |H_b|).
     *
     * @param frf the coarse FRF, increasing frequency
     * @return first guesses of the resonances, Hz
     */
    static List<Double> coarsePeaksHz(Frf frf) {
        List<Double> peaks = new ArrayList<>();
        for (int i = 1; i + 1 < frf.size(); i++) {
            double m = frf.magnitude(i);
            double left = frf.magnitude(i - 1);
            double right = frf.magnitude(i + 1);
            if (m > 1.5 * left && m > 1.5 * right) {
                int j = left > right ? i - 1 : i + 1;
                double wa = frf.frequencyHz(Math.min(i, j));
                double wb = frf.frequencyHz(Math.max(i, j));
                double ha = frf.magnitude(Math.min(i, j));
                double hb = frf.magnitude(Math.max(i, j));
                peaks.add(Math.sqrt((ha * wa * wa + hb * wb * wb) / (ha + hb)));
            }
        }
        return peaks;
    }
}
