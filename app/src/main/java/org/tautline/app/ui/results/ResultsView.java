package org.tautline.app.ui.results;

import java.awt.BorderLayout;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import javax.swing.JTable;
import javax.swing.ListSelectionModel;
import javax.swing.SwingUtilities;

import net.miginfocom.swing.MigLayout;
import org.tautline.analysis.modal.Pole;
import org.tautline.app.qualify.QualificationResult;

/**
 * The results of a qualification in tabs: FRF and fit, pole choice, modes with the Nyquist view,
 * participation pattern, and properties with the verdict. A click on the pole chart refits off the event thread.
 *
 * <p>Build and use on the event thread.
 */
public final class ResultsView {
    private final JTabbedPane tabs = new JTabbedPane();
    private final JPanel component = new JPanel(new BorderLayout());
    private final FrfPanel frf = new FrfPanel();
    private final StabilisationPanel poles = new StabilisationPanel(this::poleClicked);
    private final ModeTableModel modeModel = new ModeTableModel();
    private final JTable modeTable = new JTable(modeModel);
    private final NyquistPanel nyquist = new NyquistPanel();
    private final ParticipationPanel participation = new ParticipationPanel();
    private final PropertiesPanel properties = new PropertiesPanel();
    private final JLabel status = new JLabel("No result yet");
    private final JProgressBar progress = new JProgressBar();
    private final JButton cancel = new JButton("Cancel refit");
    private final JButton automatic = new JButton("Automatic pole choice");
    private final List<Consumer<QualificationResult>> listeners = new ArrayList<>();
    private final RefitScheduler refits = new RefitScheduler(new RefitScheduler.Listener() {
        @Override
        public void finished(QualificationResult result) {
            refitFinished(result);
        }

        @Override
        public void failed(String message) {
            refitEnded(message);
        }

        @Override
        public void idle() {
            refitEnded("Refit cancelled; showing the last fit");
        }
    });
    private QualificationResult shown;
    private PoleChoice choice;

    /** Builds the view; call on the event thread. */
    public ResultsView() {
        modeTable.setName("modeTable");
        modeTable.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        modeTable.setFillsViewportHeight(true);
        modeTable.getSelectionModel().addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting() && shown != null) {
                nyquist.show(shown, modeTable.getSelectedRow());
            }
        });
        JScrollPane tableScroll = new JScrollPane(modeTable);
        tableScroll.setPreferredSize(new java.awt.Dimension(700, 400));
        nyquist.component().setPreferredSize(new java.awt.Dimension(520, 400));
        JSplitPane modes = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, tableScroll, nyquist.component());
        modes.setResizeWeight(0.55);
        tabs.setName("resultTabs");
        tabs.setName("resultTabs");
        tabs.addTab("FRF and fit", frf.component());
        tabs.addTab("Pole choice", poles.component());
        tabs.addTab("Modes", modes);
        tabs.addTab("Participation", participation.component());
        tabs.addTab("Properties and verdict", properties.component());
        progress.setIndeterminate(false);
        progress.setVisible(false);
        cancel.setEnabled(false);
        cancel.addActionListener(e -> refits.cancel());
        automatic.setEnabled(false);
        automatic.addActionListener(e -> {
            if (choice != null) {
                startRefit(choice.reset());
            }
        });
        status.setName("refitStatus");
        JPanel bar = new JPanel(new MigLayout("insets 4 8 4 8", "[grow][][][]"));
        bar.add(status, "growx");
        bar.add(progress, "w 120lp!");
        bar.add(cancel);
        bar.add(automatic);
        component.add(tabs, BorderLayout.CENTER);
        component.add(bar, BorderLayout.SOUTH);
    }

    /** @return the component to place in a window */
    public JComponent component() {
        return component;
    }

    /**
     * Shows a result in every tab and makes its poles the current choice; cancels a running refit.
     *
     * @param result the qualification to show
     */
    public void show(QualificationResult result) {
        refits.cancel();
        display(result);
        status.setText(statusOf(result));
    }

    /**
     * @param listener called on the event thread with each result a pole choice produced
     */
    public void onResultChanged(Consumer<QualificationResult> listener) {
        listeners.add(listener);
    }

    JTabbedPane tabs() {
        return tabs;
    }

    private void display(QualificationResult result) {
        shown = result;
        choice = PoleChoice.of(result.modal().chart(), result.modal().selection());
        frf.show(result);
        poles.show(result.modal().chart(), choice, result.receptance());
        modeModel.show(result);
        participation.show(result);
        properties.show(result);
        automatic.setEnabled(true);
        if (!result.modes().isEmpty()) {
            modeTable.setRowSelectionInterval(0, 0);
        } else {
            nyquist.show(result, -1);
        }
    }

    private void poleClicked(Pole pole) {
        if (choice == null) {
            return;
        }
        startRefit(choice.toggle(pole));
    }

    private void startRefit(PoleChoice next) {
        choice = next;
        poles.show(shown.modal().chart(), next, shown.receptance());
        refits.submit(shown, next.selection());
        status.setText("Refitting with " + next.poles().size() + " poles...");
        progress.setIndeterminate(true);
        progress.setVisible(true);
        cancel.setEnabled(true);
    }

    private void refitFinished(QualificationResult result) {
        stopProgress();
        display(result);
        status.setText("Refitted: " + statusOf(result));
        for (Consumer<QualificationResult> l : listeners) {
            l.accept(result);
        }
    }

    private void refitEnded(String message) {
        stopProgress();
        if (shown != null) {
            // Back to the poles of the result on show.
            choice = PoleChoice.of(shown.modal().chart(), shown.modal().selection());
            poles.show(shown.modal().chart(), choice, shown.receptance());
        }
        status.setText(message);
    }

    private void stopProgress() {
        progress.setIndeterminate(false);
        progress.setVisible(false);
        cancel.setEnabled(refits.isRunning());
        SwingUtilities.invokeLater(component::revalidate); // the status bar changed width after the event
    }

    private static String statusOf(QualificationResult r) {
        return r.modes().size() + " modes" + r.verdict().map(v -> ", verdict " + v.outcome()).orElse("")
                + (r.modal().warnings().isEmpty() ? "" : " (" + r.modal().warnings().size() + " notes)");
    }
}
