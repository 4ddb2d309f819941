package org.tautline.app.ui.chart;

import java.awt.BorderLayout;

import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;

import net.miginfocom.swing.MigLayout;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;

/**
 * A chart on screen: drawn in the current look (and again when the look changes), zoomed with the mouse wheel or by
 * dragging a box, with our own context menu ({@link ChartMenu}) and a visible "Show whole range" button above it.
 *
 * <p>The chart is drawn into an image in software and blitted, which keeps repaints short on X servers without
 * accelerated anti-aliasing and lets a cursor line move without redrawing the chart. Build and use on the event
 * thread.
 */
public final class ChartView {
    private final ChartPanel panel;
    private final JPanel component = new JPanel(new BorderLayout());
    private final JPanel toolbar = new JPanel(new MigLayout("insets 2 6 0 6, fillx, hidemode 3", "[grow,fill][]"));
    private final Runnable wholeRange;
    private Runnable afterRestyle = () -> { };

    /**
     * @param chart the chart
     * @param wholeRange what "Show whole range" does; null to fit every axis to the data
     */
    public ChartView(JFreeChart chart, Runnable wholeRange) {
        ChartStyle.apply(chart);
        panel = new ChartPanel(chart, 680, 420, 100, 100, 4000, 3000, true, false, false, false, false, false, true) {
            private static final long serialVersionUID = 1L;

            @Override
            public void updateUI() {
                super.updateUI();
                if (getChart() != null) {
                    ChartStyle.apply(getChart());
                    restyled();
                }
            }
        };
        this.wholeRange = wholeRange == null ? panel::restoreAutoBounds : wholeRange;
        panel.setMouseWheelEnabled(true);
        panel.setPopupMenu(ChartMenu.of(this));
        JButton reset = new JButton("Show whole range");
        reset.setName("wholeRange");
        reset.setToolTipText("Undo any zoom: the mouse wheel or dragging a box zooms in");
        reset.addActionListener(e -> showWholeRange());
        toolbar.add(new JLabel(" "));
        toolbar.add(reset);
        component.add(toolbar, BorderLayout.NORTH);
        component.add(panel, BorderLayout.CENTER);
    }

    private void restyled() {
        if (afterRestyle != null) {
            afterRestyle.run();
        }
    }

    /** @param action run after each restyle (a look change), for colours the chart takes from the look */
    public void afterRestyle(Runnable action) {
        afterRestyle = action;
        action.run();
    }

    /** @return the chart panel itself, without the button row */
    public ChartPanel chartPanel() {
        return panel;
    }

    /** @return the chart */
    public JFreeChart chart() {
        return panel.getChart();
    }

    /** @return the chart with the button row above it, to place in a window */
    public JComponent component() {
        return component;
    }

    /** Hides the button row, for a chart that redraws itself from live data (the mouse and the menu still zoom). */
    public void hideButtons() {
        toolbar.setVisible(false);
    }

    /** @param readout shown at the left of the button row (a cursor readout) */
    public void readout(JComponent readout) {
        toolbar.remove(0);
        toolbar.add(readout, "growx", 0);
        toolbar.revalidate();
    }

    /** Undoes any zoom. */
    public void showWholeRange() {
        wholeRange.run();
    }

    /**
     * @param message what the chart shows while it has no data: what to do to get some
     */
    public void emptyMessage(String message) {
        chart().getPlot().setNoDataMessage(message);
        chart().getPlot().setNoDataMessageFont(ChartStyle.titleFont().deriveFont(java.awt.Font.PLAIN));
    }
}
