package org.tautline.app.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Specification;
import org.tautline.app.qualify.SpecificationFile;
import org.tautline.app.qualify.SpecimenFile;
import picocli.CommandLine.Option;

/** What a fit needs besides the FRF to qualify it: the specimen as stated and, to judge it, the specification. */
final class FitInputs {
    @Option(names = "--specimen", paramLabel = "S.json", description = "The specimen description (see the README).")
    private Path specimenFile;

    @Option(names = "--spec", paramLabel = "SPEC.json", description = "The specification to judge against (needs --specimen).")
    private Path specificationFile;

    /**
     * What was stated about the run.
     *
     * @param specimen the specimen
     * @param specification the limits, empty when none were given
     */
    record Stated(Specimen specimen, Optional<Specification> specification) {
    }

    /**
     * Reads and checks the files given, whole.
     *
     * @return the specimen and limits; empty without {@code --specimen}
     * @throws IOException when a file cannot be read
     * @throws AnalysisException for {@code --spec} without {@code --specimen}, or a file that does not hold what it
     *         should, naming it
     */
    Optional<Stated> read() throws IOException {
        if (specificationFile != null && specimenFile == null) {
            throw new AnalysisException("--spec needs --specimen: the limits judge the specimen's properties");
        }
        if (specimenFile == null) {
            return Optional.empty();
        }
        Specimen specimen = SpecimenFile.read(specimenFile);
        Optional<Specification> specification = specificationFile == null ? Optional.empty()
                : Optional.of(SpecificationFile.read(specificationFile));
        return Optional.of(new Stated(specimen, specification));
    }

    /** @return the option that gave the specimen file, for messages */
    Path specimenFile() {
        return specimenFile;
    }

    /** @return the option that gave the specification file, for messages; null when not given */
    Path specificationFile() {
        return specificationFile;
    }
}
