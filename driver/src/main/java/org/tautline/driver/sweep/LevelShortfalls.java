package org.tautline.driver.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Gathers the steps of a pass whose force level could not be reached into bands of consecutive steps, for one
 * warning per band instead of one per step.
 */
final class LevelShortfalls {
    private final double targetN;
    private final double driveLimitV;
    private final List<String> warnings = new ArrayList<>();
    private int count;
    private double firstHz;
    private double lastHz;
    private double lowestN;
    private boolean atLimit;

    /**
     * @param targetN the pass's force level, N
     * @param driveLimitV the plan's drive limit, V
     */
    LevelShortfalls(double targetN, double driveLimitV) {
        this.targetN = targetN;
        this.driveLimitV = driveLimitV;
    }

    /**
     * @param point a completed step of the pass, in the order run
     * @param shortOfLevel true when the level control could not reach the target at it
     */
    void add(SweepPoint point, boolean shortOfLevel) {
        if (!shortOfLevel) {
            close();
            return;
        }
        if (count == 0) {
            firstHz = point.frequencyHz();
            lowestN = point.forceAmplitudeN();
            atLimit = false;
        }
        count++;
        lastHz = point.frequencyHz();
        lowestN = Math.min(lowestN, point.forceAmplitudeN());
        atLimit |= point.driveAmplitudeV() >= driveLimitV * (1 - 1e-12);
    }

    private void close() {
        if (count == 0) {
            return;
        }
        String where = count == 1 ? String.format(Locale.ROOT, "at %.2f Hz", firstHz)
                : String.format(Locale.ROOT, "at %d steps from %.2f to %.2f Hz", count, Math.min(firstHz, lastHz),
                        Math.max(firstHz, lastHz));
        warnings.add(String.format(Locale.ROOT, "force level not reached %s: as low as %.4g N of the %.4g N asked for%s",
                where, lowestN, targetN, atLimit ? ", with the drive at its limit " + driveLimitV + " V" : ""));
        count = 0;
    }

    /** @return one warning per band, the band in progress included */
    List<String> warnings() {
        close();
        return List.copyOf(warnings);
    }
}
