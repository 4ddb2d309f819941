package org.tautline.app.qualify;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalLong;

import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Limit;
import org.tautline.analysis.verdict.Specification;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sim.SimulationConfigs;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SweepPlan;

/**
 * The built-in demo: an invented tie wire, its stated setup, its specification and its sweep plan.
 *
 * <p>Everything here is invented for the demo; it describes no real product and no data sheet.
 */
public final class DemoScenario {
    private DemoScenario() {
    }

    /**
     * The tension the demo wire really has in the simulation, N: a little below its nominal 150 N
     * ({@link SimulationConfigs#DEMO_TENSION_N}, the same wire the {@code sim} rig simulates by default).
     */
    public static final double TRUE_TENSION_N = SimulationConfigs.DEMO_TENSION_N;

    /** The stated specimen's id for the demo wire as built. */
    public static final String ID = "DEMO-TW-0042";

    /**
     * @return the simulated rig's configuration: the wire as it really is, slacker than stated; the {@code sim} rig's
     *     default ({@link SimulationConfigs#demoWire()})
     */
    public static SimulationConfig simulation() {
        return SimulationConfigs.demoWire();
    }

    /**
     * The demo wire as built or one specimen of its invented lot, at its own true tension or at a chosen one; the same
     * specimen the {@code sim} rig opens with the options {@code seed} and {@code tensionN}.
     *
     * @param seed empty for the wire as built (noise seed 1), or the seed of one specimen of its lot
     * @param tensionN empty for the specimen's own true tension, or the tension to give it, N
     * @return the simulated rig's configuration
     * @see SimulationConfigs#demoWire(OptionalLong, OptionalDouble)
     */
    public static SimulationConfig simulation(OptionalLong seed, OptionalDouble tensionN) {
        return SimulationConfigs.demoWire(seed, tensionN);
    }

    /** A line for people: what the demo specimen is. */
    public static final String DESCRIPTION = "polymer-jacketed steel tie wire (invented demo specimen)";

    /**
     * What the technician states about the specimen: nominal values from its (invented) data sheet.
     *
     * <p>mu 2.0e-3 kg/m +/- 1 %, EI 6.14e-4 N m^2 (0.5 mm steel core) +/- 10 %, EA 39 000 N, pinned
     * ends on a 0.60 m span, stinger at 0.07 m, sensor at 0.43 m along the drive, nominal 150 N.
     *
     * @return the stated specimen
     */
    public static Specimen specimen() {
        return specimen(ID);
    }

    /**
     * What the technician states about one specimen of the demo wire's lot: the same nominal values under the
     * specimen's own id.
     *
     * @param seed empty for the wire as built, or the seed of one specimen of its lot
     * @return the stated specimen: {@value #ID}, or {@code DEMO-TW-S} and the seed, for example {@code DEMO-TW-S0007}
     */
    public static Specimen specimen(OptionalLong seed) {
        return specimen(seed.isPresent() ? String.format(Locale.ROOT, "DEMO-TW-S%04d", seed.getAsLong()) : ID);
    }

    private static Specimen specimen(String id) {
        return new Specimen(id, 0.60, 2.0e-3, 0.02e-3, 6.14e-4, 0.614e-4, EndCondition.PINNED, 0.07, 0.43,
                150.0, 0.0, 0.0, 39000.0, Optional.empty());
    }

    /** @return the demo specification: the limits the wire must meet */
    public static Specification specification() {
        return new Specification("demo tie wire, invented", List.of(
                Limit.between("fundamental frequency", "f1Hz", "Hz", 215.0, 245.0),
                Limit.between("tension", "tensionN", "N", 135.0, 165.0),
                Limit.atMost("inharmonicity", "inharmonicityB", "", 1e-3),
                Limit.between("damping of the fundamental", "dampingRatio1", "", 0.001, 0.01),
                Limit.between("stinger position", "forcingPositionM", "m", 0.055, 0.085),
                Limit.between("shift of f1 between test levels", "linearityShift1", "", -1e-3, 1e-3),
                Limit.atMost("FRF standard error at resonances", "resonanceFrfRelativeStdError", "", 0.05)));
    }

    /**
     * The demo sweep: log-spaced steps through the first six modes.
     *
     * <p>Steps 0.2 % apart put about four lines in each half-power band at zeta ~ 0.4 %; 250 cycles
     * of settling let the slowest transient decay below -60 dB (6.9 time constants = 1.1/zeta
     * cycles), then 100 whole cycles are fitted, enough to hold the FRF's standard error near 2 %
     * at the resonances, where the force drops to a fraction of a millinewton per volt.
     *
     * <p>The safety limits leave room for the level check at three times the drive ({@link LevelCheck}):
     * the drive never above 5 V, the force below 2 N (the demo's largest is about 0.3 N, off resonance), the
     * response below 1.8 mm, 90 % of the displacement sensor's 2 mm full scale, and the wire's motion at the sensor
     * below 1.5 mm (the fundamental doublet moves it about 44 micrometres per volt; the largest motion of the sweep,
     * about 1.1 mm at 1 V, is near 259 Hz, where the shaker's moving mass on its stinger resonates with the wire; it
     * goes as the inverse of the wire's damping, which is why the lot's damping spread is small, see
     * {@link org.tautline.driver.sim.DemoWireLot}).
     *
     * @return the plan
     */
    public static SweepPlan plan() {
        return SweepPlan.uniform(180.0, 1500.0, 1061, 250, 0.02, 100, SimulationConfigs.DEMO_DRIVE_V, 0.2, 3,
                LIMITS);
    }

    /** The demo's safety limits: drive 5 V, force 2 N, response 1.8 mm, displacement 1.5 mm; see {@link #plan()}. */
    public static final SafetyLimits LIMITS = new SafetyLimits(5.0, 2.0, 1.8e-3, 1.5e-3);
}
