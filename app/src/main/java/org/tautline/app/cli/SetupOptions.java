package org.tautline.app.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.Optional;
import java.util.OptionalDouble;

import org.tautline.analysis.AnalysisException;
import org.tautline.app.trace.RigFile;
import org.tautline.app.trace.RunSetup;
import picocli.CommandLine.Option;

/** The run's setup on the command line: the rig file and the air at the test (and, for a report, the test date). */
final class SetupOptions {
    @Option(names = "--rig-file", paramLabel = "RIG.json",
            description = "The rig file: the rig's name and its instruments with serials and calibration (see the README).")
    private Path rigFile;

    @Option(names = "--temperature-c", paramLabel = "C", description = "Air temperature at the specimen during the test, °C.")
    private Double temperatureC;

    @Option(names = "--humidity-pct", paramLabel = "RH", description = "Relative humidity during the test, %%.")
    private Double humidityPct;

    /**
     * @param testedAt when the test was made, when known
     * @return the setup these options give
     * @throws IOException when the rig file cannot be read
     */
    RunSetup setup(Optional<Instant> testedAt) throws IOException {
        try {
            return new RunSetup(testedAt, temperatureC == null ? OptionalDouble.empty() : OptionalDouble.of(temperatureC),
                    humidityPct == null ? OptionalDouble.empty() : OptionalDouble.of(humidityPct),
                    rigFile == null ? Optional.empty() : Optional.of(RigFile.read(rigFile)));
        } catch (AnalysisException e) {
            throw e.getMessage().startsWith(String.valueOf(rigFile)) ? e
                    : new AnalysisException("--temperature-c/--humidity-pct: " + e.getMessage(), e);
        }
    }

    /**
     * @param text a test date as an option gives it: an ISO 8601 instant or a date (taken as midnight UTC)
     * @return the instant
     */
    static Instant testDate(String text) {
        try {
            return Instant.parse(text);
        } catch (DateTimeParseException e) {
            try {
                return LocalDate.parse(text).atStartOfDay(ZoneOffset.UTC).toInstant();
            } catch (DateTimeParseException again) {
                throw new AnalysisException("--test-date '" + text + "': expected a date (2026-11-02) or an ISO 8601"
                        + " instant in UTC (2026-11-02T09:14:00Z)");
            }
        }
    }
}
