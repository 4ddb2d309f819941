package org.tautline.app.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.app.qualify.JsonFields;
import org.tautline.app.qualify.Qualification;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.trace.DataFile;
import org.tautline.app.ui.results.SyntheticWire;

/**
 * A run folder's result.json carries the fit as it was made, poles beyond the band included, and reads back to the
 * same fit; a report takes it only when it was made from the folder's frf.csv. The values checked are the file's own
 * (a round trip must give back exactly what was written), not estimates.
 */
class RecordedFitTest {
    /** Two invented poles beyond the invented wire's 160 to 1000 Hz band, standing for modes outside it. */
    private static final List<Mode> BEYOND = List.of(new Mode(120.5, 0.02, new Complex(310.25, -4.5)),
            new Mode(1147.0, 0.004, new Complex(-1203.0, 17.75)));
    private static QualificationResult wire;
    private static QualificationResult withBeyond;

    @BeforeAll
    static void qualify() {
        wire = SyntheticWire.qualified();
        ModalEstimate m = wire.modal();
        ModalEstimate beyond = new ModalEstimate(m.modes(), m.residualTerms().withOutsideBand(BEYOND),
                m.residualTermsStd(), m.quality(), m.chart(), m.selection(), m.bandLowHz(), m.bandHighHz(),
                List.of("an invented note"), Optional.of("an invented unexplained residual"));
        withBeyond = Qualification.ofRecordedFit(wire.specimen(), wire.receptance(), beyond,
                Optional.of(SyntheticWire.specification()), Optional.empty(), "no level check in this invented case",
                List.of("an invented caution of the record"), 1.5);
    }

    private static String sha(QualificationResult r) {
        return DataFile.sha256(org.tautline.analysis.frf.FrfCsvWriter.format(r.receptance(), Map.of())
                .getBytes(java.nio.charset.StandardCharsets.UTF_8));
    }

    private static RecordedFit.Reading readBack(Path file, QualificationResult r, String frfSha) throws Exception {
        return RecordedFit.read(JsonFields.read(file, LevelCheckFile.WHAT), r.receptance(), frfSha);
    }

    @Test
    void polesBeyondTheBandAndTheWholeFitReadBackAsWritten(@TempDir Path dir) throws Exception {
        Path file = dir.resolve(RunDirectory.RESULT);
        ResultFile.write(file, withBeyond, sha(withBeyond));
        JsonNode poles = ResultFile.MAPPER.readTree(file.toFile()).get("residuals").get("polesBeyondBand");
        assertEquals("poles beyond the band, standing for the modes outside it", poles.get("description").asText());
        assertEquals(1147.0, poles.get("poles").get(1).get("frequencyHz").asDouble());
        assertEquals(0.004, poles.get("poles").get(1).get("dampingRatio").asDouble());
        assertEquals(-1203.0, poles.get("poles").get(1).get("modalConstant").get("re").asDouble());
        assertEquals(17.75, poles.get("poles").get(1).get("modalConstant").get("im").asDouble());

        RecordedFit fit = readBack(file, withBeyond, sha(withBeyond)).fit().orElseThrow();
        ModalEstimate written = withBeyond.modal();
        ModalEstimate read = fit.modal();
        assertEquals(BEYOND, read.residualTerms().outsideBand());
        assertEquals(written.residualTerms().upper(), read.residualTerms().upper());
        assertEquals(written.residualTerms().lower(), read.residualTerms().lower());
        assertEquals(written.modes(), read.modes(), "modes with their standard errors, exactly");
        assertEquals(written.bandLowHz(), read.bandLowHz());
        assertEquals(written.bandHighHz(), read.bandHighHz());
        assertEquals(written.quality().orElseThrow().normalisedResidual(), read.quality().orElseThrow().normalisedResidual());
        assertEquals(written.quality().orElseThrow().correlation(), read.quality().orElseThrow().correlation());
        assertEquals(written.modes().size(), read.quality().orElseThrow().bands().size(), "one quality band per mode");
        assertEquals(written.warnings(), read.warnings());
        assertEquals(Optional.of("an invented unexplained residual"), read.unexplained());
        assertEquals(List.of("an invented caution of the record"), fit.recordCautions());
        assertEquals("no level check in this invented case", fit.whyNoLevelCheck());

        // Judged again, the recorded fit gives the same numbering, figures and verdict.
        QualificationResult again = Qualification.ofRecordedFit(wire.specimen(), wire.receptance(), read,
                Optional.of(SyntheticWire.specification()), Optional.empty(), fit.whyNoLevelCheck(),
                fit.recordCautions(), fit.wallTimeS());
        assertEquals(withBeyond.modes(), again.modes());
        assertEquals(withBeyond.measurements(), again.measurements());
        assertEquals(withBeyond.verdict(), again.verdict());
        assertEquals(withBeyond.cautions(), again.cautions());
        assertEquals(Optional.empty(), fit.disagreement(again));
    }

    @Test
    void theReportListsThePolesBeyondTheBandOnlyWhenThereAreAny(@TempDir Path dir) throws Exception {
        String with = reportText(dir.resolve("with.pdf"), withBeyond);
        assertTrue(with.contains("Poles beyond the band, standing for the modes outside it (part of the residual terms,"
                + " not modes of the specimen):"), with);
        assertTrue(with.contains("1147 Hz, damping ratio 0.004, modal constant -1203 + 17.75 j 1/kg"), with);
        assertTrue(with.contains("120.5 Hz, damping ratio 0.02, modal constant 310.25 - 4.5 j 1/kg"), with);
        ModalEstimate m = wire.modal();
        ModalEstimate none = new ModalEstimate(m.modes(), m.residualTerms().withOutsideBand(List.of()),
                m.residualTermsStd(), m.quality(), m.chart(), m.selection(), m.bandLowHz(), m.bandHighHz(), m.warnings(),
                m.unexplained());
        QualificationResult without = Qualification.ofRecordedFit(wire.specimen(), wire.receptance(), none,
                Optional.of(SyntheticWire.specification()), Optional.empty(), "", List.of(), 0);
        String text = reportText(dir.resolve("without.pdf"), without);
        assertFalse(text.contains("Poles beyond the band"), text);
    }

    private static String reportText(Path pdf, QualificationResult r) throws Exception {
        QualificationReport.write(new RunDirectory(pdf.getParent(), r, Map.of(), Optional.empty()),
                new ReportInfo("", ReportInfo.SOFTWARE, Instant.parse("2026-11-03T10:00:00Z")), "", List.of(), pdf);
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            return new PDFTextStripper().getText(document).replace('\n', ' ').replaceAll(" +", " ");
        }
    }

    @Test
    void aResultMadeFromAnotherFrfIsRefusedNamingBothChecksums(@TempDir Path dir) throws Exception {
        Path file = dir.resolve(RunDirectory.RESULT);
        String other = "0".repeat(64);
        ResultFile.write(file, wire, other);
        String here = sha(wire);
        AnalysisException e = assertThrows(AnalysisException.class, () -> readBack(file, wire, here));
        assertEquals(file + ": the result was made from an frf.csv with SHA-256 " + other + ", but the folder's"
                + " frf.csv has SHA-256 " + here + "; expected the two files of one run (put back the frf.csv the result"
                + " was made from, or remove result.json to have the FRF fitted again, without its level check)",
                e.getMessage());
    }

    @Test
    void aResultWithoutModesOrWithoutTheFrfsChecksumIsFittedAgainSayingWhy(@TempDir Path dir) throws Exception {
        Path file = dir.resolve(RunDirectory.RESULT);
        ObjectNode old = ResultFile.json(wire);
        ResultFile.MAPPER.writeValue(file.toFile(), old);
        RecordedFit.Reading reading = readBack(file, wire, sha(wire));
        assertTrue(reading.fit().isEmpty());
        assertEquals("its result.json does not name the frf.csv it was made from (it was written by an earlier version,"
                + " or by hand)", reading.refitReason());
        Files.writeString(file, "{\"linearity\": {\"linear\": true, \"shifts\": []}}");
        assertEquals("its result.json records no modes", readBack(file, wire, sha(wire)).refitReason());
    }

    @Test
    void aRecordedFitThatIsNotWholeIsRefusedNamingThePlace(@TempDir Path dir) throws Exception {
        Path file = dir.resolve(RunDirectory.RESULT);
        ObjectNode json = ResultFile.json(wire);
        ((ObjectNode) json.get("modes").get(1)).remove("dampingRatio");
        ResultFile.write(file, json, sha(wire));
        AnalysisException e = assertThrows(AnalysisException.class, () -> readBack(file, wire, sha(wire)));
        assertEquals(file + ", modes[1]: field \"dampingRatio\" is missing; expected a number", e.getMessage());
        json = ResultFile.json(wire);
        ((ObjectNode) json.get("modes").get(0)).put("frequencyHz", -5.0);
        ResultFile.write(file, json, sha(wire));
        e = assertThrows(AnalysisException.class, () -> readBack(file, wire, sha(wire)));
        assertEquals(file + ", modes[0]: mode frequencyHz must be positive and finite, got -5.0; expected a mode as the"
                + " fit records it", e.getMessage());
        json = ResultFile.json(wire);
        ((ObjectNode) json.get("residuals")).remove("polesBeyondBand");
        ResultFile.write(file, json, sha(wire));
        e = assertThrows(AnalysisException.class, () -> readBack(file, wire, sha(wire)));
        assertEquals(file + ", residuals: field \"polesBeyondBand\" must be an object", e.getMessage());
    }

    @Test
    void aRecordedLimitResultTheJudgingNoLongerGivesIsSaid(@TempDir Path dir) throws Exception {
        Path file = dir.resolve(RunDirectory.RESULT);
        ObjectNode json = ResultFile.json(wire);
        ObjectNode first = (ObjectNode) json.get("verdict").get("limits").get(0);
        LimitResult judged = wire.verdict().orElseThrow().results().get(0);
        String other = judged.outcome().name().equals("FAIL") ? "PASS" : "FAIL";
        first.put("outcome", other);
        ResultFile.write(file, json, sha(wire));
        RecordedFit fit = readBack(file, wire, sha(wire)).fit().orElseThrow();
        assertEquals(Optional.of("result.json records the limit \"" + judged.limit().name() + "\" as "
                + other.toLowerCase(java.util.Locale.ROOT) + ", but judged again from its modes by this version the limit \""
                + judged.limit().name() + "\" is " + judged.outcome().label() + "; the recorded result is not reproduced"),
                fit.disagreement(wire));
        List<Integer> numbered = new ArrayList<>(wire.modes().stream().map(QualifiedMode::harmonic).toList());
        assertEquals(numbered, fit.harmonics());
    }
}
