package org.tautline.app.ui;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextArea;
import javax.swing.SwingWorker;

import com.fazecast.jSerialComm.SerialPort;
import net.miginfocom.swing.MigLayout;
import org.tautline.app.ui.run.OptionLabel;
import org.tautline.driver.spi.RigDriver;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.spi.RigOption;

/**
 * The rig screen: choose a driver (built-in or plugin), fill its settings, connect and see what the rig says about itself.
 *
 * <p>The serial port list is read on a background thread; connecting is done by the workbench, off the event thread.
 */
final class RigScreen {
    private final JPanel panel = new JPanel(new MigLayout("insets 10, wrap 1", "[left]"));
    private final JPanel optionPanel = new JPanel(new MigLayout("insets 0, wrap 3", "[right][260:260:][grow]"));
    private final JComboBox<String> driverBox = new JComboBox<>();
    private final Map<String, JComboBox<String>> optionEditors = new LinkedHashMap<>();
    private final JButton connect = new JButton("Connect");
    private final JButton disconnect = new JButton("Disconnect");
    private final JTextArea identity = new JTextArea(6, 80);
    private final RigDrivers drivers;
    /** What the rig screen says before a rig is connected: what to do next. */
    static final String NOT_CONNECTED = "No rig connected. Choose a driver and press Connect: \"sim\" is the simulated"
            + " rig, which needs no hardware; \"serial\" talks to a rig on a serial port. Then run the sweep on the Run"
            + " screen (Alt+3).";

    RigScreen(RigDrivers drivers, Runnable onConnect, Runnable onDisconnect) {
        this.drivers = drivers;
        for (RigDriver d : drivers.list()) {
            driverBox.addItem(d.name());
        }
        driverBox.setName("driver");
        driverBox.setSelectedItem("sim");
        driverBox.addActionListener(e -> showOptions());
        connect.setName("connect");
        connect.setMnemonic('C');
        connect.addActionListener(e -> onConnect.run());
        disconnect.setName("disconnect");
        disconnect.setMnemonic('D');
        disconnect.setEnabled(false);
        disconnect.addActionListener(e -> onDisconnect.run());
        identity.setEditable(false);
        identity.setName("rigIdentity");
        identity.setLineWrap(true);
        identity.setWrapStyleWord(true);
        identity.setText(NOT_CONNECTED);

        JLabel title = new JLabel("Rig");
        title.putClientProperty("FlatLaf.styleClass", "h3");
        panel.add(title);
        JLabel driverLabel = new JLabel("Driver");
        driverLabel.setDisplayedMnemonic('v');
        driverLabel.setLabelFor(driverBox);
        JLabel description = new JLabel();
        description.setName("driverDescription");
        panel.add(driverLabel, "split 3");
        panel.add(driverBox, "w 200!");
        panel.add(description, "gapleft 12");
        panel.add(optionPanel);
        panel.add(connect, "split 2, w 120!");
        panel.add(disconnect, "w 120!");
        JLabel healthTitle = new JLabel("Identity and health");
        healthTitle.putClientProperty("FlatLaf.styleClass", "h4");
        panel.add(healthTitle, "gaptop 12");
        panel.add(identity, "w 900!");
        for (String w : drivers.warnings()) {
            panel.add(new JLabel("Plugin warning: " + w));
        }
        showOptions();
    }

    JComponent component() {
        return panel;
    }

    String driverName() {
        return (String) driverBox.getSelectedItem();
    }

    /** @return the settings as typed, by option name */
    Map<String, String> options() {
        Map<String, String> values = new LinkedHashMap<>();
        optionEditors.forEach((name, box) -> {
            Object v = box.getEditor().getItem();
            values.put(name, v == null ? "" : v.toString());
        });
        return values;
    }

    void connected(boolean connected, List<String> health) {
        connect.setEnabled(!connected);
        disconnect.setEnabled(connected);
        driverBox.setEnabled(!connected);
        identity.setText(String.join("\n", health));
    }

    private void showOptions() {
        optionPanel.removeAll();
        optionEditors.clear();
        RigDriver driver = drivers.find(driverName());
        ((JLabel) findNamed("driverDescription")).setText(driver.description());
        for (RigOption o : driver.options()) {
            JComboBox<String> box = new JComboBox<>();
            box.setEditable(true);
            box.setName("option." + o.name());
            // The default as the selected item (not only the editor's text), so that a change of look keeps it.
            if (!o.isRequired()) {
                box.addItem(o.defaultValue());
                box.setSelectedItem(o.defaultValue());
            }
            if (o.name().equals("port")) {
                listPorts(box);
            }
            JLabel label = new JLabel(OptionLabel.of(o) + (o.isRequired() ? ", required" : ""));
            label.setLabelFor(box);
            optionPanel.add(label);
            optionPanel.add(box, "growx");
            optionPanel.add(new JLabel("<html>" + o.description() + "</html>"), "wmax 520");
            optionEditors.put(o.name(), box);
        }
        panel.revalidate();
        panel.repaint();
    }

    private JComponent findNamed(String name) {
        for (java.awt.Component c : panel.getComponents()) {
            if (name.equals(c.getName())) {
                return (JComponent) c;
            }
        }
        throw new IllegalStateException("no component " + name);
    }

    /** Lists the serial ports off the event thread: enumerating them can block on some systems. */
    private static void listPorts(JComboBox<String> box) {
        new SwingWorker<List<String>, Void>() {
            @Override
            protected List<String> doInBackground() {
                List<String> names = new ArrayList<>();
                for (SerialPort p : SerialPort.getCommPorts()) {
                    names.add(p.getSystemPortPath());
                }
                return names;
            }

            @Override
            protected void done() {
                try {
                    Object typed = box.getEditor().getItem();
                    for (String name : get()) {
                        box.addItem(name);
                    }
                    box.getEditor().setItem(typed);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (java.util.concurrent.ExecutionException e) {
                    box.setToolTipText("could not list the serial ports: " + e.getCause().getMessage());
                }
            }
        }.execute();
    }
}
