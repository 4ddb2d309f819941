package org.tautline.app.ui.chart;

import java.awt.BasicStroke;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.event.MouseEvent;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;

import javax.swing.JCheckBox;
import javax.swing.JLabel;
import javax.swing.JPanel;

import net.miginfocom.swing.MigLayout;
import org.jfree.chart.ChartMouseEvent;
import org.jfree.chart.ChartMouseListener;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.panel.AbstractOverlay;
import org.jfree.chart.panel.Overlay;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.RectangleEdge;

/**
 * The cursor of an FRF plot: a vertical line that follows the pointer, and a readout above the plot of the frequency,
 * |H| and phase of the line under it (see {@link FrfReading}); with "Snap to fitted modes" on, the line jumps to a
 * fitted mode within a few pixels. The line is drawn over the chart's image, so moving it does not redraw the chart.
 * Build and use on the event thread.
 */
public final class FrfCursor {
    /** How near a mode the pointer must be for the cursor to snap to it, pixels. */
    private static final double SNAP_PX = 12;
    private final ChartView view;
    private final Supplier<FrfLines> lines;
    private final Supplier<List<FrfReading.ModeMark>> modes;
    private final JLabel readout = new JLabel(FrfReading.HINT);
    private final JCheckBox snap = new JCheckBox("Snap to fitted modes", true);
    private final Line line = new Line();
    private Optional<FrfReading> reading = Optional.empty();

    /**
     * @param view the FRF chart; its domain axis is the frequency in Hz
     * @param lines the FRF on show, asked again at each move (it may grow during a sweep)
     * @param modes the fitted modes on show; empty for none, and then the snap box is hidden
     * @param snapShown true to offer snapping
     */
    public FrfCursor(ChartView view, Supplier<FrfLines> lines, Supplier<List<FrfReading.ModeMark>> modes,
                     boolean snapShown) {
        this.view = view;
        this.lines = lines;
        this.modes = modes;
        readout.setName("frfReadout");
        snap.setName("snapToModes");
        snap.setVisible(snapShown);
        snap.setToolTipText("The cursor jumps to a fitted mode's natural frequency when the pointer is near it");
        JPanel bar = new JPanel(new MigLayout("insets 0, fillx, hidemode 3", "[][grow,fill]"));
        bar.add(snap);
        bar.add(readout, "wmin 0");
        view.readout(bar);
        view.chartPanel().addOverlay(line);
        view.chartPanel().addChartMouseListener(new ChartMouseListener() {
            @Override
            public void chartMouseClicked(ChartMouseEvent event) {
                // a click zooms or chooses nothing here: the cursor follows the pointer
            }

            @Override
            public void chartMouseMoved(ChartMouseEvent event) {
                moved(event.getTrigger());
            }
        });
    }

    /** @return the reading on show, if the pointer has been over the plot since the data last changed */
    public Optional<FrfReading> reading() {
        return reading;
    }

    /** Forgets the reading: for new data. */
    public void clear() {
        reading = Optional.empty();
        readout.setText(FrfReading.HINT);
        line.fire();
    }

    /**
     * Reads the FRF at a frequency as if the pointer were there.
     *
     * @param pointerHz the frequency, Hz
     * @param snapRatio how near a mode snaps, as a frequency ratio (see {@link FrfReading#at})
     */
    public void readAt(double pointerHz, double snapRatio) {
        reading = FrfReading.at(lines.get(), modes.get(), pointerHz, snap.isSelected() ? snapRatio : 1);
        readout.setText(reading.map(FrfReading::text).orElse(FrfReading.HINT));
        line.fire();
    }

    private void moved(MouseEvent e) {
        ChartPanel panel = view.chartPanel();
        Rectangle2D area = panel.getScreenDataArea();
        if (area == null || !area.contains(e.getPoint())) {
            return;
        }
        ValueAxis axis = domainAxis();
        double hz = axis.java2DToValue(e.getX(), area, RectangleEdge.BOTTOM);
        double nearHz = axis.java2DToValue(e.getX() + SNAP_PX, area, RectangleEdge.BOTTOM);
        readAt(hz, nearHz > hz ? nearHz / hz : 1);
    }

    private ValueAxis domainAxis() {
        return ((XYPlot) view.chart().getPlot()).getDomainAxis();
    }

    /** The cursor line, drawn over the chart's image. */
    private final class Line extends AbstractOverlay implements Overlay {
        private static final BasicStroke STROKE = new BasicStroke(1f);

        void fire() {
            fireOverlayChanged();
        }

        @Override
        public void paintOverlay(Graphics2D g2, ChartPanel panel) {
            if (reading.isEmpty()) {
                return;
            }
            Rectangle2D area = panel.getScreenDataArea();
            double x = domainAxis().valueToJava2D(reading.get().cursorHz(), area, RectangleEdge.BOTTOM);
            if (!(x >= area.getMinX() && x <= area.getMaxX())) {
                return;
            }
            Shape clip = g2.getClip();
            g2.clip(area);
            g2.setPaint(reading.get().mode().isPresent() ? org.tautline.app.ui.Palette.FIT : ChartStyle.foreground());
            g2.setStroke(STROKE);
            g2.draw(new Line2D.Double(x, area.getMinY(), x, area.getMaxY()));
            g2.setClip(clip);
        }
    }
}
