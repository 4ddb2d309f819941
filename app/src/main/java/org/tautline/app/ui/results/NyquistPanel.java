package org.tautline.app.ui.results;

import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;
import java.util.List;

import javax.swing.JComponent;

import org.hipparchus.complex.Complex;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.tautline.app.qualify.QualificationResult;

/** Real against imaginary mobility around one mode: measured lines, the model's curve and the fitted circle. */
final class NyquistPanel {
    private final XYSeries measured = new XYSeries("measured", false, true);
    private final XYSeries model = new XYSeries("fitted model", false, true);
    private final XYSeries circle = new XYSeries("fitted circle", false, true);
    private final ChartPanel component;

    NyquistPanel() {
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(measured);
        data.addSeries(model);
        data.addSeries(circle);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer();
        renderer.setSeriesLinesVisible(0, false);
        renderer.setSeriesShape(0, new Ellipse2D.Double(-2.5, -2.5, 5, 5));
        renderer.setSeriesPaint(0, ResultColours.MEASURED);
        renderer.setSeriesShapesVisible(1, false);
        renderer.setSeriesPaint(1, ResultColours.FIT);
        renderer.setSeriesStroke(1, new BasicStroke(1.5f));
        renderer.setSeriesShapesVisible(2, false);
        renderer.setSeriesPaint(2, ResultColours.SECOND);
        renderer.setSeriesStroke(2, new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {6f, 4f}, 0f));
        NumberAxis re = new NumberAxis("Re Y (m/(N s))");
        NumberAxis im = new NumberAxis("Im Y (m/(N s))");
        re.setAutoRangeIncludesZero(false);
        im.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(data, re, im, renderer);
        Charts.style(plot);
        component = Charts.panel("Mobility around the selected mode", plot, true);
    }

    JComponent component() {
        return component;
    }

    void show(QualificationResult result, int modeIndex) {
        measured.clear();
        model.clear();
        circle.clear();
        if (modeIndex < 0 || modeIndex >= result.modes().size()) {
            component.getChart().setTitle("Mobility around the selected mode (select a mode in the table)");
            return;
        }
        var mode = result.modes().get(modeIndex).mode();
        NyquistData data = NyquistData.around(result.receptance(), result.synthesized(), mode);
        fill(measured, data.measured());
        fill(model, data.model());
        fill(circle, List.of(data.circlePoints(120)));
        component.getChart().setTitle(String.format(java.util.Locale.ROOT, "Mobility around %.5g Hz (%.5g .. %.5g Hz)",
                mode.frequencyHz(), data.fromHz(), data.toHz())
                + (data.circle().isEmpty() ? ": too few lines for a circle" : ""));
    }

    private static void fill(XYSeries series, List<Complex> points) {
        for (Complex c : points) {
            series.add(c.getReal(), c.getImaginary(), false);
        }
        series.fireSeriesChanged();
    }
}
