package org.tautline.driver.journal;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.tautline.driver.sim.SimulatedRigDriver;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.sweep.LevelMode;
import org.tautline.driver.sweep.Refinement;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SettleRule;
import org.tautline.driver.sweep.SweepDirection;
import org.tautline.driver.sweep.SweepPlan;

/** Shared set-up of the journal tests: the clean simulated demo wire and a short plan. */
final class JournalFixtures {
    /** The simulated rig's options as the sim driver records them: the demo wire as built, noise seed 1. */
    static final Map<String, String> SIM_OPTIONS = Map.of("scenario", "demo-wire-clean", "seed", "none");
    /**
     * 13 steps over 150..300 Hz around the demo wire's fundamental (about 226 Hz). 400 settle cycles are
     * at least 2.7 s, 13 time constants of the fundamental (zeta about 0.35 %): a step's leftover
     * transient is below e^-13 = 2e-6 of its start, so a resumed sweep (which starts at rest) settles
     * to what an uninterrupted one measures.
     */
    static final SweepPlan PLAN = SweepPlan.uniform(150, 300, 13, 400, 0.0, 20, 1.0, 0.02, 3, wideLimits());
    static final Clock CLOCK = Clock.fixed(Instant.parse("2025-03-01T09:30:00Z"), ZoneOffset.UTC);

    private JournalFixtures() {
    }

    /** Limits far above anything the journal tests' sweeps reach: these tests are about the journal, not the limits. */
    static SafetyLimits wideLimits() {
        return new SafetyLimits(5.0, 10.0, 0.01, 0.01);
    }

    /** An adaptive plan around the clean wire's fundamental doublet: 9 coarse steps, then refinement. */
    static SweepPlan adaptivePlan() {
        return new SweepPlan(200, 260, 9, SettleRule.detected(0.01), 32, LevelMode.DRIVE, List.of(1.0), wideLimits(),
                SweepDirection.UP, Optional.of(new Refinement(1e-4, 0.05, 120.0)), 0.002, 0.01, 1.0, 20.0, 0.05, 1);
    }

    static Rig cleanRig() {
        return new SimulatedRigDriver().open(SIM_OPTIONS);
    }

    static JournalHeader header(Rig rig, boolean samples) {
        return new JournalHeader(JournalHeader.FORMAT_VERSION, CLOCK.instant(), "sim",
                new java.util.TreeMap<>(SIM_OPTIONS), rig.identity(), rig.acquisition().sampleRateHz(),
                rig.acquisition().channels(), PLAN, samples ? JournaledSweep.SAMPLES_FILE : "");
    }


    static Path journal(Path dir) {
        return dir.resolve("journal");
    }
}
