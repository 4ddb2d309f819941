package org.tautline.driver.journal;

import java.time.Instant;
import java.util.Optional;

import org.tautline.driver.sweep.SweepStatus;

/**
 * One session of a journal: the start or a resume, the steps it completed and how it ended.
 *
 * @param startedAt when the session started
 * @param identity the rig's identity in this session
 * @param firstStep index of the first step this session ran
 * @param stepCount steps this session completed
 * @param status how it ended; empty when the journal stops before an END record (power loss, kill)
 * @param reason the END record's reason; empty when there is none
 */
public record JournalSession(Instant startedAt, String identity, int firstStep, int stepCount,
                             Optional<SweepStatus> status, String reason) {
}
