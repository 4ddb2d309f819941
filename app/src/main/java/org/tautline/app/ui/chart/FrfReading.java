package org.tautline.app.ui.chart;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * What the cursor of an FRF plot reads: the line nearest the pointer, or a fitted mode when the pointer is near one
 * and snapping is on. Free of Swing.
 *
 * @param cursorHz where the cursor line is drawn, Hz: the line read, or the mode snapped to
 * @param line the index of the FRF line read
 * @param mode the fitted mode snapped to, when the cursor snapped to one
 * @param text the readout for people, for example "f 225.6 Hz  |H| 2.31 × 10⁻² m/N  phase -91.4°  coherence 0.998"
 */
public record FrfReading(double cursorHz, int line, Optional<ModeMark> mode, String text) {

    /**
     * A fitted mode the cursor may snap to.
     *
     * @param frequencyHz its natural frequency, Hz
     * @param description what it is, for example "harmonic 1, lower of a pair: 225.565 ± 0.013 Hz"
     */
    public record ModeMark(double frequencyHz, String description) {
    }

    /** What the readout says before the pointer has been over the plot. */
    public static final String HINT = "Move the pointer over the plot to read frequency, |H| and phase";

    /**
     * @param lines the FRF
     * @param modes the fitted modes, empty for none
     * @param pointerHz the frequency under the pointer, Hz
     * @param snapRatio how near a mode the pointer must be to snap to it, as a frequency ratio above 1 (1.01 for 1 %);
     *        1 or less for no snapping
     * @return the reading; empty when the FRF has no lines
     */
    public static Optional<FrfReading> at(FrfLines lines, List<ModeMark> modes, double pointerHz, double snapRatio) {
        if (lines.size() == 0 || !(pointerHz > 0)) {
            return Optional.empty();
        }
        Optional<ModeMark> snapped = Optional.empty();
        if (snapRatio > 1) {
            double best = Math.log(snapRatio);
            for (ModeMark m : modes) {
                double distance = Math.abs(Math.log(m.frequencyHz() / pointerHz));
                if (distance <= best) {
                    best = distance;
                    snapped = Optional.of(m);
                }
            }
        }
        double hz = snapped.map(ModeMark::frequencyHz).orElse(pointerHz);
        int i = lines.nearest(hz);
        String values = String.format(Locale.ROOT, "f %s Hz   |H| %s %s   phase %.1f°", plain(lines.frequencyHz()[i], 6),
                plain(lines.magnitude()[i], 4), lines.unit(), lines.phaseDeg()[i])
                + lines.lineFigure().map(f -> "   " + lines.lineFigureName() + " " + plain(f[i], 3)).orElse("");
        String text = snapped.map(m -> "Mode " + m.description() + "   |   nearest line: " + values).orElse(values);
        return Optional.of(new FrfReading(snapped.isPresent() ? hz : lines.frequencyHz()[i], i, snapped, text));
    }

    /** A number to the given significant figures, a power of ten outside 0.001 to a million. */
    static String plain(double v, int digits) {
        if (!Double.isFinite(v)) {
            return "-";
        }
        if (v == 0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(v).round(new MathContext(digits));
        double magnitude = Math.abs(v);
        if (magnitude >= 1e-3 && magnitude < 1e6) {
            return d.toPlainString();
        }
        int exponent = (int) Math.floor(Math.log10(Math.abs(d.doubleValue())));
        return d.movePointLeft(exponent).toPlainString() + " × " + LogTicks.power(exponent);
    }
}
