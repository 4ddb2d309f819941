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

    /** @return the mean frequency of the members, Hz */
    double frequencyHz() {
        return members.stream().mapToDouble(m -> m.mode().frequencyHz()).average().orElseThrow();
    }

    /** @return standard error used to weight the cluster: that of the mean, at least 1e-7 of the frequency, Hz */
    double frequencyStdHz() {
        double sum = 0;
        for (FittedMode m : members) {
            double s = m.frequencyStdHz();
            sum += Double.isFinite(s) && s > 0 ? s * s : 0;
        }
        return Math.max(Math.sqrt(sum) / members.size(), 1e-7 * frequencyHz());
    }
}
