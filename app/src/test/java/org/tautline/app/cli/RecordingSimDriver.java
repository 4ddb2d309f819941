package org.tautline.app.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;

import org.tautline.driver.sim.SimulatedRigDriver;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.RigDriver;
import org.tautline.driver.spi.RigOption;
import org.tautline.driver.sweep.RecordingRig;

/**
 * A plugin driver for the path tests: the simulated rig, wrapped so that every command and block is recorded.
 *
 * <p>It reaches the commands the way a lab's plugin does: {@link #pluginJar(Path)} writes a jar holding only the
 * service entry, into a folder given to {@code --plugins}; the class itself is on the test class path, which the
 * plugin class loader's parent sees. The last rig opened is kept for the test to inspect.
 */
public final class RecordingSimDriver implements RigDriver {
    /** The driver's name. */
    public static final String NAME = "recording-sim";
    private static volatile RecordingRig last;

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public String description() {
        return "the simulated rig with every command and block recorded (a test plugin)";
    }

    @Override
    public List<RigOption> options() {
        return new SimulatedRigDriver().options();
    }

    @Override
    public Rig open(Map<String, String> options) {
        RecordingRig rig = new RecordingRig(new SimulatedRigDriver().open(options));
        last = rig;
        return rig;
    }

    /** @return the rig opened last, or null */
    public static RecordingRig last() {
        return last;
    }

    /**
     * Writes the plugin jar into a folder.
     *
     * @param folder the plugins folder to give to {@code --plugins}
     * @return the folder
     * @throws IOException when the jar cannot be written
     */
    public static Path pluginJar(Path folder) throws IOException {
        Files.createDirectories(folder);
        try (OutputStream file = Files.newOutputStream(folder.resolve("recording-sim.jar"));
             JarOutputStream jar = new JarOutputStream(file)) {
            jar.putNextEntry(new JarEntry("META-INF/services/" + RigDriver.class.getName()));
            jar.write((RecordingSimDriver.class.getName() + "\n").getBytes(StandardCharsets.UTF_8));
            jar.closeEntry();
        }
        return folder;
    }
}
