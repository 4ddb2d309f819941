package org.tautline.app.report;

import java.time.Instant;

/**
 * Who, when and with what a report was made.
 *
 * @param operator the operator's name, empty when not given (a blank line is left to fill in)
 * @param softwareVersion the software name and version
 * @param createdAt when the report was made (UTC); the test date is the run's, in its setup
 * @param reportNumber the lab's number for this report, empty when not given (printed "not given", never made up)
 */
public record ReportInfo(String operator, String softwareVersion, Instant createdAt, String reportNumber) {
    /** This software's name and version as reports print it. */
    public static final String SOFTWARE = "Tautline 0.1.0";

    /** Checks that no part is null. */
    public ReportInfo {
        if (operator == null || softwareVersion == null || createdAt == null || reportNumber == null) {
            throw new IllegalArgumentException("report information is given or empty, never null");
        }
        operator = operator.strip();
        reportNumber = reportNumber.strip();
    }

    /**
     * Report information without a report number.
     *
     * @param operator the operator's name, empty when not given
     * @param softwareVersion the software name and version
     * @param createdAt when the report was made
     */
    public ReportInfo(String operator, String softwareVersion, Instant createdAt) {
        this(operator, softwareVersion, createdAt, "");
    }
}
