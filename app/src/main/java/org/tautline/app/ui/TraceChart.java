package org.tautline.app.ui;

import java.awt.BasicStroke;

import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.DefaultXYDataset;
import org.tautline.app.ui.run.TraceBuffer;

/** Live force and response traces: the latest samples the sweep read, one plot above the other. */
final class TraceChart {
    private final DefaultXYDataset force = new DefaultXYDataset();
    private final DefaultXYDataset response = new DefaultXYDataset();
    private final ChartPanel panel;

    TraceChart() {
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(new NumberAxis("Time within the latest samples (s)"));
        plot.add(plot(force, "Force (N)", Palette.FIT), 1);
        plot.add(plot(response, "Response", Palette.MEASURED), 1);
        JFreeChart chart = new JFreeChart("Live signals", JFreeChart.DEFAULT_TITLE_FONT, plot, false);
        // Live charts redraw many times a second: shapes without anti-aliasing keep each redraw short.
        chart.setAntiAlias(false);
        panel = ChartStyle.panel(chart);
        panel.setName("traces");
    }

    private static XYPlot plot(DefaultXYDataset series, String label, java.awt.Color colour) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setSeriesPaint(0, colour);
        r.setSeriesStroke(0, new BasicStroke(1.0f));
        // One path per series instead of a line per segment: several times faster to draw.
        r.setDrawSeriesLineAsPath(true);
        NumberAxis axis = new NumberAxis(label);
        axis.setAutoRangeIncludesZero(false);
        return new XYPlot(series, null, axis, r);
    }

    /** @param label the response axis label, with its unit */
    void responseLabel(String label) {
        CombinedDomainXYPlot plot = (CombinedDomainXYPlot) panel.getChart().getPlot();
        plot.getSubplots().get(1).getRangeAxis().setLabel(label);
    }

    ChartPanel panel() {
        return panel;
    }

    /** Redraws from the latest samples; call on the event thread. */
    void show(TraceBuffer.Snapshot s) {
        fill(force, s.timeS(), s.force());
        fill(response, s.timeS(), s.response());
    }

    void clear() {
        fill(force, new double[0], new double[0]);
        fill(response, new double[0], new double[0]);
    }

    /** Replaces the series in one step: linear in the samples, one redraw. */
    private static void fill(DefaultXYDataset data, double[] t, double[] v) {
        data.addSeries("signal", new double[][] {t, v});
    }
}
