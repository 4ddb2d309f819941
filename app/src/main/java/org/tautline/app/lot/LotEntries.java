package org.tautline.app.lot;

import java.nio.file.Path;
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
        return entry(lot, result, runDirectory, "", recordedAt);
    }

    /**
     * Builds the entry of a run folder: its absolute path and the fingerprint of its {@code frf.csv}, by which the
     * register adds it to a lot only once.
     *
     * @param lot the lot name, not blank
     * @param result the qualification of the folder's files
     * @param folder the run folder
     * @param frfSha256 the SHA-256 of the folder's {@code frf.csv} as analysed, 64 lower-case hex digits
     * @param recordedAt when
     * @return the entry
     */
    public static LotEntry ofRunFolder(String lot, QualificationResult result, Path folder, String frfSha256,
                                       Instant recordedAt) {
        if (frfSha256 == null || frfSha256.isEmpty()) {
            throw new IllegalArgumentException("a run folder's entry needs the fingerprint of its frf.csv, got none");
        }
        return entry(lot, result, folder.toAbsolutePath().normalize().toString(), frfSha256, recordedAt);
    }

    private static LotEntry entry(String lot, QualificationResult result, String runDirectory, String frfSha256,
                                  Instant recordedAt) {
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
        return new LotEntry(lot, result.specimen().id(), recordedAt, outcome, runDirectory, figures, frfSha256);
    }
}
