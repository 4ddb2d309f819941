package org.tautline.app.ui.results;

import org.tautline.app.ui.Palette;
import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;
import java.util.List;

import javax.swing.JComponent;
import javax.swing.JPanel;

import org.hipparchus.complex.Complex;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.ui.chart.ChartView;

/** Real against imaginary mobility around one mode: measured lines, the model's curve and the fitted circle. */
final class NyquistPanel {
    private final XYSeries measured = new XYSeries("measured", false, true);
    private final XYSeries model = new XYSeries("fitted model", false, true);
    private final XYSeries circle = new XYSeries("fitted circle", false, true);
    private final ChartView view;
    private final JComponent component;
    private final JPanel square;
    private NyquistData shownData;

    NyquistPanel() {
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(measured);
        data.addSeries(model);
        data.addSeries(circle);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer();
        renderer.setSeriesLinesVisible(0, false);
        renderer.setSeriesShape(0, new Ellipse2D.Double(-2.5, -2.5, 5, 5));
        renderer.setSeriesPaint(0, Palette.MEASURED);
        renderer.setSeriesShapesVisible(1, false);
        renderer.setSeriesPaint(1, Palette.FIT);
        renderer.setSeriesStroke(1, new BasicStroke(1.5f));
        renderer.setSeriesShapesVisible(2, false);
        renderer.setSeriesPaint(2, Palette.SECOND);
        renderer.setSeriesStroke(2, new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {6f, 4f}, 0f));
        NumberAxis re = new NumberAxis("Re Y, real part of the mobility (m/(N s))");
        NumberAxis im = new NumberAxis("Im Y, imaginary part (m/(N s))");
        re.setAutoRangeIncludesZero(false);
        im.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(data, re, im, renderer);
        view = Charts.view("Mobility around the selected mode", plot, true, this::wholeRange);
        view.emptyMessage("No result yet");
        component = view.component();
        square = new JPanel(null) {
            private static final long serialVersionUID = 1L;

            @Override
            public void doLayout() {
                // Keep the chart roughly square (legend and title take some height) so equal spans look equal.
                int side = Math.min(getWidth(), getHeight() + getHeight() / 8);
                int height = Math.min(getHeight(), side);
                component.setBounds((getWidth() - side) / 2, 0, side, height);
            }
        };
        square.add(component);
    }

    JComponent component() {
        return square;
    }

    private void wholeRange() {
        if (shownData != null) {
            equalScales(shownData);
        } else {
            view.chartPanel().restoreAutoBounds();
        }
    }

    /** Empties the chart, for a screen with no result. */
    void clear() {
        measured.clear();
        model.clear();
        circle.clear();
        shownData = null;
        view.chart().setTitle("Mobility around the selected mode");
    }

    void show(QualificationResult result, int modeIndex) {
        measured.clear();
        model.clear();
        circle.clear();
        shownData = null;
        if (modeIndex < 0 || modeIndex >= result.modes().size()) {
            view.chart().setTitle("Mobility around the selected mode (select a mode in the table)");
            return;
        }
        var mode = result.modes().get(modeIndex).mode();
        NyquistData data = NyquistData.around(result.receptance(), result.modal().plainModes(), mode);
        fill(measured, data.measured());
        fill(model, data.model());
        fill(circle, List.of(data.circlePoints(120)));
        shownData = data;
        equalScales(data);
        view.chart().setTitle(String.format(java.util.Locale.ROOT, "Mobility around %.5g Hz (%.5g to %.5g Hz)",
                mode.frequencyHz(), data.fromHz(), data.toHz())
                + (data.circle().isEmpty() ? ": too few lines for a circle" : ""));
    }

    /** Gives both axes the same span so that a circle looks like one (the panel is kept square). */
    private void equalScales(NyquistData data) {
        List<Complex> all = new java.util.ArrayList<>(data.measured());
        all.addAll(List.of(data.circlePoints(60)));
        if (all.isEmpty()) {
            return;
        }
        double reLow = all.stream().mapToDouble(Complex::getReal).min().orElseThrow();
        double reHigh = all.stream().mapToDouble(Complex::getReal).max().orElseThrow();
        double imLow = all.stream().mapToDouble(Complex::getImaginary).min().orElseThrow();
        double imHigh = all.stream().mapToDouble(Complex::getImaginary).max().orElseThrow();
        double half = 0.55 * Math.max(Math.max(reHigh - reLow, imHigh - imLow), 1e-30);
        XYPlot plot = view.chart().getXYPlot();
        plot.getDomainAxis().setRange(0.5 * (reLow + reHigh) - half, 0.5 * (reLow + reHigh) + half);
        plot.getRangeAxis().setRange(0.5 * (imLow + imHigh) - half, 0.5 * (imLow + imHigh) + half);
    }

    private static void fill(XYSeries series, List<Complex> points) {
        for (Complex c : points) {
            series.add(c.getReal(), c.getImaginary(), false);
        }
        series.fireSeriesChanged();
    }
}
