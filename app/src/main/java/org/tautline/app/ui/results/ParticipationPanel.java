package org.tautline.app.ui.results;

import org.tautline.app.ui.Palette;
import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;

import javax.swing.JComponent;

import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;
import org.tautline.analysis.specimen.ParticipationEntry;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.ui.chart.ChartView;

/** Measured modal constants (with 2-sigma bars) against those expected from the stated setup, per harmonic. */
final class ParticipationPanel {
    private final XYIntervalSeries measured = new XYIntervalSeries("measured ± 2 std");
    private final XYIntervalSeries expected = new XYIntervalSeries("expected at the stated positions (scaled)");
    private final ChartView view;

    ParticipationPanel() {
        XYIntervalSeriesCollection data = new XYIntervalSeriesCollection();
        data.addSeries(measured);
        data.addSeries(expected);
        XYErrorRenderer renderer = new XYErrorRenderer();
        renderer.setDrawXError(false);
        renderer.setSeriesLinesVisible(0, false);
        renderer.setSeriesShape(0, new Ellipse2D.Double(-4, -4, 8, 8));
        renderer.setSeriesPaint(0, Palette.MEASURED);
        renderer.setSeriesLinesVisible(1, true);
        renderer.setSeriesShape(1, PoleSymbols.square());
        renderer.setSeriesPaint(1, Palette.FIT);
        renderer.setSeriesStroke(1, new BasicStroke(1.2f));
        renderer.setErrorPaint(Palette.MEASURED);
        NumberAxis harmonic = new NumberAxis("Harmonic n");
        harmonic.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        XYPlot plot = new XYPlot(data, harmonic, new NumberAxis("Modal constant (1/kg)"), renderer);
        view = Charts.view("Participation pattern", plot, true, null);
        view.emptyMessage("No result yet");
    }

    JComponent component() {
        return view.component();
    }

    /** Empties the chart, for a screen with no result. */
    void clear() {
        measured.clear();
        expected.clear();
        view.chart().setTitle("Participation pattern");
    }

    void show(QualificationResult result) {
        measured.clear();
        expected.clear();
        if (result.participation().isEmpty()) {
            view.chart().setTitle("Participation pattern: needs at least two numbered harmonics");
            return;
        }
        var fit = result.participation().get();
        for (ParticipationEntry e : fit.entries()) {
            double m = e.measuredModalConstant();
            double u = 2 * (Double.isFinite(e.measuredStd()) ? e.measuredStd() : 0);
            measured.add(e.harmonic(), e.harmonic(), e.harmonic(), m, m - u, m + u);
            double x = fit.statedScale() * e.expectedModalConstant();
            expected.add(e.harmonic(), e.harmonic(), e.harmonic(), x, x, x);
        }
        view.chart().setTitle(String.format(java.util.Locale.ROOT,
                "Participation pattern (misfit per degree of freedom %.3g at the stated positions)",
                fit.statedReducedChiSquare()));
    }
}
