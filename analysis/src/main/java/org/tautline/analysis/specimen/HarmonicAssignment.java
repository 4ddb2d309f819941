package org.tautline.analysis.specimen;

import java.util.ArrayList;
import java.util.List;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.modal.FittedMode;

/**
 * The harmonic numbers of a set of fitted modes, and the harmonics that are missing and why.
 *
 * @param modes the numbered modes, in order of frequency
 * @param unnumberedModes indices of modes that fit no harmonic (rig modes, spurious peaks)
 * @param absent every harmonic up to the top of the band with no mode, with its reason
 * @param numberingFundamentalHz f0 of the numbering model f_n = n f0 sqrt(1 + B n^2), Hz
 * @param inharmonicityB B of the numbering model
 */
public record HarmonicAssignment(List<AssignedMode> modes, List<Integer> unnumberedModes, List<AbsentHarmonic> absent,
                                 double numberingFundamentalHz, double inharmonicityB) {

    /** Copies the lists so that the record stays immutable. */
    public HarmonicAssignment {
        modes = List.copyOf(modes);
        unnumberedModes = List.copyOf(unnumberedModes);
        absent = List.copyOf(absent);
    }

    /**
     * The harmonic of one mode.
     *
     * @param modeIndex index in the list given to the numbering
     * @return n, or 0 when the mode was not numbered
     */
    public int harmonicOf(int modeIndex) {
        return modes.stream().filter(m -> m.modeIndex() == modeIndex).mapToInt(AssignedMode::harmonic).findFirst()
                .orElse(0);
    }

    /**
     * The numbered modes as frequencies with harmonic numbers and standard errors, for the tension fit.
     *
     * @param fitted the same list of fitted modes that was numbered
     * @return one entry per numbered mode (both polarisations of a doublet appear)
     */
    public List<NumberedFrequency> numberedFrequencies(List<FittedMode> fitted) {
        List<NumberedFrequency> out = new ArrayList<>();
        for (AssignedMode m : modes) {
            if (m.modeIndex() >= fitted.size()) {
                throw new AnalysisException("mode index " + m.modeIndex() + " is not in the list of " + fitted.size()
                        + " fitted modes");
            }
            FittedMode f = fitted.get(m.modeIndex());
            out.add(new NumberedFrequency(m.harmonic(), f.mode().frequencyHz(), f.frequencyStdHz()));
        }
        return out;
    }
}
