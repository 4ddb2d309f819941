package org.tautline.app.ui;

import java.awt.BasicStroke;
import java.awt.Color;

import javax.swing.JComponent;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.tautline.analysis.verdict.Figure;
import org.tautline.app.lot.FigureStatistics;
import org.tautline.app.ui.chart.ChartStyle;
import org.tautline.app.ui.chart.ChartView;

/**
 * The individuals control chart of one figure of a lot: the values in register order, the centre line,
 * the control limits (dashed) and the specification limits (solid), with the points outside the control
 * limits drawn as a separate series.
 */
final class LotChart {
    private final XYSeriesCollection data = new XYSeriesCollection();
    private final XYPlot plot;
    private final JFreeChart chart;
    private final ChartView view;

    LotChart() {
        NumberAxis qualification = new NumberAxis("Qualification in register order");
        qualification.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        NumberAxis value = new NumberAxis("Value");
        value.setAutoRangeIncludesZero(false);
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, true);
        r.setSeriesPaint(0, Palette.MEASURED);
        r.setSeriesPaint(1, Palette.FAIL);
        r.setSeriesLinesVisible(1, false);
        plot = new XYPlot(data, qualification, value, r);
        chart = new JFreeChart("Control chart", ChartStyle.titleFont(), plot, true);
        view = new ChartView(chart, null);
        view.chartPanel().setName("lotChart");
        view.emptyMessage("No lot shown: name a register and a lot above, then Show lot (or add the result on show)");
    }

    /** @return the chart with its "Show whole range" button, to place in the lot screen */
    JComponent panel() {
        return view.component();
    }

    /** @param f the figure to chart; call on the event thread */
    void show(FigureStatistics f) {
        data.removeAllSeries();
        plot.clearRangeMarkers();
        XYSeries values = new XYSeries(axisLabel(f), false);
        XYSeries outside = new XYSeries("outside the control limits", false);
        for (int i = 0; i < f.chart().values().size(); i++) {
            values.add(i + 1, f.chart().values().get(i));
        }
        for (int i : f.chart().outOfControl()) {
            outside.add(i + 1, f.chart().values().get(i));
        }
        data.addSeries(values);
        data.addSeries(outside);
        plot.getRangeAxis().setLabel(axisLabel(f));
        marker(f.chart().centre(), "centre", Palette.SECOND, false);
        marker(f.chart().lowerControlLimit(), "LCL", Palette.SECOND, true);
        marker(f.chart().upperControlLimit(), "UCL", Palette.SECOND, true);
        marker(f.lowerLimit(), "lower spec", Palette.FIT, false);
        marker(f.upperLimit(), "upper spec", Palette.FIT, false);
        chart.setTitle("Control chart of " + Figure.labelFor(f.key()) + " (individuals, " + f.n() + (f.n() == 1 ? " qualification)" : " qualifications)"));
        double[] range = valueRange(f);
        plot.getRangeAxis().setRange(range[0], range[1]);
        plot.getDomainAxis().setRange(0.5, Math.max(f.n(), 2) + 0.5);
    }

    /** The figure's label with its unit, typographic, for the axis and the legend. */
    private static String axisLabel(FigureStatistics f) {
        return Figure.labelFor(f.key()) + (f.unit().isBlank() ? "" : " (" + Figure.unitLabel(f.unit()) + ")");
    }

    /**
     * The value axis: the values, the control limits and the specification limits, padded by a tenth; a lot
     * whose values are all equal gets 1 % of the value either side so that its axis still reads.
     */
    static double[] valueRange(FigureStatistics f) {
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        java.util.List<Double> all = new java.util.ArrayList<>(f.chart().values());
        all.addAll(java.util.List.of(f.chart().lowerControlLimit(), f.chart().upperControlLimit(), f.lowerLimit(),
                f.upperLimit()));
        for (double v : all) {
            if (Double.isFinite(v)) {
                low = Math.min(low, v);
                high = Math.max(high, v);
            }
        }
        double span = high - low;
        if (!(span > 1e-9 * Math.max(Math.abs(low), Math.abs(high)))) {
            double half = Math.abs(low) > 0 ? 0.01 * Math.abs(low) : 1.0;
            return new double[] {low - half, high + half};
        }
        return new double[] {low - 0.1 * span, high + 0.1 * span};
    }

    private void marker(double at, String label, Color colour, boolean dashed) {
        if (!Double.isFinite(at)) {
            return;
        }
        ValueMarker m = new ValueMarker(at, colour, dashed
                ? new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {6f, 4f}, 0f)
                : new BasicStroke(1.2f));
        m.setLabel(label);
        m.setLabelPaint(colour);
        m.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
        m.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
        plot.addRangeMarker(m);
    }
}
