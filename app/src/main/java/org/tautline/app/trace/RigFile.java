package org.tautline.app.trace;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;
import org.tautline.app.qualify.JsonFields;

/**
 * Reads a rig file (our own JSON format, documented in the README): the rig's {@code name} and its
 * {@code instruments}, each with a {@code role} and, when known, {@code model}, {@code serial},
 * {@code calibrationCertificate} and {@code calibrationDue} (a date, {@code YYYY-MM-DD}).
 *
 * <p>The file is checked whole, like the specimen and specification files: a field the format does not have, a field
 * written {@code null} (leave out what is not known), a value of the wrong type or a date that is not a date is
 * refused, naming the file, the instrument and what was expected.
 */
public final class RigFile {
    /** The fields of the file. */
    static final List<String> FIELDS = List.of("name", "instruments");
    /** The fields of one instrument. */
    static final List<String> INSTRUMENT_FIELDS = List.of("role", "model", "serial", "calibrationCertificate",
            "calibrationDue");

    private RigFile() {
    }

    /**
     * Reads and checks a rig file.
     *
     * @param file the JSON file
     * @return the rig
     * @throws IOException when the file cannot be read
     * @throws AnalysisException naming the file, the field and what was expected
     */
    public static RigDescription read(Path file) throws IOException {
        return of(JsonFields.read(file, "rig"));
    }

    /**
     * Reads a rig from a JSON object (a rig file, or the {@code rig} block of a run's setup).
     *
     * @param json the object
     * @return the rig
     * @throws AnalysisException naming the place, the field and what was expected
     */
    static RigDescription of(JsonFields json) {
        json.refuseUnknown(FIELDS);
        refuseNulls(json, FIELDS);
        String name = json.text("name");
        if (name.isBlank()) {
            throw new AnalysisException(json.where() + ": field \"name\" is blank; expected the rig's name or asset number");
        }
        List<Instrument> instruments = new ArrayList<>();
        for (JsonFields entry : json.objects("instruments")) {
            entry.refuseUnknown(INSTRUMENT_FIELDS);
            refuseNulls(entry, INSTRUMENT_FIELDS);
            String role = entry.text("role");
            if (role.isBlank()) {
                throw new AnalysisException(entry.where() + ": field \"role\" is blank; expected what the instrument does,"
                        + " for example \"force sensor\"");
            }
            instruments.add(new Instrument(role, optionalText(entry, "model"), optionalText(entry, "serial"),
                    optionalText(entry, "calibrationCertificate"), date(entry, "calibrationDue")));
        }
        return new RigDescription(name, instruments);
    }

    static void refuseNulls(JsonFields json, List<String> fields) {
        for (String field : fields) {
            if (json.holdsNull(field)) {
                throw new AnalysisException(json.where() + ": field \"" + field + "\" is null; leave the field out when it"
                        + " is not known (it is then reported as not given)");
            }
        }
    }

    private static Optional<String> optionalText(JsonFields json, String field) {
        if (!json.has(field)) {
            return Optional.empty();
        }
        String text = json.text(field);
        if (text.isBlank()) {
            throw new AnalysisException(json.where() + ": field \"" + field + "\" is blank; expected text, or leave the"
                    + " field out when it is not known");
        }
        return Optional.of(text.strip());
    }

    private static Optional<LocalDate> date(JsonFields json, String field) {
        if (!json.has(field)) {
            return Optional.empty();
        }
        String text = json.text(field);
        try {
            return Optional.of(LocalDate.parse(text));
        } catch (DateTimeParseException e) {
            throw new AnalysisException(json.where() + ": field \"" + field + "\" holds \"" + text + "\"; expected a date"
                    + " as YYYY-MM-DD (ISO 8601), for example 2027-03-31");
        }
    }
}
