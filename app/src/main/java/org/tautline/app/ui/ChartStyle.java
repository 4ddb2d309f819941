package org.tautline.app.ui;

import java.awt.Color;

import javax.swing.UIManager;

import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.LegendTitle;

/** Colours a chart from the current look (light or dark), keeping the data colours of {@link Palette}. */
final class ChartStyle {
    private static final java.awt.BasicStroke GRID = new java.awt.BasicStroke(0.5f);
    private ChartStyle() {
    }

    /**
     * @param chart a chart
     * @return a panel showing it that restyles the chart whenever the look changes
     */
    static ChartPanel panel(JFreeChart chart) {
        // Buffered: the chart is drawn into an image in software and blitted, which keeps repaints short on
        // X servers without accelerated anti-aliasing.
        apply(chart);
        ChartPanel panel = new ChartPanel(chart, true) {
            private static final long serialVersionUID = 1L;

            @Override
            public void updateUI() {
                super.updateUI();
                if (getChart() != null) {
                    apply(getChart());
                }
            }
        };
        panel.setMouseWheelEnabled(true);
        return panel;
    }

    static void apply(JFreeChart chart) {
        Color background = colour("Panel.background", Color.WHITE);
        Color text = colour("Label.foreground", Color.BLACK);
        Color plotBackground = colour("TextField.background", Color.WHITE);
        Color grid = mix(plotBackground, text, 0.15);
        chart.setBackgroundPaint(background);
        if (chart.getTitle() != null) {
            chart.getTitle().setPaint(text);
        }
        LegendTitle legend = chart.getLegend();
        if (legend != null) {
            legend.setBackgroundPaint(background);
            legend.setItemPaint(text);
        }
        style(chart.getPlot(), plotBackground, grid, text);
    }

    private static void style(Plot plot, Color background, Color grid, Color text) {
        if (plot instanceof CombinedDomainXYPlot combined) {
            axis(combined.getDomainAxis(), text);
            for (XYPlot sub : combined.getSubplots()) {
                style(sub, background, grid, text);
            }
        } else if (plot instanceof XYPlot xy) {
            xy.setBackgroundPaint(background);
            xy.setDomainGridlinePaint(grid);
            xy.setRangeGridlinePaint(grid);
            // Solid thin gridlines: dashed strokes cost several times more to draw, on every redraw.
            xy.setDomainGridlineStroke(GRID);
            xy.setRangeGridlineStroke(GRID);
            if (xy.getDomainAxis() != null) {
                axis(xy.getDomainAxis(), text);
            }
            axis(xy.getRangeAxis(), text);
        }
    }

    private static void axis(Axis axis, Color text) {
        axis.setLabelPaint(text);
        axis.setTickLabelPaint(text);
        axis.setAxisLinePaint(text);
        axis.setTickMarkPaint(text);
    }

    private static Color colour(String key, Color fallback) {
        Color c = UIManager.getColor(key);
        return c == null ? fallback : c;
    }

    private static Color mix(Color a, Color b, double t) {
        return new Color((int) (a.getRed() * (1 - t) + b.getRed() * t), (int) (a.getGreen() * (1 - t) + b.getGreen() * t),
                (int) (a.getBlue() * (1 - t) + b.getBlue() * t));
    }
}
