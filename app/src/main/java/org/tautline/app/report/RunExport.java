package org.tautline.app.report;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.Measurement;
import org.tautline.app.qualify.QualificationResult;

/**
 * Exports a qualification as CSV and JSON with the unit in every column name or key:
 * {@code frf-export.csv/.json}, {@code modes.csv/.json}, {@code properties.csv/.json}, {@code verdict.csv/.json}.
 */
public final class RunExport {
    /** The files written, in order. */
    public static final List<String> FILES = List.of("frf-export.csv", "frf-export.json", "modes.csv", "modes.json",
            "properties.csv", "properties.json", "verdict.csv", "verdict.json");
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private RunExport() {
    }

    /**
     * Writes the exports.
     *
     * @param r the qualification
     * @param dir the folder, created when missing
     * @throws IOException when a file cannot be written
     */
    public static void write(QualificationResult r, Path dir) throws IOException {
        Files.createDirectories(dir);
        frf(r, dir);
        modes(r, dir);
        properties(r.measurements(), dir);
        verdict(r, dir);
    }

    private static void frf(QualificationResult r, Path dir) throws IOException {
        Frf m = r.receptance();
        Frf f = r.synthesized();
        ArrayNode rows = JSON.createArrayNode();
        try (Writer out = Files.newBufferedWriter(dir.resolve("frf-export.csv"), StandardCharsets.UTF_8)) {
            out.write("frequency_Hz,measured_real_m_per_N,measured_imag_m_per_N,fitted_real_m_per_N,fitted_imag_m_per_N\n");
            for (int i = 0; i < m.size(); i++) {
                out.write(m.frequencyHz(i) + "," + m.value(i).getReal() + "," + m.value(i).getImaginary() + ","
                        + f.value(i).getReal() + "," + f.value(i).getImaginary() + "\n");
                ObjectNode row = rows.addObject();
                row.put("frequencyHz", m.frequencyHz(i));
                row.put("measuredRealMPerN", m.value(i).getReal());
                row.put("measuredImagMPerN", m.value(i).getImaginary());
                row.put("fittedRealMPerN", f.value(i).getReal());
                row.put("fittedImagMPerN", f.value(i).getImaginary());
            }
        }
        JSON.writeValue(dir.resolve("frf-export.json").toFile(), rows);
    }

    private static void modes(QualificationResult r, Path dir) throws IOException {
        ArrayNode rows = JSON.createArrayNode();
        try (Writer out = Files.newBufferedWriter(dir.resolve("modes.csv"), StandardCharsets.UTF_8)) {
            out.write("harmonic,polarisation,frequency_Hz,frequency_std_Hz,damping_ratio_1,damping_ratio_std_1,"
                    + "modal_constant_real_per_kg,modal_constant_imag_per_kg,modal_constant_real_std_per_kg\n");
            for (QualifiedMode q : r.modes()) {
                FittedMode f = q.fitted();
                out.write(q.harmonic() + "," + q.polarisation() + "," + f.mode().frequencyHz() + "," + f.frequencyStdHz() + ","
                        + f.mode().dampingRatio() + "," + f.dampingRatioStd() + "," + f.mode().modalConstant().getReal() + ","
                        + f.mode().modalConstant().getImaginary() + "," + f.modalConstantStd().getReal() + "\n");
                ObjectNode row = rows.addObject();
                row.put("harmonic", q.harmonic());
                row.put("polarisation", q.polarisation());
                row.put("frequencyHz", f.mode().frequencyHz());
                row.put("frequencyStdHz", f.frequencyStdHz());
                row.put("dampingRatio", f.mode().dampingRatio());
                row.put("dampingRatioStd", f.dampingRatioStd());
                row.put("modalConstantRealPerKg", f.mode().modalConstant().getReal());
                row.put("modalConstantImagPerKg", f.mode().modalConstant().getImaginary());
                row.put("modalConstantRealStdPerKg", f.modalConstantStd().getReal());
            }
        }
        JSON.writeValue(dir.resolve("modes.json").toFile(), rows);
    }

    private static void properties(Map<String, Measurement> figures, Path dir) throws IOException {
        ArrayNode rows = JSON.createArrayNode();
        try (Writer out = Files.newBufferedWriter(dir.resolve("properties.csv"), StandardCharsets.UTF_8)) {
            out.write("figure,value,standard_uncertainty,unit\n");
            for (Map.Entry<String, Measurement> e : figures.entrySet()) {
                Measurement m = e.getValue();
                out.write(e.getKey() + "," + m.value() + "," + m.standardUncertainty() + "," + m.unit() + "\n");
                ObjectNode row = rows.addObject();
                row.put("figure", e.getKey());
                row.put("value", m.value());
                row.put("standardUncertainty", m.standardUncertainty());
                row.put("unit", m.unit());
            }
        }
        JSON.writeValue(dir.resolve("properties.json").toFile(), rows);
    }

    private static void verdict(QualificationResult r, Path dir) throws IOException {
        ObjectNode root = JSON.createObjectNode();
        root.put("outcome", r.verdict().map(v -> v.outcome().name()).orElse("NONE"));
        ArrayNode rows = root.putArray("limits");
        try (Writer out = Files.newBufferedWriter(dir.resolve("verdict.csv"), StandardCharsets.UTF_8)) {
            out.write("limit,figure,unit,value,expanded_uncertainty,lower_bound,upper_bound,margin,result\n");
            for (LimitResult l : r.verdict().map(v -> v.results()).orElse(List.of())) {
                out.write(quote(l.limit().name()) + "," + l.limit().figureKey() + "," + l.limit().unit() + ","
                        + l.measuredValue() + "," + l.expandedUncertainty() + "," + l.limit().lowerBound() + ","
                        + l.limit().upperBound() + "," + l.margin() + "," + l.outcome() + "\n");
                ObjectNode row = rows.addObject();
                row.put("limit", l.limit().name());
                row.put("figure", l.limit().figureKey());
                row.put("unit", l.limit().unit());
                row.put("value", l.measuredValue());
                row.put("expandedUncertainty", l.expandedUncertainty());
                row.put("lowerBound", l.limit().lowerBound());
                row.put("upperBound", l.limit().upperBound());
                row.put("margin", l.margin());
                row.put("result", l.outcome().name());
                row.put("reason", l.reason());
            }
        }
        JSON.writeValue(dir.resolve("verdict.json").toFile(), root);
    }

    private static String quote(String text) {
        return "\"" + text.replace("\"", "\"\"") + "\"";
    }
}
