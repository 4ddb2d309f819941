package org.tautline.app.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.hipparchus.complex.Complex;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.specimen.AbsentHarmonic;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.Verdict;
import org.tautline.app.qualify.DemoOutcome;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.qualify.TruthComparison;
import org.tautline.app.report.RunFolderWriter;
import org.tautline.driver.sim.SimulatedSpecimen;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sim.SimulationTruth;
import org.tautline.driver.sim.TrueMode;

/** The demo outcome as JSON, with SI units in every key. */
final class ResultJson {
    /**
     * Writes indented JSON with every character beyond ASCII escaped (RFC 8259, section 7: "±" is written
     * {@code \u00b1}), so the text is the same under any terminal encoding, LANG=C included, and reads back exactly.
     */
    static final ObjectMapper MAPPER = com.fasterxml.jackson.databind.json.JsonMapper.builder()
            .enable(com.fasterxml.jackson.core.json.JsonWriteFeature.ESCAPE_NON_ASCII).build()
            .enable(SerializationFeature.INDENT_OUTPUT);

    private ResultJson() {
    }

    static ObjectNode outcome(DemoOutcome outcome) {
        ObjectNode root = result(outcome.result());
        ObjectNode ordered = MAPPER.createObjectNode();
        ordered.set("specimen", root.get("specimen"));
        ordered.set("truth", truth(outcome.truth()));
        root.remove("specimen");
        ordered.setAll(root);
        ArrayNode modes = (ArrayNode) ordered.get("modes");
        for (int i = 0; i < modes.size(); i++) {
            ObjectNode m = (ObjectNode) modes.get(i);
            Mode estimate = outcome.result().modes().get(i).mode();
            TruthComparison.nearest(outcome.truth(), estimate).ifPresent(t -> {
                m.put("truthFrequencyHz", t.mode().frequencyHz());
                m.put("frequencyErrorRelative", TruthComparison.frequencyError(estimate, t));
            });
        }
        return ordered;
    }

    /** A qualification or fit result: specimen, modes with standard errors, properties, verdict. */
    static ObjectNode result(QualificationResult r) {
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
            properties.put("tensionMethod", t.method().name().toLowerCase(java.util.Locale.ROOT));
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
        r.sweep().ifPresent(sweep -> {
            root.put("rigTimeS", sweep.rigTimeS());
            root.put("steps", sweep.points().size());
            root.put("sweepCompleted", sweep.completed());
        });
        root.put("wallTimeS", r.wallTimeS());
        ArrayNode cautions = root.putArray("cautions");
        r.cautions().forEach(cautions::add);
        r.verdict().ifPresent(v -> root.set("verdict", verdict(v)));
        return root;
    }

    /** The modal fit's residual terms, quality and warnings. */
    static void modal(ObjectNode root, ModalEstimate modal) {
        ObjectNode residuals = root.putObject("residuals");
        residuals.set("upper", complex(modal.residualTerms().upper()));
        residuals.set("lower", complex(modal.residualTerms().lower()));
        ObjectNode quality = root.putObject("quality");
        quality.put("bandLowHz", modal.bandLowHz());
        quality.put("bandHighHz", modal.bandHighHz());
        modal.quality().ifPresent(q -> {
            putFinite(quality, "normalisedResidual", q.normalisedResidual());
            putFinite(quality, "correlation", q.correlation());
        });
        ArrayNode warnings = root.putArray("warnings");
        modal.warnings().forEach(warnings::add);
    }

    static ObjectNode fittedMode(FittedMode f) {
        ObjectNode node = mode(f.mode());
        putFinite(node, "frequencyStdHz", f.frequencyStdHz());
        putFinite(node, "dampingRatioStd", f.dampingRatioStd());
        ObjectNode std = node.putObject("modalConstantStd");
        putFinite(std, "re", f.modalConstantStd().getReal());
        putFinite(std, "im", f.modalConstantStd().getImaginary());
        return node;
    }

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
        node.put("ends", s.ends().name().toLowerCase(java.util.Locale.ROOT));
        return node;
    }

    static ObjectNode truth(SimulationTruth truth) {
        SimulationConfig config = truth.config();
        SimulatedSpecimen s = config.specimen();
        ObjectNode node = MAPPER.createObjectNode();
        ObjectNode specimen = node.putObject("specimen");
        specimen.put("lengthM", s.lengthM());
        specimen.put("tensionN", s.tensionN());
        specimen.put("linearDensityKgPerM", s.linearDensityKgPerM());
        specimen.put("bendingStiffnessNm2", s.bendingStiffnessNm2());
        specimen.put("forcingPositionM", config.sensors().forcingPositionM());
        specimen.put("sensorPositionM", config.sensors().sensorPositionM());
        specimen.put("ends", s.ends().name().toLowerCase(java.util.Locale.ROOT));
        ArrayNode modes = node.putArray("modes");
        for (TrueMode t : truth.modes()) {
            ObjectNode m = mode(t.mode());
            m.put("harmonic", t.harmonic());
            m.put("polarisation", t.polarisation());
            modes.add(m);
        }
        return node;
    }

    static ObjectNode mode(Mode mode) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("frequencyHz", mode.frequencyHz());
        node.put("dampingRatio", mode.dampingRatio());
        node.set("modalConstant", complex(mode.modalConstant()));
        return node;
    }

    /** JSON has no NaN or infinity: a figure that is not a finite number is written as null. */
    static void putFinite(ObjectNode node, String key, double value) {
        if (Double.isFinite(value)) {
            node.put(key, value);
        } else {
            node.putNull(key);
        }
    }

    static ObjectNode complex(Complex value) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("re", value.getReal());
        node.put("im", value.getImaginary());
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

    /** A specimen in the specimen-file format that {@code SpecimenFile} reads. */
    static ObjectNode specimenFile(Specimen s) {
        return RunFolderWriter.specimenFile(s);
    }

    /** A specification in the format that {@code SpecificationFile} reads. */
    static ObjectNode specificationFile(org.tautline.analysis.verdict.Specification spec) {
        return RunFolderWriter.specificationFile(spec);
    }
}
