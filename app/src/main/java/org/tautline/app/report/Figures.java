package org.tautline.app.report;

import java.util.Locale;

/** How the report and the exports print numbers: six significant digits, so that every figure is traceable. */
public final class Figures {
    private Figures() {
    }

    /**
     * @param value a number
     * @return six significant digits, {@code -} for NaN
     */
    public static String format(double value) {
        return Double.isNaN(value) ? "-" : String.format(Locale.ROOT, "%.6g", value);
    }
}
