package org.tautline.app.lot;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.tautline.analysis.verdict.Limit;
import org.tautline.analysis.verdict.Measurement;
import org.tautline.app.qualify.QualificationResult;

/** Turns a qualification into a lot register entry: every figure with the specification's limits on it. */
public final class LotEntries {
    private LotEntries() {
    }

    /**
     * Builds the entry.
     *
     * @param lot the lot name, not blank
     * @param result the qualification
     * @param runDirectory where its files are, empty when unknown
     * @param recordedAt when
     * @return the entry
     */
    public static LotEntry of(String lot, QualificationResult result, String runDirectory, Instant recordedAt) {
        if (lot == null || lot.isBlank()) {
            throw new IllegalArgumentException("a lot needs a name, got " + (lot == null ? "none" : "a blank name"));
        }
        List<LotFigure> figures = new ArrayList<>();
        for (Map.Entry<String, Measurement> e : result.measurements().entrySet()) {
            double lower = Double.NaN;
            double upper = Double.NaN;
            if (result.verdict().isPresent()) {
                for (var limit : result.verdict().get().results()) {
                    Limit l = limit.limit();
                    if (l.figureKey().equals(e.getKey())) {
                        lower = Double.isNaN(lower) ? l.lowerBound() : lower;
                        upper = Double.isNaN(upper) ? l.upperBound() : upper;
                    }
                }
            }
            Measurement m = e.getValue();
            figures.add(new LotFigure(e.getKey(), m.value(), m.standardUncertainty(), m.unit(), lower, upper));
        }
        String outcome = result.verdict().map(v -> v.outcome().name()).orElse("NONE");
        return new LotEntry(lot, result.specimen().id(), recordedAt, outcome, runDirectory, figures);
    }
}
