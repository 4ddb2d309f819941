package org.tautline.app.ui.results;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.CircleFit;
import org.tautline.analysis.modal.ModalSynthesis;
import org.tautline.analysis.modal.Mode;

/**
 * What the Nyquist view draws around one mode: measured and modelled mobility and the fitted circle. Free of Swing.
 *
 * <p>The view uses MOBILITY because a viscous mode traces an exact circle there (Kennedy and Pancu 1947;
 * Ewins, Modal Testing, 2nd ed. 2000, section 4.3, from memory), which is what {@link CircleFit} fits.
 * The band is the mode's frequency +- {@value #HALF_POWER_BANDWIDTHS} half-power bandwidths 2 zeta f.
 *
 * @param measured measured mobility at the lines in the band, m/(N s)
 * @param model the fitted model's mobility (its modes, without residual terms) on a fine grid over the band, m/(N s)
 * @param circle the circle fitted to the measured lines, absent when the band holds too few lines or the fit failed
 * @param fromHz lower edge of the band, Hz
 * @param toHz upper edge of the band, Hz
 */
record NyquistData(List<Complex> measured, List<Complex> model, Optional<CircleFit> circle, double fromHz, double toHz) {
    /** Half-width of the band in half-power bandwidths. */
    static final double HALF_POWER_BANDWIDTHS = 2.0;
    /** Points of the model's curve. */
    static final int MODEL_POINTS = 200;

    /**
     * @param receptance the measured receptance
     * @param modes the fitted model's modes
     * @param mode the mode to look at
     * @return the data, empty bands when no line lies near the mode
     */
    static NyquistData around(Frf receptance, List<Mode> modes, Mode mode) {
        double halfWidthHz = HALF_POWER_BANDWIDTHS * 2 * mode.dampingRatio() * mode.frequencyHz();
        double from = mode.frequencyHz() - Math.max(halfWidthHz, 1e-3 * mode.frequencyHz());
        double to = mode.frequencyHz() + Math.max(halfWidthHz, 1e-3 * mode.frequencyHz());
        List<Complex> measured = band(receptance.toQuantity(FrfQuantity.MOBILITY), from, to);
        double[] grid = new double[MODEL_POINTS];
        for (int k = 0; k < MODEL_POINTS; k++) {
            grid[k] = from + (to - from) * k / (MODEL_POINTS - 1.0);
        }
        List<Complex> model = band(ModalSynthesis.synthesize(modes, grid, FrfQuantity.MOBILITY), from, to);
        Optional<CircleFit> circle;
        try {
            circle = measured.size() >= 4 ? Optional.of(CircleFit.of(receptance, from, to)) : Optional.empty();
        } catch (AnalysisException e) {
            circle = Optional.empty();
        }
        return new NyquistData(measured, model, circle, from, to);
    }

    /**
     * @param points number of points
     * @return the fitted circle as a closed polygon, m/(N s); empty when there is no circle
     */
    Complex[] circlePoints(int points) {
        if (circle.isEmpty()) {
            return new Complex[0];
        }
        Complex[] out = new Complex[points + 1];
        for (int k = 0; k <= points; k++) {
            double angle = 2 * Math.PI * k / points;
            out[k] = circle.get().centre().add(new Complex(Math.cos(angle), Math.sin(angle)).multiply(circle.get().radius()));
        }
        return out;
    }

    private static List<Complex> band(Frf frf, double fromHz, double toHz) {
        List<Complex> out = new ArrayList<>();
        for (int i = 0; i < frf.size(); i++) {
            if (frf.frequencyHz(i) >= fromHz && frf.frequencyHz(i) <= toHz) {
                out.add(frf.value(i));
            }
        }
        return List.copyOf(out);
    }
}
