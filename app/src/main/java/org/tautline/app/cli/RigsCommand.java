package org.tautline.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fazecast.jSerialComm.SerialPort;
import org.tautline.driver.spi.RigDriver;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.spi.RigOption;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code tautline rigs}: lists the rig drivers with their options, and the serial ports of this computer. */
@Command(name = "rigs", mixinStandardHelpOptions = true,
        description = "List the rig drivers (built in and from plugins) with their options, and the serial ports.")
final class RigsCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private PluginFolders plugins;

    @Option(names = "--json", description = "Print the drivers and ports as JSON.")
    private boolean json;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        RigDrivers drivers = plugins.drivers(spec.commandLine().getErr());
        List<String[]> ports = serialPorts();
        if (json) {
            out.println(ResultJson.MAPPER.writeValueAsString(asJson(drivers, ports)));
        } else {
            out.println("Rig drivers:");
            for (RigDriver driver : drivers.list()) {
                out.printf("  %-10s %s%n", driver.name(), driver.description());
                for (RigOption option : driver.options()) {
                    String value = option.isRequired() ? "(required)" : "default " + option.defaultValue();
                    String unit = option.unit().isEmpty() ? "" : " " + option.unit();
                    out.printf("    %-12s %-22s %s%n", option.name(), value + unit, option.description());
                }
            }
            out.println("Serial ports:");
            if (ports.isEmpty()) {
                out.println("  (none found)");
            }
            for (String[] port : ports) {
                out.printf("  %-20s %s%n", port[0], port[1]);
            }
            out.println("Choose one with: tautline sweep --rig NAME [--option KEY=VALUE]... or --rig serial:PORT");
        }
        out.flush();
        return 0;
    }

    private static ObjectNode asJson(RigDrivers drivers, List<String[]> ports) {
        ObjectNode root = ResultJson.MAPPER.createObjectNode();
        ArrayNode list = root.putArray("drivers");
        for (RigDriver driver : drivers.list()) {
            ObjectNode d = list.addObject();
            d.put("name", driver.name());
            d.put("description", driver.description());
            ArrayNode options = d.putArray("options");
            for (RigOption option : driver.options()) {
                ObjectNode o = options.addObject();
                o.put("name", option.name());
                o.put("description", option.description());
                if (option.isRequired()) {
                    o.putNull("default");
                } else {
                    o.put("default", option.defaultValue());
                }
                o.put("unit", option.unit());
                o.put("required", option.isRequired());
            }
        }
        ArrayNode serial = root.putArray("serialPorts");
        for (String[] port : ports) {
            serial.addObject().put("path", port[0]).put("description", port[1]);
        }
        return root;
    }

    /** The serial ports jSerialComm sees: path and description; empty when its native part cannot load. */
    private List<String[]> serialPorts() {
        List<String[]> ports = new ArrayList<>();
        try {
            for (SerialPort port : SerialPort.getCommPorts()) {
                ports.add(new String[] {port.getSystemPortPath(), port.getPortDescription()});
            }
        } catch (RuntimeException | LinkageError e) {
            spec.commandLine().getErr().println("tautline: warning: serial ports could not be listed: " + e.getMessage());
        }
        return ports;
    }
}
