package org.tautline.app.ui.project;

import java.io.IOException;
import java.io.OutputStream;
import java.math.BigDecimal;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import com.fasterxml.jackson.core.JacksonException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.analysis.frf.FrfQuantity;

/**
 * Reads and writes workbench projects as JSON; writes are atomic (a temporary file in the same
 * folder, forced to disk, then moved over the old file with {@code ATOMIC_MOVE}).
 *
 * <p>Layout: {@code {"format": "tautline-project", "version": 1, "setup": {key: number or text},
 * "results": {key: text}, "measuredFrf": {"quantity", "frequencyHz": [], "real": [], "imag": []}}}.
 * Setup numbers are written as typed; text that is not a number stays text, so nothing typed is lost.
 */
public final class ProjectFile {
    /** The value of the {@code format} field. */
    public static final String FORMAT = "tautline-project";
    /** The version this code writes and reads. */
    public static final int VERSION = 1;
    private static final ObjectMapper JSON = new ObjectMapper()
            .enable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS)
            .enable(SerializationFeature.INDENT_OUTPUT);

    private ProjectFile() {
    }

    /**
     * Writes a project atomically.
     *
     * @param project the project
     * @param file where to write it
     * @throws IOException when the file cannot be written; the old file is then left as it was
     */
    public static void write(Project project, Path file) throws IOException {
        ObjectNode root = JSON.createObjectNode();
        root.put("format", FORMAT);
        root.put("version", VERSION);
        ObjectNode setup = root.putObject("setup");
        project.setup().forEach((key, text) -> putNumberOrText(setup, key, text));
        ObjectNode results = root.putObject("results");
        project.resultSummary().forEach(results::put);
        project.measuredFrf().ifPresent(frf -> {
            ObjectNode node = root.putObject("measuredFrf");
            node.put("quantity", frf.quantity().name());
            frf.frequencyHz().forEach(node.putArray("frequencyHz")::add);
            frf.real().forEach(node.putArray("real")::add);
            frf.imag().forEach(node.putArray("imag")::add);
        });
        byte[] bytes = JSON.writeValueAsBytes(root);
        Path folder = file.toAbsolutePath().getParent();
        Files.createDirectories(folder);
        Path temp = Files.createTempFile(folder, "." + file.getFileName() + ".", ".tmp");
        try {
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE);
                 OutputStream out = Channels.newOutputStream(channel)) {
                out.write(bytes);
                out.flush();
                channel.force(true);
            }
            Files.move(temp, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(temp);
        }
    }

    private static void putNumberOrText(ObjectNode node, String key, String text) {
        try {
            node.put(key, new BigDecimal(text.trim()));
        } catch (NumberFormatException e) {
            node.put(key, text);
        }
    }

    /**
     * Reads a project.
     *
     * @param file the project file
     * @return the project
     * @throws ProjectFileException naming the file and the field when the file is not a valid project
     * @throws IOException when the file cannot be read
     */
    public static Project read(Path file) throws IOException {
        JsonNode root;
        try {
            root = JSON.readTree(file.toFile());
        } catch (JacksonException e) {
            String where = e.getLocation() == null ? "" : " at line " + e.getLocation().getLineNr() + ", column "
                    + e.getLocation().getColumnNr();
            throw new ProjectFileException("project file " + file + ": not valid JSON" + where + ": "
                    + e.getOriginalMessage(), e);
        }
        if (root == null || !root.isObject()) {
            throw fieldError(file, "(top level)", "a JSON object");
        }
        if (!FORMAT.equals(root.path("format").asText(null))) {
            throw fieldError(file, "format", "\"" + FORMAT + "\"");
        }
        if (root.path("version").asInt(-1) != VERSION) {
            throw fieldError(file, "version", Integer.toString(VERSION));
        }
        Map<String, String> setup = textMap(file, root, "setup");
        Map<String, String> results = root.has("results") ? textMap(file, root, "results") : Map.of();
        Optional<MeasuredFrf> frf = root.has("measuredFrf") ? Optional.of(frf(file, root.get("measuredFrf")))
                : Optional.empty();
        return new Project(setup, results, frf);
    }

    private static Map<String, String> textMap(Path file, JsonNode root, String field) throws ProjectFileException {
        JsonNode node = root.get(field);
        if (node == null || !node.isObject()) {
            throw fieldError(file, field, "an object of field names to numbers or text");
        }
        Map<String, String> values = new LinkedHashMap<>();
        for (Map.Entry<String, JsonNode> e : node.properties()) {
            JsonNode v = e.getValue();
            if (v.isNumber()) {
                values.put(e.getKey(), v.isBigDecimal() ? v.decimalValue().toString() : v.asText());
            } else if (v.isTextual()) {
                values.put(e.getKey(), v.asText());
            } else {
                throw fieldError(file, field + "." + e.getKey(), "a number or text, got " + v.getNodeType());
            }
        }
        return values;
    }

    private static MeasuredFrf frf(Path file, JsonNode node) throws ProjectFileException {
        if (!node.isObject()) {
            throw fieldError(file, "measuredFrf", "an object with quantity, frequencyHz, real and imag");
        }
        FrfQuantity quantity;
        try {
            quantity = FrfQuantity.valueOf(node.path("quantity").asText(""));
        } catch (IllegalArgumentException e) {
            throw fieldError(file, "measuredFrf.quantity", "RECEPTANCE, MOBILITY or ACCELERANCE");
        }
        List<Double> f = numbers(file, node, "frequencyHz");
        List<Double> re = numbers(file, node, "real");
        List<Double> im = numbers(file, node, "imag");
        if (re.size() != f.size() || im.size() != f.size()) {
            throw fieldError(file, "measuredFrf", "as many real and imag values as frequencyHz lines (" + f.size()
                    + "), got " + re.size() + " and " + im.size());
        }
        return new MeasuredFrf(quantity, f, re, im);
    }

    private static List<Double> numbers(Path file, JsonNode frf, String field) throws ProjectFileException {
        JsonNode node = frf.get(field);
        if (!(node instanceof ArrayNode)) {
            throw fieldError(file, "measuredFrf." + field, "an array of numbers");
        }
        List<Double> values = new ArrayList<>(node.size());
        for (int i = 0; i < node.size(); i++) {
            if (!node.get(i).isNumber()) {
                throw fieldError(file, "measuredFrf." + field + "[" + i + "]", "a number, got " + node.get(i));
            }
            values.add(node.get(i).doubleValue());
        }
        return values;
    }

    private static ProjectFileException fieldError(Path file, String field, String expected) {
        return new ProjectFileException("project file " + file + ": field '" + field + "' is missing or wrong; expected "
                + expected);
    }
}
