package org.tautline.app.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalLong;

import com.fasterxml.jackson.databind.node.ObjectNode;

import org.tautline.app.lot.FigureStatistics;
import org.tautline.app.lot.LotEntries;
import org.tautline.app.lot.LotRegister;
import org.tautline.app.lot.LotStatistics;
import org.tautline.app.qualify.DemoScenario;
import org.tautline.app.report.QualificationReport;
import org.tautline.app.report.ReportInfo;
import org.tautline.app.report.RunDirectory;
import org.tautline.app.trace.Instrument;
import org.tautline.app.trace.RigDescription;
import org.tautline.app.trace.RunSetup;
import org.tautline.driver.sim.SensorSetup;
import org.tautline.driver.sim.ShakerModel;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sweep.SweepPlan;

/** The demo's records: the rig lines of its FRF file, its report, and its entry in the lot register. */
final class DemoRecords {
    private static final org.tautline.analysis.format.QuantityFormat NUMBERS =
            new org.tautline.analysis.format.QuantityFormat(org.tautline.analysis.format.TextStyle.ASCII);

    private DemoRecords() {
    }

    /**
     * @param seed the demo's seed, when one was given
     * @param tensionN the true tension it was given, when one was given
     * @return which simulated specimen the demo qualifies, for people
     */
    static String simulatedSpecimen(OptionalLong seed, OptionalDouble tensionN) {
        String which = seed.isPresent() ? "specimen " + seed.getAsLong() + " of the demo wire's invented lot (seed "
                + seed.getAsLong() + ")" : "the demo wire as built (no seed)";
        return which + (tensionN.isPresent() ? String.format(Locale.ROOT, ", given a true tension of %s N",
                fmt(tensionN.getAsDouble())) : "");
    }

    /**
     * Adds the seed to the simulated truth of the demo's JSON, {@code truth.specimen.seed}: the number, or null for the
     * demo wire as built.
     *
     * @param outcome the demo's JSON
     * @param seed the seed, when one was given
     * @return the same node
     */
    static ObjectNode withSeed(ObjectNode outcome, OptionalLong seed) {
        ObjectNode specimen = (ObjectNode) outcome.get("truth").get("specimen");
        if (seed.isPresent()) {
            specimen.put("seed", seed.getAsLong());
        } else {
            specimen.putNull("seed");
        }
        return outcome;
    }

    /**
     * @param sim the simulated rig the demo ran on
     * @return rig, sensors, calibration and plan of the demo as FRF file metadata
     */
    static Map<String, String> rigMetadata(SimulationConfig sim) {
        ShakerModel shaker = sim.shaker();
        SensorSetup sensors = sim.sensors();
        SweepPlan plan = DemoScenario.plan();
        Map<String, String> m = new LinkedHashMap<>();
        m.put("rig", "simulated rig (invented), sample rate " + fmt(sim.sampleRateHz()) + " Hz");
        m.put("exciter", String.format(Locale.ROOT, "electrodynamic model: moving mass %s kg, force constant %s N/A, coil %s ohm",
                fmt(shaker.movingMassKg()), fmt(shaker.forceConstantNPerA()), fmt(shaker.coilResistanceOhm())));
        m.put("force sensor", String.format(Locale.ROOT, "full scale %s N, noise %s N/sqrt(Hz), %d-bit ADC",
                fmt(sensors.forceFullScale()), fmt(sensors.forceNoiseDensity()), sensors.adcBits()));
        m.put("response sensor", String.format(Locale.ROOT, "%s, full scale %s, noise %s per sqrt(Hz)",
                sensors.responseSensor().name().toLowerCase(Locale.ROOT), fmt(sensors.responseFullScale()),
                fmt(sensors.responseNoiseDensity())));
        m.put("calibration", "simulated transducers read in SI units directly: sensitivity 1, no calibration certificate applies");
        m.put("sweep plan", plan.describe());
        return m;
    }

    /**
     * What the run folder records of the demo's setup: when it ran and on which rig. The simulated rig has no air and
     * its instruments no serials or certificates, so those are left out and the report says "not given".
     *
     * @param startedAt when the demo's sweep started
     * @param sim the simulated rig the demo ran on
     * @return the setup to record in {@code setup.json}
     */
    static RunSetup setup(Instant startedAt, SimulationConfig sim) {
        Map<String, String> m = rigMetadata(sim);
        Optional<String> simulation = Optional.of("simulation (invented)");
        List<Instrument> instruments = List.of(
                new Instrument("exciter: " + m.get("exciter"), simulation, Optional.empty(), Optional.empty(),
                        Optional.empty()),
                new Instrument("force sensor: " + m.get("force sensor"), simulation, Optional.empty(), Optional.empty(),
                        Optional.empty()),
                new Instrument("response sensor: " + m.get("response sensor"), simulation, Optional.empty(),
                        Optional.empty(), Optional.empty()));
        return new RunSetup(Optional.of(startedAt), OptionalDouble.empty(), OptionalDouble.empty(),
                Optional.of(new RigDescription(m.get("rig"), instruments)));
    }

    /** A number as the rest of the output writes it (trailing zeros dropped, powers of ten as 1e-6), in ASCII. */
    private static String fmt(double v) {
        return NUMBERS.number(v);
    }

    /** Appends the run to the lot when asked, then writes DIR/report.pdf (with the lot's charts when a lot is given). */
    static void write(Path dir, String lot, String register, String operator) throws IOException {
        RunDirectory run = RunDirectory.read(dir);
        List<FigureStatistics> statistics = List.of();
        if (lot != null) {
            String location = register != null ? register : LotCommand.besideRuns(dir);
            try (LotRegister r = LotRegister.openForAppending(location)) {
                r.append(LotEntries.ofRunFolder(lot, run.result(), dir, run.frfSha256(), Instant.now()));
                statistics = LotStatistics.of(r.entries(lot));
                System.err.println("tautline: appended " + run.result().specimen().id() + " to lot " + lot + " in " + r.name());
            }
        }
        Path pdf = dir.resolve("report.pdf");
        QualificationReport.write(run, new ReportInfo(operator, ReportInfo.SOFTWARE, Instant.now()), lot == null ? "" : lot,
                statistics, pdf);
        System.err.println("tautline: wrote " + pdf);
    }
}
