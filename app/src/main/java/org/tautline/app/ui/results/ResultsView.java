package org.tautline.app.ui.results;

import java.awt.BorderLayout;
import java.awt.CardLayout;
import java.awt.Dimension;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
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
import javax.swing.JTextArea;
import javax.swing.ListSelectionModel;
import javax.swing.SwingUtilities;

import net.miginfocom.swing.MigLayout;
import org.tautline.analysis.modal.Pole;
import org.tautline.app.qualify.QualificationResult;

/**
 * The results of a qualification: the verdict banner and the run header above tabs with the FRF and fit, the pole
 * choice, the modes with the Nyquist view, the participation pattern, and the properties with the verdict per limit.
 * A click on the pole chart refits off the event thread.
 *
 * <p>With no result the screen says how to get one. A result stops being current when a new run starts or a run ends
 * without a result: it stays on show, marked "not current", and it is no longer offered for export or a lot
 * ({@link #current()} is empty); the pole choice is off. Build and use on the event thread.
 */
public final class ResultsView {
    /** What the empty results screen says: what to do next. */
    public static final String NO_RESULT = "No result yet.\n\nTo get one, connect a rig on the Rig screen (Alt+2; the"
            + " simulated rig \"sim\" needs no hardware), then press Start sweep on the Run screen (Alt+3). Or import an"
            + " FRF (File, Import FRF, Ctrl+I) or a recording (File, Import recording).\n\nThe verdict, the fitted modes and the tension show here"
            + " when the sweep is complete.";
    private final CardLayout cards = new CardLayout();
    private final JPanel component = new JPanel(cards);
    private final JTextArea empty = new JTextArea(NO_RESULT);
    private final ResultHeader header = new ResultHeader();
    private final JTabbedPane tabs = new JTabbedPane();
    private final FrfPanel frf = new FrfPanel();
    private final StabilisationPanel poles = new StabilisationPanel(this::poleClicked);
    private final ModeTableModel modeModel = new ModeTableModel();
    private final JTable modeTable = new JTable(modeModel);
    private final JScrollPane tableScroll = new JScrollPane(modeTable);
    private final JSplitPane modes = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT);
    private final NyquistPanel nyquist = new NyquistPanel();
    private final ParticipationPanel participation = new ParticipationPanel();
    private final PropertiesPanel properties = new PropertiesPanel();
    private final JLabel status = new JLabel(" ");
    private final JProgressBar progress = new JProgressBar();
    private final JButton cancel = new JButton("Cancel refit");
    private final JButton automatic = new JButton("Automatic pole choice");
    private final List<Consumer<QualificationResult>> listeners = new ArrayList<>();
    private final RefitScheduler refits = new RefitScheduler(RefitScheduler.of(this::refitFinished, this::refitEnded,
            () -> refitEnded("Refit cancelled; showing the last fit")));
    private QualificationResult shown;
    private ResultOrigin origin;
    private boolean stale;
    private PoleChoice choice;

    /** Builds the view; call on the event thread. */
    public ResultsView() {
        modeTable.setName("modeTable");
        modeTable.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        modeTable.setFillsViewportHeight(true);
        modeTable.setAutoResizeMode(JTable.AUTO_RESIZE_LAST_COLUMN);
        modeTable.getSelectionModel().addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting() && shown != null) {
                nyquist.show(shown, modeTable.getSelectedRow());
            }
        });
        nyquist.component().setPreferredSize(new Dimension(420, 400));
        nyquist.component().setMinimumSize(new Dimension(320, 200));
        modes.setLeftComponent(tableScroll);
        modes.setRightComponent(nyquist.component());
        modes.setName("modesSplit");
        // The table keeps the width its columns need; the Nyquist view takes the rest.
        modes.setResizeWeight(0);
        tabs.setName("resultTabs");
        tabs.addTab("FRF and fit", frf.component());
        tabs.addTab("Pole choice", poles.component());
        tabs.addTab("Modes", modes);
        tabs.addTab("Participation", participation.component());
        tabs.addTab("Properties and verdict", properties.component());
        progress.setVisible(false);
        cancel.setEnabled(false);
        cancel.addActionListener(e -> refits.cancel());
        automatic.setEnabled(false);
        automatic.addActionListener(e -> {
            if (choice != null && !stale) {
                startRefit(choice.reset());
            }
        });
        status.setName("refitStatus");
        JPanel bar = new JPanel(new MigLayout("insets 4 8 4 8", "[grow][][][]"));
        bar.add(status, "growx, wmin 0");
        bar.add(progress, "w 120lp!");
        bar.add(cancel);
        bar.add(automatic);
        JPanel result = new JPanel(new BorderLayout());
        result.add(header.component(), BorderLayout.NORTH);
        result.add(tabs, BorderLayout.CENTER);
        result.add(bar, BorderLayout.SOUTH);
        empty.setName("resultsEmpty");
        empty.setEditable(false);
        empty.setLineWrap(true);
        empty.setWrapStyleWord(true);
        empty.setOpaque(false);
        empty.setFont(javax.swing.UIManager.getFont("Label.font").deriveFont(javax.swing.UIManager.getFont("Label.font")
                .getSize2D() * 1.2f));
        JPanel emptyCard = new JPanel(new MigLayout("insets 40 60 40 60, fill", "[grow,fill,::760]", "[top]"));
        emptyCard.add(empty);
        component.add(emptyCard, "empty");
        component.add(result, "result");
        cards.show(component, "empty");
    }

    /** @return the component to place in a window */
    public JComponent component() {
        return component;
    }

    /**
     * Shows a current result in every tab and makes its poles the current choice; cancels a running refit.
     *
     * @param result the qualification to show
     * @param from where it came from, for the header
     */
    public void show(QualificationResult result, ResultOrigin from) {
        refits.cancel();
        origin = from;
        stale = false;
        display(result);
        status.setText(statusOf(result));
        cards.show(component, "result");
    }

    /**
     * The result on show stops being current: it stays on show, marked so, or the screen says why there is none.
     *
     * @param why what happened, as a clause, for example "a sweep started at 14:03:12 is running"
     */
    public void withdraw(String why) {
        refits.cancel();
        if (shown == null) {
            empty.setText("No result yet: " + why + ".\n\n" + NO_RESULT.substring(NO_RESULT.indexOf("To get one")));
            return;
        }
        stale = true;
        header.stale("Not current: " + why + ". The result below is from the " + origin.how() + " " + origin.when()
                + "; it cannot be exported or added to a lot, and the pole choice is off until a new result shows.");
        automatic.setEnabled(false);
        status.setText("Not current: " + why);
    }

    /**
     * Shows no result, saying why.
     *
     * @param why what happened, as a sentence, for example "A new project was started."
     */
    public void clear(String why) {
        refits.cancel();
        shown = null;
        origin = null;
        stale = false;
        choice = null;
        header.clear();
        frf.clear();
        poles.clear();
        modeModel.clear();
        nyquist.clear();
        participation.clear();
        properties.clear();
        automatic.setEnabled(false);
        empty.setText(why + "\n\n" + NO_RESULT);
        cards.show(component, "empty");
    }

    /** @return the result on show when it is current: empty with none, or when it is marked not current */
    public Optional<QualificationResult> current() {
        return stale ? Optional.empty() : Optional.ofNullable(shown);
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

    FrfPanel frf() {
        return frf;
    }

    private void display(QualificationResult result) {
        shown = result;
        choice = PoleChoice.of(result.modal().chart(), result.modal().selection());
        header.show(result, origin);
        frf.show(result);
        poles.show(result.modal().chart(), choice, result.receptance());
        modeModel.show(result);
        ColumnWidths.fitToContent(modeTable);
        // The table keeps room for every column whole; the Nyquist view takes the rest of the width.
        int tableWidth = modeTable.getColumnModel().getTotalColumnWidth() + 24;
        tableScroll.setMinimumSize(new Dimension(tableWidth, 100));
        tableScroll.setPreferredSize(new Dimension(tableWidth, 400));
        modes.resetToPreferredSizes();
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
        if (choice == null || stale) {
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
        if (!stale) {
            status.setText(message);
        }
    }

    private void stopProgress() {
        progress.setIndeterminate(false);
        progress.setVisible(false);
        cancel.setEnabled(refits.isRunning());
        SwingUtilities.invokeLater(component::revalidate); // the status bar changed width after the event
    }

    private static String statusOf(QualificationResult r) {
        int notes = r.modal().warnings().size() + r.tension().map(t -> t.warnings().size()).orElse(0);
        return r.modes().size() + " modes fitted" + r.verdict().map(v -> "; verdict: " + v.outcome().label()).orElse("")
                + (notes == 0 ? "" : "; " + notes + (notes == 1 ? " note" : " notes") + " under Properties and verdict");
    }
}
