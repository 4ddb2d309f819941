package org.tautline.app.report;

import java.time.Instant;

/**
 * Who, when and with what a report was made.
 *
 * @param operator the operator's name, empty when not given (a blank line is left to fill in)
 * @param softwareVersion the software name and version
 * @param createdAt when the report was made (UTC)
 */
public record ReportInfo(String operator, String softwareVersion, Instant createdAt) {
    /** This software's name and version as reports print it. */
    public static final String SOFTWARE = "Tautline 0.1.0";
}
