package org.tautline.app.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.tautline.analysis.AnalysisException;
import org.tautline.app.trace.RigDescription;
import org.tautline.app.trace.RigFile;
import org.tautline.app.trace.RunSetup;

/**
 * What the person exporting a report from the window gives for it, as typed: who, the report number, and the facts of
 * the test the workbench does not know itself (the air, the rig file with instruments and calibration, and the test
 * date of an FRF that came from a file). A field left empty is "not given" in the report, never made up. Free of Swing.
 *
 * @param operator the operator's name, empty when not given
 * @param reportNumber the lab's number for the report, empty when not given
 * @param testDate the test date of an FRF from a file ({@code 2026-11-02} or an ISO 8601 instant), empty when not known;
 *        not used for a sweep run in the window, whose start is the test date
 * @param temperatureC the air temperature at the specimen, °C, empty when not measured
 * @param humidityPct the relative humidity, %, empty when not measured
 * @param rigFile the rig file's path, empty for none
 */
record ReportDetails(String operator, String reportNumber, String testDate, String temperatureC, String humidityPct,
                     String rigFile) {
    /** Takes null as empty and strips every field. */
    ReportDetails {
        operator = strip(operator);
        reportNumber = strip(reportNumber);
        testDate = strip(testDate);
        temperatureC = strip(temperatureC);
        humidityPct = strip(humidityPct);
        rigFile = strip(rigFile);
    }

    /**
     * The run's setup from these details and what the workbench knows; reads the rig file (call off the event thread).
     *
     * @param sweepStartedAt when the sweep of the result started, for a sweep run in the window; empty for an FRF
     *        from a file
     * @param rigOfTheRun the rig the window ran the sweep on, in words; used as the rig when no rig file is given
     * @return the setup to record and report
     * @throws IOException when the rig file cannot be read
     * @throws AnalysisException naming the field and what was expected
     */
    RunSetup setup(Optional<Instant> sweepStartedAt, Optional<String> rigOfTheRun) throws IOException {
        Optional<Instant> tested = sweepStartedAt.isPresent() ? sweepStartedAt : testDate(testDate);
        Optional<RigDescription> rig = rigFile.isEmpty()
                ? rigOfTheRun.filter(r -> !r.isBlank()).map(r -> new RigDescription(r, List.of()))
                : Optional.of(RigFile.read(Path.of(rigFile)));
        OptionalDouble temperature = number(temperatureC, "Air temperature (°C)", "21.5");
        OptionalDouble humidity = number(humidityPct, "Relative humidity (%)", "45");
        try {
            return new RunSetup(tested, temperature, humidity, rig);
        } catch (AnalysisException e) {
            throw new AnalysisException("Report details: " + e.getMessage(), e);
        }
    }

    private static Optional<Instant> testDate(String text) {
        if (text.isEmpty()) {
            return Optional.empty();
        }
        try {
            return Optional.of(Instant.parse(text));
        } catch (DateTimeParseException e) {
            try {
                return Optional.of(LocalDate.parse(text).atStartOfDay(ZoneOffset.UTC).toInstant());
            } catch (DateTimeParseException again) {
                throw new AnalysisException("Report details: Test date '" + text + "': expected a date (2026-11-02) or"
                        + " an ISO 8601 instant in UTC (2026-11-02T09:14:00Z), or leave it empty when not known");
            }
        }
    }

    private static OptionalDouble number(String text, String field, String example) {
        if (text.isEmpty()) {
            return OptionalDouble.empty();
        }
        try {
            double value = Double.parseDouble(text);
            if (Double.isFinite(value)) {
                return OptionalDouble.of(value);
            }
        } catch (NumberFormatException e) {
            // said below, with the field
        }
        throw new AnalysisException("Report details: " + field + " '" + text + "': expected a number, for example "
                + example + ", or leave it empty when not measured");
    }

    private static String strip(String text) {
        return text == null ? "" : text.strip();
    }
}
