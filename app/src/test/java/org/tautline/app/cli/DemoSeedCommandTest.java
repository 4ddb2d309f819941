package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.driver.sim.SimulatedSpecimen;
import org.tautline.driver.sim.SimulationConfigs;

/** {@code tautline demo --seed N --tension-n T}: one specimen of the demo wire's lot, given a tension it must fail. */
class DemoSeedCommandTest {

    @Test
    void aDrawnSpecimenGivenTooHighATensionFailsAndItsRecordsShowTheDrawnTruth(@TempDir Path dir) throws Exception {
        Path run = dir.resolve("run");
        CliRun r = CliRun.of("demo", "--seed", "5", "--tension-n", "170", "--json", "--no-progress", "--out",
                run.toString());
        assertEquals(ExitCodes.VERDICT_FAIL, r.exitCode(), r.out() + r.err());

        JsonNode root = ResultJson.MAPPER.readTree(r.out());
        assertEquals("DEMO-TW-S0005", root.get("specimen").get("id").asText(), "the specimen's own id");
        assertEquals(150.0, root.get("specimen").get("tensionN").asDouble(), 0.0, "the stated tension stays nominal");
        JsonNode truth = root.get("truth").get("specimen");
        SimulatedSpecimen drawn = SimulationConfigs.demoWire(5).specimen();
        assertEquals(5, truth.get("seed").asLong());
        assertEquals(170.0, truth.get("tensionN").asDouble(), 0.0, "the tension given with --tension-n");
        assertEquals(drawn.linearDensityKgPerM(), truth.get("linearDensityKgPerM").asDouble(), 0.0, "drawn mu");
        assertEquals(drawn.bendingStiffnessNm2(), truth.get("bendingStiffnessNm2").asDouble(), 0.0, "drawn EI");
        assertEquals(drawn.damping().dampingRatioAt(root.get("truth").get("modes").get(0).get("frequencyHz").asDouble()),
                root.get("truth").get("modes").get(0).get("dampingRatio").asDouble(), 1e-15, "drawn damping");

        // Mersenne's law, T = 4 L^2 f0^2 mu: the series gives T/mu, read with the stated nominal mu.
        double expected = 170.0 * 2.0e-3 / drawn.linearDensityKgPerM();
        assertEquals(expected, root.get("properties").get("tensionN").asDouble(), 0.002 * expected);
        boolean tensionFails = false;
        for (JsonNode limit : root.get("verdict").get("limits")) {
            tensionFails |= "tensionN".equals(limit.get("figure").asText()) && "FAIL".equals(limit.get("outcome").asText());
        }
        assertTrue(tensionFails, "the tension limit (135 .. 165 N) fails: " + root.get("verdict"));
        JsonNode recorded = ResultJson.MAPPER.readTree(run.resolve("result.json").toFile());
        assertFalse(recorded.has("linearity"), "a failing specimen is not driven harder for the level check");
        assertTrue(recorded.path("whyNoLevelCheck").asText().startsWith("the specimen already fails its tension limit"),
                "the result says why there is no level check: " + recorded.path("whyNoLevelCheck"));

        assertEquals(root.get("truth"), ResultJson.MAPPER.readTree(run.resolve("truth.json").toFile()));
        assertEquals("DEMO-TW-S0005", ResultJson.MAPPER.readTree(run.resolve("specimen.json").toFile()).get("id").asText());
        List<String> csv = Files.readAllLines(run.resolve("frf.csv"));
        assertTrue(csv.contains("# simulated specimen: specimen 5 of the demo wire's invented lot (seed 5), given a true"
                + " tension of 170 N"), csv.subList(0, 12).toString());
    }

    @Test
    void badOptionsAreRefusedBeforeTheRigIsExcited() {
        CliRun negative = CliRun.of("demo", "--seed", "-1", "--no-progress");
        assertEquals(ExitCodes.ERROR, negative.exitCode());
        assertEquals("tautline: --seed must be a whole number from 0 to 2147483647, got -1", negative.err().strip());
        CliRun slack = CliRun.of("demo", "--tension-n", "115", "--no-progress");
        assertEquals(ExitCodes.ERROR, slack.exitCode());
        assertEquals("tautline: --tension-n must lie between 120 and 180 N (the simulated demo wire's range), got 115.0 N",
                slack.err().strip());
        CliRun lot = CliRun.of("demo", "--lot", "L1", "--no-progress");
        assertEquals(ExitCodes.ERROR, lot.exitCode());
        assertEquals("tautline: --lot needs --out DIR: the register keeps where the run's files are", lot.err().strip());
        assertEquals(2, CliRun.of("demo", "--seed", "seven").exitCode(), "a command line that cannot be parsed");
    }
}
