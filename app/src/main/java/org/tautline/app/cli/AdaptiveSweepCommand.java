package org.tautline.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.analysis.frf.FrfCsvWriter;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.app.SafetyNotice;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.RigDriver;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.spi.RigOptionValues;
import org.tautline.driver.sweep.AdaptivePass;
import org.tautline.driver.sweep.AdaptiveSweepPlan;
import org.tautline.driver.sweep.AdaptiveSweepResult;
import org.tautline.driver.sweep.AdaptiveSweepRunner;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepStatus;

/**
 * {@code tautline sweep --plan PLAN.json}: the adaptive engine on any rig, journaling every step.
 *
 * <p>Steps and the ending go to {@code RUNDIR/adaptive-journal.jsonl} ({@link AdaptiveJournalFile});
 * {@code tautline resume} does not continue an adaptive sweep.
 */
final class AdaptiveSweepCommand {
    private AdaptiveSweepCommand() {
    }

    static int run(RigDrivers drivers, String driverName, Map<String, String> options, AdaptiveSweepPlan plan,
                   Path runDir, boolean json, boolean noProgress, PrintWriter out, PrintWriter err) throws IOException {
        RigDriver driver = drivers.find(driverName);
        Map<String, String> complete = RigOptionValues.of(driver, options).asMap();
        Path journal = runDir.resolve(AdaptiveJournalFile.NAME);
        if (Files.exists(journal)) {
            throw new IllegalArgumentException(runDir + " already holds a journal; choose another --out");
        }
        Files.createDirectories(runDir);
        err.print(SafetyNotice.asText("sim".equals(driverName)));
        err.flush();
        AdaptiveSweepResult result;
        try (Rig rig = driver.open(complete); AdaptiveJournalFile writer = new AdaptiveJournalFile(journal)) {
            {
                result = SweepCommand.runInterruptibly(cancel -> new AdaptiveSweepRunner(rig).run(plan,
                        SweepEventListener.completedSteps(SweepCommand.progress(noProgress)), cancel, writer),
                        runDir, err);
            }
        }
        ObjectNode node = ResultJson.MAPPER.createObjectNode();
        node.put("status", result.status().name().toLowerCase(Locale.ROOT));
        node.put("reason", result.reason());
        node.put("rigTimeS", result.rigTimeS());
        node.put("journal", journal.toString());
        ArrayNode passes = node.putArray("passes");
        for (int i = 0; i < result.passes().size(); i++) {
            AdaptivePass pass = result.passes().get(i);
            Path frf = runDir.resolve(String.format(Locale.ROOT, "frf-%d-%s.csv", i + 1,
                    pass.direction().name().toLowerCase(Locale.ROOT)));
            if (!pass.points().isEmpty()) {
                Map<String, String> metadata = new LinkedHashMap<>();
                metadata.put("source", "Tautline adaptive stepped-sine sweep");
                metadata.put("level", Double.toString(pass.level()));
                metadata.put("direction", pass.direction().name().toLowerCase(Locale.ROOT));
                FrfCsvWriter.write(pass.toFrf(), metadata, frf);
            }
            passes.add(passJson(pass, pass.points().isEmpty() ? null : frf));
            for (String warning : pass.warnings()) {
                err.println("warning: " + warning);
            }
        }
        if (json) {
            out.println(ResultJson.MAPPER.writeValueAsString(node));
        } else {
            out.printf(Locale.ROOT, "adaptive sweep %s: %s; rig time %.1f s; journal %s%n",
                    result.status().name().toLowerCase(Locale.ROOT), result.reason(), result.rigTimeS(), journal);
            for (AdaptivePass pass : result.passes()) {
                out.printf(Locale.ROOT, "  level %.4g %s, %s: %d steps, %.1f s%n", pass.level(),
                        plan.levelMode() == org.tautline.driver.sweep.LevelMode.FORCE ? "N" : "V",
                        pass.direction().name().toLowerCase(Locale.ROOT), pass.points().size(), pass.rigTimeS());
                for (FittedMode m : pass.modes()) {
                    out.printf(Locale.ROOT, "    f %.4f +- %.4f Hz, zeta %.5f +- %.5f%n", m.mode().frequencyHz(),
                            m.frequencyStdHz(), m.mode().dampingRatio(), m.dampingRatioStd());
                }
            }
        }
        out.flush();
        err.flush();
        return result.status() == SweepStatus.COMPLETED ? 0 : 1;
    }

    private static ObjectNode passJson(AdaptivePass pass, Path frf) {
        ObjectNode node = ResultJson.MAPPER.createObjectNode();
        node.put("level", pass.level());
        node.put("direction", pass.direction().name().toLowerCase(Locale.ROOT));
        node.put("steps", pass.points().size());
        node.put("rigTimeS", pass.rigTimeS());
        node.put("targetsMet", pass.targetsMet());
        if (frf == null) {
            node.putNull("frf");
        } else {
            node.put("frf", frf.toString());
        }
        ArrayNode modes = node.putArray("modes");
        for (FittedMode m : pass.modes()) {
            ObjectNode mode = modes.addObject();
            mode.put("frequencyHz", m.mode().frequencyHz());
            mode.put("frequencyStdHz", m.frequencyStdHz());
            mode.put("dampingRatio", m.mode().dampingRatio());
            mode.put("dampingRatioStd", m.dampingRatioStd());
        }
        ArrayNode warnings = node.putArray("warnings");
        pass.warnings().forEach(warnings::add);
        return node;
    }
}
