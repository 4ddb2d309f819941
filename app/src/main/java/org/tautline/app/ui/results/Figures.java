package org.tautline.app.ui.results;

import java.util.Locale;

/** Plain text for a value with its standard uncertainty. Free of Swing. */
final class Figures {
    private Figures() {
    }

    /**
     * @param value the value
     * @param std its standard uncertainty; NaN when unknown
     * @return for example {@code "228.41 ± 0.012"}, or the value and "(no std)" when the uncertainty is unknown
     */
    static String plusMinus(double value, double std) {
        if (!Double.isFinite(value)) {
            return "not measured";
        }
        if (!Double.isFinite(std)) {
            return String.format(Locale.ROOT, "%.5g (no std)", value);
        }
        return String.format(Locale.ROOT, "%.5g ± %.2g", value, std);
    }

    /**
     * @param value the value with its uncertainty
     * @param std its standard uncertainty
     * @param unit the unit, empty for none
     * @return {@link #plusMinus} with the unit after it
     */
    static String plusMinus(double value, double std, String unit) {
        String text = plusMinus(value, std);
        return unit == null || unit.isEmpty() || !Double.isFinite(value) ? text : text + " " + unit;
    }

    /**
     * @param value a number
     * @return four significant digits, or "-" when not finite
     */
    static String plain(double value) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, "%.4g", value) : "-";
    }
}
