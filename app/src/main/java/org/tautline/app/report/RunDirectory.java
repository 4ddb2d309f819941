package org.tautline.app.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.FrfCsvReader;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Specification;
import org.tautline.app.qualify.Qualification;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.qualify.SpecificationFile;
import org.tautline.app.qualify.SpecimenFile;

/**
 * A run directory as {@code demo --out} writes it: {@code frf.csv}, {@code specimen.json} and optionally
 * {@code spec.json}. The qualification is re-derived from these files; the fit is deterministic, so it gives
 * the figures of the run. The level check needs the rig, so its shifts are read from {@code result.json}.
 *
 * @param directory the directory
 * @param result the qualification re-derived from its files
 * @param metadata the FRF file's metadata (rig, sensors, calibration, plan), in file order
 * @param recordedSweep the sweep as {@code result.json} recorded it (steps, rig and wall time), in words
 */
public record RunDirectory(Path directory, QualificationResult result, java.util.Map<String, String> metadata,
                           Optional<String> recordedSweep) {

    /** Copies the metadata. */
    public RunDirectory {
        metadata = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(metadata));
    }
    /** The FRF file name. */
    public static final String FRF = "frf.csv";
    /** The specimen file name. */
    public static final String SPECIMEN = "specimen.json";
    /** The specification file name. */
    public static final String SPECIFICATION = "spec.json";
    /** The recorded result; its level check is taken over, everything else is derived again. */
    public static final String RESULT = "result.json";

    /**
     * Reads a run directory and qualifies it again.
     *
     * @param directory the directory
     * @return the run
     * @throws IOException when a file cannot be read
     * @throws AnalysisException when a file is missing or wrong, naming it
     */
    public static RunDirectory read(Path directory) throws IOException {
        if (!Files.isDirectory(directory)) {
            throw new AnalysisException("run directory " + directory + " does not exist; expected the folder demo --out wrote");
        }
        for (String name : new String[] {FRF, SPECIMEN}) {
            if (!Files.isRegularFile(directory.resolve(name))) {
                throw new AnalysisException("run directory " + directory + " has no " + name + "; expected " + FRF + " and "
                        + SPECIMEN + " (and " + SPECIFICATION + " to judge the limits)");
            }
        }
        Specimen specimen = SpecimenFile.read(directory.resolve(SPECIMEN));
        Path specFile = directory.resolve(SPECIFICATION);
        Optional<Specification> specification = Files.isRegularFile(specFile)
                ? Optional.of(SpecificationFile.read(specFile)) : Optional.empty();
        FrfCsvReader.Contents frf = FrfCsvReader.read(directory.resolve(FRF));
        QualificationResult result = Qualification.analyse(specimen, frf.frf(), Optional.empty(), ModalEstimator.defaults(),
                specification, System.nanoTime());
        Optional<org.tautline.analysis.specimen.LinearityResult> levels = LevelCheckFile.read(directory.resolve(RESULT));
        if (levels.isPresent()) {
            result = Qualification.withLinearity(result, levels.get(), specification);
        }
        return new RunDirectory(directory, result, frf.metadata(), LevelCheckFile.sweepLine(directory.resolve(RESULT)));
    }
}
