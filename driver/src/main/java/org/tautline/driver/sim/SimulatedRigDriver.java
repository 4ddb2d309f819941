package org.tautline.driver.sim;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.OptionalLong;

import org.tautline.driver.RigException;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.RigDriver;
import org.tautline.driver.spi.RigOption;
import org.tautline.driver.spi.RigOptionValues;

/**
 * The {@code sim} rig driver: opens a {@link SimulatedRig} on a ready-made scenario.
 *
 * <p>Options: {@code scenario} ({@code demo-wire}, the default; {@code demo-wire-midspan}, driven at
 * midspan; {@code demo-wire-clean}, the demo wire with no noise, hum, distortion or nonlinearity, see
 * {@link SimulationConfig#idealised()}); {@code seed} ({@value #NONE}, the default: the demo wire as built,
 * {@link SimulationConfigs#demoWire()}, with noise seed 1; a whole number 0 or more: one specimen of the demo wire's
 * invented lot, {@link SimulationConfigs#demoWire(long)}, with that noise seed) and {@code tensionN} ({@value #NONE},
 * the default: the specimen's own tension; or the true tension in N, within
 * {@value SimulationConfigs#DEMO_MIN_TENSION_N}..{@value SimulationConfigs#DEMO_MAX_TENSION_N}).
 */
public final class SimulatedRigDriver implements RigDriver {
    /** The scenarios {@code scenario} accepts. */
    public static final List<String> SCENARIOS = List.of("demo-wire", "demo-wire-midspan", "demo-wire-clean");
    /** The value of {@code seed} and {@code tensionN} that asks for the demo wire's own. */
    public static final String NONE = "none";

    @Override
    public String name() {
        return "sim";
    }

    @Override
    public String description() {
        return "the simulated rig: a time-domain model of a tensioned wire, shaker and sensors (no hardware)";
    }

    @Override
    public List<RigOption> options() {
        return List.of(
                RigOption.withDefault("scenario", "the simulated specimen and rig: " + String.join(", ", SCENARIOS),
                        "demo-wire", ""),
                RigOption.withDefault("seed", "none for the demo wire as built (sensor noise seed 1), or a whole number"
                        + " 0 or more that draws one specimen of the wire's invented lot, with its own tension, mass per"
                        + " length, bending stiffness and damping, and seeds the sensor noise; the same seed gives the"
                        + " same specimen and samples", NONE, ""),
                RigOption.withDefault("tensionN", "none for the specimen's own true tension (146.5 N as built), or"
                        + " the true tension to give it, " + number(SimulationConfigs.DEMO_MIN_TENSION_N) + " to "
                        + number(SimulationConfigs.DEMO_MAX_TENSION_N) + " N", NONE, "N"));
    }

    @Override
    public Rig open(Map<String, String> options) {
        RigOptionValues values = RigOptionValues.of(this, options);
        String scenario = values.choice("scenario", SCENARIOS);
        OptionalLong seed = isNone(values.text("seed")) ? OptionalLong.empty()
                : OptionalLong.of(values.wholeNumber("seed", 0, Integer.MAX_VALUE));
        SimulationConfig wire = SimulationConfigs.demoWire(seed, tension(values.text("tensionN")));
        SimulationConfig config = switch (scenario) {
            case "demo-wire-midspan" -> SimulationConfigs.drivenAtMidspan(wire);
            case "demo-wire-clean" -> wire.idealised();
            default -> wire;
        };
        return new SimulatedRig(config);
    }

    private static boolean isNone(String value) {
        return value.strip().equals(NONE);
    }

    private OptionalDouble tension(String value) {
        if (isNone(value)) {
            return OptionalDouble.empty();
        }
        String prefix = "rig driver '" + name() + "': option 'tensionN'";
        double tensionN;
        try {
            tensionN = Double.parseDouble(value.strip());
        } catch (NumberFormatException e) {
            throw new RigException(prefix + " must be none or a tension in N, got '" + value + "'");
        }
        if (!(tensionN >= SimulationConfigs.DEMO_MIN_TENSION_N && tensionN <= SimulationConfigs.DEMO_MAX_TENSION_N)) {
            throw new RigException(prefix + " must lie between " + number(SimulationConfigs.DEMO_MIN_TENSION_N)
                    + " and " + number(SimulationConfigs.DEMO_MAX_TENSION_N) + " N, got '" + value + "'");
        }
        return OptionalDouble.of(tensionN);
    }

    private static String number(double value) {
        return value == Math.rint(value) ? Long.toString((long) value) : Double.toString(value);
    }
}
