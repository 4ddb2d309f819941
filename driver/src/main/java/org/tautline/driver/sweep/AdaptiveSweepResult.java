package org.tautline.driver.sweep;

import java.util.List;

/**
 * The outcome of an adaptive sweep: each pass run, and how the sweep ended.
 *
 * @param passes passes completed or stopped, in order (a stopped pass holds the steps done before the stop)
 * @param status COMPLETED, CANCELLED, LIMIT or FAULT; the output is off in every case
 * @param reason why it ended, in a sentence (as the journal records it)
 * @param rigTimeS rig time of the whole sweep, s
 */
public record AdaptiveSweepResult(List<AdaptivePass> passes, SweepStatus status, String reason, double rigTimeS) {

    /** Copies the list. */
    public AdaptiveSweepResult {
        passes = List.copyOf(passes);
    }
}
