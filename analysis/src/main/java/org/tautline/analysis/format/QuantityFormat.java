package org.tautline.analysis.format;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.tautline.analysis.AnalysisException;

/**
 * Writes measured values for people: a value with its standard uncertainty as the GUM asks (JCGM 100:2008, 7.2.6:
 * the uncertainty to at most two significant digits, the value rounded to match), in the form of 7.2.2's fourth
 * scheme, {@code (100.02147 ± 0.00035) g}, with one plus-minus sign and the unit after the bracket.
 *
 * <p>Rules, the same on the terminal, in the window and in the report:
 * <ul>
 * <li>the uncertainty is rounded to two significant digits, to the nearest (7.2.6's example 28.05 kHz to 28 kHz;
 * half-way cases away from zero), with the carry (0.0996 becomes 0.10), and written with both digits (0.8 as
 * 0.80); the value to the same decimal place;</li>
 * <li>a number of magnitude 0.001 to below 10⁶ is written in full; a smaller or larger one, or one needing more
 * than six decimals, in engineering notation (a power of ten that is a multiple of 3) shared by value and
 * uncertainty: {@code (614 ± 61) × 10⁻⁶ N m²}, or {@code (614 +/- 61)e-6 N m^2} in ASCII;</li>
 * <li>an uncertainty that was not evaluated (NaN) is said to be so, never written as zero; one that is exactly zero
 * (stated exact) is written {@code ± 0}; a value not determined (NaN) is said to be so;</li>
 * <li>a dimensionless figure has no unit; units are given in the ASCII form the figures use ({@code "N m^2"}) and
 * written in the output's style ({@code N m²} or {@code N m^2}).</li>
 * </ul>
 *
 * @param style the symbols the output can show
 */
public record QuantityFormat(TextStyle style) {
    /** What is written for an uncertainty that was not evaluated. */
    public static final String NOT_EVALUATED = "not evaluated";
    /** What is written for a value that was not determined (NaN). */
    public static final String NOT_DETERMINED = "not determined";
    /** Significant digits of a value written without an uncertainty. */
    public static final int VALUE_DIGITS = 6;
    private static final MathContext TWO_DIGITS = new MathContext(2, RoundingMode.HALF_UP);
    private static final int SMALLEST_PLAIN_EXPONENT = -3;
    private static final int LARGEST_PLAIN_EXPONENT = 5;
    private static final int MOST_PLAIN_DECIMALS = 6;
    private static final String SUPERSCRIPT_DIGITS = "⁰¹²³⁴⁵⁶⁷⁸⁹";
    private static final Pattern SUPERSCRIPT_POWER = Pattern.compile(" × 10([⁻]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+)");

    /** Checks a style is given. */
    public QuantityFormat {
        if (style == null) {
            throw new AnalysisException("a quantity format needs a text style");
        }
    }

    /** @return the format for this process's standard output (ASCII forms under {@code LANG=C}) */
    public static QuantityFormat forStandardOutput() {
        return new QuantityFormat(TextStyle.forStandardOutput());
    }

    /**
     * A value with its standard uncertainty and unit, for example {@code (150.3 ± 1.2) N}.
     *
     * @param value the value; NaN for one not determined
     * @param standardUncertainty its standard uncertainty, 0 or more; NaN when not evaluated
     * @param unit the unit in ASCII form ({@code "N m^2"}), empty for a dimensionless figure
     * @return the text
     */
    public String withUncertainty(double value, double standardUncertainty, String unit) {
        checkUncertainty(standardUncertainty);
        if (!Double.isFinite(value)) {
            return value(value, unit);
        }
        if (Double.isNaN(standardUncertainty)) {
            return value(value, unit) + ", uncertainty " + NOT_EVALUATED;
        }
        if (Double.isInfinite(standardUncertainty)) {
            return value(value, unit) + ", uncertainty unbounded";
        }
        String u = unit(unit);
        if (standardUncertainty == 0) {
            String pair = number(value) + " " + style.plusMinus() + " 0";
            return u.isEmpty() ? pair : "(" + pair + ") " + u;
        }
        Rounded r = round(value, standardUncertainty);
        String pair = r.value() + " " + style.plusMinus() + " " + r.uncertainty();
        if (r.exponent() == 0) {
            return u.isEmpty() ? pair : "(" + pair + ") " + u;
        }
        return "(" + pair + ")" + powerOfTen(r.exponent()) + (u.isEmpty() ? "" : " " + u);
    }

    /**
     * A value and its standard uncertainty rounded together (GUM 7.2.6), for tables that give them in two columns.
     *
     * @param value a finite value
     * @param standardUncertainty a positive finite standard uncertainty
     * @return the digits of both and their common power of ten
     */
    public Rounded round(double value, double standardUncertainty) {
        if (!Double.isFinite(value)) {
            throw new AnalysisException("only a finite value can be rounded to its uncertainty, got " + value);
        }
        if (!(standardUncertainty > 0) || Double.isInfinite(standardUncertainty)) {
            throw new AnalysisException("a value is rounded to a positive finite uncertainty, got "
                    + standardUncertainty);
        }
        BigDecimal u = twoDigits(standardUncertainty);
        BigDecimal v = BigDecimal.valueOf(value).setScale(u.scale(), RoundingMode.HALF_UP);
        int exponent = Math.max(magnitude(v), magnitude(u));
        if (plain(exponent, u.scale())) {
            return new Rounded(v.toPlainString(), u.toPlainString(), 0);
        }
        int engineering = Math.floorDiv(exponent, 3) * 3;
        return new Rounded(v.movePointLeft(engineering).toPlainString(), u.movePointLeft(engineering).toPlainString(),
                engineering);
    }

    /**
     * A number shown beside an uncertainty it does not have itself (a margin beside U), rounded to the same decimal
     * place as that uncertainty would round a value (GUM 7.2.6), with its unit.
     *
     * @param value the number
     * @param u the uncertainty that sets the decimal place; not positive and finite: six digits
     * @param unit the unit in ASCII form, empty for none
     * @return the text
     */
    public String valueLike(double value, double u, String unit) {
        if (!Double.isFinite(value) || !(u > 0) || Double.isInfinite(u)) {
            return value(value, unit);
        }
        Rounded r = round(value, u);
        String written = unit(unit);
        return r.value() + (r.exponent() == 0 ? "" : powerOfTen(r.exponent())) + (written.isEmpty() ? "" : " " + written);
    }

    /**
     * A rounded pair's value as one cell of a table: its digits with the power of ten ({@code 614e-6}).
     *
     * @param r a rounded pair
     * @return the value's text
     */
    public String valueCell(Rounded r) {
        return r.value() + cellPower(r.exponent());
    }

    /**
     * A rounded pair's uncertainty as one cell of a table ({@code 61e-6}).
     *
     * @param r a rounded pair
     * @return the uncertainty's text
     */
    public String uncertaintyCell(Rounded r) {
        return r.uncertainty() + cellPower(r.exponent());
    }

    /**
     * A value without an uncertainty (a stated value, a bound) to {@value #VALUE_DIGITS} significant digits, trailing
     * zeros dropped, with its unit: {@code 0.6 m}, {@code 150 N}.
     *
     * @param value the value; NaN for one not determined
     * @param unit the unit in ASCII form, empty for none
     * @return the text
     */
    public String value(double value, String unit) {
        if (Double.isNaN(value)) {
            return NOT_DETERMINED;
        }
        String u = unit(unit);
        return number(value) + (u.isEmpty() ? "" : " " + u);
    }

    /**
     * A number without unit or uncertainty, to {@value #VALUE_DIGITS} significant digits, trailing zeros dropped.
     *
     * @param value the number; NaN for one not determined
     * @return the text
     */
    public String number(double value) {
        if (Double.isNaN(value)) {
            return NOT_DETERMINED;
        }
        if (Double.isInfinite(value)) {
            return value < 0 ? "-infinity" : "infinity";
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal v = BigDecimal.valueOf(value).round(new MathContext(VALUE_DIGITS, RoundingMode.HALF_UP))
                .stripTrailingZeros();
        int exponent = magnitude(v);
        if (plain(exponent, 0)) {
            return v.toPlainString();
        }
        int engineering = Math.floorDiv(exponent, 3) * 3;
        return v.movePointLeft(engineering).stripTrailingZeros().toPlainString() + powerOfTen(engineering);
    }

    /**
     * An uncertainty alone, to two significant digits with its unit, or {@value #NOT_EVALUATED}.
     *
     * @param standardUncertainty 0 or more; NaN when not evaluated
     * @param unit the unit in ASCII form, empty for none
     * @return the text
     */
    public String uncertainty(double standardUncertainty, String unit) {
        checkUncertainty(standardUncertainty);
        if (Double.isNaN(standardUncertainty)) {
            return NOT_EVALUATED;
        }
        if (Double.isInfinite(standardUncertainty) || standardUncertainty == 0) {
            return value(standardUncertainty, unit);
        }
        BigDecimal u = twoDigits(standardUncertainty);
        String text = plain(magnitude(u), u.scale()) ? u.toPlainString() : number(u.doubleValue());
        String written = unit(unit);
        return text + (written.isEmpty() ? "" : " " + written);
    }

    /**
     * A unit in this style: {@code "N m^2"} as {@code N m²} where powers can be shown.
     *
     * @param ascii the unit in the ASCII form figures use; empty or null for none
     * @return the unit to print, empty for none
     */
    public String unit(String ascii) {
        if (ascii == null || ascii.isBlank()) {
            return "";
        }
        return style.unitPowers() ? ascii.replace("^2", "²").replace("^3", "³") : ascii;
    }

    /**
     * A sentence written with the Unicode symbols ({@link TextStyle#UNICODE}) put into this style: "±" as this style's
     * sign, {@code m²} as {@code m^2} and {@code × 10⁻⁶} as {@code e-6} where the style cannot show them; a sentence
     * in Unicode style stays as it is.
     *
     * @param unicodeText a sentence written with Unicode symbols; null is taken as empty
     * @return the sentence in this style
     */
    public String inStyle(String unicodeText) {
        if (unicodeText == null) {
            return "";
        }
        String out = unicodeText.replace("±", style.plusMinus());
        if (!style.superscriptExponents()) {
            Matcher m = SUPERSCRIPT_POWER.matcher(out);
            StringBuilder plain = new StringBuilder();
            while (m.find()) {
                StringBuilder digits = new StringBuilder("e");
                for (char c : m.group(1).toCharArray()) {
                    digits.append(c == '⁻' ? '-' : (char) ('0' + SUPERSCRIPT_DIGITS.indexOf(c)));
                }
                m.appendReplacement(plain, digits.toString());
            }
            m.appendTail(plain);
            out = plain.toString();
        }
        return style.unitPowers() ? out : out.replace("²", "^2").replace("³", "^3");
    }

    private static void checkUncertainty(double standardUncertainty) {
        if (standardUncertainty < 0) {
            throw new AnalysisException("a standard uncertainty is 0 or more, got " + standardUncertainty);
        }
    }

    /**
     * An uncertainty rounded to the nearest two significant digits, written with both even where the second is a
     * zero (0.8 as 0.80, 2 as 2.0), so that every uncertainty shows the same number of digits.
     */
    private static BigDecimal twoDigits(double uncertainty) {
        BigDecimal u = BigDecimal.valueOf(uncertainty).round(TWO_DIGITS);
        return u.precision() < 2 ? u.setScale(u.scale() + 2 - u.precision(), RoundingMode.UNNECESSARY) : u;
    }

    /** The power of ten of the leading digit; 0 for zero. */
    private static int magnitude(BigDecimal d) {
        return d.signum() == 0 ? Integer.MIN_VALUE : d.precision() - d.scale() - 1;
    }

    private static boolean plain(int exponent, int decimals) {
        return exponent == Integer.MIN_VALUE || (exponent >= SMALLEST_PLAIN_EXPONENT && exponent <= LARGEST_PLAIN_EXPONENT
                && decimals <= MOST_PLAIN_DECIMALS);
    }

    private String powerOfTen(int exponent) {
        if (!style.superscriptExponents()) {
            return "e" + exponent;
        }
        StringBuilder out = new StringBuilder(" × 10");
        for (char c : Integer.toString(exponent).toCharArray()) {
            out.append(c == '-' ? '⁻' : SUPERSCRIPT_DIGITS.charAt(c - '0'));
        }
        return out.toString();
    }

    private static String cellPower(int exponent) {
        return exponent == 0 ? "" : "e" + exponent;
    }
}
