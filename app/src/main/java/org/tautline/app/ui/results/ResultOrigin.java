package org.tautline.app.ui.results;

import java.time.Instant;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.Locale;

/**
 * Where a result on the results screen came from, for its header: when the run was made and on which rig.
 *
 * @param madeAt when the sweep started, or when an FRF from a file was fitted
 * @param how what that moment was, in words: "sweep started" or "fitted"
 * @param rig the rig in words (driver and the identity it answered), or where the FRF came from when no rig was used
 */
public record ResultOrigin(Instant madeAt, String how, String rig) {
    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss z", Locale.ROOT);

    /**
     * @param startedAt when the sweep started
     * @param driver the rig driver's name, for example "sim"
     * @param identity what the rig answered when asked who it is
     * @return the origin of a sweep run in the workbench
     */
    public static ResultOrigin sweep(Instant startedAt, String driver, String identity) {
        return new ResultOrigin(startedAt, "sweep started", driver + ": " + org.tautline.app.ui.PlainWords.of(identity));
    }

    /**
     * @param fittedAt when the fit was made
     * @param source where the FRF came from, for example "wire.csv"
     * @return the origin of an FRF read from a file
     */
    public static ResultOrigin file(Instant fittedAt, String source) {
        return new ResultOrigin(fittedAt, "fitted", "none: the FRF came from " + source);
    }

    /** @return when, in local time with the zone, for example "2025-06-11 14:03:12 CEST" */
    public String when() {
        return WHEN.format(madeAt.atZone(ZoneId.systemDefault()));
    }

    /** @return the time of day alone, for short messages, for example "14:03:12" */
    public static String timeOfDay(Instant at) {
        return DateTimeFormatter.ofPattern("HH:mm:ss", Locale.ROOT).format(at.atZone(ZoneId.systemDefault()));
    }
}
