package org.tautline.driver.sweep;

import java.util.List;

import org.tautline.analysis.frf.Frf;

/**
 * The outcome of a sweep: every completed step, each pass, and how the sweep ended (the output is off).
 *
 * @param plan the plan that was run
 * @param responseQuantity what channel 1 measured: displacement, velocity or acceleration
 * @param steps every completed step in the order run, earlier sessions' first; enough to continue the sweep
 * @param passes the passes run or started, in order (a stopped pass holds the steps done before the stop)
 * @param status how the sweep ended
 * @param reason why, in a sentence (as the journal records it)
 * @param rigTimeS rig time of the whole sweep, all sessions, ramps included (less a resumed session's ramp-up), s
 */
public record SweepResult(SweepPlan plan, String responseQuantity, List<CompletedStep> steps, List<SweepPass> passes,
                          SweepStatus status, String reason, double rigTimeS) {

    /** Copies the lists. */
    public SweepResult {
        steps = List.copyOf(steps);
        passes = List.copyOf(passes);
    }

    /** @return true when every pass ran to its end */
    public boolean completed() {
        return status == SweepStatus.COMPLETED;
    }

    /** @return the points of the first pass, in the order run (the whole sweep for a one-pass plan) */
    public List<SweepPoint> points() {
        return passes.isEmpty() ? List.of() : passes.get(0).points();
    }

    /** @return the FRF of the first pass (the whole sweep for a one-pass plan) */
    public Frf toFrf() {
        return SweepPass.frfOf(points(), responseQuantity);
    }

    /** @return every warning of every pass, in order */
    public List<String> warnings() {
        return passes.stream().flatMap(p -> p.warnings().stream()).toList();
    }
}
