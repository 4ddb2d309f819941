package org.tautline.app.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.hipparchus.complex.Complex;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.Verdict;
import org.tautline.app.qualify.DemoOutcome;
import org.tautline.app.qualify.IdentifiedMode;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.qualify.SpecimenDescription;
import org.tautline.app.qualify.TruthComparison;
import org.tautline.driver.sim.SimulatedSpecimen;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sim.SimulationTruth;
import org.tautline.driver.sim.TrueMode;

/** The demo outcome as JSON, with SI units in every key. */
final class ResultJson {
    static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ResultJson() {
    }

    static ObjectNode outcome(DemoOutcome outcome) {
        QualificationResult r = outcome.result();
        ObjectNode root = MAPPER.createObjectNode();
        root.set("specimen", specimen(r.specimen()));
        root.set("truth", truth(outcome.truth()));
        ArrayNode modes = root.putArray("modes");
        for (IdentifiedMode m : r.modes()) {
            ObjectNode node = mode(m.mode());
            node.put("harmonic", m.harmonic());
            TruthComparison.nearest(outcome.truth(), m.mode()).ifPresent(t -> {
                node.put("truthFrequencyHz", t.mode().frequencyHz());
                node.put("frequencyErrorRelative", TruthComparison.frequencyError(m.mode(), t));
            });
            modes.add(node);
        }
        ObjectNode properties = root.putObject("properties");
        r.tension().ifPresent(t -> {
            properties.put("tensionN", t.tensionN());
            properties.put("tensionStdN", t.tensionStdN());
            properties.put("tensionMethod", t.method());
        });
        root.put("rigTimeS", r.sweep().rigTimeS());
        root.put("wallTimeS", r.wallTimeS());
        root.put("steps", r.sweep().points().size());
        root.put("sweepCompleted", r.sweep().completed());
        root.set("verdict", verdict(r.verdict()));
        return root;
    }

    static ObjectNode specimen(SpecimenDescription s) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("id", s.id());
        node.put("description", s.description());
        node.put("lengthM", s.lengthM());
        node.put("tensionN", s.nominalTensionN());
        node.put("linearDensityKgPerM", s.linearDensityKgPerM());
        node.put("linearDensityStdKgPerM", s.linearDensityStdKgPerM());
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
