package org.tautline.app.ui;

import java.awt.BasicStroke;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.Optional;

import javax.swing.JComponent;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.tautline.app.ui.chart.ChartStyle;
import org.tautline.app.ui.chart.ChartView;
import org.tautline.app.ui.chart.FrfCursor;
import org.tautline.app.ui.chart.FrfLines;
import org.tautline.app.ui.chart.LogScaleAxis;

/** The live FRF magnitude chart of the run screen: measured points on log-log axes, with a cursor readout. */
final class FrfChart {
    private final XYSeries measured = new XYSeries("measured |H|", true, false);
    private final XYSeries phaseDeg = new XYSeries("phase", true, false);
    private final LogScaleAxis frequencyAxis = new LogScaleAxis("Frequency (Hz)");
    private final ChartView view;
    private double bandLowHz = Double.NaN;
    private double bandHighHz = Double.NaN;

    FrfChart() {
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(measured);
        LogScaleAxis magnitudeAxis = new LogScaleAxis("Receptance magnitude |H| (m/N)");
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer();
        renderer.setSeriesPaint(0, Palette.MEASURED);
        renderer.setSeriesLinesVisible(0, false);
        renderer.setSeriesShapesVisible(0, true);
        // Small filled squares without outlines: a thousand points redraw quickly.
        renderer.setSeriesShape(0, new Rectangle2D.Double(-1.5, -1.5, 3, 3));
        renderer.setDrawOutlines(false);
        renderer.setSeriesStroke(0, new BasicStroke(1.0f));
        XYPlot plot = new XYPlot(data, frequencyAxis, magnitudeAxis, renderer);
        plot.setDomainMinorGridlinesVisible(true);
        JFreeChart chart = new JFreeChart("FRF magnitude as measured", ChartStyle.titleFont(), plot, false);
        view = new ChartView(chart, this::wholeRange);
        view.emptyMessage("No sweep yet: press Start sweep to measure the FRF step by step");
        new FrfCursor(view, this::lines, List::of, false);
    }

    private FrfLines lines() {
        int n = measured.getItemCount();
        double[] f = new double[n];
        double[] m = new double[n];
        double[] p = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = measured.getX(i).doubleValue();
            m[i] = measured.getY(i).doubleValue();
            p[i] = phaseDeg.getY(i).doubleValue();
        }
        return new FrfLines(f, m, p, "m/N", Optional.empty(), "");
    }

    private void wholeRange() {
        view.chartPanel().restoreAutoBounds();
        if (Double.isFinite(bandLowHz)) {
            frequencyAxis.setRange(bandLowHz, bandHighHz);
        }
    }

    /** @param live true while points arrive many times a second: draws without anti-aliasing to keep redraws short */
    void live(boolean live) {
        view.chart().setAntiAlias(!live);
    }

    /**
     * Fixes the frequency axis to a sweep's band so that the chart grows into a steady frame.
     *
     * @param startHz first step, Hz
     * @param stopHz last step, Hz
     */
    void band(double startHz, double stopHz) {
        bandLowHz = startHz * 0.95;
        bandHighHz = stopHz * 1.05;
        frequencyAxis.setRange(bandLowHz, bandHighHz);
    }

    JComponent component() {
        return view.component();
    }

    void clear() {
        measured.clear();
        phaseDeg.clear();
    }

    /**
     * Adds measured points as a sweep delivers them; the chart redraws once per call.
     *
     * @param frequenciesHz step frequencies, Hz
     * @param magnitudes |H| at those steps, m/N
     * @param phasesDeg the phase at those steps, degrees
     */
    void addMeasuredPoints(double[] frequenciesHz, double[] magnitudes, double[] phasesDeg) {
        for (int i = 0; i < frequenciesHz.length; i++) {
            if (magnitudes[i] > 0) {
                measured.add(frequenciesHz[i], magnitudes[i], false);
                phaseDeg.add(frequenciesHz[i], phasesDeg[i], false);
            }
        }
        measured.fireSeriesChanged();
    }
}
