package org.tautline.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.analysis.format.QuantityFormat;
import org.tautline.analysis.frf.FrfCsvWriter;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.driver.journal.JournalHeader;
import org.tautline.driver.journal.JournalReader;
import org.tautline.driver.sweep.LevelMode;
import org.tautline.driver.sweep.SweepPass;
import org.tautline.driver.sweep.SweepResult;
import org.tautline.driver.sweep.SweepStatus;

/** What {@code sweep} and {@code resume} write and print when a sweep ends, and the exit status they return. */
final class SweepReport {
    private SweepReport() {
    }

    /**
     * Writes the FRF of every pass of a complete sweep and, when it was qualified, its {@code result.json}; prints the
     * summary (JSON with {@code json}), the warnings and the result or why there is none, and says how to go on when
     * the sweep ended early.
     *
     * @param result the sweep
     * @param runDir the run folder
     * @param qualifying the qualification of the completed sweep, if the specimen was stated
     * @param json true for JSON on standard output
     * @param out standard output
     * @param err standard error
     * @return the exit status ({@link ExitCodes}): the verdict's when the sweep was qualified
     * @throws IOException when a file cannot be written
     */
    static int finish(SweepResult result, Path runDir, SweepQualifying qualifying, boolean json, PrintWriter out,
                      PrintWriter err) throws IOException {
        Path journal = runDir.resolve(SweepCommand.JOURNAL);
        JournalHeader header = JournalReader.read(journal).header();
        Map<Integer, Path> frfFiles = new LinkedHashMap<>();
        if (result.completed()) {
            for (SweepPass pass : result.passes()) {
                Path file = runDir.resolve(pass.index() == 0 ? SweepCommand.FRF
                        : String.format(Locale.ROOT, "frf-pass%d.csv", pass.index() + 1));
                Map<String, String> metadata = new LinkedHashMap<>();
                metadata.put("source", "Tautline stepped-sine sweep");
                metadata.put("rig", header.identity());
                metadata.put("sweep plan", result.plan().describe());
                metadata.put("pass", (pass.index() + 1) + " of " + result.passes().size() + ", level " + level(result, pass)
                        + ", " + pass.direction().label());
                metadata.put("steps", Integer.toString(pass.points().size()));
                FrfCsvWriter.write(pass.toFrf(), metadata, file);
                frfFiles.put(pass.index(), file);
            }
            qualifying.writeResult(runDir);
        }
        for (String warning : result.warnings()) {
            err.println("warning: " + warning);
        }
        if (json) {
            ObjectNode summary = json(result, header, journal, frfFiles);
            qualifying.addTo(summary, result, runDir);
            out.println(ResultJson.MAPPER.writeValueAsString(summary));
        } else {
            out.println(text(result, runDir, journal, frfFiles, QuantityFormat.forStandardOutput()));
            out.print(qualifying.text(result, runDir));
        }
        out.flush();
        err.flush();
        return qualifying.exitCode(result, switch (result.status()) {
            case COMPLETED -> ExitCodes.OK;
            case CANCELLED -> ExitCodes.SWEEP_STOPPED;
            case LIMIT -> ExitCodes.SWEEP_LIMIT;
            case FAULT -> ExitCodes.SWEEP_FAULT;
        });
    }

    private static String level(SweepResult result, SweepPass pass) {
        return String.format(Locale.ROOT, "%.4g %s", pass.level(), result.plan().levelMode() == LevelMode.FORCE ? "N" : "V");
    }

    private static String text(SweepResult result, Path runDir, Path journal, Map<Integer, Path> frfFiles,
                               QuantityFormat f) {
        StringBuilder s = new StringBuilder();
        int steps = result.steps().size();
        switch (result.status()) {
            case COMPLETED -> s.append(String.format(Locale.ROOT, "sweep complete: %d steps, rig time %s; wrote %s and %s",
                    steps, f.value(Math.round(result.rigTimeS() * 10) / 10.0, "s"), journal, String.join(", ", frfFiles.values().stream().map(Path::toString)
                            .toList())));
            case CANCELLED -> s.append("sweep stopped after ").append(steps).append(" steps (").append(result.reason())
                    .append("); the output is off and the journal keeps every completed step. Continue it with"
                            + " 'tautline resume ").append(runDir).append("'");
            case LIMIT -> s.append("sweep stopped at a safety limit after ").append(steps).append(" steps: ")
                    .append(result.reason()).append(". The drive was ramped down and switched off. Check the specimen and"
                            + " the rig before going on: 'tautline resume ").append(runDir)
                    .append("' continues with the same plan and limits");
            case FAULT -> s.append("sweep stopped by a fault after ").append(steps).append(" steps: ")
                    .append(result.reason()).append(". The output was switched off and the journal keeps every completed"
                            + " step. Once the rig is fixed, continue with 'tautline resume ").append(runDir)
                    .append("' (add --port PATH if the rig now answers on another port)");
        }
        if (result.passes().size() > 1 || result.plan().adaptive()) {
            for (SweepPass pass : result.passes()) {
                s.append(String.format(Locale.ROOT, "%n  pass %d, level %s, %s: %d steps, %s", pass.index() + 1,
                        level(result, pass), pass.direction().label(), pass.points().size(),
                        f.value(Math.round(pass.rigTimeS() * 10) / 10.0, "s")));
                for (FittedMode m : pass.modes()) {
                    s.append(String.format(Locale.ROOT, "%n    f %s, damping ratio %s",
                            f.withUncertainty(m.mode().frequencyHz(), m.frequencyStdHz(), "Hz"),
                            f.withUncertainty(m.mode().dampingRatio(), m.dampingRatioStd(), "")));
                }
            }
        }
        return s.toString();
    }

    private static ObjectNode json(SweepResult result, JournalHeader header, Path journal, Map<Integer, Path> frfFiles) {
        ObjectNode node = ResultJson.MAPPER.createObjectNode();
        node.put("completed", result.completed());
        node.put("status", result.status().name().toLowerCase(Locale.ROOT));
        node.put("reason", result.reason());
        node.put("steps", result.steps().size());
        node.put("rigTimeS", result.rigTimeS());
        node.put("driver", header.driver());
        node.put("rigIdentity", header.identity());
        node.put("journal", journal.toString());
        if (frfFiles.containsKey(0)) {
            node.put("frf", frfFiles.get(0).toString());
        } else {
            node.putNull("frf");
        }
        ArrayNode passes = node.putArray("passes");
        for (SweepPass pass : result.passes()) {
            ObjectNode p = passes.addObject();
            p.put("level", pass.level());
            p.put("direction", pass.direction().name().toLowerCase(Locale.ROOT));
            p.put("steps", pass.points().size());
            p.put("rigTimeS", pass.rigTimeS());
            p.put("complete", pass.complete());
            p.put("targetsMet", pass.targetsMet());
            if (frfFiles.containsKey(pass.index())) {
                p.put("frf", frfFiles.get(pass.index()).toString());
            } else {
                p.putNull("frf");
            }
            ArrayNode modes = p.putArray("modes");
            for (FittedMode m : pass.modes()) {
                ObjectNode mode = modes.addObject();
                mode.put("frequencyHz", m.mode().frequencyHz());
                mode.put("frequencyStdHz", m.frequencyStdHz());
                mode.put("dampingRatio", m.mode().dampingRatio());
                mode.put("dampingRatioStd", m.dampingRatioStd());
            }
            ArrayNode warnings = p.putArray("warnings");
            pass.warnings().forEach(warnings::add);
        }
        return node;
    }

    /** @return true when a status leaves the sweep resumable: stopped or faulted, not finished */
    static boolean resumable(SweepStatus status) {
        return status != SweepStatus.COMPLETED;
    }
}
