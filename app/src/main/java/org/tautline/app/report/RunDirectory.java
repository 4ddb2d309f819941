package org.tautline.app.report;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.FrfCsvReader;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Specification;
import org.tautline.app.qualify.JsonFields;
import org.tautline.app.qualify.Qualification;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.qualify.SpecificationFile;
import org.tautline.app.qualify.SpecimenFile;
import org.tautline.app.trace.DataFile;
import org.tautline.app.trace.Calibrations;
import org.tautline.app.trace.RunSetup;
import org.tautline.app.trace.SetupFile;

/**
 * A run directory as {@code demo --out} writes it: {@code frf.csv} and {@code specimen.json} (required),
 * {@code spec.json} (optional: without it no limit is judged), {@code result.json} (optional: the recorded result,
 * level check and sweep) and {@code setup.json} (optional: the test date, the air and the rig, {@link SetupFile}). A
 * file that is there must be readable: a folder, an empty file, a link to nothing or content that cannot be read is
 * refused, naming it, before anything is analysed.
 *
 * <p>The result reported is the recorded one: when {@code result.json} records the modes and names the SHA-256 of the
 * {@code frf.csv} it was made from, and that is this folder's {@code frf.csv}, the recorded modes are taken as they are
 * (a fit from poles chosen by hand in the workbench cannot be repeated from the FRF alone) and numbered and judged
 * again ({@link RecordedFit}); a {@code result.json} naming another FRF is refused. Otherwise the FRF is fitted again
 * and {@link #resultSource} says so and why. The level check needs the rig, so its shifts are always read from
 * {@code result.json}.
 *
 * @param directory the directory
 * @param result the qualification re-derived from its files
 * @param metadata the FRF file's metadata (rig, sensors, calibration, plan), in file order
 * @param recordedSweep the sweep as {@code result.json} recorded it (steps, rig and wall time), in words
 * @param frfSha256 the SHA-256 of the {@code frf.csv} bytes that were analysed, lower-case hex; empty when the
 *        result did not come from a run directory
 * @param setup the run's recorded setup (test date, air, rig), {@link RunSetup#NONE} when none was recorded
 * @param dataFiles every file of the folder the result rests on, with its SHA-256; empty when it was not read from
 *        files
 * @param resultSource how the result's modes were obtained (taken as recorded, or fitted again and why)
 */
public record RunDirectory(Path directory, QualificationResult result, Map<String, String> metadata,
                           Optional<String> recordedSweep, String frfSha256, RunSetup setup, List<DataFile> dataFiles,
                           ResultSource resultSource) {
    /** The FRF file name. */
    public static final String FRF = "frf.csv";
    /** The specimen file name. */
    public static final String SPECIMEN = "specimen.json";
    /** The specification file name. */
    public static final String SPECIFICATION = "spec.json";
    /** The recorded result: its modes are reported (when made from this folder's FRF) and its level check taken over. */
    public static final String RESULT = "result.json";

    /** Copies the metadata and the files. */
    public RunDirectory {
        metadata = Collections.unmodifiableMap(new LinkedHashMap<>(metadata));
        dataFiles = List.copyOf(dataFiles);
    }

    /**
     * A qualification with a fingerprint but no setup or data files.
     *
     * @param directory where it is written
     * @param result the qualification
     * @param metadata the FRF metadata
     * @param recordedSweep the sweep in words
     * @param frfSha256 the SHA-256 of frf.csv, empty for none
     */
    public RunDirectory(Path directory, QualificationResult result, Map<String, String> metadata,
                        Optional<String> recordedSweep, String frfSha256) {
        this(directory, result, metadata, recordedSweep, frfSha256, RunSetup.NONE, List.of(), ResultSource.NONE);
    }

    /**
     * A qualification that was not read from a run directory's files (the workbench's): no FRF fingerprint.
     *
     * @param directory where it is written
     * @param result the qualification
     * @param metadata the FRF metadata
     * @param recordedSweep the sweep in words
     */
    public RunDirectory(Path directory, QualificationResult result, Map<String, String> metadata,
                        Optional<String> recordedSweep) {
        this(directory, result, metadata, recordedSweep, "");
    }

    /**
     * The files of a run directory, read and checked, not yet analysed.
     *
     * @param directory the directory
     * @param specimen the stated specimen
     * @param specification the limits, empty without {@code spec.json}
     * @param frf the FRF and its metadata
     * @param levelCheck the recorded level check, empty without one
     * @param recordedSweep the recorded sweep in words, empty without one
     * @param frfSha256 the SHA-256 of the {@code frf.csv} bytes, lower-case hex
     * @param setup the recorded setup, {@link RunSetup#NONE} without {@code setup.json}
     * @param dataFiles the files read, with their SHA-256
     * @param recorded the fit {@code result.json} records, or why the FRF is to be fitted again
     */
    public record Inputs(Path directory, Specimen specimen, Optional<Specification> specification,
                         FrfCsvReader.Contents frf, Optional<LinearityResult> levelCheck, Optional<String> recordedSweep,
                         String frfSha256, RunSetup setup, List<DataFile> dataFiles, RecordedFit.Reading recorded) {
        /** Copies the files. */
        public Inputs {
            dataFiles = List.copyOf(dataFiles);
        }

        /**
         * @param given setup values given now (command-line options)
         * @return these inputs with what the recorded setup lacks filled in from {@code given}
         * @throws AnalysisException when a given value differs from a recorded one
         */
        public Inputs withSetup(RunSetup given) {
            return new Inputs(directory, specimen, specification, frf, levelCheck, recordedSweep, frfSha256,
                    setup.with(given, directory.resolve(SetupFile.NAME).toString()), dataFiles, recorded);
        }
    }

    /**
     * Reads a run directory and qualifies it again.
     *
     * @param directory the directory
     * @return the run
     * @throws IOException when a file cannot be read
     * @throws AnalysisException when a file is missing or cannot be read as what it should hold, naming it
     */
    public static RunDirectory read(Path directory) throws IOException {
        return analyse(readInputs(directory));
    }

    /**
     * Reads and checks every file of a run directory, without the (slow) analysis.
     *
     * @param directory the directory
     * @return its inputs
     * @throws IOException when a file cannot be read
     * @throws AnalysisException when a file is missing or cannot be read as what it should hold, naming it
     */
    public static Inputs readInputs(Path directory) throws IOException {
        if (!Files.exists(directory)) {
            throw new AnalysisException("run directory " + directory + " does not exist; expected the folder demo --out wrote");
        }
        if (!Files.isDirectory(directory)) {
            throw new AnalysisException("run directory " + directory + " is a file, not a folder; expected the folder"
                    + " demo --out wrote");
        }
        present(directory, FRF, true, "the measured FRF (CSV)");
        present(directory, SPECIMEN, true, "the specimen (JSON)");
        boolean judged = present(directory, SPECIFICATION, false, "the specification (JSON)");
        boolean recorded = present(directory, RESULT, false, "the recorded run (JSON)");
        boolean setUp = present(directory, SetupFile.NAME, false, "the run's setup (JSON)");
        Specimen specimen = SpecimenFile.read(directory.resolve(SPECIMEN));
        Optional<Specification> specification = judged ? Optional.of(SpecificationFile.read(directory.resolve(SPECIFICATION)))
                : Optional.empty();
        Path frfFile = directory.resolve(FRF);
        byte[] frfBytes = bytes(directory, FRF);
        FrfCsvReader.Contents frf = FrfCsvReader.read(new ByteArrayInputStream(frfBytes), frfFile.toString());
        Optional<LinearityResult> levels = Optional.empty();
        Optional<String> sweep = Optional.empty();
        RecordedFit.Reading fit = RecordedFit.Reading.refit(RecordedFit.NO_RESULT_FILE);
        if (recorded) {
            Path resultFile = directory.resolve(RESULT);
            JsonFields result = JsonFields.read(resultFile, LevelCheckFile.WHAT);
            levels = LevelCheckFile.levelCheck(resultFile, result);
            sweep = LevelCheckFile.sweepLine(resultFile, result);
            fit = RecordedFit.read(result, frf.frf(), sha256(frfBytes));
        }
        RunSetup setup = setUp ? SetupFile.read(directory) : RunSetup.NONE;
        List<DataFile> files = new ArrayList<>();
        files.add(DataFile.of(FRF, frfBytes));
        for (String name : new String[] {SPECIMEN, SPECIFICATION, RESULT, SetupFile.NAME}) {
            if (Files.exists(directory.resolve(name), LinkOption.NOFOLLOW_LINKS)) {
                files.add(DataFile.of(name, bytes(directory, name)));
            }
        }
        return new Inputs(directory, specimen, specification, frf, levels, sweep, sha256(frfBytes), setup, files, fit);
    }

    /**
     * Qualifies checked inputs: the recorded fit numbered and judged again, or, without one, the FRF fitted again.
     *
     * @param in the run's inputs
     * @return the run
     */
    public static RunDirectory analyse(Inputs in) {
        QualificationResult result;
        List<String> cautions = new ArrayList<>();
        ResultSource source;
        if (in.recorded().fit().isPresent()) {
            RecordedFit fit = in.recorded().fit().get();
            result = Qualification.ofRecordedFit(in.specimen(), in.frf().frf(), fit.modal(), in.specification(),
                    in.levelCheck(), fit.whyNoLevelCheck(), fit.recordCautions(), fit.wallTimeS());
            fit.disagreement(result).ifPresent(cautions::add);
            source = ResultSource.RECORDED;
        } else {
            result = Qualification.analyse(in.specimen(), in.frf().frf(), Optional.empty(), ModalEstimator.defaults(),
                    in.specification(), System.nanoTime());
            if (in.levelCheck().isPresent()) {
                result = Qualification.withLinearity(result, in.levelCheck().get(), in.specification());
            }
            source = ResultSource.refitted(in.recorded().refitReason());
        }
        cautions.addAll(Calibrations.expired(in.setup(), java.time.Instant.now()));
        result = Qualification.withCautions(result, cautions);
        return new RunDirectory(in.directory(), result, in.frf().metadata(), in.recordedSweep(), in.frfSha256(),
                in.setup(), in.dataFiles(), source);
    }

    /**
     * Checks that a file of the run is there as a readable, non-empty file.
     *
     * @return whether it is there; false only for an optional file that is absent
     */
    private static boolean present(Path directory, String name, boolean required, String holding) throws IOException {
        Path file = directory.resolve(name);
        String expected = "; expected a file holding " + holding;
        if (!Files.exists(file, LinkOption.NOFOLLOW_LINKS)) {
            if (required) {
                throw new AnalysisException("run directory " + directory + " has no " + name + "; expected " + FRF + " and "
                        + SPECIMEN + " (and " + SPECIFICATION + " to judge the limits)");
            }
            return false;
        }
        String at = "run directory " + directory + ": " + name;
        if (Files.isDirectory(file)) {
            throw new AnalysisException(at + " is a folder" + expected);
        }
        if (!Files.exists(file)) {
            throw new AnalysisException(at + " is a link to nothing" + expected);
        }
        if (!Files.isRegularFile(file)) {
            throw new AnalysisException(at + " is not a regular file" + expected);
        }
        if (Files.size(file) == 0) {
            throw new AnalysisException(at + " is empty" + expected);
        }
        return true;
    }

    private static byte[] bytes(Path directory, String name) throws IOException {
        try {
            return Files.readAllBytes(directory.resolve(name));
        } catch (AccessDeniedException e) {
            throw new AnalysisException("run directory " + directory + ": " + name + " cannot be read (permission denied);"
                    + " expected a readable file");
        }
    }

    /** @return the lower-case hex SHA-256 of the bytes */
    static String sha256(byte[] bytes) {
        return DataFile.sha256(bytes);
    }
}
