package org.tautline.app.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.FrfCsvWriter;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Limit;
import org.tautline.analysis.verdict.Specification;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.trace.DataFile;
import org.tautline.app.trace.RunSetup;
import org.tautline.app.trace.SetupFile;

/**
 * Writes a qualification made in the workbench as a run folder of the form {@link RunDirectory} reads:
 * {@code frf.csv} (the measured FRF as receptance, with what is known of the rig and the plan), {@code specimen.json},
 * {@code spec.json} (when limits were judged), {@code result.json} (the result as it is on show, with the poles chosen
 * by hand and the level check of the run, in the form {@code demo --out} writes, naming the SHA-256 of
 * {@code frf.csv}) and {@code setup.json} (test date, air, rig). The report made from the folder names the SHA-256 of
 * each of these files, and {@code tautline report} reads the folder again to the same modes and verdict, without
 * fitting the FRF again ({@link RecordedFit}).
 */
public final class RunFolderWriter {
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private RunFolderWriter() {
    }

    /**
     * Writes the run folder.
     *
     * @param folder a folder that does not exist yet or is empty, so that the checksums name only this run's files
     * @param result the qualification as it is on show
     * @param metadata what is known of the rig, the sensors and the plan, for the FRF file's header
     * @param recordedSweep the sweep as it was run, in words, when there was one
     * @param setup the run's setup to record
     * @return the run folder with the result as it is (not fitted again), its setup and the SHA-256 of every file written
     * @throws IOException when a file cannot be written
     * @throws AnalysisException when the folder is a file or already holds files
     */
    public static RunDirectory write(Path folder, QualificationResult result, Map<String, String> metadata,
                                     Optional<String> recordedSweep, RunSetup setup) throws IOException {
        refuseUsed(folder);
        Files.createDirectories(folder);
        FrfCsvWriter.write(result.receptance(), metadata, folder.resolve(RunDirectory.FRF));
        JSON.writeValue(folder.resolve(RunDirectory.SPECIMEN).toFile(), specimenFile(result.specimen()));
        Optional<Specification> specification = result.assessment().request().specification();
        if (specification.isPresent()) {
            JSON.writeValue(folder.resolve(RunDirectory.SPECIFICATION).toFile(), specificationFile(specification.get()));
        }
        ResultFile.write(folder.resolve(RunDirectory.RESULT), result,
                DataFile.sha256(Files.readAllBytes(folder.resolve(RunDirectory.FRF))));
        SetupFile.write(folder, setup);
        List<DataFile> files = new ArrayList<>();
        for (String name : List.of(RunDirectory.FRF, RunDirectory.SPECIMEN, RunDirectory.SPECIFICATION,
                RunDirectory.RESULT, SetupFile.NAME)) {
            Path file = folder.resolve(name);
            if (Files.exists(file, LinkOption.NOFOLLOW_LINKS)) {
                files.add(DataFile.of(name, Files.readAllBytes(file)));
            }
        }
        return new RunDirectory(folder, result, metadata, recordedSweep, files.get(0).sha256(), setup, files, ResultSource.SHOWN);
    }

    /**
     * A specimen in the specimen-file format that {@code SpecimenFile} reads.
     *
     * @param s the specimen
     * @return its JSON
     */
    public static ObjectNode specimenFile(Specimen s) {
        ObjectNode node = JSON.createObjectNode();
        node.put("id", s.id());
        node.put("lengthM", s.lengthM());
        node.put("ends", s.ends().name().toLowerCase(Locale.ROOT));
        s.material().ifPresent(m -> node.put("material", m.name().toLowerCase(Locale.ROOT).replace('_', '-')));
        node.put("linearDensityKgPerM", s.linearDensityKgPerM());
        putUncertainty(node, "linearDensityStdKgPerM", s.linearDensityStdKgPerM());
        node.put("bendingStiffnessNm2", s.bendingStiffnessNm2());
        putUncertainty(node, "bendingStiffnessStdNm2", s.bendingStiffnessStdNm2());
        node.put("forcingPositionM", s.forcingPositionM());
        node.put("sensorPositionM", s.sensorPositionM());
        node.put("nominalTensionN", s.nominalTensionN());
        node.put("beltSpeedMPerS", s.beltSpeedMPerS());
        node.put("sensorAngleDeg", Math.toDegrees(s.sensorAngleRad()));
        node.put("axialStiffnessN", s.axialStiffnessN());
        return node;
    }

    /**
     * A specification in the format that {@code SpecificationFile} reads.
     *
     * @param spec the specification
     * @return its JSON
     */
    public static ObjectNode specificationFile(Specification spec) {
        ObjectNode node = JSON.createObjectNode();
        node.put("name", spec.name());
        if (!spec.revision().isEmpty()) {
            node.put("revision", spec.revision());
        }
        ArrayNode limits = node.putArray("limits");
        for (Limit limit : spec.limits()) {
            ObjectNode l = limits.addObject();
            l.put("name", limit.name());
            l.put("figure", limit.figureKey());
            l.put("unit", limit.unit());
            if (limit.hasLowerBound()) {
                l.put("lower", limit.lowerBound());
            }
            if (limit.hasUpperBound()) {
                l.put("upper", limit.upperBound());
            }
        }
        return node;
    }

    /** An uncertainty as a specimen file writes it: a number, or "not evaluated" for NaN. */
    private static void putUncertainty(ObjectNode node, String field, double std) {
        if (Double.isNaN(std)) {
            node.put(field, "not evaluated");
        } else {
            node.put(field, std);
        }
    }

    private static void refuseUsed(Path folder) throws IOException {
        if (!Files.exists(folder, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        if (!Files.isDirectory(folder)) {
            throw new AnalysisException(folder + " is a file; expected a new or empty folder for the report and its data"
                    + " files");
        }
        try (Stream<Path> entries = Files.list(folder)) {
            List<String> held = entries.map(p -> p.getFileName().toString()).sorted().limit(4).toList();
            if (!held.isEmpty()) {
                throw new AnalysisException("folder " + folder + " already holds files (" + String.join(", ", held)
                        + (held.size() == 4 ? ", ..." : "") + "); choose a new or empty folder, so that the report's"
                        + " checksums name only this run's files");
            }
        }
    }
}
