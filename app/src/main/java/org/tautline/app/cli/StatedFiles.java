package org.tautline.app.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.verdict.Specification;
import org.tautline.app.qualify.SpecificationFile;
import org.tautline.app.qualify.SpecimenFile;
import org.tautline.app.report.RunDirectory;

/**
 * The specimen and specification a run folder records ({@code specimen.json}, {@code spec.json}, in the form
 * {@code demo --out} writes): {@code sweep} writes them before it excites anything, so that the folder says what was
 * stated at the test and {@code resume} can qualify the completed sweep without being told again.
 */
final class StatedFiles {
    private StatedFiles() {
    }

    /**
     * Writes what was stated into the run folder.
     *
     * @param runDir the run folder
     * @param stated the specimen and limits
     * @throws IOException when a file cannot be written
     */
    static void write(Path runDir, FitInputs.Stated stated) throws IOException {
        ResultJson.MAPPER.writeValue(runDir.resolve(RunDirectory.SPECIMEN).toFile(),
                ResultJson.specimenFile(stated.specimen()));
        if (stated.specification().isPresent()) {
            ResultJson.MAPPER.writeValue(runDir.resolve(RunDirectory.SPECIFICATION).toFile(),
                    ResultJson.specificationFile(stated.specification().get()));
        }
    }

    /** Removes what {@link #write} wrote, for a run that was never made. */
    static void remove(Path runDir) throws IOException {
        Files.deleteIfExists(runDir.resolve(RunDirectory.SPECIMEN));
        Files.deleteIfExists(runDir.resolve(RunDirectory.SPECIFICATION));
    }

    /**
     * What a run folder records and what the options state now, together: an option fills in what the folder lacks,
     * and one that states something other than what the folder records is refused, for what was stated at the test is
     * never replaced. What the options add is written into the folder.
     *
     * @param runDir the run folder
     * @param options the options given now
     * @return the specimen and limits; empty when neither the folder nor the options give a specimen
     * @throws IOException when a file cannot be read or written
     * @throws AnalysisException when a file cannot be read as what it should hold, or an option differs from the record
     */
    static Optional<FitInputs.Stated> recordedOrGiven(Path runDir, FitInputs options) throws IOException {
        Optional<FitInputs.Stated> given = options.read();
        Path specimenFile = runDir.resolve(RunDirectory.SPECIMEN);
        Path specFile = runDir.resolve(RunDirectory.SPECIFICATION);
        boolean hasSpecimen = Files.exists(specimenFile, LinkOption.NOFOLLOW_LINKS);
        boolean hasSpec = Files.exists(specFile, LinkOption.NOFOLLOW_LINKS);
        if (!hasSpecimen) {
            if (hasSpec && given.isEmpty()) {
                throw new AnalysisException(runDir + " holds " + RunDirectory.SPECIFICATION + " but no "
                        + RunDirectory.SPECIMEN + "; give the specimen with --specimen S.json (the limits judge the"
                        + " specimen's properties)");
            }
            if (given.isEmpty()) {
                return Optional.empty();
            }
            FitInputs.Stated stated = given.get();
            if (hasSpec) {
                Specification recorded = SpecificationFile.read(specFile);
                same(specFile, "--spec", options.specificationFile(), recorded, stated.specification());
                stated = new FitInputs.Stated(stated.specimen(), Optional.of(recorded));
            }
            write(runDir, stated);
            return Optional.of(stated);
        }
        FitInputs.Stated recorded = new FitInputs.Stated(SpecimenFile.read(specimenFile),
                hasSpec ? Optional.of(SpecificationFile.read(specFile)) : Optional.empty());
        if (given.isEmpty()) {
            return Optional.of(recorded);
        }
        if (!ResultJson.specimenFile(recorded.specimen()).equals(ResultJson.specimenFile(given.get().specimen()))) {
            throw new AnalysisException("--specimen " + options.specimenFile() + " states another specimen than the "
                    + specimenFile + " recorded at the sweep; what was stated at the test is never replaced: leave"
                    + " out --specimen, or run the specimen anew in another folder");
        }
        if (hasSpec) {
            same(specFile, "--spec", options.specificationFile(), recorded.specification().get(),
                    given.get().specification());
            return Optional.of(recorded);
        }
        if (given.get().specification().isPresent()) {
            FitInputs.Stated stated = new FitInputs.Stated(recorded.specimen(), given.get().specification());
            write(runDir, stated);
            return Optional.of(stated);
        }
        return Optional.of(recorded);
    }

    private static void same(Path recordedFile, String option, Path givenFile, Specification recorded,
                             Optional<Specification> given) {
        if (given.isPresent() && !ResultJson.specificationFile(recorded).equals(ResultJson.specificationFile(given.get()))) {
            throw new AnalysisException(option + " " + givenFile + " states other limits than the " + recordedFile
                    + " recorded at the sweep; what was stated at the test is never replaced: leave out " + option
                    + ", or run the specimen anew in another folder");
        }
    }
}
