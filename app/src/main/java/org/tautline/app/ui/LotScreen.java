package org.tautline.app.ui;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutionException;

import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.JTextField;
import javax.swing.ListSelectionModel;
import javax.swing.SwingWorker;
import javax.swing.table.DefaultTableModel;

import net.miginfocom.swing.MigLayout;
import org.tautline.analysis.verdict.Figure;
import org.tautline.app.lot.FigureStatistics;
import org.tautline.app.lot.LotEntries;
import org.tautline.app.lot.LotRegister;
import org.tautline.app.lot.LotStatistics;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.ui.lot.LotRows;

/**
 * The lot screen: opens a lot register (an SQLite file or a JDBC URL), shows a lot's statistics per figure
 * with Cpk against the specification, and the individuals control chart of the figure selected in the table;
 * the result on show can be added to the lot. Register work runs off the event thread.
 */
final class LotScreen {
    private final JPanel panel = new JPanel(new MigLayout("insets 8, fill", "[][grow,fill][]", "[][][][grow,fill]"));
    private final JTextField register = new JTextField(Path.of(LotRegister.DEFAULT_FILE_NAME).toAbsolutePath().toString());
    private final JTextField lot = new JTextField("DEMO-LOT");
    private final JButton show = new JButton("Show lot");
    private final JButton add = new JButton("Add the shown result to this lot");
    private final JLabel message = new JLabel("Name a register and a lot, then Show lot.");
    private final DefaultTableModel table = new DefaultTableModel(LotRows.COLUMNS.toArray(), 0) {
        private static final long serialVersionUID = 1L;

        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private final JTable figures = new JTable(table);
    private final LotChart chart = new LotChart();
    private List<FigureStatistics> statistics = List.of();
    private Optional<QualificationResult> shown = Optional.empty();

    LotScreen() {
        register.setName("lotRegister");
        lot.setName("lotName");
        show.setName("showLot");
        add.setName("addToLot");
        message.setName("lotMessage");
        show.setMnemonic('h');
        add.setMnemonic('d');
        add.setEnabled(false);
        JLabel registerLabel = new JLabel("Register (file or jdbc: URL)");
        registerLabel.setDisplayedMnemonic('g');
        registerLabel.setLabelFor(register);
        JLabel lotLabel = new JLabel("Lot");
        lotLabel.setDisplayedMnemonic('L');
        lotLabel.setLabelFor(lot);
        panel.add(registerLabel);
        panel.add(register, "span 2, wrap");
        panel.add(lotLabel);
        panel.add(lot, "w 240!, split 3");
        panel.add(show);
        panel.add(add, "wrap");
        panel.add(message, "span 3, wrap");
        figures.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        figures.setName("lotFigures");
        figures.getSelectionModel().addListSelectionListener(e -> {
            int row = figures.getSelectedRow();
            if (!e.getValueIsAdjusting() && row >= 0 && row < statistics.size()) {
                chart.show(statistics.get(row));
                message.setText(LotRows.chartSummary(statistics.get(row)));
            }
        });
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, new JScrollPane(figures), chart.panel());
        split.setResizeWeight(0.35);
        panel.add(split, "span 3, grow");
        show.addActionListener(e -> load());
        add.addActionListener(e -> append());
    }

    JComponent component() {
        return panel;
    }

    /** @param result the result now on the results screen, which Add puts into the lot */
    void resultShown(QualificationResult result) {
        shown = Optional.of(result);
        add.setEnabled(true);
    }

    private void load() {
        String location = register.getText().strip();
        String name = lot.getText().strip();
        if (!location.startsWith("jdbc:") && !Files.isRegularFile(Path.of(location))) {
            message.setText("No register file " + location + "; add a result to start one, or name an existing file.");
            return;
        }
        run("reading lot " + name, () -> read(location, name));
    }

    private void append() {
        String location = register.getText().strip();
        String name = lot.getText().strip();
        QualificationResult result = shown.orElseThrow();
        run("adding " + result.specimen().id() + " to lot " + name, () -> {
            try (LotRegister r = LotRegister.openForAppending(location)) {
                r.append(LotEntries.of(name, result, "workbench", Instant.now()));
            }
            return read(location, name);
        });
    }

    private static List<FigureStatistics> read(String location, String name) {
        if (name.isEmpty()) {
            throw new IllegalArgumentException("the lot name is empty; expected the name the qualifications were added under");
        }
        try (LotRegister r = LotRegister.openForQueries(location)) {
            return LotStatistics.of(r.entries(name));
        }
    }

    /** A register job that returns the lot's statistics. */
    private interface RegisterJob {
        List<FigureStatistics> run();
    }

    private void run(String busy, RegisterJob job) {
        show.setEnabled(false);
        add.setEnabled(false);
        message.setText(busy + " ...");
        new SwingWorker<List<FigureStatistics>, Void>() {
            @Override
            protected List<FigureStatistics> doInBackground() {
                return job.run();
            }

            @Override
            protected void done() {
                show.setEnabled(true);
                add.setEnabled(shown.isPresent());
                try {
                    showStatistics(get());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    message.setText("Could not use the register: " + e.getCause().getMessage());
                }
            }
        }.execute();
    }

    private void showStatistics(List<FigureStatistics> lotStatistics) {
        statistics = List.copyOf(lotStatistics);
        table.setRowCount(0);
        LotRows.of(statistics).forEach(table::addRow);
        org.tautline.app.ui.results.ColumnWidths.fitToContent(figures);
        if (statistics.isEmpty()) {
            message.setText("Lot " + lot.getText().strip() + " has no qualifications in this register yet.");
            return;
        }
        int tension = 0;
        for (int i = 0; i < statistics.size(); i++) {
            if (statistics.get(i).key().equals(Figure.TENSION.key())) {
                tension = i;
            }
        }
        figures.setRowSelectionInterval(tension, tension);
    }
}
