package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Groups the stable poles of a stabilisation chart into columns, one column per candidate mode.
 *
 * <p>Poles sorted by frequency start a new column wherever the gap to the previous pole exceeds
 * a radius of a quarter of the poles' own half-power bandwidth 2 zeta f, capped at 1 % of f (the
 * chart's frequency criterion). Two modes one half-power bandwidth apart therefore stay apart
 * while the order-to-order scatter of one mode, a small fraction of its bandwidth, is absorbed. A
 * column in which more than half of the orders contribute two or more poles holds two modes and
 * is split at its widest gap. Each column keeps one pole per order: the one nearest the column's
 * median frequency.
 */
final class ModeSelectionClusters {
    private static final double BANDWIDTH_FRACTION = 0.25;

    private ModeSelectionClusters() {
    }

    /**
     * The columns of a set of poles.
     *
     * @param points the candidate points, any order
     * @return columns, each with at most one point per order, in increasing frequency
     */
    static List<List<StabilisationPoint>> columns(List<StabilisationPoint> points) {
        List<StabilisationPoint> sorted = new ArrayList<>(points);
        sorted.sort(Comparator.comparingDouble(StabilisationPoint::frequencyHz));
        List<List<StabilisationPoint>> columns = new ArrayList<>();
        List<StabilisationPoint> current = new ArrayList<>();
        for (StabilisationPoint p : sorted) {
            if (!current.isEmpty() && gap(current.get(current.size() - 1), p) > radiusHz(current.get(current.size() - 1), p)) {
                splitAndAdd(current, columns);
                current = new ArrayList<>();
            }
            current.add(p);
        }
        if (!current.isEmpty()) {
            splitAndAdd(current, columns);
        }
        return columns;
    }

    private static double gap(StabilisationPoint a, StabilisationPoint b) {
        return Math.abs(b.frequencyHz() - a.frequencyHz());
    }

    private static double radiusHz(StabilisationPoint a, StabilisationPoint b) {
        double f = Math.min(a.frequencyHz(), b.frequencyHz());
        double zeta = Math.min(a.dampingRatio(), b.dampingRatio());
        return Math.min(StabilisationChart.FREQUENCY_TOLERANCE * f, BANDWIDTH_FRACTION * 2 * zeta * f);
    }

    /** Splits a frequency-sorted column that holds two modes, then keeps one point per order. */
    private static void splitAndAdd(List<StabilisationPoint> column, List<List<StabilisationPoint>> out) {
        if (column.size() >= 4 && holdsTwoModes(column)) {
            int cut = 1;
            for (int i = 2; i < column.size(); i++) {
                if (gap(column.get(i - 1), column.get(i)) > gap(column.get(cut - 1), column.get(cut))) {
                    cut = i;
                }
            }
            splitAndAdd(new ArrayList<>(column.subList(0, cut)), out);
            splitAndAdd(new ArrayList<>(column.subList(cut, column.size())), out);
            return;
        }
        out.add(onePerOrder(column));
    }

    private static boolean holdsTwoModes(List<StabilisationPoint> column) {
        Map<Integer, Integer> perOrder = new HashMap<>();
        for (StabilisationPoint p : column) {
            perOrder.merge(p.order(), 1, Integer::sum);
        }
        long doubled = perOrder.values().stream().filter(n -> n >= 2).count();
        return 2 * doubled > perOrder.size();
    }

    private static List<StabilisationPoint> onePerOrder(List<StabilisationPoint> column) {
        double median = column.get(column.size() / 2).frequencyHz();
        Map<Integer, StabilisationPoint> best = new HashMap<>();
        for (StabilisationPoint p : column) {
            StabilisationPoint kept = best.get(p.order());
            if (kept == null || Math.abs(p.frequencyHz() - median) < Math.abs(kept.frequencyHz() - median)) {
                best.put(p.order(), p);
            }
        }
        List<StabilisationPoint> out = new ArrayList<>(best.values());
        out.sort(Comparator.comparingInt(StabilisationPoint::order));
        return List.copyOf(out);
    }
}
