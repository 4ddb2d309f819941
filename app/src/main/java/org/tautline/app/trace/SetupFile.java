package org.tautline.app.trace;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.analysis.AnalysisException;
import org.tautline.app.qualify.JsonFields;

/**
 * A run's setup as recorded in its folder, {@code setup.json} (our own JSON format, documented in the README):
 * {@code testedAt} (ISO 8601 instant), {@code temperatureC}, {@code relativeHumidityPct} and {@code rig} (the rig file's
 * content, copied at the test so that a later change to the rig file does not change the run's record). Each field is
 * optional; a field written {@code null}, of the wrong type or unknown is refused naming the file and the field.
 */
public final class SetupFile {
    /** The file name inside a run folder. */
    public static final String NAME = "setup.json";
    static final List<String> FIELDS = List.of("testedAt", "temperatureC", "relativeHumidityPct", "rig");
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private SetupFile() {
    }

    /**
     * Reads a run folder's setup.
     *
     * @param runDir the run folder
     * @return its setup; {@link RunSetup#NONE} when it has no {@value #NAME}
     * @throws IOException when the file cannot be read
     * @throws AnalysisException naming the file, the field and what was expected
     */
    public static RunSetup read(Path runDir) throws IOException {
        Path file = runDir.resolve(NAME);
        if (!Files.exists(file, LinkOption.NOFOLLOW_LINKS)) {
            return RunSetup.NONE;
        }
        JsonFields json = JsonFields.read(file, "run's setup");
        json.refuseUnknown(FIELDS);
        RigFile.refuseNulls(json, FIELDS);
        Optional<Instant> testedAt = Optional.empty();
        if (json.has("testedAt")) {
            String text = json.text("testedAt");
            try {
                testedAt = Optional.of(Instant.parse(text));
            } catch (DateTimeParseException e) {
                throw new AnalysisException(json.where() + ": field \"testedAt\" holds \"" + text + "\"; expected an"
                        + " ISO 8601 instant in UTC, for example 2026-11-02T09:14:00Z");
            }
        }
        try {
            return new RunSetup(testedAt, optionalNumber(json, "temperatureC"), optionalNumber(json, "relativeHumidityPct"),
                    json.has("rig") ? Optional.of(RigFile.of(json.object("rig"))) : Optional.empty());
        } catch (AnalysisException e) {
            throw e.getMessage().startsWith(json.where()) ? e : new AnalysisException(json.where() + ": " + e.getMessage(), e);
        }
    }

    /**
     * Writes a setup into a run folder, replacing none: a folder that has one keeps it.
     *
     * @param runDir the run folder
     * @param setup what to record
     * @throws IOException when it cannot be written
     * @throws AnalysisException when the folder already records a setup
     */
    public static void write(Path runDir, RunSetup setup) throws IOException {
        Path file = runDir.resolve(NAME);
        if (Files.exists(file, LinkOption.NOFOLLOW_LINKS)) {
            throw new AnalysisException(file + " exists; a run's recorded setup is not replaced");
        }
        ObjectNode root = MAPPER.createObjectNode();
        setup.testedAt().ifPresent(t -> root.put("testedAt", t.toString()));
        setup.temperatureC().ifPresent(t -> root.put("temperatureC", t));
        setup.relativeHumidityPct().ifPresent(h -> root.put("relativeHumidityPct", h));
        setup.rig().ifPresent(rig -> {
            ObjectNode r = root.putObject("rig");
            r.put("name", rig.name());
            ArrayNode instruments = r.putArray("instruments");
            for (Instrument i : rig.instruments()) {
                ObjectNode node = instruments.addObject();
                node.put("role", i.role());
                i.model().ifPresent(v -> node.put("model", v));
                i.serial().ifPresent(v -> node.put("serial", v));
                i.calibrationCertificate().ifPresent(v -> node.put("calibrationCertificate", v));
                i.calibrationDue().ifPresent(v -> node.put("calibrationDue", v.toString()));
            }
        });
        Files.writeString(file, MAPPER.writeValueAsString(root) + "\n", StandardCharsets.UTF_8);
    }

    private static OptionalDouble optionalNumber(JsonFields json, String field) {
        return json.has(field) ? OptionalDouble.of(json.number(field)) : OptionalDouble.empty();
    }
}
