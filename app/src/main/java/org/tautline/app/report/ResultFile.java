package org.tautline.app.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;

import com.fasterxml.jackson.core.json.JsonWriteFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.hipparchus.complex.Complex;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.qualify.QualificationRequest;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.specimen.AbsentHarmonic;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.Verdict;
import org.tautline.app.qualify.QualificationResult;

/**
 * A qualification as JSON, with SI units in every key: what {@code demo --out} and the workbench's exported report
 * write as a run folder's {@value RunDirectory#RESULT}, and what {@code fit --json} and {@code demo --json} print.
 * {@link RecordedFit} reads the fit back from it, so that {@code report} reports the recorded result instead of fitting
 * the FRF again.
 */
public final class ResultFile {
    /**
     * Writes indented JSON with every character beyond ASCII escaped (RFC 8259, section 7: "±" is written
     * {@code \u00b1}), so the text is the same under any terminal encoding, LANG=C included, and reads back exactly.
     */
    public static final ObjectMapper MAPPER = JsonMapper.builder().enable(JsonWriteFeature.ESCAPE_NON_ASCII).build()
            .enable(SerializationFeature.INDENT_OUTPUT);
    /** The key of the SHA-256 of the {@code frf.csv} a recorded result was made from. */
    public static final String FRF_SHA256 = "frfSha256";
    /** What the poles beyond the band are, for a person reading the file or the report. */
    public static final String BEYOND_BAND_LABEL = "poles beyond the band, standing for the modes outside it";

    private ResultFile() {
    }

    /**
     * Writes a run folder's result file.
     *
     * @param file where to write it (a run folder's {@value RunDirectory#RESULT})
     * @param result the qualification
     * @param frfSha256 the SHA-256 of the {@code frf.csv} bytes the result was made from, lower-case hex
     * @throws IOException when the file cannot be written
     */
    public static void write(Path file, QualificationResult result, String frfSha256) throws IOException {
        write(file, json(result), frfSha256);
    }

    /**
     * Writes a result already in JSON (the demo's, with its truth beside it) as a run folder's result file.
     *
     * @param file where to write it
     * @param json the result, as {@link #json} gives it and perhaps with more fields
     * @param frfSha256 the SHA-256 of the {@code frf.csv} bytes the result was made from, lower-case hex
     * @throws IOException when the file cannot be written
     */
    public static void write(Path file, ObjectNode json, String frfSha256) throws IOException {
        ObjectNode recorded = json.deepCopy();
        recorded.put(FRF_SHA256, frfSha256);
        MAPPER.writeValue(file.toFile(), recorded);
    }

    /**
     * A qualification or fit result: specimen, modes with standard errors, the fit's residual terms and poles beyond
     * the band, properties, level check, sweep, cautions and verdict, and what the request said of the record (its
     * cautions, why it has no level check) so that {@link RecordedFit} can judge the recorded modes again.
     *
     * @param r the qualification
     * @return its JSON
     */
    public static ObjectNode json(QualificationResult r) {
        ObjectNode root = MAPPER.createObjectNode();
        root.set("specimen", specimen(r.specimen()));
        ArrayNode modes = root.putArray("modes");
        for (QualifiedMode m : r.modes()) {
            ObjectNode node = fittedMode(m.fitted());
            node.put("harmonic", m.harmonic());
            node.put("polarisation", m.polarisation());
            modes.add(node);
        }
        ArrayNode absent = root.putArray("absentHarmonics");
        for (AbsentHarmonic a : r.harmonics().absent()) {
            ObjectNode node = absent.addObject();
            node.put("harmonic", a.harmonic());
            node.put("expectedFrequencyHz", a.expectedFrequencyHz());
            node.put("reason", a.explanation());
        }
        modal(root, r.modal());
        ObjectNode properties = root.putObject("properties");
        r.tension().ifPresent(t -> {
            properties.put("tensionN", t.tensionN());
            putFinite(properties, "tensionStdN", t.tensionStdN());
            putFinite(properties, "bendingStiffnessNm2", t.bendingStiffnessNm2());
            putFinite(properties, "bendingStiffnessStdNm2", t.bendingStiffnessStdNm2());
            putFinite(properties, "inharmonicityB", t.inharmonicityB());
            properties.put("tensionMethod", t.method().name().toLowerCase(Locale.ROOT));
        });
        r.participation().ifPresent(p -> {
            putFinite(properties, "forcingPositionM", p.forcingPositionM());
            putFinite(properties, "forcingPositionStdM", p.forcingPositionStdM());
            putFinite(properties, "sensorPositionM", p.sensorPositionM());
            putFinite(properties, "sensorPositionStdM", p.sensorPositionStdM());
            putFinite(properties, "linearDensityKgPerM", p.effectiveLinearDensityKgPerM());
            properties.put("forcingPositionMismatch", p.forcingMismatch());
            properties.put("sensorPositionMismatch", p.sensorMismatch());
        });
        r.linearity().ifPresent(l -> {
            ObjectNode linearity = root.putObject("linearity");
            linearity.put("linear", l.linear());
            ArrayNode findings = linearity.putArray("findings");
            l.findings().forEach(findings::add);
            ArrayNode shifts = linearity.putArray("shifts");
            l.shifts().forEach(h -> {
                ObjectNode node = shifts.addObject();
                node.put("harmonic", h.harmonic());
                node.put("firstFrequencyHz", h.firstFrequencyHz());
                node.put("secondFrequencyHz", h.secondFrequencyHz());
                node.put("relativeShift", h.relativeShift());
                putFinite(node, "relativeShiftStd", h.relativeShiftStd());
                putFinite(node, "predictedRelativeShift", h.predictedRelativeShift());
                node.put("significant", h.significant());
            });
        });
        QualificationRequest request = r.assessment().request();
        if (r.linearity().isEmpty() && !request.whyNoLevelCheck().isEmpty()) {
            root.put("whyNoLevelCheck", request.whyNoLevelCheck());
        }
        r.sweep().ifPresent(sweep -> {
            root.put("rigTimeS", sweep.rigTimeS());
            root.put("steps", sweep.points().size());
            root.put("sweepCompleted", sweep.completed());
        });
        root.put("wallTimeS", r.wallTimeS());
        ArrayNode cautions = root.putArray("cautions");
        r.cautions().forEach(cautions::add);
        ArrayNode recordCautions = root.putArray("recordCautions");
        request.recordCautions().forEach(recordCautions::add);
        r.verdict().ifPresent(v -> root.set("verdict", verdict(v)));
        return root;
    }

    /**
     * The modal fit's residual terms (with their standard errors and the poles beyond the band), band, quality and
     * warnings, and what it could not explain.
     *
     * @param root the object to add them to
     * @param modal the fit
     */
    public static void modal(ObjectNode root, ModalEstimate modal) {
        ObjectNode residuals = root.putObject("residuals");
        residuals.set("upper", complex(modal.residualTerms().upper()));
        residuals.set("lower", complex(modal.residualTerms().lower()));
        residuals.set("upperStd", complex(modal.residualTermsStd().upper()));
        residuals.set("lowerStd", complex(modal.residualTermsStd().lower()));
        ObjectNode beyond = residuals.putObject("polesBeyondBand");
        beyond.put("description", BEYOND_BAND_LABEL);
        ArrayNode poles = beyond.putArray("poles");
        modal.residualTerms().outsideBand().forEach(m -> poles.add(mode(m)));
        ObjectNode quality = root.putObject("quality");
        quality.put("bandLowHz", modal.bandLowHz());
        quality.put("bandHighHz", modal.bandHighHz());
        modal.quality().ifPresent(q -> {
            putFinite(quality, "normalisedResidual", q.normalisedResidual());
            putFinite(quality, "correlation", q.correlation());
        });
        ArrayNode warnings = root.putArray("warnings");
        modal.warnings().forEach(warnings::add);
        modal.unexplained().ifPresent(u -> root.put("unexplained", u));
    }

    /**
     * @param f a fitted mode
     * @return its frequency, damping ratio, modal constant and their standard errors
     */
    public static ObjectNode fittedMode(FittedMode f) {
        ObjectNode node = mode(f.mode());
        putFinite(node, "frequencyStdHz", f.frequencyStdHz());
        putFinite(node, "dampingRatioStd", f.dampingRatioStd());
        node.set("modalConstantStd", complex(f.modalConstantStd()));
        return node;
    }

    /**
     * @param s the stated specimen
     * @return its summary
     */
    static ObjectNode specimen(Specimen s) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("id", s.id());
        node.put("lengthM", s.lengthM());
        node.put("tensionN", s.nominalTensionN());
        node.put("linearDensityKgPerM", s.linearDensityKgPerM());
        node.put("linearDensityStdKgPerM", s.linearDensityStdKgPerM());
        node.put("bendingStiffnessNm2", s.bendingStiffnessNm2());
        node.put("forcingPositionM", s.forcingPositionM());
        node.put("sensorPositionM", s.sensorPositionM());
        node.put("ends", s.ends().name().toLowerCase(Locale.ROOT));
        return node;
    }

    /**
     * @param mode a mode
     * @return its frequency, damping ratio and modal constant
     */
    public static ObjectNode mode(Mode mode) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("frequencyHz", mode.frequencyHz());
        node.put("dampingRatio", mode.dampingRatio());
        node.set("modalConstant", complex(mode.modalConstant()));
        return node;
    }

    /**
     * JSON has no NaN or infinity: a figure that is not a finite number is written as null.
     *
     * @param node the object
     * @param key the key
     * @param value the figure
     */
    public static void putFinite(ObjectNode node, String key, double value) {
        if (Double.isFinite(value)) {
            node.put(key, value);
        } else {
            node.putNull(key);
        }
    }

    /** A complex number as {@code re} and {@code im}, each null when not finite. */
    static ObjectNode complex(Complex value) {
        ObjectNode node = MAPPER.createObjectNode();
        putFinite(node, "re", value.getReal());
        putFinite(node, "im", value.getImaginary());
        return node;
    }

    static ObjectNode verdict(Verdict verdict) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("outcome", verdict.outcome().name());
        ArrayNode limits = node.putArray("limits");
        for (LimitResult result : verdict.results()) {
            ObjectNode limit = limits.addObject();
            limit.put("name", result.limit().name());
            limit.put("figure", result.limit().figureKey());
            limit.put("figureLabel", Figure.labelFor(result.limit().figureKey()));
            limit.put("unit", result.limit().unit());
            putFinite(limit, "lower", result.limit().lowerBound());
            putFinite(limit, "upper", result.limit().upperBound());
            putFinite(limit, "value", result.measuredValue());
            putFinite(limit, "standardUncertainty", result.standardUncertainty());
            putFinite(limit, "margin", result.margin());
            limit.put("outcome", result.outcome().name());
            limit.put("reason", result.reason());
        }
        ArrayNode reasons = node.putArray("reasons");
        verdict.reasons().forEach(reasons::add);
        return node;
    }
}
