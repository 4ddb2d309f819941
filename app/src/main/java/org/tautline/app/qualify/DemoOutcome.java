package org.tautline.app.qualify;

import org.tautline.driver.sim.SimulationTruth;

/**
 * A demo qualification together with the simulated truth it can be judged against.
 *
 * @param result what Tautline measured and decided
 * @param truth what the simulated rig really had
 */
public record DemoOutcome(QualificationResult result, SimulationTruth truth) {
}
