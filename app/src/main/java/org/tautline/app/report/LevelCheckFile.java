package org.tautline.app.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.tautline.analysis.specimen.HarmonicShift;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.app.qualify.JsonFields;

/**
 * The level check of a run, read back from the {@code linearity} block of its {@code result.json}: the check
 * needs the rig, so a report cannot repeat it and takes the recorded shifts instead.
 *
 * <p>The file is optional; when it is there it must be one JSON object, read as strictly as every JSON input
 * ({@link JsonFields#read}), and every block this class uses must be whole: {@code linearity} with {@code linear} and
 * its {@code shifts}, and the sweep's {@code steps}, {@code rigTimeS} and {@code sweepCompleted} together.
 */
public final class LevelCheckFile {
    /** What the file describes, for messages. */
    static final String WHAT = "recorded run";

    private LevelCheckFile() {
    }

    /**
     * @param resultJson a run's result.json
     * @return the recorded level check; empty when the file is absent or records none
     * @throws org.tautline.analysis.AnalysisException when the file is there but cannot be read as a recorded run,
     *         naming the file, the place and what was expected
     * @throws IOException when the file cannot be read for another reason
     */
    public static Optional<LinearityResult> read(Path resultJson) throws IOException {
        Optional<JsonFields> root = open(resultJson);
        return root.isPresent() ? levelCheck(resultJson, root.get()) : Optional.empty();
    }

    /**
     * @param resultJson a run's result.json
     * @return the recorded sweep in words: steps, rig time, wall time, whether it completed; empty when the file is
     *         absent or records no sweep
     * @throws IOException when the file cannot be read
     */
    static Optional<String> sweepLine(Path resultJson) throws IOException {
        Optional<JsonFields> root = open(resultJson);
        return root.isPresent() ? sweepLine(resultJson, root.get()) : Optional.empty();
    }

    /** @return the file's fields; empty when there is no file (a link to nothing or a folder is refused) */
    static Optional<JsonFields> open(Path resultJson) throws IOException {
        if (!Files.exists(resultJson, LinkOption.NOFOLLOW_LINKS)) {
            return Optional.empty();
        }
        return Optional.of(JsonFields.read(resultJson, WHAT));
    }

    static Optional<LinearityResult> levelCheck(Path resultJson, JsonFields root) {
        if (!root.has("linearity")) {
            return Optional.empty();
        }
        JsonFields block = root.object("linearity");
        boolean linear = block.bool("linear");
        List<HarmonicShift> shifts = new ArrayList<>();
        for (JsonFields s : block.objects("shifts")) {
            shifts.add(new HarmonicShift(s.wholeNumber("harmonic"), s.number("firstFrequencyHz"),
                    s.number("secondFrequencyHz"), s.number("relativeShift"), s.number("relativeShiftStd", Double.NaN),
                    s.number("predictedRelativeShift", Double.NaN), s.bool("significant")));
        }
        String recorded = "recorded in " + resultJson.getFileName();
        List<String> findings = new ArrayList<>();
        List<String> stated = block.has("findings") ? block.texts("findings") : List.of();
        if (stated.isEmpty()) {
            // A file written before the check's own words were recorded.
            findings.add("level check at two drive levels (" + recorded + "): " + (linear ? "linear" : "not linear"));
        } else {
            findings.add(stated.get(0) + " (" + recorded + ")");
            findings.addAll(stated.subList(1, stated.size()));
        }
        return Optional.of(new LinearityResult(shifts, linear, findings));
    }

    static Optional<String> sweepLine(Path resultJson, JsonFields root) {
        if (!root.has("steps") && !root.has("rigTimeS")) {
            return Optional.empty();
        }
        int steps = root.wholeNumber("steps");
        double rigTimeS = root.number("rigTimeS");
        boolean completed = root.bool("sweepCompleted");
        return Optional.of(String.format(Locale.ROOT, "Sweep as recorded in %s: %d steps, rig time %s,"
                        + " wall time %s, %s.", resultJson.getFileName(), steps, seconds(rigTimeS),
                seconds(root.number("wallTimeS", Double.NaN)), completed ? "completed" : "stopped before the end"));
    }

    /** A duration to a tenth of a second, as a timer reads it; "not determined" when not recorded. */
    private static String seconds(double s) {
        return ReportText.FORMAT.value(Double.isFinite(s) ? Math.round(s * 10) / 10.0 : s, "s");
    }
}
