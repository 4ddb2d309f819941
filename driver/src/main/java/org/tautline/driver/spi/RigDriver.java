package org.tautline.driver.spi;

import java.util.List;
import java.util.Map;

/**
 * A kind of rig Tautline can open: a plugin found by {@link java.util.ServiceLoader}.
 *
 * <p>A driver is a small stateless factory. Register an implementation by listing its class name in
 * {@code META-INF/services/org.tautline.driver.spi.RigDriver} of its jar, and put the jar on the class
 * path or in the plugins folder (see {@link RigDrivers}). It needs a public no-argument constructor.
 * {@link #open(Map)} receives the options as given; {@link RigOptionValues#of(RigDriver, Map)} checks
 * them against {@link #options()} and fills in the defaults.
 */
public interface RigDriver {

    /** @return the short name used to choose the driver, for example {@code sim}; lower case, no spaces */
    String name();

    /** @return what the driver talks to, one sentence */
    String description();

    /** @return the settings {@link #open(Map)} accepts, in the order to show them */
    List<RigOption> options();

    /**
     * Connects to a rig with its output off.
     *
     * @param options setting name to value, as given by the user; settings left out take their default
     * @return the connected rig; the caller closes it
     * @throws org.tautline.driver.RigException for an unknown, missing or malformed option, or when the
     *         rig cannot be reached, with a message that says which and what was expected
     */
    Rig open(Map<String, String> options);
}
