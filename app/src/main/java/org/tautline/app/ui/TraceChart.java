package org.tautline.app.ui;

import java.awt.BasicStroke;

import javax.swing.JComponent;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.DefaultXYDataset;
import org.tautline.app.ui.chart.ChartStyle;
import org.tautline.app.ui.chart.ChartView;
import org.tautline.app.ui.chart.SiPrefix;
import org.tautline.analysis.verdict.Figure;
import org.tautline.app.ui.run.TraceBuffer;

/** Live force and response traces: the latest samples the sweep read, one plot above the other. */
final class TraceChart {
    private final DefaultXYDataset force = new DefaultXYDataset();
    private final DefaultXYDataset response = new DefaultXYDataset();
    private final ChartView view;
    private String responseName = "Response";
    private String responseUnit = "";

    TraceChart() {
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(new NumberAxis("Time within the latest samples (s)"));
        plot.add(plot(force, "Force (N)", Palette.FIT), 1);
        plot.add(plot(response, "Response", Palette.MEASURED), 1);
        JFreeChart chart = new JFreeChart("Live signals", ChartStyle.titleFont(), plot, false);
        // Live charts redraw many times a second: shapes without anti-aliasing keep each redraw short.
        chart.setAntiAlias(false);
        view = new ChartView(chart, null);
        view.chartPanel().setName("traces");
        view.hideButtons();
        for (XYPlot sub : plot.getSubplots()) {
            sub.setNoDataMessage("No sweep running");
        }
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

    /**
     * @param name what the response sensor measures, for example "Response, displacement"
     * @param unit its SI unit, for example "m"
     */
    void response(String name, String unit) {
        responseName = name;
        responseUnit = unit.isBlank() ? "" : Figure.unitLabel(unit);
    }

    JComponent component() {
        return view.component();
    }

    /** Redraws from the latest samples; call on the event thread. */
    void show(TraceBuffer.Snapshot s) {
        fill(force, s.timeS(), scaled(s.force(), 0, "Force", "N"));
        fill(response, s.timeS(), scaled(s.response(), 1, responseName, responseUnit));
    }

    /** The values in the SI prefix that suits them, with the axis label to match (20 mN, not 0.020 N). */
    private double[] scaled(double[] values, int subplot, String name, String unit) {
        double largest = 0;
        for (double v : values) {
            largest = Math.max(largest, Math.abs(v));
        }
        SiPrefix prefix = SiPrefix.forLargest(largest);
        double[] out = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            out[i] = values[i] * prefix.factor();
        }
        String label = name + (unit.isEmpty() ? "" : " (" + prefix.symbol() + unit + ")");
        org.jfree.chart.axis.ValueAxis axis = ((CombinedDomainXYPlot) view.chart().getPlot()).getSubplots().get(subplot)
                .getRangeAxis();
        if (!label.equals(axis.getLabel())) {
            axis.setLabel(label);
        }
        return out;
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
