package org.tautline.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.tautline.driver.spi.RigDrivers;
import picocli.CommandLine.Option;

/** The {@code --plugins DIR} option shared by the commands that open rigs, and the drivers it yields. */
final class PluginFolders {
    @Option(names = "--plugins", paramLabel = "DIR",
            description = "Load driver plugins from the jar files in DIR (repeatable). Default: the folders of the"
                    + " tautline.plugins system property, else ~/.tautline/plugins.")
    private List<Path> folders = new ArrayList<>();

    /**
     * The drivers of the class path and the plugins folders given, or of the default folders when none is given.
     *
     * @param err where plugin warnings are printed
     * @return the drivers
     */
    RigDrivers drivers(PrintWriter err) {
        RigDrivers drivers = folders.isEmpty() ? RigDrivers.standard() : RigDrivers.load(folders);
        drivers.warnings().forEach(w -> err.println("tautline: warning: " + w));
        return drivers;
    }
}
