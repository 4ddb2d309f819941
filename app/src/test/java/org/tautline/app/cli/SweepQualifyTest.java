package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.time.Clock;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Limit;
import org.tautline.analysis.verdict.Specification;
import org.tautline.app.qualify.DemoScenario;
import org.tautline.app.report.ResultSource;
import org.tautline.app.report.RunDirectory;
import org.tautline.driver.journal.JournaledSweep;
import org.tautline.driver.sim.SimulatedSpecimen;
import org.tautline.driver.sim.SimulationConfigs;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.RecordingRig;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepResult;

/**
 * {@code sweep} and {@code resume} given the specimen and the specification: the run folder holds what {@code demo
 * --out} writes (specimen.json, spec.json, result.json naming frf.csv by its SHA-256), {@code report} states that
 * recorded result, and a sweep that ended early is not fitted. Short sweeps across the demo wire's fundamental.
 */
class SweepQualifyTest {
    /** The level check's sentence when the drive limit is the sweep's own drive (the command line's default). */
    private static final String NO_ROOM = "the drive limit (1 V) leaves no room for a second drive level at least 1.5"
            + " times the sweep's 1 V, so the level check was not run; a drive limit of 1.5 V or more allows it";

    @TempDir
    Path dir;

    /** The demo's stated specimen and a specification of f1, tension and the shift of f1 between levels. */
    private Path[] statedFiles() throws Exception {
        Path specimen = dir.resolve("stated-specimen.json");
        Path spec = dir.resolve("stated-spec.json");
        ResultJson.MAPPER.writeValue(specimen.toFile(), ResultJson.specimenFile(DemoScenario.specimen()));
        ResultJson.MAPPER.writeValue(spec.toFile(), ResultJson.specificationFile(specification()));
        return new Path[] {specimen, spec};
    }

    private static Specification specification() {
        return new Specification("tie wire, fundamental only (invented)", List.of(
                Limit.between("fundamental frequency", "f1Hz", "Hz", 215.0, 245.0),
                Limit.between("tension", "tensionN", "N", 135.0, 165.0),
                Limit.between("shift of f1 between test levels", "linearityShift1", "", -1e-3, 1e-3)));
    }

    /** 40 steps across the demo wire's fundamental doublet (about 225.6 and 227.1 Hz). */
    private static List<String> sweep(String rig, Path plugins, Path run, String... extra) {
        List<String> args = new ArrayList<>(List.of("sweep", "--rig", rig, "--from", "215", "--to", "240", "--steps",
                "40", "--settle-cycles", "250", "--cycles", "50", "--ramp", "0.02", "--no-progress", "--plugins",
                plugins.toString(), "--out", run.toString()));
        args.addAll(List.of(extra));
        return args;
    }

    private static String sha256(Path file) throws Exception {
        // Reference: the JDK's own SHA-256 (FIPS 180-4), independent of the product's DataFile.
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
    }

    private static JsonNode read(Path file) throws Exception {
        return ResultJson.MAPPER.readTree(file.toFile());
    }

    @Test
    void aCompletedSweepIsJudgedWithItsLevelCheckAndReportStatesTheRecordedResult() throws Exception {
        Path[] stated = statedFiles();
        Path plugins = RecordingSimDriver.pluginJar(dir.resolve("plugins"));
        Path run = dir.resolve("run");
        CliRun r = CliRun.of(sweep(RecordingSimDriver.NAME, plugins, run, "--max-drive", "3", "--specimen",
                stated[0].toString(), "--spec", stated[1].toString()).toArray(String[]::new));

        assertEquals(0, r.exitCode(), r.out() + r.err());
        assertTrue(r.out().startsWith("sweep complete: 40 steps"), r.out());
        assertTrue(r.out().contains("\nVerdict: PASS\n"), r.out());
        assertTrue(r.err().contains("tautline: level check: sweeping the fundamental (225.6 Hz, +/- 2 %) again at 1 V"
                + " and 3 V\n"), r.err());
        for (String name : List.of("journal", "frf.csv", "setup.json", "specimen.json", "spec.json", "result.json")) {
            assertTrue(Files.isRegularFile(run.resolve(name)), name + " is in the run folder");
        }
        assertFalse(Files.exists(run.resolve("result.json.part")));
        assertEquals(ResultJson.specimenFile(DemoScenario.specimen()), read(run.resolve("specimen.json")));
        assertEquals(ResultJson.specificationFile(specification()), read(run.resolve("spec.json")));

        JsonNode result = read(run.resolve("result.json"));
        assertEquals(sha256(run.resolve("frf.csv")), result.get("frfSha256").asText(), "names the folder's frf.csv");
        assertEquals("PASS", result.get("verdict").get("outcome").asText());
        assertTrue(result.get("sweepCompleted").asBoolean());
        assertEquals(40, result.get("steps").asInt());
        assertFalse(result.has("whyNoLevelCheck"), "the level check ran");
        // Reference: Mersenne's law f1 = (1/2L) sqrt(T/mu) for the simulated wire (checks.md); its bending stiffness
        // raises f1 by about 6e-5 (Fletcher), and the level check's levels shift it by about 2e-5 (Kirchhoff-Carrier).
        SimulatedSpecimen wire = SimulationConfigs.demoWire().specimen();
        double mersenneHz = Math.sqrt(wire.tensionN() / wire.linearDensityKgPerM()) / (2 * wire.lengthM());
        JsonNode shift = result.get("linearity").get("shifts").get(0);
        assertEquals(mersenneHz, shift.get("firstFrequencyHz").asDouble(), 2e-4 * mersenneHz, "f1 at 1 V");
        assertEquals(mersenneHz, shift.get("secondFrequencyHz").asDouble(), 2e-4 * mersenneHz, "f1 at 3 V");

        RecordingRig rig = RecordingSimDriver.last();
        assertFalse(rig.exciter().isOutputEnabled(), "the output is off after the level check");
        assertEquals("off", rig.commands.get(rig.commands.size() - 1).kind(), "the last command switched the output off");
        assertEquals(3, rig.commands.stream().filter(c -> c.kind().equals("on")).count(),
                "the output went on for the sweep and for each of the level check's two passes: " + rig.commands);

        RunDirectory folder = RunDirectory.read(run);
        assertEquals(ResultSource.RECORDED, folder.resultSource(), "the recorded fit is taken, not a new one");
        assertEquals(result.get("linearity").get("shifts").get(0).get("relativeShift").asDouble(),
                folder.result().linearity().orElseThrow().shifts().get(0).relativeShift(), 0.0);
        CliRun report = CliRun.of("report", run.toString(), "--pdf", dir.resolve("report.pdf").toString());
        assertEquals(0, report.exitCode(), report.err());
    }

    @Test
    void withoutRoomForASecondLevelTheResultSaysWhyThereIsNoLevelCheck() throws Exception {
        Path[] stated = statedFiles();
        Path run = dir.resolve("run");
        CliRun r = CliRun.of(sweep("sim", dir, run, "--specimen", stated[0].toString(), "--spec", stated[1].toString(),
                "--json").toArray(String[]::new));

        assertEquals(ExitCodes.VERDICT_NOT_DETERMINABLE, r.exitCode(), r.err());
        assertFalse(r.err().contains("level check: sweeping"), "nothing is excited after the sweep: " + r.err());
        JsonNode summary = ResultJson.MAPPER.readTree(r.out());
        assertEquals(NO_ROOM, summary.get("result").get("whyNoLevelCheck").asText());
        JsonNode result = read(run.resolve("result.json"));
        assertEquals(NO_ROOM, result.get("whyNoLevelCheck").asText());
        assertFalse(result.has("linearity"));
        assertEquals(sha256(run.resolve("frf.csv")), result.get("frfSha256").asText());
        JsonNode shiftLimit = result.get("verdict").get("limits").get(2);
        assertEquals("NOT_DETERMINABLE", shiftLimit.get("outcome").asText());
        assertTrue(shiftLimit.get("reason").asText().endsWith(NO_ROOM), shiftLimit.toString());

        RunDirectory folder = RunDirectory.read(run);
        assertEquals(ResultSource.RECORDED, folder.resultSource());
        assertEquals(NO_ROOM, folder.result().assessment().request().whyNoLevelCheck(), "the report says why too");
        assertEquals(ExitCodes.VERDICT_NOT_DETERMINABLE,
                CliRun.of("report", run.toString(), "--pdf", dir.resolve("report.pdf").toString()).exitCode());
    }

    @Test
    void aSweepStoppedAtALimitIsNotFittedAndSaysHowToComplete() throws Exception {
        Path[] stated = statedFiles();
        Path plugins = RecordingSimDriver.pluginJar(dir.resolve("plugins"));
        Path run = dir.resolve("run");
        // The demo wire moves about 41 micrometres per volt at its fundamental: 30 micrometres trips there.
        CliRun r = CliRun.of(sweep(RecordingSimDriver.NAME, plugins, run, "--max-displacement", "3e-5", "--specimen",
                stated[0].toString(), "--spec", stated[1].toString()).toArray(String[]::new));

        assertEquals(ExitCodes.SWEEP_LIMIT, r.exitCode(), r.err());
        RecordingRig rig = RecordingSimDriver.last();
        rig.assertTrippedOnTheLastBlock("specimen displacement", new SafetyLimits(1.0, 2.0, Double.POSITIVE_INFINITY,
                3e-5));
        rig.assertRampedDownThenOff(0.02);
        assertFalse(rig.exciter().isOutputEnabled());
        int steps = Integer.parseInt(r.out().replaceFirst("(?s)^sweep stopped at a safety limit after (\\d+) steps.*",
                "$1"));
        assertTrue(r.out().contains("\nNo verdict: the run is incomplete (" + steps + " steps measured, the sweep stopped"
                + " at a safety limit), so its FRF was not fitted and no result.json was written; 'tautline resume " + run
                + "' completes it, then fits it and judges the specimen as recorded in specimen.json.\n"), r.out());
        assertFalse(Files.exists(run.resolve("result.json")));
        assertFalse(Files.exists(run.resolve("frf.csv")));
        assertTrue(Files.isRegularFile(run.resolve("specimen.json")), "what was stated is recorded for resume");
        assertTrue(Files.isRegularFile(run.resolve("spec.json")));
    }

    @Test
    void resumeFitsTheCompletedSweepWithTheSpecimenAndRefusesAnotherThanTheRecorded() throws Exception {
        Path[] stated = statedFiles();
        Path run = dir.resolve("cut");
        Files.createDirectories(run);
        // The sweep the command would run with --max-drive 3, stopped after 4 steps.
        SweepPlan plan = SweepPlan.uniform(215, 240, 40, 250, 0.02, 50, 1.0, 0.02, 3,
                new SafetyLimits(3.0, 2.0, Double.POSITIVE_INFINITY, 0.001));
        SweepControl control = new SweepControl();
        SweepResult partial = JournaledSweep.run(RigDrivers.load(List.of()), "sim", Map.of(), plan,
                run.resolve("journal"), false, e -> {
                    if (e.completed() && e.stepNumber() == 4) {
                        control.requestStop("stopped by the test");
                    }
                }, control, Clock.systemUTC());
        assertEquals(4, partial.steps().size());

        Specimen demo = DemoScenario.specimen();
        Specimen other = new Specimen("OTHER-1", demo.lengthM(), demo.linearDensityKgPerM(),
                demo.linearDensityStdKgPerM(), demo.bendingStiffnessNm2(), demo.bendingStiffnessStdNm2(), demo.ends(),
                demo.forcingPositionM(), demo.sensorPositionM(), demo.nominalTensionN(), demo.beltSpeedMPerS(),
                demo.sensorAngleRad(), demo.axialStiffnessN(), demo.material());
        ResultJson.MAPPER.writeValue(run.resolve("specimen.json").toFile(), ResultJson.specimenFile(other));
        CliRun refused = CliRun.of("resume", run.toString(), "--no-progress", "--plugins", dir.toString(), "--specimen",
                stated[0].toString());
        assertEquals(ExitCodes.ERROR, refused.exitCode());
        assertEquals("tautline: --specimen " + stated[0] + " states another specimen than the " + run.resolve(
                "specimen.json") + " recorded at the sweep; what was stated at the test is never replaced: leave out"
                + " --specimen, or run the specimen anew in another folder", refused.err().strip());
        Files.delete(run.resolve("specimen.json"));

        CliRun r = CliRun.of("resume", run.toString(), "--no-progress", "--plugins", dir.toString(), "--specimen",
                stated[0].toString(), "--spec", stated[1].toString());
        assertEquals(0, r.exitCode(), r.out() + r.err());
        assertTrue(r.out().startsWith("sweep complete: 40 steps"), r.out());
        assertTrue(r.out().contains("\nVerdict: PASS\n"), r.out());
        assertEquals(ResultJson.specimenFile(demo), read(run.resolve("specimen.json")), "recorded by resume");
        JsonNode result = read(run.resolve("result.json"));
        assertEquals(sha256(run.resolve("frf.csv")), result.get("frfSha256").asText());
        assertTrue(result.has("linearity"), "the level check ran on the rig the sweep was resumed on");
        assertEquals(ResultSource.RECORDED, RunDirectory.read(run).resultSource());
    }

    @Test
    void aPlanWithTwoLevelsGivesTheLevelCheckFromItsOwnPasses() throws Exception {
        Path[] stated = statedFiles();
        Path plan = dir.resolve("plan.json");
        Files.writeString(plan, """
                {"startHz": 215, "stopHz": 240, "refine": false, "coarseSteps": 40, "fixedDwellS": 1.2,
                 "integrationCycles": 50, "rampS": 0.02, "levelMode": "drive", "levels": [1.0, 3.0],
                 "limits": {"driveV": 3, "forceN": 2, "responseAmplitude": 9e-4, "displacementM": 9e-4}}
                """);
        Path run = dir.resolve("run");
        CliRun r = CliRun.of("sweep", "--rig", "sim", "--plan", plan.toString(), "--no-progress", "--plugins",
                dir.toString(), "--out", run.toString(), "--specimen", stated[0].toString(), "--spec",
                stated[1].toString());
        assertEquals(0, r.exitCode(), r.out() + r.err());
        assertFalse(r.err().contains("level check: sweeping"), "no sweep beyond the plan's: " + r.err());
        JsonNode shift = read(run.resolve("result.json")).get("linearity").get("shifts").get(0);
        // Reference: the Kirchhoff-Carrier backbone (checks.md) predicts the shift; the measured one agrees within
        // four standard errors and 30 %, as in the demo's test.
        assertEquals(shift.get("predictedRelativeShift").asDouble(), shift.get("relativeShift").asDouble(),
                4 * shift.get("relativeShiftStd").asDouble() + 0.3 * Math.abs(shift.get("predictedRelativeShift")
                        .asDouble()), shift.toString());
        assertTrue(Files.isRegularFile(run.resolve("frf-pass2.csv")), "the second level's FRF is kept too");
    }

    @Test
    void aCompletedSweepWhoseFrfCannotBeFittedIsNotDeterminable() throws Exception {
        Path[] stated = statedFiles();
        Path run = dir.resolve("run");
        List<String> args = sweep("sim", dir, run, "--specimen", stated[0].toString());
        args.set(args.indexOf("40"), "6"); // six lines: fewer than a modal fit needs
        CliRun r = CliRun.of(args.toArray(String[]::new));
        assertEquals(ExitCodes.VERDICT_NOT_DETERMINABLE, r.exitCode(), r.err());
        assertTrue(r.out().contains("\nNo verdict: the sweep is complete, but its FRF could not be fitted ("), r.out());
        assertTrue(r.out().endsWith("); frf.csv and the journal are kept.\n"), r.out());
        assertTrue(Files.isRegularFile(run.resolve("frf.csv")));
        assertFalse(Files.exists(run.resolve("result.json")), "no result is recorded");
    }

    @Test
    void withoutASpecimenTheSweepSaysTheFrfIsFittedLaterAndASpecAloneIsRefused() throws Exception {
        Path run = dir.resolve("run");
        CliRun r = CliRun.of(sweep("sim", dir, run).toArray(String[]::new));
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().endsWith("\nNo --specimen was given, so the FRF was not fitted here; 'tautline fit --frf "
                + run.resolve("frf.csv") + " --specimen S.json' or 'tautline report " + run + "' (with specimen.json in"
                + " the folder) will fit it later, without a level check.\n"), r.out());
        assertFalse(Files.exists(run.resolve("result.json")));

        Path other = dir.resolve("other");
        CliRun spec = CliRun.of(sweep("sim", dir, other, "--spec", statedFiles()[1].toString()).toArray(String[]::new));
        assertEquals(ExitCodes.ERROR, spec.exitCode());
        assertEquals("tautline: --spec needs --specimen: the limits judge the specimen's properties", spec.err().strip());
        assertFalse(Files.exists(other), "nothing was created, nothing excited");
    }
}
