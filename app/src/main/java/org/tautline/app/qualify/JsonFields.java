package org.tautline.app.qualify;

import java.io.IOException;
import java.nio.file.Path;

import com.fasterxml.jackson.databind.JsonNode;
import org.tautline.analysis.AnalysisException;

/** Reads a small JSON file and its fields with messages that name the file, the field and what was expected. */
public final class JsonFields {
    private final String where;
    private final JsonNode node;

    private JsonFields(String where, JsonNode node) {
        this.where = where;
        this.node = node;
    }

    /**
     * Reads a file that must hold one JSON object, strictly: UTF-8 (a byte-order mark is allowed), no duplicate field,
     * nothing after the object.
     *
     * @param file the file
     * @param what what it describes, for messages ("specimen")
     * @return its fields
     * @throws AnalysisException when the file is absent, a folder, empty, not UTF-8, not valid JSON or not one object,
     *         naming the file and the line and column (or byte offset)
     * @throws IOException when the file cannot be read for another reason
     */
    public static JsonFields read(Path file, String what) throws IOException {
        return new JsonFields(file.toString(), StrictJsonFile.readObject(file, what));
    }

    public String where() {
        return where;
    }

    /**
     * Refuses a field this object should not hold: a misspelt optional field would otherwise be ignored.
     *
     * @param known every field the object may hold
     * @throws AnalysisException naming the first unknown field and the known ones
     */
    public void refuseUnknown(java.util.Collection<String> known) {
        java.util.Iterator<String> names = node.fieldNames();
        while (names.hasNext()) {
            String name = names.next();
            if (!known.contains(name)) {
                throw new AnalysisException(where + ": field \"" + name + "\" is not one this file may hold; expected only "
                        + String.join(", ", known));
            }
        }
    }

    /**
     * @param field a field that is present
     * @return its JSON text as written (for a boolean, {@code true} or {@code false})
     */
    public String rawText(String field) {
        JsonNode value = node.get(field);
        return value == null ? "null" : value.toString();
    }

    /**
     * @param field a field
     * @return true when the object holds the field with the value {@code null} (not when the field is left out)
     */
    public boolean holdsNull(String field) {
        return node.has(field) && node.get(field).isNull();
    }

    public boolean has(String field) {
        return node.has(field) && !node.get(field).isNull();
    }

    public double number(String field) {
        JsonNode value = node.get(field);
        if (value == null || value.isNull()) {
            throw new AnalysisException(where + ": field \"" + field + "\" is missing; expected a number");
        }
        if (!value.isNumber()) {
            throw new AnalysisException(where + ": field \"" + field + "\" holds " + value + "; expected a number");
        }
        if (!Double.isFinite(value.asDouble())) {
            throw new AnalysisException(where + ": field \"" + field + "\" holds a number beyond the range of a double"
                    + " (about 1.8e308); expected a finite number");
        }
        return value.asDouble();
    }

    public double number(String field, double fallback) {
        return has(field) ? number(field) : fallback;
    }

    public String text(String field) {
        JsonNode value = node.get(field);
        if (value == null || value.isNull()) {
            throw new AnalysisException(where + ": field \"" + field + "\" is missing; expected text");
        }
        if (!value.isTextual()) {
            throw new AnalysisException(where + ": field \"" + field + "\" holds " + value + "; expected text");
        }
        return value.asText();
    }

    /**
     * A field that names something either by text or by a whole number (a channel name or index).
     *
     * @param field the field
     * @return its text, or the number as text
     */
    public String textOrIndex(String field) {
        JsonNode value = node.get(field);
        if (value == null || !(value.isTextual() || value.isInt())) {
            throw new AnalysisException(where + ": field \"" + field + "\" must be a name or a 0-based index");
        }
        return value.asText();
    }

    /**
     * The objects of an array field, each named by its place for messages.
     *
     * @param field the field
     * @return the objects, in order
     */
    public java.util.List<JsonFields> objects(String field) {
        JsonNode value = node.get(field);
        if (value == null || !value.isArray()) {
            throw new AnalysisException(where + ": field \"" + field + "\" must be an array of objects");
        }
        java.util.List<JsonFields> out = new java.util.ArrayList<>();
        for (int i = 0; i < value.size(); i++) {
            if (!value.get(i).isObject()) {
                throw new AnalysisException(where + ", " + field + "[" + i + "]: expected an object");
            }
            out.add(new JsonFields(where + ", " + field + "[" + i + "]", value.get(i)));
        }
        return out;
    }

    /**
     * A field holding one JSON object, named for messages as this file's field.
     *
     * @param field the field
     * @return its fields
     */
    public JsonFields object(String field) {
        JsonNode value = node.get(field);
        if (value == null || !value.isObject()) {
            throw new AnalysisException(where + ": field \"" + field + "\" must be an object");
        }
        return new JsonFields(where + ", " + field, value);
    }

    /**
     * A field holding a non-empty array of numbers.
     *
     * @param field the field
     * @return the numbers, in order
     */
    public java.util.List<Double> numbers(String field) {
        JsonNode value = node.get(field);
        if (value == null || !value.isArray() || value.isEmpty()) {
            throw new AnalysisException(where + ": field \"" + field + "\" must be a non-empty array of numbers");
        }
        java.util.List<Double> out = new java.util.ArrayList<>();
        for (int i = 0; i < value.size(); i++) {
            if (!value.get(i).isNumber()) {
                throw new AnalysisException(where + ", " + field + "[" + i + "] holds " + value.get(i) + "; expected a number");
            }
            if (!Double.isFinite(value.get(i).asDouble())) {
                throw new AnalysisException(where + ", " + field + "[" + i + "] holds a number beyond the range of a double"
                        + " (about 1.8e308); expected a finite number");
            }
            out.add(value.get(i).asDouble());
        }
        return out;
    }

    /**
     * A field holding an array of texts, possibly empty.
     *
     * @param field the field
     * @return the texts, in order
     */
    public java.util.List<String> texts(String field) {
        JsonNode value = node.get(field);
        if (value == null || !value.isArray()) {
            throw new AnalysisException(where + ": field \"" + field + "\" must be an array of texts");
        }
        java.util.List<String> out = new java.util.ArrayList<>();
        for (int i = 0; i < value.size(); i++) {
            if (!value.get(i).isTextual()) {
                throw new AnalysisException(where + ", " + field + "[" + i + "] holds " + value.get(i) + "; expected text");
            }
            out.add(value.get(i).asText());
        }
        return out;
    }

    /**
     * A field holding {@code true} or {@code false}.
     *
     * @param field the field
     * @return its value
     */
    public boolean bool(String field) {
        JsonNode value = node.get(field);
        if (value == null || value.isNull()) {
            throw new AnalysisException(where + ": field \"" + field + "\" is missing; expected true or false");
        }
        if (!value.isBoolean()) {
            throw new AnalysisException(where + ": field \"" + field + "\" holds " + value + "; expected true or false");
        }
        return value.asBoolean();
    }

    /**
     * A whole-number field that must be present.
     *
     * @param field the field
     * @return the number
     */
    public int wholeNumber(String field) {
        if (!has(field)) {
            throw new AnalysisException(where + ": field \"" + field + "\" is missing; expected a whole number");
        }
        return wholeNumber(field, 0);
    }

    /**
     * An optional whole-number field.
     *
     * @param field the field
     * @param fallback the value when the field is absent
     * @return the number
     */
    public int wholeNumber(String field, int fallback) {
        if (!has(field)) {
            return fallback;
        }
        JsonNode value = node.get(field);
        if (!value.canConvertToInt() || !value.isIntegralNumber()) {
            throw new AnalysisException(where + ": field \"" + field + "\" holds " + value + "; expected a whole number");
        }
        return value.asInt();
    }
}
