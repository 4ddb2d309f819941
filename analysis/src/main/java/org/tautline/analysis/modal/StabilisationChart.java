package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;
import java.util.function.IntFunction;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;

/**
 * The poles of a range of model orders, each classified against the poles of the order before it.
 *
 * <p>A stabilisation chart plots every pole at its frequency against the model order; physical
 * poles line up as vertical columns while mathematical poles scatter (B. Peeters et al., Shock and
 * Vibration 11:395, 2004, and the earlier modal-testing literature, from memory). Each pole is
 * compared with the pole of the previous order nearest to it in frequency: within 1 % in natural
 * frequency it is {@link StabilityClass#FREQUENCY}, within 5 % in damping ratio as well it is
 * {@link StabilityClass#DAMPING}, and with a {@link ResidueEstimator} also within 5 % in modal
 * constant it is {@link StabilityClass#STABLE} (thresholds: common practice, see
 * {@link StabilityClass}). Without a residue estimator DAMPING is the top class. An order whose poles
 * cannot be computed (singular normal equations, a root search that does not converge) is left out
 * of the chart and listed in {@link #skippedOrders()}; the next order is then compared with the last
 * order that has poles. Immutable.
 */
public final class StabilisationChart {
    /** Relative frequency agreement for {@link StabilityClass#FREQUENCY}: 1 %. */
    public static final double FREQUENCY_TOLERANCE = 0.01;
    /** Relative damping agreement for {@link StabilityClass#DAMPING}: 5 %. */
    public static final double DAMPING_TOLERANCE = 0.05;
    /** Relative modal-constant agreement for {@link StabilityClass#STABLE}: 5 %. */
    public static final double MODAL_CONSTANT_TOLERANCE = 0.05;

    /**
     * Estimates the residues of a set of poles from the same FRF, for the modal-constant criterion.
     *
     * <p>An implementation fits the FRF with the poles held fixed (for example least-squares
     * frequency-domain residue estimation) and returns one residue R_r per pole, in the
     * pole-residue form R/(jw - lambda) + conj(R)/(jw - conj(lambda)) of {@link Pole}; the chart
     * turns each into a modal constant with {@link Pole#modalConstantOf(Complex)}. It is called
     * once per order with all poles of that order, stable and unstable.
     */
    @FunctionalInterface
    public interface ResidueEstimator {
        /**
         * The residues of the poles.
         *
         * @param poles the poles of one model order
         * @return one residue per pole, in the same order
         */
        Complex[] residues(List<Pole> poles);
    }

    private final double bandLowHz;
    private final double bandHighHz;
    private final List<Integer> orders;
    private final List<StabilisationPoint> points;
    private final StabilityClass topClass;
    private final List<Integer> skippedOrders;

    private StabilisationChart(double bandLowHz, double bandHighHz, List<Integer> orders,
                               List<StabilisationPoint> points, StabilityClass topClass, List<Integer> skippedOrders) {
        this.bandLowHz = bandLowHz;
        this.bandHighHz = bandHighHz;
        this.orders = orders;
        this.points = points;
        this.topClass = topClass;
        this.skippedOrders = skippedOrders;
    }

    /**
     * Runs LSCF at orders minOrder, minOrder + step, ... up to maxOrder and classifies the poles.
     *
     * @param lscf the estimator, built for at least maxOrder
     * @param minOrder the lowest order, at least 1
     * @param maxOrder the highest order, at least minOrder and at most {@link Lscf#maxOrder()}
     * @param orderStep the order increment, at least 1 (2 is usual: one conjugate pair per step)
     * @param residuesOrNull residue estimator for the modal-constant criterion, or null to skip it
     * @return the chart
     */
    public static StabilisationChart build(Lscf lscf, int minOrder, int maxOrder, int orderStep,
                                           ResidueEstimator residuesOrNull) {
        if (lscf == null) {
            throw new AnalysisException("a stabilisation chart needs an LSCF estimator, got none");
        }
        if (minOrder < 1 || maxOrder < minOrder || orderStep < 1 || maxOrder > lscf.maxOrder()) {
            throw new AnalysisException("stabilisation orders must satisfy 1 <= minOrder <= maxOrder <= "
                    + lscf.maxOrder() + " (the estimator's maxOrder) with orderStep >= 1, got minOrder " + minOrder
                    + ", maxOrder " + maxOrder + ", orderStep " + orderStep);
        }
        return build(lscf.bandLowHz(), lscf.bandHighHz(), minOrder, maxOrder, orderStep, lscf::poles, residuesOrNull);
    }

    /**
     * Runs a pole estimator at orders minOrder, minOrder + step, ... up to maxOrder and classifies the poles; an
     * order whose poles cannot be computed is skipped.
     *
     * @param bandLowHz lower edge of the band, Hz
     * @param bandHighHz upper edge of the band, Hz
     * @param minOrder the lowest order
     * @param maxOrder the highest order
     * @param orderStep the order increment
     * @param polesOfOrder the poles of one order; throws {@link AnalysisException} when they cannot be computed
     * @param residuesOrNull residue estimator for the modal-constant criterion, or null to skip it
     * @return the chart
     * @throws AnalysisException when no order has poles that can be computed
     */
    static StabilisationChart build(double bandLowHz, double bandHighHz, int minOrder, int maxOrder, int orderStep,
                                    IntFunction<List<Pole>> polesOfOrder, ResidueEstimator residuesOrNull) {
        SortedMap<Integer, List<Pole>> poles = new TreeMap<>();
        List<Integer> skipped = new ArrayList<>();
        AnalysisException first = null;
        for (int order = minOrder; order <= maxOrder; order += orderStep) {
            try {
                poles.put(order, polesOfOrder.apply(order));
            } catch (AnalysisException e) {
                skipped.add(order);
                first = first == null ? e : first;
            }
        }
        if (poles.isEmpty()) {
            throw new AnalysisException("no model order from " + minOrder + " to " + maxOrder + " gave poles that could"
                    + " be computed; the first failure: " + first.getMessage(), first);
        }
        StabilisationChart chart = classify(bandLowHz, bandHighHz, poles, residuesOrNull);
        return new StabilisationChart(chart.bandLowHz, chart.bandHighHz, chart.orders, chart.points, chart.topClass,
                List.copyOf(skipped));
    }

    /**
     * Classifies poles already estimated at a set of orders (by LSCF or any other estimator).
     *
     * @param bandLowHz lower edge of the band the poles were estimated in, Hz
     * @param bandHighHz upper edge, Hz
     * @param polesByOrder the poles of each order, at least one order
     * @param residuesOrNull residue estimator for the modal-constant criterion, or null to skip it
     * @return the chart
     */
    public static StabilisationChart classify(double bandLowHz, double bandHighHz,
                                              SortedMap<Integer, List<Pole>> polesByOrder,
                                              ResidueEstimator residuesOrNull) {
        if (!(bandLowHz >= 0) || !(bandHighHz > bandLowHz) || Double.isInfinite(bandHighHz)) {
            throw new AnalysisException("stabilisation band must satisfy 0 <= bandLowHz < bandHighHz, both finite, got "
                    + bandLowHz + " .. " + bandHighHz + " Hz");
        }
        if (polesByOrder == null || polesByOrder.isEmpty()) {
            throw new AnalysisException("a stabilisation chart needs the poles of at least one order, got none");
        }
        List<StabilisationPoint> points = new ArrayList<>();
        List<Pole> previous = null;
        Complex[] previousConstants = null;
        for (Map.Entry<Integer, List<Pole>> entry : polesByOrder.entrySet()) {
            int order = entry.getKey();
            List<Pole> current = List.copyOf(entry.getValue());
            Complex[] constants = residuesOrNull == null ? null : modalConstants(residuesOrNull, current, order);
            for (int i = 0; i < current.size(); i++) {
                Pole pole = current.get(i);
                StabilityClass c = StabilityClass.NEW;
                int match = previous == null ? -1 : nearest(previous, pole);
                if (match >= 0) {
                    c = compare(pole, previous.get(match), constants == null ? null : constants[i],
                            previousConstants == null ? null : previousConstants[match]);
                }
                points.add(new StabilisationPoint(order, pole, c));
            }
            previous = current;
            previousConstants = constants;
        }
        return new StabilisationChart(bandLowHz, bandHighHz, List.copyOf(polesByOrder.keySet()),
                Collections.unmodifiableList(points),
                residuesOrNull == null ? StabilityClass.DAMPING : StabilityClass.STABLE, List.of());
    }

    private static Complex[] modalConstants(ResidueEstimator estimator, List<Pole> poles, int order) {
        Complex[] residues = estimator.residues(poles);
        if (residues == null || residues.length != poles.size()) {
            throw new AnalysisException("the residue estimator must return one residue for each of the " + poles.size()
                    + " poles of order " + order + ", got " + (residues == null ? "none" : residues.length));
        }
        Complex[] constants = new Complex[residues.length];
        for (int i = 0; i < residues.length; i++) {
            constants[i] = poles.get(i).modalConstantOf(residues[i]);
        }
        return constants;
    }

    private static int nearest(List<Pole> poles, Pole pole) {
        int best = -1;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (int j = 0; j < poles.size(); j++) {
            double distance = Math.abs(poles.get(j).frequencyHz() - pole.frequencyHz());
            if (distance < bestDistance) {
                bestDistance = distance;
                best = j;
            }
        }
        return best;
    }

    private static StabilityClass compare(Pole pole, Pole reference, Complex constant, Complex referenceConstant) {
        double fRef = reference.frequencyHz();
        if (!(Math.abs(pole.frequencyHz() - fRef) <= FREQUENCY_TOLERANCE * fRef)) {
            return StabilityClass.NEW;
        }
        double zetaRef = reference.dampingRatio();
        if (!(Math.abs(pole.dampingRatio() - zetaRef) <= DAMPING_TOLERANCE * Math.abs(zetaRef))) {
            return StabilityClass.FREQUENCY;
        }
        if (constant == null || referenceConstant == null
                || !(constant.subtract(referenceConstant).norm() <= MODAL_CONSTANT_TOLERANCE * referenceConstant.norm())) {
            return StabilityClass.DAMPING;
        }
        return StabilityClass.STABLE;
    }

    /** @return lower edge of the band, Hz */
    public double bandLowHz() {
        return bandLowHz;
    }

    /** @return upper edge of the band, Hz */
    public double bandHighHz() {
        return bandHighHz;
    }

    /** @return the model orders of the chart, increasing */
    public List<Integer> orders() {
        return orders;
    }

    /** @return every pole of every order, by order and then by frequency */
    public List<StabilisationPoint> points() {
        return points;
    }

    /**
     * The points of one order.
     *
     * @param order a model order of the chart
     * @return its points, possibly none
     */
    public List<StabilisationPoint> pointsAt(int order) {
        return points.stream().filter(p -> p.order() == order).toList();
    }

    /** @return the orders that were asked for but left out because their poles could not be computed, increasing */
    public List<Integer> skippedOrders() {
        return skippedOrders;
    }

    /** @return the strictest class this chart can give: STABLE with a residue estimator, else DAMPING */
    public StabilityClass topClass() {
        return topClass;
    }
}
