package org.tautline.app.report;

import java.awt.Color;
import java.io.IOException;
import java.util.List;
import java.util.Locale;

import org.apache.pdfbox.pdmodel.PDPageContentStream;

/**
 * A line and point chart drawn as PDF vector paths: axes with ticks and labels, linear x, linear or
 * logarithmic y, series as lines or markers, horizontal reference lines and a legend.
 */
final class PdfChart {
    /**
     * One data series.
     *
     * @param yError half-length of each point's error bar (one standard uncertainty), empty for none
     */
    record Series(String name, double[] x, double[] y, Color colour, boolean markers, boolean dashed, double[] yError) {
        Series(String name, double[] x, double[] y, Color colour, boolean markers, boolean dashed) {
            this(name, x, y, colour, markers, dashed, new double[0]);
        }

        double low(int i) {
            return i < yError.length && Double.isFinite(yError[i]) ? y[i] - yError[i] : y[i];
        }

        double high(int i) {
            return i < yError.length && Double.isFinite(yError[i]) ? y[i] + yError[i] : y[i];
        }
    }

    private final String title;
    private final String xLabel;
    private final String yLabel;
    private final boolean logY;
    private final List<Series> series;

    PdfChart(String title, String xLabel, String yLabel, boolean logY, List<Series> series) {
        this.title = title;
        this.xLabel = xLabel;
        this.yLabel = yLabel;
        this.logY = logY;
        this.series = List.copyOf(series);
    }

    /** Draws the chart in a box of the given height below the writer's cursor, the full text width. */
    void draw(PageWriter w, float heightPt) throws IOException {
        float top = w.reserve(heightPt);
        PDPageContentStream s = w.stream();
        float left = PageWriter.MARGIN + 55;
        float right = PageWriter.MARGIN + PageWriter.WIDTH - 5;
        float bottom = top - heightPt + 38;
        float plotTop = top - 30;
        w.text(w.bold, 9, PageWriter.MARGIN, top - 10, title, Color.BLACK);
        double[] xr = range(true);
        double[] yr = range(false);
        s.setStrokingColor(Color.BLACK);
        s.setLineWidth(0.6f);
        s.addRect(left, bottom, right - left, plotTop - bottom);
        s.stroke();
        boolean integerX = series.stream().allMatch(ser -> java.util.Arrays.stream(ser.x()).allMatch(v -> v == Math.rint(v)));
        for (double t : ticks(xr[0], xr[1])) {
            if (integerX && t != Math.rint(t)) {
                continue;
            }
            float px = (float) (left + (t - xr[0]) / (xr[1] - xr[0]) * (right - left));
            s.moveTo(px, bottom);
            s.lineTo(px, bottom - 3);
            s.stroke();
            String label = format(t);
            w.text(w.regular, 7, px - w.width(w.regular, 7, label) / 2, bottom - 11, label, Color.BLACK);
        }
        for (double t : logY ? logTicks(yr[0], yr[1]) : ticks(yr[0], yr[1])) {
            float py = yPos(t, yr, bottom, plotTop);
            s.setStrokingColor(new Color(225, 225, 225));
            s.moveTo(left, py);
            s.lineTo(right, py);
            s.stroke();
            s.setStrokingColor(Color.BLACK);
            s.moveTo(left - 3, py);
            s.lineTo(left, py);
            s.stroke();
            String label = logY ? String.format(Locale.ROOT, "1e%d", Math.round(Math.log10(t))) : format(t);
            w.text(w.regular, 7, left - 5 - w.width(w.regular, 7, label), py - 2.5f, label, Color.BLACK);
        }
        w.text(w.regular, 8, (left + right) / 2 - w.width(w.regular, 8, xLabel) / 2, bottom - 22, xLabel, Color.BLACK);
        w.text(w.regular, 8, PageWriter.MARGIN, plotTop + 5, yLabel, Color.BLACK);
        float legendX = right;
        for (int k = series.size() - 1; k >= 0; k--) {
            Series ser = series.get(k);
            if (ser.name().isEmpty()) {
                continue;
            }
            legendX -= w.width(w.regular, 7, ser.name()) + 22;
            s.setStrokingColor(ser.colour());
            s.setNonStrokingColor(ser.colour());
            if (ser.markers()) {
                s.addRect(legendX + 4, plotTop + 5, 4, 4);
                s.fill();
            } else {
                s.moveTo(legendX, plotTop + 7);
                s.lineTo(legendX + 12, plotTop + 7);
                s.stroke();
            }
            w.text(w.regular, 7, legendX + 15, plotTop + 4.5f, ser.name(), Color.BLACK);
        }
        for (Series ser : series) {
            s.setStrokingColor(ser.colour());
            s.setNonStrokingColor(ser.colour());
            s.setLineWidth(ser.markers() ? 0.5f : 1.0f);
            s.setLineDashPattern(ser.dashed() ? new float[] {3, 2} : new float[0], 0);
            boolean open = false;
            for (int i = 0; i < ser.x().length; i++) {
                if (!usable(ser.y()[i]) || !Double.isFinite(ser.x()[i])) {
                    continue;
                }
                float px = (float) (left + (ser.x()[i] - xr[0]) / (xr[1] - xr[0]) * (right - left));
                float py = yPos(ser.y()[i], yr, bottom, plotTop);
                if (ser.markers()) {
                    s.addRect(px - 1.5f, py - 1.5f, 3, 3);
                    s.fill();
                    if (i < ser.yError().length && Double.isFinite(ser.yError()[i]) && ser.yError()[i] > 0
                            && usable(ser.low(i))) {
                        float lo = yPos(ser.low(i), yr, bottom, plotTop);
                        float hi = yPos(ser.high(i), yr, bottom, plotTop);
                        s.moveTo(px, lo);
                        s.lineTo(px, hi);
                        s.moveTo(px - 2.5f, lo);
                        s.lineTo(px + 2.5f, lo);
                        s.moveTo(px - 2.5f, hi);
                        s.lineTo(px + 2.5f, hi);
                        s.stroke();
                    }
                } else if (!open) {
                    s.moveTo(px, py);
                    open = true;
                } else {
                    s.lineTo(px, py);
                }
            }
            if (open) {
                s.stroke();
            }
            s.setLineDashPattern(new float[0], 0);
        }
        s.setStrokingColor(Color.BLACK);
        s.setNonStrokingColor(Color.BLACK);
        s.setLineWidth(0.6f);
    }

    private boolean usable(double v) {
        return Double.isFinite(v) && (!logY || v > 0);
    }

    private float yPos(double v, double[] yr, float bottom, float top) {
        double t = logY ? (Math.log10(v) - Math.log10(yr[0])) / (Math.log10(yr[1]) - Math.log10(yr[0]))
                : (v - yr[0]) / (yr[1] - yr[0]);
        return (float) (bottom + t * (top - bottom));
    }

    private double[] range(boolean xAxis) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Series ser : series) {
            for (int i = 0; i < ser.x().length; i++) {
                double[] values = xAxis ? new double[] {ser.x()[i]} : new double[] {ser.low(i), ser.high(i)};
                for (double v : values) {
                    if (xAxis ? Double.isFinite(v) : usable(v)) {
                        lo = Math.min(lo, v);
                        hi = Math.max(hi, v);
                    }
                }
            }
        }
        if (!(hi >= lo)) {
            return new double[] {0, 1};
        }
        if (!xAxis && logY) {
            return new double[] {Math.pow(10, Math.floor(Math.log10(lo))), Math.pow(10, Math.ceil(Math.log10(hi)))};
        }
        if (hi - lo <= 1e-9 * Math.max(Math.abs(hi), Math.abs(lo))) {
            hi = lo;
        }
        boolean counted = xAxis && series.stream().allMatch(ser -> java.util.Arrays.stream(ser.x())
                .allMatch(v -> v == Math.rint(v)));
        double pad = hi > lo ? (xAxis ? (counted ? 0.03 * (hi - lo) : 0) : 0.08 * (hi - lo))
                : Math.max(Math.abs(lo) * 0.05, 1e-12);
        return new double[] {lo - pad, hi + pad};
    }

    static double[] ticks(double lo, double hi) {
        double raw = (hi - lo) / 6;
        double magnitude = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = magnitude * (raw / magnitude < 2 ? 2 : raw / magnitude < 5 ? 5 : 10);
        double first = Math.ceil(lo / step) * step;
        int count = (int) Math.floor((hi - first) / step + 1e-9) + 1;
        double[] out = new double[Math.max(count, 0)];
        for (int i = 0; i < out.length; i++) {
            out[i] = first + i * step;
        }
        return out;
    }

    private static double[] logTicks(double lo, double hi) {
        int a = (int) Math.round(Math.log10(lo));
        int b = (int) Math.round(Math.log10(hi));
        double[] out = new double[b - a + 1];
        for (int i = 0; i < out.length; i++) {
            out[i] = Math.pow(10, a + i);
        }
        return out;
    }

    private static String format(double v) {
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        return a >= 1e5 || a < 1e-3 ? String.format(Locale.ROOT, "%.3g", v)
                : String.format(Locale.ROOT, "%.6g", v).replaceAll("\\.?0+$", "");
    }
}
