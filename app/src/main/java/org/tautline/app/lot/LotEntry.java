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
 */
public record LotEntry(String lot, String specimenId, Instant recordedAt, String outcome, String runDirectory,
                       List<LotFigure> figures) {

    /** Copies the figures. */
    public LotEntry {
        figures = List.copyOf(figures);
    }
}
