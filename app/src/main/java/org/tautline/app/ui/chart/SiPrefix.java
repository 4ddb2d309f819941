package org.tautline.app.ui.chart;

/**
 * The SI prefix that brings a signal's values to between 1 and 1000, for axis labels such as "Response (µm)" rather
 * than tick labels such as "1.5E-4". Free of Swing.
 *
 * @param symbol the prefix, for example "µ"; empty for none
 * @param factor what a value in the base unit is multiplied by to be in the prefixed unit, for example 1e6
 */
public record SiPrefix(String symbol, double factor) {
    private static final String[] SYMBOLS = {"p", "n", "µ", "m", "", "k", "M"};

    /**
     * @param largest the largest magnitude among the values, in the base unit
     * @return the prefix (pico to mega) that puts it between 1 and 1000; none for zero or a value that is not finite
     */
    public static SiPrefix forLargest(double largest) {
        if (!(largest > 0) || Double.isInfinite(largest)) {
            return new SiPrefix("", 1);
        }
        int group = (int) Math.floor(Math.log10(largest) / 3);
        group = Math.max(-4, Math.min(2, group));
        return new SiPrefix(SYMBOLS[group + 4], Math.pow(10, -3 * group));
    }
}
