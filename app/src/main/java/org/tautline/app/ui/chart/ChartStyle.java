package org.tautline.app.ui.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;

import javax.swing.UIManager;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.title.Title;

/**
 * Colours and fonts a chart from the current look (light or dark), keeping the data colours of
 * {@link org.tautline.app.ui.Palette}. {@link ChartView} calls it again whenever the look changes.
 */
public final class ChartStyle {
    private static final BasicStroke GRID = new BasicStroke(0.5f);

    private ChartStyle() {
    }

    /** @return the text colour of the current look, for chart items that must stand out from the plot (chosen poles) */
    public static Color foreground() {
        return colour("Label.foreground", Color.BLACK);
    }

    /** @return the background of the plot area in the current look */
    public static Color plotBackground() {
        return colour("TextField.background", Color.WHITE);
    }

    /** @return the font of chart titles: the look's label font, bold and a little larger */
    public static Font titleFont() {
        Font base = UIManager.getFont("Label.font");
        return base == null ? JFreeChart.DEFAULT_TITLE_FONT : base.deriveFont(Font.BOLD, base.getSize2D() * 1.15f);
    }

    /**
     * Colours the chart's background, titles, legend, plot, grid and axes from the current look.
     *
     * @param chart a chart; call on the event thread
     */
    public static void apply(JFreeChart chart) {
        Color background = colour("Panel.background", Color.WHITE);
        Color text = foreground();
        Color plotBackground = plotBackground();
        Color grid = mix(plotBackground, text, 0.15);
        chart.setBackgroundPaint(background);
        if (chart.getTitle() != null) {
            chart.getTitle().setPaint(text);
            chart.getTitle().setFont(titleFont());
        }
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            Title t = chart.getSubtitle(i);
            if (t instanceof LegendTitle legend) {
                legend.setBackgroundPaint(background);
                legend.setItemPaint(text);
            } else if (t instanceof TextTitle title) {
                title.setPaint(text);
            }
        }
        chart.getPlot().setNoDataMessagePaint(text);
        style(chart.getPlot(), plotBackground, grid, text);
    }

    private static void style(Plot plot, Color background, Color grid, Color text) {
        if (plot instanceof CombinedDomainXYPlot combined) {
            axis(combined.getDomainAxis(), text);
            combined.setBackgroundPaint(null);
            for (XYPlot sub : combined.getSubplots()) {
                style(sub, background, grid, text);
            }
        } else if (plot instanceof XYPlot xy) {
            xy.setBackgroundPaint(background);
            xy.setDomainGridlinePaint(grid);
            xy.setRangeGridlinePaint(grid);
            xy.setDomainMinorGridlinePaint(mix(background, text, 0.07));
            xy.setRangeMinorGridlinePaint(mix(background, text, 0.07));
            // Solid thin gridlines: dashed strokes cost several times more to draw, on every redraw.
            xy.setDomainGridlineStroke(GRID);
            xy.setRangeGridlineStroke(GRID);
            xy.setDomainMinorGridlineStroke(GRID);
            xy.setRangeMinorGridlineStroke(GRID);
            xy.setOutlinePaint(grid);
            for (int i = 0; i < xy.getDomainAxisCount(); i++) {
                axis(xy.getDomainAxis(i), text);
            }
            for (int i = 0; i < xy.getRangeAxisCount(); i++) {
                axis(xy.getRangeAxis(i), text);
            }
        }
    }

    private static void axis(Axis axis, Color text) {
        if (axis == null) {
            return;
        }
        axis.setLabelPaint(text);
        axis.setTickLabelPaint(text);
        axis.setAxisLinePaint(text);
        axis.setTickMarkPaint(text);
    }

    private static Color colour(String key, Color fallback) {
        Color c = UIManager.getColor(key);
        return c == null ? fallback : c;
    }

    /**
     * @param a one colour
     * @param b another
     * @param t how much of {@code b}, 0 to 1
     * @return the mixture
     */
    static Color mix(Color a, Color b, double t) {
        return new Color((int) (a.getRed() * (1 - t) + b.getRed() * t), (int) (a.getGreen() * (1 - t) + b.getGreen() * t),
                (int) (a.getBlue() * (1 - t) + b.getBlue() * t));
    }
}
