package org.tautline.analysis.specimen;

import java.util.Objects;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.modal.FittedMode;

/**
 * A numbered fitted mode from one run, with the mode's vibration amplitude in that run.
 *
 * @param harmonic harmonic number n
 * @param mode the fitted mode
 * @param modalAmplitudeM peak transverse displacement of the mode's shape in the run, m (0 or more)
 */
public record LevelledMode(int harmonic, FittedMode mode, double modalAmplitudeM) {

    /** Checks the values. */
    public LevelledMode {
        if (harmonic < 1) {
            throw new AnalysisException("harmonic must be 1 or more, got " + harmonic);
        }
        Objects.requireNonNull(mode, "mode must be given");
        if (!(modalAmplitudeM >= 0) || Double.isInfinite(modalAmplitudeM)) {
            throw new AnalysisException("modal amplitude of harmonic " + harmonic
                    + " must be zero or a positive finite number of m, got " + modalAmplitudeM);
        }
    }
}
