package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.tautline.analysis.AnalysisException;

/**
 * The physical modes chosen from a stabilisation chart, automatically and then, if wanted, by hand.
 *
 * <p>The automatic choice needs no threshold from the user. It follows the reading of a
 * stabilisation chart described with the LSCF method (B. Peeters et al., Shock and Vibration
 * 11:395, 2004, from memory: physical poles form columns of stable poles, mathematical poles
 * scatter or come out unstable), with rules of our own choosing:
 * <ol>
 * <li>keep the poles of the chart's top class ({@link StabilisationChart#topClass()});
 * <li>reject poles with damping ratio zeta &lt;= 0 (unstable) or above {@link #MAX_DAMPING_RATIO};
 * <li>reject poles whose half-power band f (1 -+ zeta) reaches within {@link #EDGE_GUARD} of the band
 *     width of either band edge, where the model is least constrained;
 * <li>group the rest into columns by frequency relative to their own half-power bandwidth (see
 *     {@code ModeSelectionClusters}), so close modes such as the two polarisations of a wire stay apart;
 * <li>keep a column when it has a pole in more than half of the chart's orders from its first
 *     appearance upwards, and in at least a quarter of all the chart's orders (and three at least);
 * <li>represent each column by its pole of median frequency.
 * </ol>
 * Immutable; {@link #withAdded(Pole)} and {@link #withDropped(int)} return new selections.
 */
public final class ModeSelection {
    /** The highest damping ratio accepted as a physical mode: 0.2, far above tensioned specimens (common practice). */
    public static final double MAX_DAMPING_RATIO = 0.2;
    /** Guard at each band edge as a fraction of the band width: 1 %. */
    public static final double EDGE_GUARD = 0.01;
    private static final int MIN_SUPPORT = 3;

    /**
     * One chosen pole and the evidence for it.
     *
     * @param pole the pole
     * @param supportingOrders the number of chart orders with a stable pole in its column (0 when added by hand or found
     *     in the residual of a fit, see {@code ModalResidualSearch})
     * @param possibleOrders the number of chart orders from the column's first appearance up (0 when added by hand)
     * @param addedByHand whether the user added it
     */
    public record Entry(Pole pole, int supportingOrders, int possibleOrders, boolean addedByHand) {
        /** Checks the values. */
        public Entry {
            if (pole == null || supportingOrders < 0 || possibleOrders < supportingOrders) {
                throw new AnalysisException("a mode-selection entry needs a pole and 0 <= supportingOrders <= possibleOrders, "
                        + "got " + pole + ", " + supportingOrders + ", " + possibleOrders);
            }
        }
    }

    private final List<Entry> entries;

    private ModeSelection(List<Entry> entries) {
        List<Entry> sorted = new ArrayList<>(entries);
        sorted.sort(Comparator.comparingDouble(e -> e.pole().frequencyHz()));
        this.entries = List.copyOf(sorted);
    }

    /**
     * Chooses the physical modes of a chart.
     *
     * @param chart the stabilisation chart
     * @return the chosen poles, in increasing frequency; possibly none
     */
    public static ModeSelection automatic(StabilisationChart chart) {
        if (chart == null) {
            throw new AnalysisException("mode selection needs a stabilisation chart, got none");
        }
        double low = chart.bandLowHz();
        double high = chart.bandHighHz();
        double guardHz = EDGE_GUARD * (high - low);
        List<StabilisationPoint> candidates = new ArrayList<>();
        for (StabilisationPoint p : chart.points()) {
            double f = p.frequencyHz();
            double zeta = p.dampingRatio();
            if (p.stabilityClass().atLeast(chart.topClass()) && zeta > 0 && zeta <= MAX_DAMPING_RATIO
                    && f * (1 - zeta) >= low + guardHz && f * (1 + zeta) <= high - guardHz) {
                candidates.add(p);
            }
        }
        List<Integer> orders = chart.orders();
        int required = Math.max(MIN_SUPPORT, (orders.size() + 3) / 4);
        List<Entry> chosen = new ArrayList<>();
        for (List<StabilisationPoint> column : ModeSelectionClusters.columns(candidates)) {
            int first = column.get(0).order();
            int possible = (int) orders.stream().filter(o -> o >= first).count();
            int support = column.size();
            if (support >= required && 2 * support > possible) {
                List<StabilisationPoint> byFrequency = new ArrayList<>(column);
                byFrequency.sort(Comparator.comparingDouble(StabilisationPoint::frequencyHz));
                Pole median = byFrequency.get((byFrequency.size() - 1) / 2).pole();
                chosen.add(new Entry(median, support, possible, false));
            }
        }
        return new ModeSelection(chosen);
    }

    /**
     * A selection of given poles, as if chosen by hand.
     *
     * @param poles the poles
     * @return the selection, in increasing frequency
     */
    public static ModeSelection of(List<Pole> poles) {
        if (poles == null) {
            throw new AnalysisException("a mode selection needs a list of poles, got none");
        }
        List<Entry> entries = new ArrayList<>();
        for (Pole p : poles) {
            entries.add(new Entry(p, 0, 0, true));
        }
        return new ModeSelection(entries);
    }

    /**
     * This selection with one more pole, added by hand.
     *
     * @param pole the pole to add
     * @return a new selection, in increasing frequency
     */
    public ModeSelection withAdded(Pole pole) {
        if (pole == null) {
            throw new AnalysisException("cannot add a missing pole to a mode selection");
        }
        List<Entry> next = new ArrayList<>(entries);
        next.add(new Entry(pole, 0, 0, true));
        return new ModeSelection(next);
    }

    /**
     * This selection with one more pole, found in the residual of a fit rather than on the chart.
     *
     * @param pole the pole to add
     * @return a new selection, in increasing frequency; the entry has no chart support and is not marked as by hand
     */
    ModeSelection withFoundInResidual(Pole pole) {
        List<Entry> next = new ArrayList<>(entries);
        next.add(new Entry(pole, 0, 0, false));
        return new ModeSelection(next);
    }

    /**
     * This selection without one pole.
     *
     * @param index the pole's index in {@link #poles()}, 0-based
     * @return a new selection
     */
    public ModeSelection withDropped(int index) {
        if (entries.isEmpty()) {
            throw new AnalysisException("cannot drop pole " + index + " from an empty mode selection");
        }
        if (index < 0 || index >= entries.size()) {
            throw new AnalysisException("cannot drop pole " + index + " from a mode selection of " + entries.size()
                    + " poles: the index must lie in 0 .. " + (entries.size() - 1));
        }
        List<Entry> next = new ArrayList<>(entries);
        next.remove(index);
        return new ModeSelection(next);
    }

    /** @return the chosen poles, in increasing frequency */
    public List<Pole> poles() {
        return entries.stream().map(Entry::pole).toList();
    }

    /** @return the chosen poles with their support, in increasing frequency */
    public List<Entry> entries() {
        return entries;
    }

    /** @return the number of chosen poles */
    public int size() {
        return entries.size();
    }
}
