package org.tautline.driver.spi;

import java.io.File;
import java.io.IOException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;
import java.util.stream.Stream;

import org.tautline.driver.RigException;

/**
 * The rig drivers available: those on the class path and those in the jar files of the plugins folders.
 *
 * <p>Plugins folders: the {@code tautline.plugins} system property when set (one or more folders
 * separated by the platform's path separator, {@code :} on Linux and macOS), otherwise
 * {@code ~/.tautline/plugins}; a folder that does not exist is skipped. Every {@code *.jar} directly
 * inside a folder is loaded by one class loader whose parent is Tautline's own, and its
 * {@code META-INF/services/org.tautline.driver.spi.RigDriver} entries are read. When two drivers share
 * a name the first found wins (the class path before the plugins folders, folders in the order
 * given, jars by file name) and the clash is reported in {@link #warnings()}; so is a plugin that
 * fails to load.
 */
public final class RigDrivers {
    /** The system property naming the plugins folders. */
    public static final String PLUGINS_PROPERTY = "tautline.plugins";

    private final Map<String, RigDriver> drivers;
    private final List<String> warnings;

    private RigDrivers(Map<String, RigDriver> drivers, List<String> warnings) {
        this.drivers = Collections.unmodifiableMap(drivers);
        this.warnings = List.copyOf(warnings);
    }

    /** @return the drivers on the class path and in the default plugins folders ({@link #defaultPluginFolders()}) */
    public static RigDrivers standard() {
        return load(defaultPluginFolders());
    }

    /**
     * @return the folders named by {@value #PLUGINS_PROPERTY}, or {@code ~/.tautline/plugins} when it is not set
     */
    public static List<Path> defaultPluginFolders() {
        String property = System.getProperty(PLUGINS_PROPERTY);
        if (property != null && !property.isBlank()) {
            List<Path> folders = new ArrayList<>();
            for (String part : property.split(File.pathSeparator)) {
                if (!part.isBlank()) {
                    folders.add(Path.of(part.strip()));
                }
            }
            return folders;
        }
        return List.of(Path.of(System.getProperty("user.home"), ".tautline", "plugins"));
    }

    /**
     * A registry of exactly the given drivers, for embedding Tautline or testing; no plugins are loaded.
     *
     * @param drivers the drivers; names must differ
     * @return the registry
     * @throws RigException when two drivers share a name
     */
    public static RigDrivers of(List<RigDriver> drivers) {
        Map<String, RigDriver> byName = new java.util.TreeMap<>();
        for (RigDriver driver : drivers) {
            if (byName.put(driver.name(), driver) != null) {
                throw new RigException("two rig drivers are named '" + driver.name() + "'");
            }
        }
        return new RigDrivers(new LinkedHashMap<>(byName), List.of());
    }

    /**
     * Finds the drivers on the class path and in the given plugins folders.
     *
     * @param pluginFolders folders whose {@code *.jar} files hold drivers; missing folders are skipped
     * @return the registry
     */
    public static RigDrivers load(List<Path> pluginFolders) {
        List<String> warnings = new ArrayList<>();
        List<URL> jars = new ArrayList<>();
        for (Path folder : pluginFolders) {
            jars.addAll(jarsIn(folder, warnings));
        }
        ClassLoader own = RigDriver.class.getClassLoader();
        ClassLoader loader = jars.isEmpty() ? own : new URLClassLoader("tautline-plugins", jars.toArray(URL[]::new), own);
        Map<String, RigDriver> found = new LinkedHashMap<>();
        Iterator<RigDriver> it = ServiceLoader.load(RigDriver.class, loader).iterator();
        while (true) {
            RigDriver driver;
            try {
                if (!it.hasNext()) {
                    break;
                }
                driver = it.next();
            } catch (ServiceConfigurationError e) {
                warnings.add("a rig driver could not be loaded and is skipped: " + e.getMessage());
                continue;
            }
            RigDriver earlier = found.get(driver.name());
            if (earlier == null) {
                found.put(driver.name(), driver);
            } else if (earlier.getClass() != driver.getClass()) {
                warnings.add("two rig drivers are named '" + driver.name() + "': " + earlier.getClass().getName()
                        + " is used, " + driver.getClass().getName() + " is skipped");
            }
        }
        Map<String, RigDriver> sorted = new LinkedHashMap<>();
        found.keySet().stream().sorted().forEach(name -> sorted.put(name, found.get(name)));
        return new RigDrivers(sorted, warnings);
    }

    private static List<URL> jarsIn(Path folder, List<String> warnings) {
        if (!Files.isDirectory(folder)) {
            return List.of();
        }
        List<URL> urls = new ArrayList<>();
        try (Stream<Path> files = Files.list(folder)) {
            for (Path jar : files.filter(p -> p.getFileName().toString().endsWith(".jar"))
                    .sorted(Comparator.comparing(p -> p.getFileName().toString())).toList()) {
                urls.add(jar.toUri().toURL());
            }
        } catch (IOException e) {
            warnings.add("plugins folder " + folder + " could not be read and is skipped: " + e.getMessage());
        }
        return urls;
    }

    /** @return every driver, by name in alphabetical order */
    public List<RigDriver> list() {
        return List.copyOf(drivers.values());
    }

    /** @return what went wrong while loading plugins; empty when nothing did */
    public List<String> warnings() {
        return warnings;
    }

    /**
     * @param name a driver name, for example {@code sim}
     * @return the driver
     * @throws RigException naming the known drivers when there is none of that name
     */
    public RigDriver find(String name) {
        RigDriver driver = drivers.get(name);
        if (driver == null) {
            throw new RigException("no rig driver is named '" + name + "'; known drivers: "
                    + String.join(", ", drivers.keySet()));
        }
        return driver;
    }
}
