package org.tautline.app.trace;

import java.time.LocalDate;
import java.util.Optional;

/**
 * One instrument of a rig as its rig file states it: what it does, and the facts that trace its readings to a
 * calibration. A fact the file leaves out is absent here and printed as "not given", never made up.
 *
 * @param role what the instrument does on the rig, for example "force sensor"
 * @param model maker's model, when stated
 * @param serial serial number, when stated
 * @param calibrationCertificate number of the calibration certificate in force, when stated
 * @param calibrationDue the date the calibration runs out, when stated
 */
public record Instrument(String role, Optional<String> model, Optional<String> serial,
                         Optional<String> calibrationCertificate, Optional<LocalDate> calibrationDue) {
    /** Checks the role is given and no optional is null. */
    public Instrument {
        if (role == null || role.isBlank()) {
            throw new IllegalArgumentException("an instrument needs its role, for example \"force sensor\"");
        }
        if (model == null || serial == null || calibrationCertificate == null || calibrationDue == null) {
            throw new IllegalArgumentException("an instrument's facts are given or empty, never null");
        }
    }

    /**
     * @param on the day that counts (the test date)
     * @return true when a due date is stated and lies before {@code on}: the calibration had run out
     */
    public boolean calibrationExpiredOn(LocalDate on) {
        return calibrationDue.isPresent() && calibrationDue.get().isBefore(on);
    }
}
