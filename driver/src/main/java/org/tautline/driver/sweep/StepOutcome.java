package org.tautline.driver.sweep;

import java.util.Optional;

/**
 * What one step of an adaptive sweep gave.
 *
 * @param step the fitted step
 * @param settleState how settling ended
 * @param settleS rig time spent settling (and correcting the level), s
 * @param warning a level that could not be reached, if any
 */
record StepOutcome(CompletedStep step, SettleState settleState, double settleS, Optional<String> warning) {
}
