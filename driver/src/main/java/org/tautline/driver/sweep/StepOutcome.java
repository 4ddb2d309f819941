package org.tautline.driver.sweep;

import java.util.Optional;

import org.tautline.driver.spi.SampleBlock;

/**
 * What one measured step gave.
 *
 * @param fit the fitted step
 * @param samples the integration samples fitted
 * @param settleState how settling ended
 * @param settleS rig time spent settling (and correcting the level), s
 * @param warning a level that could not be reached, if any
 */
record StepOutcome(StepFit fit, SampleBlock samples, SettleState settleState, double settleS, Optional<String> warning) {
}
