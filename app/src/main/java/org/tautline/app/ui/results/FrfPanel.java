package org.tautline.app.ui.results;

import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import javax.swing.JComponent;

import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.ui.Palette;
import org.tautline.app.ui.chart.ChartView;
import org.tautline.app.ui.chart.FrfCursor;
import org.tautline.app.ui.chart.FrfLines;
import org.tautline.app.ui.chart.FrfReading;

/**
 * FRF magnitude and phase, measured with the fitted model over them, and the per-line coherence or quality beneath,
 * with a cursor readout that can snap to the fitted modes.
 */
final class FrfPanel {
    private final XYSeries magnitude = new XYSeries("measured", true, false);
    private final XYSeries magnitudeFit = new XYSeries("fitted model", true, false);
    private final XYSeries phase = new XYSeries("measured", true, false);
    private final XYSeries phaseFit = new XYSeries("fitted model", true, false);
    private final XYSeries lineFigure = new XYSeries("per line", true, false);
    private final NumberAxis lineAxis = new NumberAxis("Coherence");
    private final NumberAxis phaseAxis = new NumberAxis("Phase (°)");
    private final CombinedDomainXYPlot plot = new CombinedDomainXYPlot(Charts.logAxis("Frequency (Hz)"));
    private final ChartView view;
    private final FrfCursor cursor;
    private FrfLines lines = FrfLines.none();
    private List<FrfReading.ModeMark> modes = List.of();

    FrfPanel() {
        plot.setGap(8);
        ValueAxis magnitudeAxis = Charts.logAxis("|H| (m/N)");
        plot.add(subplot(magnitude, magnitudeFit, magnitudeAxis, true), 3);
        plot.add(subplot(phase, phaseFit, phaseAxis, false), 2);
        plot.add(subplot(lineFigure, null, lineAxis, false), 1);
        wholePhase();
        view = Charts.view(FrfQuantity.RECEPTANCE.label().substring(0, 1).toUpperCase(java.util.Locale.ROOT)
                + FrfQuantity.RECEPTANCE.label().substring(1) + ": measured and fitted", plot, true, this::wholeRange);
        view.emptyMessage("No result yet");
        cursor = new FrfCursor(view, () -> lines, () -> modes, true);
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
        plot.setDomainMinorGridlinesVisible(true);
        // Only the magnitude plot names the two series in the legend.
        renderer.setDefaultSeriesVisibleInLegend(inLegend);
        return plot;
    }

    private void wholePhase() {
        phaseAxis.setRange(-185, 185);
        phaseAxis.setTickUnit(new NumberTickUnit(90));
    }

    /** The measured band with a little room either side, |H| fitted to the data, the phase from -180° to 180°. */
    private void wholeRange() {
        view.chartPanel().restoreAutoBounds();
        double[] f = lines.frequencyHz();
        if (f.length > 1) {
            plot.getDomainAxis().setRange(f[0] / 1.03, f[f.length - 1] * 1.03);
        }
        wholePhase();
    }

    JComponent component() {
        return view.component();
    }

    /** @return the cursor, for reading the plot at a frequency */
    FrfCursor cursor() {
        return cursor;
    }

    /** Empties the plot, for a screen with no result. */
    void clear() {
        for (XYSeries s : List.of(magnitude, magnitudeFit, phase, phaseFit, lineFigure)) {
            s.clear();
        }
        lines = FrfLines.none();
        modes = List.of();
        cursor.clear();
    }

    void show(QualificationResult result) {
        fill(magnitude, magnitudeFit, result.receptance(), result.synthesized());
        Frf h = result.receptance();
        lineFigure.clear();
        double[] figure;
        String figureName;
        if (h.coherence().isPresent()) {
            figure = h.coherence().get();
            figureName = "coherence";
            lineAxis.setLabel("Coherence");
            lineAxis.setRange(0, 1.05);
        } else if (h.quality().isPresent()) {
            figure = h.quality().get();
            figureName = "sine-fit residual / RMS";
            lineAxis.setLabel("Fit residual");
            lineAxis.setAutoRange(true);
        } else {
            figure = new double[0];
            figureName = "";
            lineAxis.setLabel("(no per-line figure)");
        }
        for (int i = 0; i < figure.length; i++) {
            lineFigure.add(h.frequencyHz(i), figure[i], false);
        }
        lineFigure.fireSeriesChanged();
        lines = linesOf(h, figure.length == h.size() ? Optional.of(figure) : Optional.empty(), figureName);
        modes = marksOf(result);
        cursor.clear();
        view.showWholeRange();
    }

    static FrfLines linesOf(Frf h, Optional<double[]> figure, String figureName) {
        double[] mag = new double[h.size()];
        double[] deg = new double[h.size()];
        for (int i = 0; i < h.size(); i++) {
            mag[i] = h.magnitude(i);
            deg[i] = phaseDegrees(h, i);
        }
        return new FrfLines(h.frequenciesHz(), mag, deg, "m/N", figure, figureName);
    }

    static List<FrfReading.ModeMark> marksOf(QualificationResult result) {
        List<FrfReading.ModeMark> marks = new ArrayList<>();
        for (QualifiedMode m : result.modes()) {
            ModeRows.Row row = ModeRows.rowOf(m);
            String which = m.harmonic() > 0 ? "harmonic " + m.harmonic() + ", " + row.polarisation()
                    : "not in the harmonic series";
            marks.add(new FrfReading.ModeMark(m.mode().frequencyHz(), which + ": " + row.frequency() + " Hz, damping ratio "
                    + row.damping()));
        }
        return marks;
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
