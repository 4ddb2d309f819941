package org.tautline.app.report;

import java.awt.Color;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.tautline.analysis.verdict.Specification;
import org.tautline.app.trace.DataFile;
import org.tautline.app.trace.Instrument;
import org.tautline.app.trace.RunSetup;

/**
 * The report's traceability: report number, specification and revision, test and report dates, the air, the rig's
 * instruments with serials and calibration, and the SHA-256 of each data file. A fact nobody gave is printed "not
 * given"; a calibration that had run out at the test is said so plainly.
 */
final class TraceSections {
    private static final float[] INSTRUMENT_COLUMNS = {0, 95, 190, 270, 365, 425};
    private static final Color WARNING = new Color(180, 40, 0);

    private TraceSections() {
    }

    /** The lines under the title: who, what, when, where. */
    static Section header(RunDirectory run, ReportInfo info, Optional<Specification> specification) {
        RunSetup setup = run.setup();
        Section s = new Section("");
        s.line("Report number: " + (info.reportNumber().isEmpty() ? ReportText.NOT_GIVEN : info.reportNumber())
                + "     Specification: " + specification.map(TraceSections::specification)
                .orElse("none (no specification in the run: no limit judged)"), 9);
        s.line("Tested: " + setup.testedAt().map(ReportText::dateTime).orElse(ReportText.NOT_GIVEN + " (the run records"
                + " no test date)") + "     Report made: " + ReportText.dateTime(info.createdAt()) + " by "
                + info.softwareVersion(), 9);
        s.line("Air at the test: temperature " + setup.temperatureC().stream().mapToObj(t -> ReportText.FORMAT.value(t, "°C"))
                .findFirst().orElse(ReportText.NOT_GIVEN) + ", relative humidity " + setup.relativeHumidityPct().stream()
                .mapToObj(h -> ReportText.FORMAT.value(h, "%")).findFirst().orElse(ReportText.NOT_GIVEN)
                + " (temperature changes tension and damping).", 9);
        s.line("Rig: " + setup.rig().map(r -> r.name()).orElse(ReportText.NOT_GIVEN) + "     Operator: "
                + (info.operator().isEmpty() ? ReportText.NOT_GIVEN : info.operator()) + "     Run folder: "
                + run.directory().toAbsolutePath(), 9);
        return s;
    }

    private static String specification(Specification spec) {
        return spec.name() + ", revision " + (spec.revision().isBlank() ? ReportText.NOT_GIVEN : spec.revision());
    }

    /**
     * @return one plain sentence per instrument whose calibration had run out at the test (or, with no test date, by
     *         the report date)
     */
    static List<String> expiredCalibrations(RunDirectory run, ReportInfo info) {
        List<String> out = new ArrayList<>();
        RunSetup setup = run.setup();
        LocalDate on = setup.testedAt().orElse(info.createdAt()).atZone(ZoneOffset.UTC).toLocalDate();
        String when = setup.testedAt().isPresent() ? "before the test" : "before the report date (no test date given)";
        setup.rig().ifPresent(rig -> rig.instruments().stream().filter(i -> i.calibrationExpiredOn(on)).forEach(i ->
                out.add("Calibration expired: " + i.role() + " (serial " + i.serial().orElse(ReportText.NOT_GIVEN)
                        + ") was due on " + i.calibrationDue().get() + ", " + when + "; its readings are not traceable to"
                        + " a valid calibration.")));
        return out;
    }

    /** Instruments, serials and calibration. */
    static Section instruments(RunDirectory run, ReportInfo info) {
        Section s = new Section("Instruments and calibration");
        RunSetup setup = run.setup();
        if (setup.rig().isEmpty()) {
            return s.line("No rig file was recorded for this run: instrument serials, calibration certificates and due"
                    + " dates are not given.", 9);
        }
        List<Instrument> instruments = setup.rig().get().instruments();
        if (instruments.isEmpty()) {
            return s.line("No instruments are recorded for the rig " + setup.rig().get().name() + ": serials and"
                    + " calibration are not given.", 9);
        }
        LocalDate on = setup.testedAt().orElse(info.createdAt()).atZone(ZoneOffset.UTC).toLocalDate();
        s.row(new String[] {"instrument", "model", "serial", "certificate", "due", "calibration"}, INSTRUMENT_COLUMNS, true);
        for (Instrument i : instruments) {
            String status = i.calibrationDue().isEmpty() ? ReportText.NOT_GIVEN
                    : i.calibrationExpiredOn(on) ? "EXPIRED" : "valid";
            // A role with a description ("force sensor: full scale 5 N, ...") gives the table its name, and the
            // description its own line below, so that no text runs into the next column.
            String[] role = i.role().split(":\\s*", 2);
            s.row(new String[] {role[0], i.model().orElse(ReportText.NOT_GIVEN), i.serial().orElse(ReportText.NOT_GIVEN),
                    i.calibrationCertificate().orElse(ReportText.NOT_GIVEN),
                    i.calibrationDue().map(LocalDate::toString).orElse(ReportText.NOT_GIVEN), status}, INSTRUMENT_COLUMNS,
                    false);
            if (role.length > 1 && !role[1].isBlank()) {
                s.line("    " + role[1], 7);
            }
        }
        s.line("Calibration is judged valid when its due date is not before " + (setup.testedAt().isPresent()
                ? "the test date." : "the report date (the run records no test date)."), 8);
        for (String expired : expiredCalibrations(run, info)) {
            s.boldLine(expired, 8, WARNING);
        }
        return s;
    }

    /** The SHA-256 of each data file. */
    static Section dataFiles(RunDirectory run) {
        Section s = new Section("Data files (SHA-256)");
        if (run.dataFiles().isEmpty()) {
            return s.line("The result was not read from files (it was made in the workbench): no data file checksum.", 9);
        }
        s.line("Anyone holding these files can check them with any SHA-256 tool (FIPS 180-4), for example sha256sum.", 8);
        for (DataFile f : run.dataFiles()) {
            s.line(f.name() + "   " + f.sha256(), 8);
        }
        return s;
    }
}
