package org.tautline.driver.spi;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;

import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.signal.SineFit;
import org.tautline.driver.RigException;

/** Drivers are found on the class path and in plugin jars; names and options are checked with clear messages. */
class RigDriversTest {
    /** A minimal third-party driver, as the README shows it: a lab preset of the simulated rig. */
    static final String PLUGIN_SOURCE = """
            package com.example.rig;

            import java.util.List;
            import java.util.Map;

            import org.tautline.driver.sim.SimulatedRigDriver;
            import org.tautline.driver.spi.Rig;
            import org.tautline.driver.spi.RigDriver;
            import org.tautline.driver.spi.RigOption;
            import org.tautline.driver.spi.RigOptionValues;

            public final class BenchPresetDriver implements RigDriver {
                @Override
                public String name() {
                    return "bench-preset";
                }

                @Override
                public String description() {
                    return "the simulated demo wire with the lab's noise seed";
                }

                @Override
                public List<RigOption> options() {
                    return List.of(RigOption.withDefault("seed", "noise seed", "42", ""));
                }

                @Override
                public Rig open(Map<String, String> options) {
                    RigOptionValues values = RigOptionValues.of(this, options);
                    return new SimulatedRigDriver().open(Map.of("seed", Long.toString(values.wholeNumber("seed"))));
                }
            }
            """;

    @Test
    void findsTheBuiltInDriversOnTheClassPath() {
        RigDrivers drivers = RigDrivers.load(List.of());
        assertEquals(List.of("replay", "serial", "sim"), drivers.list().stream().map(RigDriver::name).toList());
        assertEquals(List.of(), drivers.warnings());
    }

    @Test
    void anUnknownNameListsTheKnownDrivers() {
        RigException e = assertThrows(RigException.class, () -> RigDrivers.load(List.of()).find("shaker9"));
        assertEquals("no rig driver is named 'shaker9'; known drivers: replay, serial, sim", e.getMessage());
    }

    @Test
    void optionsAreCheckedWithTheDriverAndOptionNamed() {
        RigDriver sim = RigDrivers.load(List.of()).find("sim");
        assertEquals("rig driver 'sim' has no option 'port'; its options are: scenario, seed, tensionN",
                assertThrows(RigException.class, () -> sim.open(Map.of("port", "/dev/ttyUSB0"))).getMessage());
        assertEquals("rig driver 'sim': option 'seed' must be a whole number, got 'abc'",
                assertThrows(RigException.class, () -> sim.open(Map.of("seed", "abc"))).getMessage());
        assertEquals("rig driver 'sim': option 'scenario' must be one of demo-wire, demo-wire-midspan, demo-wire-clean,"
                + " got 'violin'", assertThrows(RigException.class, () -> sim.open(Map.of("scenario", "violin"))).getMessage());
        Map<String, String> complete = RigOptionValues.of(sim, Map.of("seed", "7")).asMap();
        assertEquals(Map.of("scenario", "demo-wire", "seed", "7", "tensionN", "none"), complete, "defaults are filled in");
        try (Rig rig = sim.open(Map.of("seed", "7"))) {
            assertTrue(rig.identity().endsWith("seed 7"), rig.identity());
        }
    }

    @Test
    void loadsADriverFromAJarInThePluginsFolderAndSkipsABrokenOne(@TempDir Path dir) throws IOException {
        Path plugins = Files.createDirectories(dir.resolve("plugins"));
        buildPluginJar(dir.resolve("build"), plugins.resolve("bench-preset.jar"));
        try (JarOutputStream broken = new JarOutputStream(Files.newOutputStream(plugins.resolve("broken.jar")))) {
            broken.putNextEntry(new JarEntry("META-INF/services/" + RigDriver.class.getName()));
            broken.write("com.example.rig.Missing\n".getBytes(StandardCharsets.UTF_8));
        }
        RigDrivers drivers = RigDrivers.load(List.of(plugins, dir.resolve("no-such-folder")));
        assertEquals(List.of("bench-preset", "replay", "serial", "sim"), drivers.list().stream().map(RigDriver::name).toList());
        assertEquals(1, drivers.warnings().size());
        assertTrue(drivers.warnings().get(0).startsWith("a rig driver could not be loaded and is skipped: "
                + RigDriver.class.getName() + ": Provider com.example.rig.Missing not found"), drivers.warnings().get(0));
        try (Rig rig = drivers.find("bench-preset").open(Map.of())) {
            assertTrue(rig.identity().endsWith("seed 42"), rig.identity());
        }
    }

    @Test
    void thePluginsPropertyNamesTheFolders() {
        String before = System.getProperty(RigDrivers.PLUGINS_PROPERTY);
        try {
            System.setProperty(RigDrivers.PLUGINS_PROPERTY, "/opt/a" + java.io.File.pathSeparator + "/opt/b");
            assertEquals(List.of(Path.of("/opt/a"), Path.of("/opt/b")), RigDrivers.defaultPluginFolders());
            System.clearProperty(RigDrivers.PLUGINS_PROPERTY);
            assertEquals(List.of(Path.of(System.getProperty("user.home"), ".tautline", "plugins")),
                    RigDrivers.defaultPluginFolders());
        } finally {
            if (before == null) {
                System.clearProperty(RigDrivers.PLUGINS_PROPERTY);
            } else {
                System.setProperty(RigDrivers.PLUGINS_PROPERTY, before);
            }
        }
    }

    /** Compiles {@link #PLUGIN_SOURCE} against the driver and analysis classes and packs it with its service entry. */
    static void buildPluginJar(Path build, Path jar) throws IOException {
        Path src = build.resolve("src/com/example/rig/BenchPresetDriver.java");
        Path classes = build.resolve("classes");
        Files.createDirectories(src.getParent());
        Files.createDirectories(classes);
        Files.writeString(src, PLUGIN_SOURCE);
        String classPath = location(RigDriver.class) + java.io.File.pathSeparator + location(SineFit.class);
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        int code = javac.run(null, null, null, "-d", classes.toString(), "-cp", classPath, src.toString());
        assertEquals(0, code, "the plugin compiles");
        try (JarOutputStream out = new JarOutputStream(Files.newOutputStream(jar))) {
            out.putNextEntry(new JarEntry("META-INF/services/" + RigDriver.class.getName()));
            out.write("com.example.rig.BenchPresetDriver\n".getBytes(StandardCharsets.UTF_8));
            out.putNextEntry(new JarEntry("com/example/rig/BenchPresetDriver.class"));
            copy(classes.resolve("com/example/rig/BenchPresetDriver.class"), out);
        }
    }

    private static void copy(Path file, OutputStream out) throws IOException {
        out.write(Files.readAllBytes(file));
    }

    private static String location(Class<?> type) {
        try {
            return Path.of(type.getProtectionDomain().getCodeSource().getLocation().toURI()).toString();
        } catch (java.net.URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }
}
