package org.tautline.app.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.specimen.HarmonicShift;
import org.tautline.analysis.specimen.LinearityResult;

/**
 * The level check of a run, read back from the {@code linearity} block of its {@code result.json}: the check
 * needs the rig, so a report cannot repeat it and takes the recorded shifts instead.
 */
public final class LevelCheckFile {
    private LevelCheckFile() {
    }

    /**
     * @param resultJson a run's result.json
     * @return the recorded level check; empty when the file is absent or holds none
     * @throws IOException when the file cannot be read
     */
    public static Optional<LinearityResult> read(Path resultJson) throws IOException {
        if (!Files.isRegularFile(resultJson)) {
            return Optional.empty();
        }
        JsonNode root = new ObjectMapper().readTree(resultJson.toFile());
        JsonNode block = root == null ? null : root.get("linearity");
        if (block == null) {
            return Optional.empty();
        }
        List<HarmonicShift> shifts = new ArrayList<>();
        JsonNode list = block.path("shifts");
        for (int i = 0; i < list.size(); i++) {
            JsonNode s = list.get(i);
            shifts.add(new HarmonicShift(s.path("harmonic").asInt(), number(resultJson, s, "firstFrequencyHz", i),
                    number(resultJson, s, "secondFrequencyHz", i), number(resultJson, s, "relativeShift", i),
                    s.path("relativeShiftStd").asDouble(Double.NaN), s.path("predictedRelativeShift").asDouble(Double.NaN),
                    s.path("significant").asBoolean()));
        }
        boolean linear = block.path("linear").asBoolean();
        return Optional.of(new LinearityResult(shifts, linear, List.of("level check at two drive levels (recorded in "
                + resultJson.getFileName() + "): " + (linear ? "linear" : "not linear"))));
    }

    /** @return the recorded sweep in words: steps, rig time, wall time, whether it completed; empty when not recorded */
    static Optional<String> sweepLine(Path resultJson) throws IOException {
        if (!Files.isRegularFile(resultJson)) {
            return Optional.empty();
        }
        JsonNode root = new ObjectMapper().readTree(resultJson.toFile());
        if (root == null || !root.has("steps") || !root.has("rigTimeS")) {
            return Optional.empty();
        }
        return Optional.of(String.format(java.util.Locale.ROOT, "Sweep as recorded in %s: %d steps, rig time %s s,"
                        + " wall time %s s, %s.", resultJson.getFileName(), root.path("steps").asInt(),
                Figures.format(root.path("rigTimeS").asDouble()), Figures.format(root.path("wallTimeS").asDouble(Double.NaN)),
                root.path("sweepCompleted").asBoolean() ? "completed" : "stopped before the end"));
    }

    private static double number(Path file, JsonNode node, String field, int index) {
        JsonNode value = node.get(field);
        if (value == null || !value.isNumber()) {
            throw new AnalysisException(file + ": linearity.shifts[" + index + "]." + field + " must be a number, got "
                    + (value == null ? "nothing" : value.toString()));
        }
        return value.asDouble();
    }
}
