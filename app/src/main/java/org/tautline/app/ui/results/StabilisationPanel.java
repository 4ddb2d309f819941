package org.tautline.app.ui.results;

import org.tautline.app.ui.Palette;
import java.awt.BasicStroke;
import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import javax.swing.JComponent;

import org.jfree.chart.ChartMouseEvent;
import org.jfree.chart.ChartMouseListener;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.entity.XYItemEntity;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.Pole;
import org.tautline.analysis.modal.StabilisationChart;
import org.tautline.analysis.modal.StabilisationPoint;
import org.tautline.analysis.modal.StabilityClass;
import org.tautline.app.ui.chart.ChartStyle;
import org.tautline.app.ui.chart.ChartView;

/** Model order against frequency over the FRF magnitude; a click on a pole reports it to a listener. */
final class StabilisationPanel {
    private static final String[] NAMES = {"chosen", StabilityClass.STABLE.label(), StabilityClass.DAMPING.label(),
        StabilityClass.FREQUENCY.label(), StabilityClass.NEW.label() + " (no match in the order below)"};
    private final XYSeriesCollection poles = new XYSeriesCollection();
    private final List<List<Pole>> polesBySeries = new ArrayList<>();
    private final XYSeries magnitude = new XYSeries("|H| (right axis)", true, false);
    private final NumberAxis frequencyAxis = new NumberAxis("Frequency (Hz)");
    private final ChartView view;
    private double bandLowHz = Double.NaN;
    private double bandHighHz = Double.NaN;

    StabilisationPanel(Consumer<Pole> onPoleClicked) {
        XYLineAndShapeRenderer symbols = new XYLineAndShapeRenderer(false, true);
        for (int s = 0; s < NAMES.length; s++) {
            poles.addSeries(new XYSeries(NAMES[s], false, true));
            polesBySeries.add(new ArrayList<>());
        }
        symbols.setSeriesShape(0, PoleSymbols.ring());
        symbols.setSeriesShapesFilled(0, false);
        symbols.setSeriesOutlineStroke(0, new BasicStroke(2f));
        symbols.setSeriesStroke(0, new BasicStroke(2f));
        symbols.setSeriesShape(1, PoleSymbols.square());
        symbols.setSeriesPaint(1, Palette.AGREEING);
        symbols.setSeriesShapesFilled(1, true);
        symbols.setSeriesShape(2, PoleSymbols.square());
        symbols.setSeriesPaint(2, Palette.AGREEING);
        symbols.setSeriesShapesFilled(2, false);
        symbols.setSeriesShape(3, PoleSymbols.frequencyOnly());
        symbols.setSeriesPaint(3, Palette.FREQUENCY_ONLY);
        symbols.setSeriesShapesFilled(3, false);
        symbols.setSeriesShape(4, PoleSymbols.lone());
        symbols.setSeriesPaint(4, Palette.LONE);
        symbols.setSeriesShapesFilled(4, false);
        symbols.setUseOutlinePaint(false);
        symbols.setDrawOutlines(true);
        frequencyAxis.setAutoRangeIncludesZero(false);
        // Plain numbers: 1500, not 1,500.
        java.text.NumberFormat plain = java.text.NumberFormat.getNumberInstance(java.util.Locale.ROOT);
        plain.setGroupingUsed(false);
        frequencyAxis.setNumberFormatOverride(plain);
        NumberAxis orderAxis = new NumberAxis("Model order");
        XYPlot plot = new XYPlot(poles, frequencyAxis, orderAxis, symbols);
        XYLineAndShapeRenderer line = new XYLineAndShapeRenderer(true, false);
        line.setSeriesPaint(0, new Color(0x88, 0x88, 0x88));
        plot.setDataset(1, new XYSeriesCollection(magnitude));
        plot.setRangeAxis(1, Charts.logAxis("|H| (m/N)"));
        plot.mapDatasetToRangeAxis(1, 1);
        plot.setRenderer(1, line);
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
        view = Charts.view("Poles by model order (click a pole to add it, a ringed one to drop it)", plot, true,
                this::wholeRange);
        view.emptyMessage("No result yet");
        view.afterRestyle(() -> symbols.setSeriesPaint(0, ChartStyle.foreground()));
        ChartPanel component = view.chartPanel();
        component.setName("poleChart");
        component.addChartMouseListener(new ChartMouseListener() {
            @Override
            public void chartMouseClicked(ChartMouseEvent event) {
                if (event.getEntity() instanceof XYItemEntity item && item.getDataset() == poles) {
                    onPoleClicked.accept(polesBySeries.get(item.getSeriesIndex()).get(item.getItem()));
                }
            }

            @Override
            public void chartMouseMoved(ChartMouseEvent event) {
                // nothing to do on hover
            }
        });
    }

    JComponent component() {
        return view.component();
    }

    private void wholeRange() {
        view.chartPanel().restoreAutoBounds();
        if (Double.isFinite(bandLowHz) && bandHighHz > bandLowHz) {
            frequencyAxis.setRange(bandLowHz, bandHighHz);
        }
    }

    /** Empties the chart, for a screen with no result. */
    void clear() {
        for (int s = 0; s < NAMES.length; s++) {
            poles.getSeries(s).clear();
            polesBySeries.get(s).clear();
        }
        magnitude.clear();
    }

    void show(StabilisationChart chart, PoleChoice choice, Frf receptance) {
        for (int s = 0; s < NAMES.length; s++) {
            poles.getSeries(s).clear();
            polesBySeries.get(s).clear();
        }
        int topOrder = chart.orders().isEmpty() ? 1 : chart.orders().get(chart.orders().size() - 1);
        double low = chart.bandLowHz();
        double high = chart.bandHighHz();
        // The lowest order each pole stands at, in one pass over the points (a chart of 160 orders holds thousands).
        java.util.Map<Pole, Integer> firstOrder = new java.util.HashMap<>();
        for (StabilisationPoint p : chart.points()) {
            firstOrder.putIfAbsent(p.pole(), p.order());
            if (p.frequencyHz() >= low && p.frequencyHz() <= high) {
                add(seriesOf(p.stabilityClass()), p.frequencyHz(), p.order(), p.pole());
            }
        }
        for (Pole chosen : choice.poles()) {
            add(0, chosen.frequencyHz(), firstOrder.getOrDefault(chosen, topOrder), chosen);
        }
        for (int s = 0; s < NAMES.length; s++) {
            poles.getSeries(s).fireSeriesChanged();
        }
        magnitude.clear();
        for (int i = 0; i < receptance.size(); i++) {
            double f = receptance.frequencyHz(i);
            if (f >= low && f <= high && receptance.magnitude(i) > 0) {
                magnitude.add(f, receptance.magnitude(i), false);
            }
        }
        magnitude.fireSeriesChanged();
        bandLowHz = low;
        bandHighHz = high;
        frequencyAxis.setRange(low, high);
    }

    private void add(int series, double frequencyHz, int order, Pole pole) {
        poles.getSeries(series).add(frequencyHz, order, false);
        polesBySeries.get(series).add(pole);
    }

    private static int seriesOf(StabilityClass c) {
        return switch (c) {
            case STABLE -> 1;
            case DAMPING -> 2;
            case FREQUENCY -> 3;
            case NEW -> 4;
        };
    }
}
