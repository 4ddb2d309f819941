package org.tautline.driver.sweep;

import java.util.Locale;

import org.tautline.driver.RigException;

/**
 * How a step waits for steady state: detected from converging block phasors, or a fixed dwell.
 *
 * <p>Detection ({@link SettleDetector}) ends a step once the transient left is below {@code tolerance}; a
 * fixed dwell waits max(cycles / f, minS) whatever the response does (common practice: dwell 5-7 time
 * constants of the slowest nearby mode, about 180 cycles to -40 dB at zeta = 0.4 %).
 *
 * @param tolerance transient left when a step counts as settled, relative (0.01 = 1 %); 0 for a fixed dwell
 * @param cycles fixed dwell in drive cycles (0 with detection)
 * @param minS shortest fixed dwell, s, whatever the frequency (0 with detection)
 */
public record SettleRule(double tolerance, double cycles, double minS) {

    /** Checks the rule; messages name the plan field. */
    public SettleRule {
        if (tolerance == 0) {
            if (!(cycles >= 0) || Double.isInfinite(cycles)) {
                throw new RigException("sweep plan: settleCycles must be zero or more, got " + cycles);
            }
            if (!(minS >= 0) || Double.isInfinite(minS)) {
                throw new RigException("sweep plan: minSettleS must be zero or more seconds, got " + minS);
            }
        } else if (!(tolerance > 0 && tolerance < 0.5)) {
            throw new RigException("sweep plan: settleTolerance must lie in (0, 0.5), got " + tolerance);
        }
    }

    /**
     * @param tolerance remaining transient accepted, relative, in (0, 0.5)
     * @return settle detection to that tolerance
     */
    public static SettleRule detected(double tolerance) {
        return new SettleRule(tolerance, 0, 0);
    }

    /**
     * @param cycles drive cycles to wait, 0 or more
     * @param minS shortest wait, s
     * @return a fixed dwell of max(cycles / f, minS)
     */
    public static SettleRule fixed(double cycles, double minS) {
        return new SettleRule(0, cycles, minS);
    }

    /** @return true when steps settle by detection, false for a fixed dwell */
    public boolean detects() {
        return tolerance > 0;
    }

    /**
     * @param frequencyHz step frequency, Hz
     * @return the fixed dwell at that frequency, s (0 under detection)
     */
    public double dwellS(double frequencyHz) {
        return detects() ? 0.0 : Math.max(cycles / frequencyHz, minS);
    }

    /** @return the rule in words, for reports */
    public String describe() {
        return detects() ? String.format(Locale.ROOT, "settle detected to %.3g %%", 100 * tolerance)
                : String.format(Locale.ROOT, "settle %.4g cycles (at least %.4g s)", cycles, minS);
    }
}
