package org.tautline.app.lot;

import java.time.Instant;
import java.util.List;

/**
 * One qualification in the lot register.
 *
 * @param lot the lot name
 * @param specimenId the specimen's identifier
 * @param recordedAt when it was appended (UTC)
 * @param outcome the overall verdict ({@code PASS}, {@code FAIL}, ...), or {@code NONE} without a specification
 * @param runDirectory where the run's files are, empty when unknown
 * @param figures its figures, in the order they were recorded
 * @param frfSha256 the SHA-256 of the run folder's {@code frf.csv}, 64 lower-case hex digits; empty when the entry did
 *        not come from a run folder. An entry that has one is added to a lot only once (see {@link LotRegister#append})
 */
public record LotEntry(String lot, String specimenId, Instant recordedAt, String outcome, String runDirectory,
                       List<LotFigure> figures, String frfSha256) {

    /** Copies the figures and checks the fingerprint's form. */
    public LotEntry {
        figures = List.copyOf(figures);
        frfSha256 = frfSha256 == null ? "" : frfSha256;
        if (!frfSha256.isEmpty() && !frfSha256.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("an FRF fingerprint is 64 lower-case hex digits (SHA-256), got '"
                    + frfSha256 + "'");
        }
    }

    /**
     * An entry that did not come from a run folder, without an FRF fingerprint.
     *
     * @param lot the lot name
     * @param specimenId the specimen's identifier
     * @param recordedAt when it was appended (UTC)
     * @param outcome the overall verdict, or {@code NONE}
     * @param runDirectory where the run's files are, empty when unknown
     * @param figures its figures
     */
    public LotEntry(String lot, String specimenId, Instant recordedAt, String outcome, String runDirectory,
                    List<LotFigure> figures) {
        this(lot, specimenId, recordedAt, outcome, runDirectory, figures, "");
    }
}
