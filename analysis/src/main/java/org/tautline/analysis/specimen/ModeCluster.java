package org.tautline.analysis.specimen;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.tautline.analysis.modal.FittedMode;

/** One peak or a split doublet of fitted modes, in order of frequency. */
final class ModeCluster {
    private final List<Integer> indices;
    private final List<FittedMode> members;

    private ModeCluster(List<Integer> indices, List<FittedMode> members) {
        this.indices = indices;
        this.members = members;
    }

    /**
     * Sorts the modes by frequency and pairs neighbours within the relative split (pairs only).
     *
     * @param modes fitted modes
     * @param splitTolerance largest (f2 - f1)/f1 of a doublet
     * @return clusters by increasing frequency
     */
    static List<ModeCluster> group(List<FittedMode> modes, double splitTolerance) {
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < modes.size(); i++) {
            order.add(i);
        }
        order.sort(Comparator.comparingDouble(i -> modes.get(i).mode().frequencyHz()));
        List<ModeCluster> out = new ArrayList<>();
        for (int k = 0; k < order.size(); k++) {
            int i = order.get(k);
            double fi = modes.get(i).mode().frequencyHz();
            if (k + 1 < order.size()) {
                int j = order.get(k + 1);
                double fj = modes.get(j).mode().frequencyHz();
                if ((fj - fi) / fi <= splitTolerance) {
                    out.add(new ModeCluster(List.of(i, j), List.of(modes.get(i), modes.get(j))));
                    k++;
                    continue;
                }
            }
            out.add(new ModeCluster(List.of(i), List.of(modes.get(i))));
        }
        return out;
    }

    int size() {
        return members.size();
    }

    int modeIndex(int member) {
        return indices.get(member);
    }

    double frequencyHz(int member) {
        return members.get(member).mode().frequencyHz();
    }

    /**
     * The frequency that stands for the cluster: its strongest member's (largest |modal constant|).
     *
     * <p>The two polarisations of a doublet see slightly different end stiffness (that is what splits them), so they
     * do not lie on one stiff-string line, and the drive excites the same one most at every harmonic (its direction
     * against the principal axes does not change). The strongest member therefore lies on one line from harmonic to
     * harmonic, also where the fit found only one member of a doublet; the mean of the members would not, and a
     * doublet found whole beside one found half could then look like a negative inharmonicity.
     *
     * @return the strongest member's frequency, Hz
     */
    double frequencyHz() {
        return strongest().mode().frequencyHz();
    }

    /** @return standard error used to weight the cluster: the strongest member's, at least 1e-7 of the frequency, Hz */
    double frequencyStdHz() {
        double s = strongest().frequencyStdHz();
        return Math.max(Double.isFinite(s) && s > 0 ? s : 0, 1e-7 * frequencyHz());
    }

    private FittedMode strongest() {
        return members.stream().max(Comparator.comparingDouble(m -> m.mode().modalConstant().norm())).orElseThrow();
    }
}
