package org.tautline.app.ui.results;

import org.tautline.app.ui.Palette;
import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;

import javax.swing.JComponent;

import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.tautline.analysis.frf.Frf;
import org.tautline.app.qualify.QualificationResult;

/** FRF magnitude and phase, measured with the fitted model over them, and the per-line coherence or quality beneath. */
final class FrfPanel {
    private final XYSeries magnitude = new XYSeries("measured", true, false);
    private final XYSeries magnitudeFit = new XYSeries("fitted model", true, false);
    private final XYSeries phase = new XYSeries("measured", true, false);
    private final XYSeries phaseFit = new XYSeries("fitted model", true, false);
    private final XYSeries lineFigure = new XYSeries("per line", true, false);
    private final NumberAxis lineAxis = new NumberAxis("Coherence");
    private final JComponent component;

    FrfPanel() {
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(Charts.logAxis("Frequency (Hz)"));
        plot.setGap(8);
        ValueAxis magnitudeAxis = Charts.logAxis("|H| (m/N)");
        plot.add(subplot(magnitude, magnitudeFit, magnitudeAxis, true), 3);
        NumberAxis phaseAxis = new NumberAxis("Phase (deg)");
        phaseAxis.setRange(-185, 185);
        phaseAxis.setTickUnit(new org.jfree.chart.axis.NumberTickUnit(90));
        plot.add(subplot(phase, phaseFit, phaseAxis, false), 2);
        plot.add(subplot(lineFigure, null, lineAxis, false), 1);
        component = Charts.panel("Receptance: measured and fitted", plot, true);
    }

    private static XYPlot subplot(XYSeries measured, XYSeries fit, ValueAxis axis, boolean inLegend) {
        XYSeriesCollection data = new XYSeriesCollection(measured);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(false, true);
        renderer.setSeriesPaint(0, fit == null ? Palette.SECOND : Palette.MEASURED);
        renderer.setSeriesShape(0, new Ellipse2D.Double(-1.5, -1.5, 3, 3));
        if (fit != null) {
            data.addSeries(fit);
            renderer.setSeriesLinesVisible(1, true);
            renderer.setSeriesShapesVisible(1, false);
            renderer.setSeriesPaint(1, Palette.FIT);
            renderer.setSeriesStroke(1, new BasicStroke(1.5f));
        }
        XYPlot plot = new XYPlot(data, null, axis, renderer);
        Charts.style(plot);
        // Only the magnitude plot names the two series in the legend.
        renderer.setDefaultSeriesVisibleInLegend(inLegend);
        return plot;
    }

    JComponent component() {
        return component;
    }

    void show(QualificationResult result) {
        fill(magnitude, magnitudeFit, result.receptance(), result.synthesized());
        Frf h = result.receptance();
        lineFigure.clear();
        double[] figure;
        if (h.coherence().isPresent()) {
            figure = h.coherence().get();
            lineAxis.setLabel("Coherence");
            lineAxis.setRange(0, 1.05);
        } else if (h.quality().isPresent()) {
            figure = h.quality().get();
            lineAxis.setLabel("Sine-fit residual / RMS");
            lineAxis.setAutoRange(true);
        } else {
            figure = new double[0];
            lineAxis.setLabel("(no per-line figure)");
        }
        for (int i = 0; i < figure.length; i++) {
            lineFigure.add(h.frequencyHz(i), figure[i], false);
        }
        lineFigure.fireSeriesChanged();
    }

    private void fill(XYSeries measured, XYSeries fit, Frf h, Frf model) {
        measured.clear();
        fit.clear();
        phase.clear();
        phaseFit.clear();
        for (int i = 0; i < h.size(); i++) {
            if (h.magnitude(i) > 0) {
                measured.add(h.frequencyHz(i), h.magnitude(i), false);
                phase.add(h.frequencyHz(i), phaseDegrees(h, i), false);
            }
            if (model.magnitude(i) > 0) {
                fit.add(model.frequencyHz(i), model.magnitude(i), false);
                double deg = phaseDegrees(model, i);
                if (i > 0 && Math.abs(deg - phaseDegrees(model, i - 1)) > 180) {
                    // A wrap from +180 to -180: break the line rather than draw a vertical stroke across the plot.
                    phaseFit.add(0.5 * (model.frequencyHz(i - 1) + model.frequencyHz(i)), null, false);
                }
                phaseFit.add(model.frequencyHz(i), deg, false);
            }
        }
        measured.fireSeriesChanged();
        fit.fireSeriesChanged();
        phase.fireSeriesChanged();
        phaseFit.fireSeriesChanged();
    }

    /** Phase in -180 .. 180 degrees. */
    static double phaseDegrees(Frf h, int line) {
        return Math.toDegrees(Math.atan2(h.value(line).getImaginary(), h.value(line).getReal()));
    }
}
