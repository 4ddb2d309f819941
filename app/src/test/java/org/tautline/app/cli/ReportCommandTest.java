package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

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

    /**
     * A value and its standard uncertainty as GUM 7.2.6 asks (JCGM 100:2008, from memory): u to two significant
     * digits, the value to the same decimal place; written here with String.format, apart from the project's
     * formatter, for values whose uncertainty is between 0.001 and 100.
     */
    private static String[] gum(double value, double u) {
        int decimals = Math.max(0, 1 - (int) Math.floor(Math.log10(u)));
        String rounded = String.format(Locale.ROOT, "%." + decimals + "f", u);
        if (rounded.replace(".", "").replaceFirst("^0+", "").length() > 2) {
            decimals = Math.max(0, decimals - 1); // the carry: 0.0996 becomes 0.10
        }
        return new String[] {String.format(Locale.ROOT, "%." + decimals + "f", value),
                String.format(Locale.ROOT, "%." + decimals + "f", u)};
    }

    @Test
    void theDemoReportWritesEveryModeAndPropertyRoundedToItsUncertainty() throws Exception {
        String text = text(runDir.resolve("report.pdf"));
        List<String> missing = new ArrayList<>();
        for (JsonNode mode : recorded.get("modes")) {
            double u = mode.get("frequencyStdHz").asDouble();
            if (u >= 1e-3 && u < 100) {
                String[] pair = gum(mode.get("frequencyHz").asDouble(), u);
                if (!text.contains(pair[0] + " " + pair[1])) {
                    missing.add("mode " + pair[0] + " " + pair[1]);
                }
            }
        }
        JsonNode p = recorded.get("properties");
        String[] tension = gum(p.get("tensionN").asDouble(), p.get("tensionStdN").asDouble());
        String tensionText = "(" + tension[0] + " ± " + tension[1] + ") N";
        if (!text.contains(tensionText)) {
            missing.add("tension " + tensionText);
        }
        assertEquals(List.of(), missing, "GUM 7.2.6 rounding (from memory) not found in the report");
        assertTrue(recorded.get("modes").size() >= 6, "the demo finds its modes");
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
    void theDemoReportNamesEveryFigureForPeopleAndSaysWhatWasNotGiven() throws Exception {
        String text = text(runDir.resolve("report.pdf"));
        for (String programName : List.of("f1Hz", "tensionN", "linearityShift1", "inharmonicityB", "dampingRatio1",
                "NOT_DETERMINABLE", "PINNED_LINE_FIT", "0.00000", "+/-")) {
            assertTrue(!text.contains(programName), "'" + programName + "' reaches the report");
        }
        assertTrue(text.contains("Report number: not given"), "no report number is made up");
        assertTrue(text.contains("Tested: ") && !text.contains("Tested: not given"), "the demo records when it ran");
        assertTrue(text.contains("temperature not given, relative humidity not given"), "no air is made up");
        assertTrue(text.contains("Specification: demo tie wire"), "the specification by name");
        assertTrue(text.contains("Rig: simulated rig (invented)"), "the demo names its simulated rig");
        assertTrue(text.contains("simulation (invented)") && text.contains("not given"), "no serial is made up");
        try (PDDocument document = Loader.loadPDF(runDir.resolve("report.pdf").toFile())) {
            int pages = document.getNumberOfPages();
            assertTrue(text.contains("page 1 of " + pages) && text.contains("page " + pages + " of " + pages), text);
        }
        // SHA-256 (FIPS 180-4) of frf.csv, computed here by the JDK's own digest
        String sha = java.util.HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256")
                .digest(Files.readAllBytes(runDir.resolve("frf.csv"))));
        assertTrue(text.contains(sha), "the SHA-256 of frf.csv");
        assertTrue(text.contains("Harmonic series: f_n / n against n"), "the plot of f_n/n against n²");
        assertTrue(text.contains("Receptance phase against frequency"), "the phase plot");
        assertTrue(text.contains("Quality of each FRF line") || text.contains("Coherence of each FRF line"), "quality plot");
    }

    @Test
    void reportCarriesTheRigFileTheAirAndTheReportNumberAndFlagsAnExpiredCalibration(@TempDir Path out)
            throws Exception {
        Path folder = DemoRunFixture.get().copyInputs(out.resolve("run"));
        Path rig = out.resolve("rig.json");
        Files.writeString(rig, "{\"name\": \"bench 2\", \"instruments\": ["
                + "{\"role\": \"force sensor\", \"serial\": \"FS10-0042\", \"calibrationCertificate\": \"CAL-17\","
                + " \"calibrationDue\": \"2027-01-31\"},"
                + "{\"role\": \"response sensor\", \"serial\": \"LV-7781\", \"calibrationDue\": \"2026-03-31\"}]}");
        Path pdf = out.resolve("r.pdf");
        CliRun run = CliRun.of("report", folder.toString(), "--pdf", pdf.toString(), "--rig-file", rig.toString(),
                "--temperature-c", "21.5", "--humidity-pct", "45", "--test-date", "2026-11-02T09:14:00Z",
                "--report-number", "QR-0153");
        // Readings of an instrument out of calibration are not traceable (ISO/IEC 17025:2017, 6.4 and 6.5, from
        // memory): the demo's PASS becomes not determinable, exit status 11, with the instrument named as the reason.
        assertEquals(11, run.exitCode(), run.err());
        String text = text(pdf).replace("\n", " ");
        assertTrue(text.contains("Report number: QR-0153"), text);
        assertTrue(text.contains("Tested: 2026-11-02 09:14 UTC"), text);
        assertTrue(text.contains("temperature 21.5 °C, relative humidity 45 %"), text);
        assertTrue(text.contains("FS10-0042") && text.contains("CAL-17") && text.contains("2027-01-31"), text);
        assertTrue(text.contains("Calibration expired: response sensor (serial LV-7781) was due on 2026-03-31, before"
                + " the test"), text);
        assertTrue(text.contains("certificate"), text);
        assertTrue(text.contains("Verdict: NOT DETERMINABLE Not determinable as a whole: the calibration of the response"
                + " sensor (serial LV-7781) was due on 2026-03-31, before the test, so its readings are not traceable to a"
                + " valid calibration"), text);
        assertTrue(!text.contains("Verdict: PASS"), text);
    }

    @Test
    void aSetupRecordedInTheRunFolderIsNotReplaced(@TempDir Path out) throws Exception {
        Path folder = DemoRunFixture.get().copyInputs(out.resolve("run"));
        Files.writeString(folder.resolve("setup.json"), "{\"testedAt\": \"2026-11-02T09:14:00Z\", \"temperatureC\": 21.5}");
        CliRun run = CliRun.of("report", folder.toString(), "--pdf", out.resolve("r.pdf").toString(), "--temperature-c", "23");
        assertEquals(1, run.exitCode());
        assertEquals("tautline: " + folder.resolve("setup.json") + " records the temperature (°C) 21.5; the temperature"
                + " (°C) given now (23.0) differs, and a value recorded at the test is not replaced; leave the option out,"
                + " or report another run folder", run.err().strip());
        assertTrue(!Files.exists(out.resolve("r.pdf")), "no report is written");
        CliRun again = CliRun.of("report", folder.toString(), "--pdf", out.resolve("r.pdf").toString(), "--humidity-pct",
                "40");
        assertEquals(0, again.exitCode(), again.err());
        String text = text(out.resolve("r.pdf"));
        assertTrue(text.contains("temperature 21.5 °C, relative humidity 40 %"), "recorded and given values together");
    }

    @Test
    void reportCommandRenders(@TempDir Path out) throws Exception {
        Path pdf = out.resolve("again.pdf");
        CliRun run = CliRun.of("report", runDir.toString(), "--pdf", pdf.toString(), "--operator", "B. Checker", "--lot", "LOT-7",
                "--register", register.toString());
        assertEquals(0, run.exitCode(), run.err());
        String text = text(pdf);
        assertTrue(text.contains("Operator: B. Checker"));
        JsonNode p = recorded.get("properties");
        String[] tension = gum(p.get("tensionN").asDouble(), p.get("tensionStdN").asDouble());
        assertTrue(text.contains("(" + tension[0] + " ± " + tension[1] + ") N"), "tension as GUM 7.2.6 rounds it");
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            assertTrue(document.getNumberOfPages() >= 2 && document.getNumberOfPages() <= 7, "pages " + document.getNumberOfPages());
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
