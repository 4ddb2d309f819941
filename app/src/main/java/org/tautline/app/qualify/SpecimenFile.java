package org.tautline.app.qualify;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.Material;
import org.tautline.analysis.specimen.Specimen;

/**
 * Reads a specimen description (our own JSON format, documented in the README).
 *
 * <p>Either {@code "material"} and {@code "diameterM"} (a solid round wire: mu, EI and EA follow
 * from the handbook values, with the handbook range as their uncertainty) or {@code "linearDensityKgPerM"} (and
 * optionally {@code "bendingStiffnessNm2"}) must be given; explicit values override the material's.
 *
 * <p>A stated value needs its uncertainty: {@code "linearDensityKgPerM"} its {@code "linearDensityStdKgPerM"},
 * {@code "bendingStiffnessNm2"} its {@code "bendingStiffnessStdNm2"}, each a number (0 or more) or the text
 * {@code "not evaluated"}. A missing uncertainty is refused, never taken as zero (that would shrink the tension's
 * uncertainty and could turn an undecided verdict into a pass); one declared not evaluated makes every figure that
 * depends on it not determinable. Fields the format does not have, and fields written as {@code null}, are refused.
 */
public final class SpecimenFile {
    private SpecimenFile() {
    }

    /**
     * Reads the file.
     *
     * @param file the JSON file
     * @return the specimen
     * @throws IOException when the file cannot be read
     */
    public static Specimen read(Path file) throws IOException {
        JsonFields json = JsonFields.read(file, "specimen");
        try {
            return parse(json);
        } catch (AnalysisException e) {
            if (e.getMessage().startsWith(json.where())) {
                throw e;
            }
            throw new AnalysisException(json.where() + ": " + e.getMessage(), e);
        }
    }

    /** The fields of the file. */
    static final List<String> FIELDS = List.of("id", "lengthM", "ends", "material", "diameterM", "linearDensityKgPerM",
            "linearDensityStdKgPerM", "bendingStiffnessNm2", "bendingStiffnessStdNm2", "forcingPositionM",
            "sensorPositionM", "nominalTensionN", "beltSpeedMPerS", "sensorAngleDeg", "axialStiffnessN");
    /** What a file writes for an uncertainty that was not evaluated. */
    static final String NOT_EVALUATED = "not evaluated";

    private static Specimen parse(JsonFields json) {
        json.refuseUnknown(FIELDS);
        for (String field : FIELDS) {
            if (json.holdsNull(field)) {
                throw new AnalysisException("field \"" + field + "\" is null; expected a value, or leave the field out"
                        + " where it is optional");
            }
        }
        String id = json.text("id");
        double length = json.number("lengthM");
        EndCondition ends = ends(json);
        double xf = json.number("forcingPositionM");
        double xs = json.number("sensorPositionM");
        double tension = json.number("nominalTensionN");
        Specimen base;
        if (json.has("material")) {
            Material material = material(json);
            if (!json.has("diameterM") && !json.has("linearDensityKgPerM")) {
                throw new AnalysisException("a material needs \"diameterM\" (or give \"linearDensityKgPerM\")");
            }
            base = json.has("diameterM")
                    ? Specimen.roundWire(id, material, json.number("diameterM"), length, ends, xf, xs, tension)
                    : new Specimen(id, length, json.number("linearDensityKgPerM"), 0, 0, 0, ends, xf, xs, tension, 0, 0, 0,
                    Optional.of(material));
        } else if (json.has("linearDensityKgPerM")) {
            base = new Specimen(id, length, json.number("linearDensityKgPerM"), 0, 0, 0, ends, xf, xs, tension, 0, 0, 0,
                    Optional.empty());
        } else {
            throw new AnalysisException("give \"material\" with \"diameterM\", or \"linearDensityKgPerM\"; neither was found");
        }
        double mu = json.number("linearDensityKgPerM", base.linearDensityKgPerM());
        double muStd = uncertainty(json, "linearDensityKgPerM", "linearDensityStdKgPerM", base.linearDensityStdKgPerM());
        double ei = json.number("bendingStiffnessNm2", base.bendingStiffnessNm2());
        double eiStd = uncertainty(json, "bendingStiffnessNm2", "bendingStiffnessStdNm2", base.bendingStiffnessStdNm2());
        double angle = Math.toRadians(json.number("sensorAngleDeg", 0));
        return new Specimen(id, length, mu, muStd, ei, eiStd, ends, xf, xs, tension, json.number("beltSpeedMPerS", 0),
                angle, json.number("axialStiffnessN", base.axialStiffnessN()), base.material());
    }

    /**
     * The uncertainty of a stated value: required when the value is stated, a number or "not evaluated" (NaN); the
     * material's handbook range when the value comes from the material.
     */
    private static double uncertainty(JsonFields json, String valueField, String stdField, double fromMaterial) {
        if (!json.has(stdField)) {
            if (json.has(valueField)) {
                throw new AnalysisException("field \"" + valueField + "\" is stated without its uncertainty; expected"
                        + " \"" + stdField + "\": a standard uncertainty (0 or more), or \"" + NOT_EVALUATED + "\"");
            }
            return fromMaterial;
        }
        if (json.rawText(stdField).startsWith("\"")) {
            String text = json.text(stdField);
            if (text.equals(NOT_EVALUATED)) {
                return Double.NaN;
            }
            throw new AnalysisException("field \"" + stdField + "\" holds '" + text + "'; expected a standard uncertainty"
                    + " (a number, 0 or more) or \"" + NOT_EVALUATED + "\"");
        }
        return json.number(stdField);
    }

    private static EndCondition ends(JsonFields json) {
        String text = json.text("ends");
        switch (text.toLowerCase(Locale.ROOT)) {
            case "pinned":
                return EndCondition.PINNED;
            case "clamped":
                return EndCondition.CLAMPED;
            default:
                throw new AnalysisException("field \"ends\" holds '" + text + "'; expected pinned or clamped");
        }
    }

    private static Material material(JsonFields json) {
        String text = json.text("material");
        String wanted = text.toLowerCase(Locale.ROOT).replace('-', '_').replace(' ', '_');
        StringBuilder known = new StringBuilder();
        for (Material m : Material.values()) {
            String name = m.name().toLowerCase(Locale.ROOT);
            if (name.equals(wanted)) {
                return m;
            }
            known.append(known.length() == 0 ? "" : ", ").append(name.replace('_', '-'));
        }
        throw new AnalysisException("field \"material\" holds '" + text + "'; expected one of " + known);
    }
}
