package org.tautline.driver.spi;

import java.util.Objects;

/**
 * One setting a rig driver accepts when it opens a rig, for example a port or a random seed.
 *
 * @param name the key, as given on the command line ({@code --option name=value}); letters, digits and dots
 * @param description what the setting does, one sentence
 * @param defaultValue the value used when none is given, or {@code null} when the setting is required
 * @param unit the unit of the value, for example {@code ms} or {@code baud}; empty when it has none
 */
public record RigOption(String name, String description, String defaultValue, String unit) {

    /** Checks the name and description. */
    public RigOption {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(unit, "unit");
        if (!name.matches("[A-Za-z][A-Za-z0-9.]*")) {
            throw new IllegalArgumentException("rig option name must be letters, digits and dots starting with a letter,"
                    + " got '" + name + "'");
        }
    }

    /**
     * A setting that must be given.
     *
     * @param name the key
     * @param description what it does
     * @param unit its unit, empty for none
     * @return the option
     */
    public static RigOption required(String name, String description, String unit) {
        return new RigOption(name, description, null, unit);
    }

    /**
     * A setting with a default.
     *
     * @param name the key
     * @param description what it does
     * @param defaultValue the value used when none is given
     * @param unit its unit, empty for none
     * @return the option
     */
    public static RigOption withDefault(String name, String description, String defaultValue, String unit) {
        return new RigOption(name, description, Objects.requireNonNull(defaultValue, "defaultValue"), unit);
    }

    /** @return true when the setting has no default and must be given */
    public boolean isRequired() {
        return defaultValue == null;
    }
}
