package org.tautline.app.ui.results;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Plain text for a value with its standard uncertainty, rounded as the GUM asks. Free of Swing.
 *
 * <p>The uncertainty is given to two significant figures and the value to the same decimal place (JCGM 100:2008,
 * "Evaluation of measurement data: Guide to the expression of uncertainty in measurement", 7.2.6). Values between
 * 0.001 and a million are written in plain decimals; others share one power of ten with their uncertainty, for
 * example "(1.00 ± 0.37) × 10⁻⁴". One "±" and Unicode units throughout.
 */
final class Figures {
    private static final String[] SUPERSCRIPT = {"⁰", "¹", "²", "³", "⁴", "⁵", "⁶", "⁷", "⁸", "⁹"};

    private Figures() {
    }

    /**
     * @param value the value
     * @param std its standard uncertainty; NaN when none was evaluated, 0 for a figure judged as it stands
     * @return for example {@code "228.410 ± 0.012"}; the value alone when the uncertainty is zero; the value and
     *         "(uncertainty not evaluated)" when it is unknown; "not measured" for a value that is not finite
     */
    static String plusMinus(double value, double std) {
        if (!Double.isFinite(value)) {
            return "not measured";
        }
        if (Double.isNaN(std) || std < 0 || Double.isInfinite(std)) {
            return plain(value) + " (uncertainty not evaluated)";
        }
        if (std == 0) {
            return plain(value);
        }
        BigDecimal u = new BigDecimal(std).round(new MathContext(2, RoundingMode.HALF_UP));
        // The place of the uncertainty's second significant figure: 10^place.
        int place = u.precision() - u.scale() - 2;
        BigDecimal v = new BigDecimal(value).setScale(-place, RoundingMode.HALF_UP);
        double largest = Math.max(Math.abs(v.doubleValue()), u.doubleValue());
        if (largest >= 1e-3 && largest < 1e6) {
            return decimals(v, -place) + " ± " + decimals(u, -place);
        }
        int exponent = (int) Math.floor(Math.log10(largest));
        int digits = Math.max(0, exponent - place);
        return "(" + decimals(v.movePointLeft(exponent), digits) + " ± " + decimals(u.movePointLeft(exponent), digits)
                + ") × 10" + superscript(exponent);
    }

    /**
     * @param value the value with its uncertainty
     * @param std its standard uncertainty
     * @param unit the unit for people (typographic), empty for none
     * @return {@link #plusMinus} with the unit after it
     */
    static String plusMinus(double value, double std, String unit) {
        String text = plusMinus(value, std);
        if (unit == null || unit.isBlank() || !Double.isFinite(value)) {
            return text;
        }
        int note = text.indexOf(" (uncertainty not evaluated)");
        return note < 0 ? text + " " + unit : text.substring(0, note) + " " + unit + text.substring(note);
    }

    /**
     * @param value a number without an uncertainty
     * @return four significant figures without trailing zeros, a power of ten outside 0.001 to a million, "-" when
     *         not finite
     */
    static String plain(double value) {
        if (!Double.isFinite(value)) {
            return "-";
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal v = new BigDecimal(value).round(new MathContext(4, RoundingMode.HALF_UP)).stripTrailingZeros();
        double magnitude = Math.abs(v.doubleValue());
        if (magnitude >= 1e-3 && magnitude < 1e6) {
            return v.toPlainString();
        }
        int exponent = (int) Math.floor(Math.log10(magnitude));
        return v.movePointLeft(exponent).stripTrailingZeros().toPlainString() + " × 10" + superscript(exponent);
    }

    private static String decimals(BigDecimal v, int digits) {
        return v.setScale(Math.max(0, digits), RoundingMode.HALF_UP).toPlainString();
    }

    /** The exponent as superscript digits, with a superscript minus. */
    static String superscript(int exponent) {
        StringBuilder out = new StringBuilder(exponent < 0 ? "⁻" : "");
        for (char c : Integer.toString(Math.abs(exponent)).toCharArray()) {
            out.append(SUPERSCRIPT[c - '0']);
        }
        return out.toString();
    }
}
