package org.tautline.app.ui;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.KeyboardFocusManager;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;

import javax.swing.ButtonGroup;
import javax.swing.JButton;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JPanel;
import javax.swing.JRadioButtonMenuItem;
import javax.swing.JTabbedPane;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import javax.swing.WindowConstants;

import net.miginfocom.swing.MigLayout;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.ui.project.RecentFiles;
import org.tautline.app.ui.results.ResultOrigin;
import org.tautline.app.ui.setup.SetupForm;
import org.tautline.driver.spi.RigDrivers;

/**
 * The workbench window: setup, rig, run and results screens in tabs, the menus, the stop control that is
 * always visible, and the status bar with the rig's state.
 */
public final class Workbench implements WorkbenchParts {
    /** The button that acknowledges the safety cautions and starts the first excitation. */
    static final String START_CHOICE = RunController.START_CHOICE;
    private final JFrame frame = new JFrame("Tautline workbench");
    private final JTabbedPane tabs = new JTabbedPane();
    private final StatusBar status = new StatusBar();
    private final SetupScreen setup;
    private final RigScreen rig;
    private final RunScreen run = new RunScreen();
    private final ResultsScreen results = new ResultsScreen();
    private final LotScreen lots = new LotScreen();
    private final RunController runs;
    private final FileController files;
    private final ExportController exports;
    private final LotAddGuard lotAdd;

    private Workbench(RigDrivers drivers, RecentFiles recent) {
        setup = new SetupScreen(SetupForm.demo(), this::edited);
        runs = new RunController(this, drivers, new RunController.ResultSink() {
            @Override
            public void show(QualificationResult result, ResultOrigin origin) {
                showResult(result, origin);
            }

            @Override
            public void withdraw(String why) {
                withdrawResult(why);
            }
        });
        rig = new RigScreen(drivers, runs::connect, runs::disconnect);
        files = new FileController(this, runs, recent);
        exports = new ExportController(this);
        results.onRefit(this::resultChanged);
        lotAdd = new LotAddGuard(lots.component());
        lotAdd.resultCurrent(false);
    }

    /** Opens the window on the event thread, with the look the desktop prefers. */
    public static void open() {
        SwingUtilities.invokeLater(() -> {
            Themes.setup(Themes.Choice.SYSTEM);
            new Workbench(RigDrivers.standard(), RecentFiles.inUserConfig()).build().setVisible(true);
        });
    }

    /**
     * Builds a window without showing it; call on the event thread.
     *
     * @param recent where the recent-files list is kept
     * @return the workbench
     */
    static Workbench create(RecentFiles recent) {
        Themes.setup(Themes.Choice.LIGHT);
        Workbench w = new Workbench(RigDrivers.standard(), recent);
        w.build();
        return w;
    }

    @Override
    public JFrame frame() {
        return frame;
    }

    @Override
    public SetupScreen setup() {
        return setup;
    }

    @Override
    public RigScreen rig() {
        return rig;
    }

    @Override
    public RunScreen run() {
        return run;
    }

    @Override
    public ResultsScreen results() {
        return results;
    }

    @Override
    public StatusBar status() {
        return status;
    }

    @Override
    public void showSetup() {
        tabs.setSelectedIndex(0);
    }

    FileController files() {
        return files;
    }

    JTabbedPane tabs() {
        return tabs;
    }

    private void edited() {
        files.edited();
    }

    /** The project, the exports and the lot screen follow the result on show, whether new or refitted. */
    private void resultChanged(QualificationResult result) {
        files.resultShown(result);
        exports.resultShown(result);
        lots.resultShown(result);
    }

    private void showResult(QualificationResult result, ResultOrigin origin) {
        lotAdd.resultCurrent(true);
        results.showResults(result, origin);
        exports.originShown(origin);
        resultChanged(result);
        tabs.setSelectedIndex(3);
    }

    /** The result on show is no longer current: it is marked so, and neither exported nor added to a lot. */
    private void withdrawResult(String why) {
        results.withdraw(why);
        exports.resultWithdrawn();
        lotAdd.resultCurrent(false);
    }

    @Override
    public void noResult(String why) {
        results.clear(why);
        exports.resultWithdrawn();
        lotAdd.resultCurrent(false);
    }

    private JFrame build() {
        tabs.addTab("1 Setup", setup.component());
        tabs.addTab("2 Rig", rig.component());
        tabs.addTab("3 Run", run.component());
        tabs.addTab("4 Results", results.component());
        tabs.addTab("5 Lot", lots.component());
        int[] keys = {KeyEvent.VK_1, KeyEvent.VK_2, KeyEvent.VK_3, KeyEvent.VK_4, KeyEvent.VK_5};
        for (int i = 0; i < keys.length; i++) {
            tabs.setMnemonicAt(i, keys[i]);
        }
        tabs.setName("screens");
        run.start.addActionListener(e -> runs.start());
        run.pause.addActionListener(e -> runs.pause());
        run.resume.addActionListener(e -> runs.resume());
        run.cancel.addActionListener(e -> runs.cancel());

        JPanel root = new JPanel(new BorderLayout());
        root.add(stopBar(), BorderLayout.NORTH);
        root.add(tabs, BorderLayout.CENTER);
        root.add(status.panel(), BorderLayout.SOUTH);
        // Escape is not a menu accelerator: an accelerator would also fire while Escape closes a menu. EscapeStop
        // sees the key first and stops only when it closes nothing; Ctrl+. is the Stop menu item's accelerator.
        EscapeStop escape = new EscapeStop(frame, runs::stopExcitation);
        KeyboardFocusManager.getCurrentKeyboardFocusManager().addKeyEventDispatcher(escape);
        frame.setJMenuBar(menus());
        frame.setContentPane(root);
        frame.setDefaultCloseOperation(WindowConstants.DO_NOTHING_ON_CLOSE);
        frame.addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                close();
            }

            @Override
            public void windowClosed(WindowEvent e) {
                KeyboardFocusManager.getCurrentKeyboardFocusManager().removeKeyEventDispatcher(escape);
            }
        });
        frame.setSize(1280, 800);
        frame.setLocationRelativeTo(null);
        return frame;
    }

    private JPanel stopBar() {
        JPanel bar = new JPanel(new MigLayout("insets 6 10 6 10, fillx", "[]push[][]"));
        JLabel hint = new JLabel("Set up the specimen, connect the rig, then run. Esc or Ctrl+. stops the excitation.");
        JButton stop = new JButton("STOP excitation (Esc)");
        stop.setName("stop");
        stop.setMnemonic('T');
        stop.setForeground(Color.WHITE);
        stop.setBackground(new Color(0xB0, 0x30, 0x00));
        stop.putClientProperty("JButton.buttonType", "roundRect");
        stop.addActionListener(e -> runs.stopExcitation());
        bar.add(hint);
        bar.add(stop, "h 32!");
        return bar;
    }

    private JMenuBar menus() {
        JMenuBar bar = new JMenuBar();
        JMenu file = menu("File", 'F');
        file.add(item("New project", 'N', KeyEvent.VK_N, files::newProject));
        file.add(item("Open project...", 'O', KeyEvent.VK_O, files::open));
        file.add(files.recentMenu());
        file.add(item("Save project", 'S', KeyEvent.VK_S, files::save));
        file.add(item("Save project as...", 'A', -1, files::saveAs));
        file.addSeparator();
        file.add(item("Import FRF (CSV)...", 'I', KeyEvent.VK_I, files::importFrf));
        file.add(item("Import recording (WAV or CSV)...", 'W', -1, files::importRecording));
        file.addSeparator();
        file.add(item("Export report (PDF)...", 'E', KeyEvent.VK_E, exports::exportReport));
        file.add(item("Export results (CSV and JSON)...", 'x', -1, exports::exportResults));
        file.addSeparator();
        file.add(item("Quit", 'Q', KeyEvent.VK_Q, this::close));
        JMenu view = menu("View", 'V');
        ButtonGroup looks = new ButtonGroup();
        for (Themes.Choice c : Themes.Choice.values()) {
            JRadioButtonMenuItem item = new JRadioButtonMenuItem(c.label(), c == Themes.Choice.LIGHT);
            item.setMnemonic(c.label().charAt(0));
            item.addActionListener(e -> Themes.apply(c));
            looks.add(item);
            view.add(item);
        }
        JMenu rigMenu = menu("Rig", 'R');
        rigMenu.add(item("Connect", 'C', -1, runs::connect));
        rigMenu.add(item("Disconnect", 'D', -1, runs::disconnect));
        rigMenu.addSeparator();
        rigMenu.add(item("Start sweep", 'S', KeyEvent.VK_R, runs::start));
        rigMenu.add(item("Pause", 'P', -1, runs::pause));
        rigMenu.add(item("Resume", 'u', -1, runs::resume));
        rigMenu.add(item("Cancel sweep", 'n', -1, runs::cancel));
        JMenuItem stop = item("Stop excitation (Esc)", 'x', -1, runs::stopExcitation);
        stop.setAccelerator(KeyStroke.getKeyStroke(KeyEvent.VK_PERIOD, InputEvent.CTRL_DOWN_MASK));
        rigMenu.add(stop);
        bar.add(file);
        bar.add(view);
        bar.add(rigMenu);
        return bar;
    }

    private void close() {
        if (runs.isRunning()) {
            runs.stopExcitation();
            status.message("A sweep was running: the drive is ramping down. Close again once it has stopped.");
            return;
        }
        if (files.confirmDiscard()) {
            runs.closeRig();
            frame.dispose();
        }
    }

    private static JMenu menu(String text, char mnemonic) {
        JMenu m = new JMenu(text);
        m.setMnemonic(mnemonic);
        return m;
    }

    private static JMenuItem item(String text, char mnemonic, int ctrlKey, Runnable action) {
        JMenuItem item = new JMenuItem(text, mnemonic);
        if (ctrlKey >= 0) {
            item.setAccelerator(KeyStroke.getKeyStroke(ctrlKey, InputEvent.CTRL_DOWN_MASK));
        }
        item.addActionListener(e -> action.run());
        return item;
    }
}
