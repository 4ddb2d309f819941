package org.tautline.app.trace;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;

/**
 * Which instruments of a run had no valid calibration at the test. Readings of an instrument whose calibration had
 * run out are not traceable (ISO/IEC 17025:2017, 6.4 and 6.5, from memory), so a verdict resting on them cannot be
 * given: each such instrument is a caution that makes the verdict not determinable.
 */
public final class Calibrations {
    private Calibrations() {
    }

    /**
     * @param setup the run's recorded setup
     * @param reportDate the date used when the run records no test date
     * @return one plain sentence per instrument whose calibration had run out by the test date (or the report date)
     */
    public static List<String> expired(RunSetup setup, Instant reportDate) {
        LocalDate on = setup.testedAt().orElse(reportDate).atZone(ZoneOffset.UTC).toLocalDate();
        String when = setup.testedAt().isPresent() ? "before the test" : "before the report date (the run records no"
                + " test date)";
        List<String> out = new ArrayList<>();
        setup.rig().ifPresent(rig -> rig.instruments().stream().filter(i -> i.calibrationExpiredOn(on)).forEach(i ->
                out.add("the calibration of the " + i.role() + " (serial " + i.serial().orElse("not given")
                        + ") was due on " + i.calibrationDue().orElseThrow() + ", " + when
                        + ", so its readings are not traceable to a valid calibration")));
        return out;
    }
}
