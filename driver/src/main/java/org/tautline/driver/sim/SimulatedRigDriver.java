package org.tautline.driver.sim;

import java.util.List;
import java.util.Map;

import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.RigDriver;
import org.tautline.driver.spi.RigOption;
import org.tautline.driver.spi.RigOptionValues;

/**
 * The {@code sim} rig driver: opens a {@link SimulatedRig} on a ready-made scenario.
 *
 * <p>Options: {@code scenario} ({@code demo-wire}, the default; {@code demo-wire-midspan}, driven at
 * midspan; {@code demo-wire-clean}, the demo wire with no noise, hum, distortion or nonlinearity, see
 * {@link SimulationConfig#idealised()}) and {@code seed} (the noise generators' seed, default 1).
 */
public final class SimulatedRigDriver implements RigDriver {
    /** The scenarios {@code scenario} accepts. */
    public static final List<String> SCENARIOS = List.of("demo-wire", "demo-wire-midspan", "demo-wire-clean");

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
                RigOption.withDefault("seed", "seed of the simulated sensor noise; the same seed gives the same samples",
                        "1", ""));
    }

    @Override
    public Rig open(Map<String, String> options) {
        RigOptionValues values = RigOptionValues.of(this, options);
        String scenario = values.choice("scenario", SCENARIOS);
        long seed = values.wholeNumber("seed");
        SimulationConfig config = switch (scenario) {
            case "demo-wire-midspan" -> SimulationConfigs.demoWireDrivenAtMidspan();
            case "demo-wire-clean" -> SimulationConfigs.demoWire().idealised();
            default -> SimulationConfigs.demoWire();
        };
        return new SimulatedRig(config.withRandomSeed(seed));
    }
}
