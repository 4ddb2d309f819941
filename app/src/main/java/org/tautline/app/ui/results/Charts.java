package org.tautline.app.ui.results;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.Plot;
import org.tautline.app.ui.chart.ChartStyle;
import org.tautline.app.ui.chart.ChartView;
import org.tautline.app.ui.chart.LogScaleAxis;

/** Shared set-up of the results charts: our log axis, and a {@link ChartView} in the current look. */
final class Charts {
    private Charts() {
    }

    static LogScaleAxis logAxis(String label) {
        return new LogScaleAxis(label);
    }

    /**
     * @param title the chart title
     * @param plot the plot
     * @param legend true to show a legend
     * @param wholeRange what "Show whole range" does; null to fit every axis to the data
     * @return the chart on screen
     */
    static ChartView view(String title, Plot plot, boolean legend, Runnable wholeRange) {
        return new ChartView(new JFreeChart(title, ChartStyle.titleFont(), plot, legend), wholeRange);
    }
}
