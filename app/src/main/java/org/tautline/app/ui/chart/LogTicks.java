package org.tautline.app.ui.chart;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;

/**
 * Where a logarithmic axis puts its ticks and which it labels, so that a band inside one or two decades still reads.
 * Free of Swing.
 *
 * <p>Over three decades or more only the powers of ten are labelled, written as powers (10⁻⁴); over fewer the labels
 * sit at 1, 2 and 5 times each power of ten; over less than twenty to one every whole multiple and 1.5 are labelled;
 * the other whole multiples are unlabelled ticks. Over less than three to one the ticks are evenly spaced in the usual 1-2-5
 * steps (common practice for graph paper and chart axes).
 */
public final class LogTicks {
    /**
     * One tick.
     *
     * @param value where it sits, in the axis' unit
     * @param label its label, empty for a tick without one
     */
    public record Tick(double value, String label) {
        /** @return true when the tick carries a label */
        public boolean labelled() {
            return !label.isEmpty();
        }
    }

    private static final double[] WHOLE = {1, 2, 3, 4, 5, 6, 7, 8, 9};
    /** Over less than twenty to one, 1.5 too: a band such as 180 to 1500 Hz then has a label above 1000. */
    private static final double[] FINE = {1, 1.5, 2, 3, 4, 5, 6, 7, 8, 9};

    private LogTicks() {
    }

    /**
     * @param low the axis' lower end, above zero
     * @param high the axis' upper end, above {@code low}
     * @return the ticks inside the range, increasing
     */
    public static List<Tick> between(double low, double high) {
        List<Tick> ticks = new ArrayList<>();
        if (!(low > 0) || !(high > low) || Double.isInfinite(high)) {
            return ticks;
        }
        double ratio = high / low;
        if (ratio < 3) {
            return linear(low, high);
        }
        int first = (int) Math.floor(Math.log10(low));
        int last = (int) Math.ceil(Math.log10(high));
        for (int decade = first; decade <= last; decade++) {
            for (double m : ratio < 20 ? FINE : WHOLE) {
                double v = m * Math.pow(10, decade);
                if (v >= low * (1 - 1e-9) && v <= high * (1 + 1e-9)) {
                    boolean labelled = ratio >= 1000 ? m == 1 : ratio < 20 || m == 1 || m == 2 || m == 5;
                    ticks.add(new Tick(v, !labelled ? "" : ratio >= 1000 ? power(decade) : format(v)));
                }
            }
        }
        return ticks;
    }

    /** Evenly spaced ticks in a 1-2-5 step, about five to ten of them, all labelled. */
    private static List<Tick> linear(double low, double high) {
        double raw = (high - low) / 6;
        double power = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = raw / power < 1.5 ? power : raw / power < 3.5 ? 2 * power : raw / power < 7.5 ? 5 * power : 10 * power;
        List<Tick> ticks = new ArrayList<>();
        for (double v = Math.ceil(low / step) * step; v <= high * (1 + 1e-12); v += step) {
            double rounded = Math.round(v / step) * step;
            ticks.add(new Tick(rounded, format(rounded)));
        }
        return ticks;
    }

    /**
     * @param exponent a power of ten
     * @return for example "10⁻⁵"
     */
    static String power(int exponent) {
        String digits = Integer.toString(Math.abs(exponent));
        StringBuilder out = new StringBuilder("10").append(exponent < 0 ? "⁻" : "");
        for (char c : digits.toCharArray()) {
            out.append("⁰¹²³⁴⁵⁶⁷⁸⁹".charAt(c - '0'));
        }
        return out.toString();
    }

    /**
     * @param value a tick value
     * @return the value in plain decimals with no trailing zeros, for example "200", "1500", "0.02"
     */
    public static String format(double value) {
        return new BigDecimal(value).round(new MathContext(6)).stripTrailingZeros().toPlainString();
    }
}
