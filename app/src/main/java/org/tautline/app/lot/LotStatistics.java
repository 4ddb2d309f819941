package org.tautline.app.lot;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Per-figure statistics of a lot (see {@link FigureStatistics}); the limits are the latest entry's. */
public final class LotStatistics {
    private LotStatistics() {
    }

    /**
     * Computes the statistics of every figure in the entries.
     *
     * @param entries the lot's qualifications in register order
     * @return one statistics per figure key, in order of first appearance
     */
    public static List<FigureStatistics> of(List<LotEntry> entries) {
        Map<String, List<Double>> values = new LinkedHashMap<>();
        Map<String, LotFigure> latest = new LinkedHashMap<>();
        for (LotEntry e : entries) {
            for (LotFigure f : e.figures()) {
                values.computeIfAbsent(f.key(), k -> new ArrayList<>()).add(f.value());
                latest.put(f.key(), f);
            }
        }
        List<FigureStatistics> out = new ArrayList<>();
        values.forEach((key, v) -> {
            LotFigure f = latest.get(key);
            out.add(FigureStatistics.of(key, f.unit(), v, f.lowerLimit(), f.upperLimit()));
        });
        return List.copyOf(out);
    }
}
