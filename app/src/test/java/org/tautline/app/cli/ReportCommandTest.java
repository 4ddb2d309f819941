package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import com.fasterxml.jackson.databind.JsonNode;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.app.SafetyNotice;

/** The demo's report, {@code report} and {@code export}, read back with PDFBox's own text extraction. */
class ReportCommandTest {
    static Path runDir;
    static Path register;
    static JsonNode recorded;

    @BeforeAll
    static void runTheDemo() throws Exception {
        DemoRunFixture demo = DemoRunFixture.get();
        runDir = demo.runDir();
        register = demo.register();
        recorded = demo.recorded();
    }

    private static String text(Path pdf) throws Exception {
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            return new PDFTextStripper().getText(document);
        }
    }

    /** Six significant digits as {@link String#format} gives them: the report's stated precision. */
    private static String six(double value) {
        return String.format(Locale.ROOT, "%.6g", value);
    }

    /** Every number the run recorded in result.json (except the simulated truth), with its path. */
    private static void numbers(String path, JsonNode node, List<Map.Entry<String, Double>> out) {
        if (node.isNumber()) {
            out.add(Map.entry(path, node.asDouble()));
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                numbers(path + "[" + i + "]", node.get(i), out);
            }
        } else if (node.isObject()) {
            for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
                String key = it.next();
                numbers(path + "." + key, node.get(key), out);
            }
        }
    }

    @Test
    void theDemoReportHoldsEveryFigureTheRunRecorded() throws Exception {
        String text = text(runDir.resolve("report.pdf"));
        List<Map.Entry<String, Double>> figures = new ArrayList<>();
        for (String section : List.of("modes", "properties", "quality", "residuals", "linearity", "verdict")) {
            numbers(section, recorded.get(section), figures);
        }
        numbers("rigTimeS", recorded.get("rigTimeS"), figures);
        numbers("steps", recorded.get("steps"), figures);
        List<String> missing = new ArrayList<>();
        for (Map.Entry<String, Double> f : figures) {
            String path = f.getKey();
            double v = f.getValue();
            if (path.endsWith("truthFrequencyHz") || path.endsWith("frequencyErrorRelative") || path.endsWith(".im")
                    && v == 0.0) {
                continue; // the simulated truth is not part of the report; real modal constants have no imaginary part
            }
            String expected = path.endsWith("harmonic") || path.endsWith("polarisation") || path.endsWith("steps")
                    ? Long.toString(Math.round(v)) : six(v);
            if (!text.contains(expected)) {
                missing.add(path + " = " + expected);
            }
        }
        assertEquals(List.of(), missing, "figures of result.json not in the report");
        assertTrue(figures.size() > 100, "the run recorded " + figures.size() + " figures");
        assertTrue(text.contains("Verdict: " + recorded.get("verdict").get("outcome").asText()), text);
        assertTrue(text.contains("Verdict: PASS"), "the level check is taken from result.json, so the demo passes");
        for (JsonNode limit : recorded.get("verdict").get("limits")) {
            assertTrue(text.contains(limit.get("name").asText()), limit.toString());
        }
        assertTrue(text.contains("DEMO-TW-0042"));
        assertTrue(text.contains("Operator: A. Tester"));
        assertTrue(text.contains("Signature: ____"));
        assertTrue(text.contains("Tautline 0.1.0"));
        assertTrue(text.contains("sweep plan: stepped sine 180.0 to 1500 Hz in 1061 log-spaced steps"), "the plan is shown");
        assertTrue(text.contains("calibration: "), "the calibration is stated");
        for (String caution : SafetyNotice.cautions()) {
            assertTrue(text.replace("\n", " ").contains(caution.substring(0, 30)), caution);
        }
        assertTrue(text.contains("Lot LOT-7"), "the lot section");
        assertTrue(text.contains("Individuals chart of tension:") || text.contains("normalised residual of the fit"), text);
    }

    @Test
    void reportCommandRenders(@TempDir Path out) throws Exception {
        Path pdf = out.resolve("again.pdf");
        CliRun run = CliRun.of("report", runDir.toString(), "--pdf", pdf.toString(), "--operator", "B. Checker", "--lot", "LOT-7",
                "--register", register.toString());
        assertEquals(0, run.exitCode(), run.err());
        String text = text(pdf);
        assertTrue(text.contains("Operator: B. Checker"));
        assertTrue(text.contains(six(recorded.get("properties").get("tensionN").asDouble())));
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            assertTrue(document.getNumberOfPages() >= 2 && document.getNumberOfPages() <= 5, "pages " + document.getNumberOfPages());
            var image = new PDFRenderer(document).renderImageWithDPI(0, 40);
            int dark = 0;
            for (int y = 0; y < image.getHeight(); y++) {
                for (int x = 0; x < image.getWidth(); x++) {
                    dark += (image.getRGB(x, y) & 0xff) < 128 ? 1 : 0;
                }
            }
            assertTrue(dark > 1000, "the first page renders with content, dark pixels " + dark);
        }
    }

    @Test
    void reportNamesAMissingRunFile(@TempDir Path out) {
        CliRun run = CliRun.of("report", out.toString(), "--pdf", out.resolve("x.pdf").toString());
        assertEquals(1, run.exitCode());
        assertEquals("tautline: run directory " + out + " has no frf.csv; expected frf.csv and specimen.json (and spec.json"
                + " to judge the limits)\n", run.err().replace("\r", ""));
        assertTrue(!new File(out.toFile(), "x.pdf").exists());
    }

    @Test
    void exportWritesUnitsInTheHeaders(@TempDir Path out) throws Exception {
        CliRun run = CliRun.of("export", runDir.toString(), "--out", out.toString());
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("frequency_Hz,measured_real_m_per_N,measured_imag_m_per_N,fitted_real_m_per_N,fitted_imag_m_per_N",
                Files.readAllLines(out.resolve("frf-export.csv")).get(0));
        List<String> modes = Files.readAllLines(out.resolve("modes.csv"));
        assertTrue(modes.get(0).startsWith("harmonic,polarisation,frequency_Hz,frequency_std_Hz,"), modes.get(0));
        assertEquals(recorded.get("modes").size() + 1, modes.size());
        assertEquals(recorded.get("modes").get(0).get("frequencyHz").asDouble(),
                Double.parseDouble(modes.get(1).split(",")[2]), 0.0);
        List<String> properties = Files.readAllLines(out.resolve("properties.csv"));
        assertTrue(properties.contains("tensionN," + recorded.get("properties").get("tensionN").asDouble() + ","
                + recorded.get("properties").get("tensionStdN").asDouble() + ",N"), properties.toString());
        JsonNode verdict = ResultJson.MAPPER.readTree(out.resolve("verdict.json").toFile());
        assertEquals("PASS", verdict.get("outcome").asText());
        assertEquals(recorded.get("verdict").get("limits").size(), verdict.get("limits").size());
    }
}
