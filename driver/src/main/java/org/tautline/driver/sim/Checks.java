package org.tautline.driver.sim;

import org.tautline.driver.RigException;

/** Argument checks for the simulation's configuration records, with messages naming field, value and expectation. */
final class Checks {
    private Checks() {
    }

    static double positive(String where, String field, double value, String unit) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new RigException(where + "." + field + " must be a positive finite number" + units(unit) + ", got "
                    + value);
        }
        return value;
    }

    static double nonNegative(String where, String field, double value, String unit) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new RigException(where + "." + field + " must be zero or a positive finite number" + units(unit)
                    + ", got " + value);
        }
        return value;
    }

    static double finite(String where, String field, double value, String unit) {
        if (!Double.isFinite(value)) {
            throw new RigException(where + "." + field + " must be a finite number" + units(unit) + ", got " + value);
        }
        return value;
    }

    static double range(String where, String field, double value, double min, double max, String unit) {
        if (!(value >= min && value <= max)) {
            throw new RigException(where + "." + field + " must lie in " + min + ".." + max + units(unit) + ", got "
                    + value);
        }
        return value;
    }

    static int intRange(String where, String field, int value, int min, int max) {
        if (value < min || value > max) {
            throw new RigException(where + "." + field + " must lie in " + min + ".." + max + ", got " + value);
        }
        return value;
    }

    static <T> T present(String where, String field, T value) {
        if (value == null) {
            throw new RigException(where + "." + field + " must be given, got null");
        }
        return value;
    }

    private static String units(String unit) {
        return unit.isEmpty() ? "" : " (" + unit + ")";
    }
}
