package org.tautline.app.ui;

import java.awt.BasicStroke;
import java.awt.geom.Rectangle2D;

import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogarithmicAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.tautline.analysis.frf.Frf;

/** The FRF magnitude chart: measured points and the fitted model on log-log axes. */
final class FrfChart {
    private final XYSeries measured = new XYSeries("measured |H|", true, false);
    private final XYSeries fit = new XYSeries("fitted model", true, false);
    private final ChartPanel panel;

    FrfChart() {
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(measured);
        data.addSeries(fit);
        LogarithmicAxis frequencyAxis = new LogarithmicAxis("Frequency (Hz)");
        frequencyAxis.setStrictValuesFlag(false);
        LogarithmicAxis magnitudeAxis = new LogarithmicAxis("Receptance magnitude (m/N)");
        magnitudeAxis.setStrictValuesFlag(false);
        magnitudeAxis.setExpTickLabelsFlag(true);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer();
        renderer.setSeriesPaint(0, Palette.MEASURED);
        renderer.setSeriesLinesVisible(0, false);
        renderer.setSeriesShapesVisible(0, true);
        // Small filled squares without outlines, and the fit as one path: a thousand points redraw quickly.
        renderer.setSeriesShape(0, new Rectangle2D.Double(-1.5, -1.5, 3, 3));
        renderer.setDrawOutlines(false);
        renderer.setDrawSeriesLineAsPath(true);
        renderer.setSeriesPaint(1, Palette.FIT);
        renderer.setSeriesShapesVisible(1, false);
        renderer.setSeriesStroke(1, new BasicStroke(1.6f));
        XYPlot plot = new XYPlot(data, frequencyAxis, magnitudeAxis, renderer);
        JFreeChart chart = new JFreeChart("FRF magnitude", JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        panel = ChartStyle.panel(chart);
    }

    /** @param live true while points arrive many times a second: draws without anti-aliasing to keep redraws short */
    void live(boolean live) {
        panel.getChart().setAntiAlias(!live);
    }

    /**
     * Fixes the frequency axis to a sweep's band so that the chart grows into a steady frame.
     *
     * @param startHz first step, Hz
     * @param stopHz last step, Hz
     */
    void band(double startHz, double stopHz) {
        ((org.jfree.chart.plot.XYPlot) panel.getChart().getPlot()).getDomainAxis().setRange(startHz * 0.95, stopHz * 1.05);
    }

    ChartPanel panel() {
        return panel;
    }

    void clear() {
        measured.clear();
        fit.clear();
    }

    /**
     * Adds measured points as a sweep delivers them; the chart redraws once per call.
     *
     * @param frequenciesHz step frequencies, Hz
     * @param magnitudes |H| at those steps, m/N
     */
    void addMeasuredPoints(double[] frequenciesHz, double[] magnitudes) {
        for (int i = 0; i < frequenciesHz.length; i++) {
            if (magnitudes[i] > 0) {
                measured.add(frequenciesHz[i], magnitudes[i], false);
            }
        }
        measured.fireSeriesChanged();
    }

    void showMeasured(Frf frf) {
        measured.clear();
        fill(measured, frf);
    }

    void showFit(Frf synthesized) {
        fit.clear();
        fill(fit, synthesized);
    }

    private static void fill(XYSeries series, Frf frf) {
        for (int i = 0; i < frf.size(); i++) {
            if (frf.magnitude(i) > 0) {
                series.add(frf.frequencyHz(i), frf.magnitude(i), false);
            }
        }
        series.fireSeriesChanged();
    }
}
