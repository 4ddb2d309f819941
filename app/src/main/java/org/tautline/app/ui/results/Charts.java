package org.tautline.app.ui.results;

import org.tautline.app.ui.Palette;
import java.awt.Color;
import java.awt.Font;

import javax.swing.UIManager;

import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogarithmicAxis;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.XYPlot;

/** Shared chart set-up: white plots, light grid, fonts from the look and feel. */
final class Charts {
    private Charts() {
    }

    static LogarithmicAxis logAxis(String label) {
        LogarithmicAxis axis = new LogarithmicAxis(label);
        axis.setStrictValuesFlag(false);
        axis.setAutoRangeIncludesZero(false);
        return axis;
    }

    static void style(XYPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(Palette.GRID);
        plot.setRangeGridlinePaint(Palette.GRID);
    }

    static ChartPanel panel(String title, Plot plot, boolean legend) {
        Font base = UIManager.getFont("Label.font");
        Font titleFont = base == null ? JFreeChart.DEFAULT_TITLE_FONT : base.deriveFont(Font.BOLD, base.getSize2D() * 1.15f);
        JFreeChart chart = new JFreeChart(title, titleFont, plot, legend);
        chart.setBackgroundPaint(Color.WHITE);
        ChartPanel panel = new ChartPanel(chart, false, true, false, true, true);
        panel.setMouseWheelEnabled(true);
        panel.setMinimumDrawWidth(100);
        panel.setMinimumDrawHeight(100);
        panel.setMaximumDrawWidth(4000);
        panel.setMaximumDrawHeight(3000);
        return panel;
    }
}
