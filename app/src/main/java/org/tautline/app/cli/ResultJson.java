package org.tautline.app.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.Mode;
import org.tautline.app.qualify.DemoOutcome;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.qualify.TruthComparison;
import org.tautline.app.report.ResultFile;
import org.tautline.app.report.RunFolderWriter;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.driver.sim.SimulatedSpecimen;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sim.SimulationTruth;
import org.tautline.driver.sim.TrueMode;

/**
 * The command line's JSON: the result in the form of a run folder's result file ({@link ResultFile}), and for the
 * demo the simulated truth beside it.
 */
final class ResultJson {
    /** Indented JSON with every character beyond ASCII escaped ({@link ResultFile#MAPPER}). */
    static final ObjectMapper MAPPER = ResultFile.MAPPER;

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
        return ResultFile.json(r);
    }

    /** The modal fit's residual terms, quality and warnings. */
    static void modal(ObjectNode root, ModalEstimate modal) {
        ResultFile.modal(root, modal);
    }

    static ObjectNode fittedMode(FittedMode f) {
        return ResultFile.fittedMode(f);
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
            ObjectNode m = ResultFile.mode(t.mode());
            m.put("harmonic", t.harmonic());
            m.put("polarisation", t.polarisation());
            modes.add(m);
        }
        return node;
    }

    /** JSON has no NaN or infinity: a figure that is not a finite number is written as null. */
    static void putFinite(ObjectNode node, String key, double value) {
        ResultFile.putFinite(node, key, value);
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
