package org.tautline.driver.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.driver.sim.SimulatedRig;
import org.tautline.driver.sim.SimulatedRigDriver;
import org.tautline.driver.sim.SimulationTruth;
import org.tautline.driver.sim.TrueMode;
import org.tautline.driver.spi.Rig;

/**
 * The adaptive engine with driver/SWEEP_PLAN.md's example plan on the simulated demo wire (the {@code sim}
 * driver's demo-wire scenario) finds and refines every mode in the band, for 20 specimens of the wire's lot (seeds 1 to
 * 20: each draws its own tension, mass, stiffness and damping, and its own sensor noise).
 *
 * <p>The wire has three harmonics between 150 and 800 Hz, each a doublet of two polarisations 0.7 % apart (about
 * one half-power bandwidth at zeta 0.35 %), the second 4.6 times weaker: six modes. The 35 coarse steps are 5 %
 * apart, so the coarse steps straddle the fundamental without a peak. The reference is the simulator's own modal
 * truth ({@link SimulationTruth}, its receptance by modal expansion), which is exact for the linear wire.
 */
class AdaptiveModeFindingTest {
    private static final double START_HZ = 150;
    private static final double STOP_HZ = 800;
    private static final double FREQUENCY_REL_STD = 2e-5;
    private static final double DAMPING_REL_STD = 0.02;
    /**
     * Frequency error allowed beyond four standard errors, relative. The demo wire hardens (Kirchhoff-Carrier): its
     * backbone w/w0 = 1 + (3/32)(EA/T0)(k a)^2 (derived in the shared checks sheet, an ODE check agreed to 1e-7)
     * with EA/T0 = 39 000 N / 146.5 N and k = pi/L gives 4.6e-5 at the 0.26 mm midspan amplitude the fundamental
     * reaches with the drive at its 5 V limit, while the truth is the small-amplitude frequency; the passes' errors
     * reach 3.0e-5 over the 20 specimens (and stayed within 2.2 standard errors with the nonlinearity switched off).
     * 1e-4 is still 70 times below the polarisation split, so a mode cannot be matched to its partner.
     */
    private static final double LEVEL_SHIFT_ALLOWANCE = 1e-4;
    /** Damping error allowed, relative: the fits' standard errors are 0.1-0.3 %, the errors reach 1 %. */
    private static final double DAMPING_TOLERANCE = 0.10;

    /**
     * SWEEP_PLAN.md's example with the documented defaults for every field it leaves out, at one of its two force
     * levels (0.001 and 0.002 N): each level is a pass of its own with a planner of its own.
     *
     * @param levelN the force level, N
     * @return the plan
     */
    static SweepPlan examplePlan(double levelN) {
        return new SweepPlan(START_HZ, STOP_HZ, 35, SettleRule.detected(0.01), 64, LevelMode.FORCE, List.of(levelN),
                new SafetyLimits(5, 2, 9e-4, 9e-4), SweepDirection.UP,
                Optional.of(new Refinement(FREQUENCY_REL_STD, DAMPING_REL_STD, 1800)), 0.002, 0.01, 0.5, 20, 0.2, 3);
    }

    /**
     * One pass per seed, the example's levels taking turns (odd seeds 0.001 N, even seeds 0.002 N), keeps the test near
     * 20 s on one core; both levels of the example on all 20 seeds (40 passes) give the same outcome.
     */
    @ParameterizedTest(name = "seed {0}")
    @ValueSource(ints = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18, 19, 20})
    void findsAndRefinesBothPolarisationsOfEveryHarmonicWithNothingSpurious(int seed) {
        SweepPass pass;
        List<TrueMode> truth = new ArrayList<>();
        try (Rig rig = new SimulatedRigDriver().open(Map.of("seed", Integer.toString(seed)))) {
            for (TrueMode t : ((SimulatedRig) rig).truth().modes()) {
                if (t.mode().frequencyHz() > START_HZ && t.mode().frequencyHz() < STOP_HZ) {
                    truth.add(t);
                }
            }
            SweepResult result = new SweepEngine(rig).run(examplePlan(seed % 2 == 1 ? 0.001 : 0.002),
                    SweepEventListener.NONE, SweepControl.none(), SweepJournal.NONE);
            assertEquals(SweepStatus.COMPLETED, result.status(), result.reason());
            pass = result.passes().get(0);
        }
        assertEquals(6, truth.size(), "the demo wire has harmonics 1-3, two polarisations each, in the band");

        String where = "seed " + seed + ", " + pass.level() + " N: ";
        List<FittedMode> left = new ArrayList<>(pass.modes());
        for (TrueMode t : truth) {
            double f = t.mode().frequencyHz();
            FittedMode match = nearest(left, f);
            String mode = where + "harmonic " + t.harmonic() + " polarisation " + t.polarisation() + " at " + f
                    + " Hz (simulator truth)";
            assertTrue(match != null, mode + " not found; modes " + pass.modes());
            double error = Math.abs(match.mode().frequencyHz() - f);
            assertTrue(error <= Math.max(4 * match.frequencyStdHz(), LEVEL_SHIFT_ALLOWANCE * f), mode + " found at "
                    + match.mode().frequencyHz() + " +- " + match.frequencyStdHz() + " Hz");
            assertEquals(t.mode().dampingRatio(), match.mode().dampingRatio(), DAMPING_TOLERANCE * t.mode().dampingRatio(),
                    mode + ": damping ratio");
            assertTrue(match.frequencyStdHz() / match.mode().frequencyHz() <= FREQUENCY_REL_STD
                    && match.dampingRatioStd() / match.mode().dampingRatio() <= DAMPING_REL_STD,
                    mode + " refined to the plan's targets: " + match);
            left.remove(match);
        }
        assertTrue(left.isEmpty(), where + "no mode beyond the true ones: " + left);
        assertTrue(pass.targetsMet(), where + "targets met: " + pass.warnings());
    }

    private static FittedMode nearest(List<FittedMode> modes, double frequencyHz) {
        FittedMode best = null;
        for (FittedMode m : modes) {
            if (best == null || Math.abs(m.mode().frequencyHz() - frequencyHz)
                    < Math.abs(best.mode().frequencyHz() - frequencyHz)) {
                best = m;
            }
        }
        return best;
    }
}
