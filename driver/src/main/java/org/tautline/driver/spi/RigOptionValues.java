package org.tautline.driver.spi;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tautline.driver.RigException;

/**
 * The options of one {@link RigDriver#open(Map)} call, checked against the driver's list and completed with defaults.
 *
 * <p>Messages name the driver and the option and say what was expected, for example
 * {@code rig driver 'sim': option 'seed' must be a whole number, got 'abc'}.
 */
public final class RigOptionValues {
    private final String driverName;
    private final Map<String, String> values;

    private RigOptionValues(String driverName, Map<String, String> values) {
        this.driverName = driverName;
        this.values = values;
    }

    /**
     * Checks the given options and fills in the defaults.
     *
     * @param driver the driver whose {@link RigDriver#options()} apply
     * @param given option name to value as the user gave them
     * @return the complete options
     * @throws RigException for an unknown option or a required one left out
     */
    public static RigOptionValues of(RigDriver driver, Map<String, String> given) {
        List<RigOption> known = driver.options();
        Map<String, String> values = new LinkedHashMap<>();
        for (String key : given.keySet()) {
            if (known.stream().noneMatch(o -> o.name().equals(key))) {
                throw new RigException("rig driver '" + driver.name() + "' has no option '" + key + "'; its options are: "
                        + names(known));
            }
        }
        for (RigOption option : known) {
            String value = given.get(option.name());
            if (value == null) {
                if (option.isRequired()) {
                    throw new RigException("rig driver '" + driver.name() + "' needs option '" + option.name() + "' ("
                            + option.description() + "); give it as " + option.name() + "=VALUE");
                }
                value = option.defaultValue();
            }
            values.put(option.name(), value);
        }
        return new RigOptionValues(driver.name(), Collections.unmodifiableMap(values));
    }

    private static String names(List<RigOption> options) {
        return options.isEmpty() ? "(none)" : String.join(", ", options.stream().map(RigOption::name).toList());
    }

    /** @return every option, in the driver's order, defaults filled in */
    public Map<String, String> asMap() {
        return values;
    }

    /**
     * @param name an option of the driver
     * @return its value as text
     */
    public String text(String name) {
        String value = values.get(name);
        if (value == null) {
            throw new RigException("rig driver '" + driverName + "' reads option '" + name
                    + "', which it does not declare among its options");
        }
        return value;
    }

    /**
     * @param name an option of the driver
     * @return its value as a whole number
     * @throws RigException when it is not one
     */
    public long wholeNumber(String name) {
        String value = text(name);
        try {
            return Long.parseLong(value.strip());
        } catch (NumberFormatException e) {
            throw new RigException(prefix(name) + " must be a whole number, got '" + value + "'");
        }
    }

    /**
     * @param name an option of the driver
     * @param min smallest accepted value
     * @param max largest accepted value
     * @return its value as a whole number within min..max
     * @throws RigException when it is not one or lies outside
     */
    public int wholeNumber(String name, int min, int max) {
        long value = wholeNumber(name);
        if (value < min || value > max) {
            throw new RigException(prefix(name) + " must lie between " + min + " and " + max + ", got " + value);
        }
        return (int) value;
    }

    /**
     * @param name an option of the driver
     * @param choices the accepted values
     * @return its value, one of the choices
     * @throws RigException when it is none of them
     */
    public String choice(String name, List<String> choices) {
        String value = text(name);
        if (!choices.contains(value)) {
            throw new RigException(prefix(name) + " must be one of " + String.join(", ", choices) + ", got '" + value + "'");
        }
        return value;
    }

    private String prefix(String name) {
        return "rig driver '" + driverName + "': option '" + name + "'";
    }
}
