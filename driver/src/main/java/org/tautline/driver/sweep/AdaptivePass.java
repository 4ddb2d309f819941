package org.tautline.driver.sweep;

import java.util.List;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.FittedMode;

/**
 * One level and direction of an adaptive sweep: its steps, the resonances it refined and what it warned of.
 *
 * @param level the level, N (force control) or V (drive)
 * @param direction UP or DOWN
 * @param points the steps in the order run
 * @param responseQuantity what channel 1 measured
 * @param rigTimeS rig time of the pass, ramps included, s
 * @param settleRigTimeS rig time spent settling, s (the rest is integration and ramps)
 * @param modes the local fit of each resonance refined, with standard errors
 * @param targetsMet true when every resonance met both accuracy targets
 * @param warnings plain sentences: levels not reached, settles that timed out, targets not met
 */
public record AdaptivePass(double level, SweepDirection direction, List<SweepPoint> points, String responseQuantity,
                           double rigTimeS, double settleRigTimeS, List<FittedMode> modes, boolean targetsMet,
                           List<String> warnings) {

    /** Copies the lists. */
    public AdaptivePass {
        points = List.copyOf(points);
        modes = List.copyOf(modes);
        warnings = List.copyOf(warnings);
    }

    /** @return the FRF of the pass's steps, increasing frequency */
    public Frf toFrf() {
        return SweepRecord.frfOf(points, responseQuantity);
    }
}
