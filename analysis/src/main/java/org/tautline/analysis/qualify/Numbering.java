package org.tautline.analysis.qualify;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.specimen.AbsenceReason;
import org.tautline.analysis.specimen.AbsentHarmonic;
import org.tautline.analysis.specimen.AssignedMode;
import org.tautline.analysis.specimen.HarmonicAssigner;
import org.tautline.analysis.specimen.HarmonicAssignment;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.specimen.StringPhysics;

/**
 * Numbers the fitted modes as harmonics, checked against what was stated about the specimen.
 *
 * <p>A numbering fixes f1, and with the stated mass per length and span the tension (Mersenne's law, f1 =
 * sqrt(T/mu)/(2L)). A numbering whose f1 lies far from the one the stated tension gives implies a tension far
 * from it too: the 225.6 Hz fundamental of a 150 N wire numbered as its eighth harmonic would mean 2 N. Such a
 * numbering is more likely wrong (a band that leaves out the first harmonics, a stray rig resonance, wrong
 * stated values) than a specimen that far off, so it is refused and the verdict is left undetermined with the
 * reason, never a confident FAIL. The numbering must put f1 within {@value #FUNDAMENTAL_TOLERANCE} of the stated
 * one, relative: a tension between 0.49 and 1.69 times the stated (1 -/+ 0.3, squared), wide enough for a
 * specimen that really is out of its specification.
 */
final class Numbering {
    /** How far the numbered f1 may lie from the stated one, relative. */
    static final double FUNDAMENTAL_TOLERANCE = 0.3;
    /** A missing harmonic expected at least this fraction as strong as the median numbered one is implausible. */
    static final double GAP_SIGNIFICANCE = 0.3;
    /** A mode counts as determined when the standard error of its frequency is below this fraction of it. */
    static final double DETERMINED_FRACTION = 0.01;

    private Numbering() {
    }

    /**
     * The numbering, or why there is none.
     *
     * @param harmonics the numbering (every mode unnumbered when refused)
     * @param refusal why the modes could not be numbered, one plain sentence; empty when they were
     */
    record Outcome(HarmonicAssignment harmonics, Optional<String> refusal) {
    }

    /**
     * @param specimen what was stated about the specimen
     * @param fitted the fitted modes
     * @param bandLowHz lowest frequency fitted, Hz
     * @param bandHighHz highest frequency fitted, Hz
     * @param splitTolerance largest relative split of a doublet
     * @return the numbering, or every mode unnumbered with the reason
     */
    static Outcome number(Specimen specimen, List<FittedMode> fitted, double bandLowHz, double bandHighHz,
                          double splitTolerance) {
        String band = String.format(Locale.ROOT, "%.4g .. %.4g Hz", bandLowHz, bandHighHz);
        if (fitted.isEmpty()) {
            return new Outcome(none(0), Optional.of("no mode was found in the band " + band + ", so no harmonic could"
                    + " be numbered"));
        }
        double statedF1 = statedFundamentalHz(specimen);
        HarmonicAssigner assigner = new HarmonicAssigner().withSplitTolerance(splitTolerance);
        try {
            HarmonicAssignment h = assigner.withFundamentalTolerance(FUNDAMENTAL_TOLERANCE).assign(specimen, fitted,
                    statedF1, bandLowHz, bandHighHz);
            Optional<String> gaps = implausibleGaps(specimen, h);
            return new Outcome(h, gaps.isPresent() ? gaps : strongUnnumbered(specimen, fitted, h));
        } catch (AnalysisException refused) {
            String implied = impliedTension(assigner, specimen, fitted, bandLowHz, bandHighHz)
                    .map(t -> String.format(Locale.ROOT, "; the best numbering without that check would mean %.3g N", t))
                    .orElse("");
            return new Outcome(none(fitted.size()), Optional.of(String.format(Locale.ROOT, "the %d mode(s) found in %s"
                    + " cannot be numbered as harmonics of the specimen as stated: its tension of %.4g N and mass per"
                    + " length of %.4g kg/m put f1 near %.4g Hz, and no numbering puts f1 within %.0f %% of that%s;"
                    + " check the stated values and the band, or choose the poles by hand", fitted.size(), band,
                    specimen.nominalTensionN(), specimen.linearDensityKgPerM(), statedF1, 100 * FUNDAMENTAL_TOLERANCE,
                    implied)));
        }
    }

    /**
     * A numbering that leaves out a harmonic below its highest one, where the stated positions put no node and the
     * expected modal constant is as large as those found, is more likely wrong than the harmonic too weak to see.
     *
     * <p>The expected modal constant of harmonic n under point forcing at x_f, seen at x_s, is
     * phi_n(x_f) phi_n(x_s) with phi_n(x) = sqrt(2/(mu L)) sin(n pi x/L), the mass-normalised shape of a pinned string
     * (S. S. Rao, Vibration of Continuous Systems, 2007, ch. 8, from memory). A missing harmonic whose expected
     * constant is at least {@value #GAP_SIGNIFICANCE} of the median of the numbered ones' is implausible.
     */
    private static Optional<String> implausibleGaps(Specimen specimen, HarmonicAssignment h) {
        int top = h.modes().stream().mapToInt(AssignedMode::harmonic).max().orElse(0);
        double[] numbered = h.modes().stream().mapToInt(AssignedMode::harmonic).distinct()
                .mapToDouble(n -> expectedConstant(specimen, n)).sorted().toArray();
        if (numbered.length == 0) {
            return Optional.empty();
        }
        double median = numbered[numbered.length / 2];
        List<Integer> implausible = new ArrayList<>();
        for (AbsentHarmonic a : h.absent()) {
            if (a.reason() == AbsenceReason.BELOW_NOISE && a.harmonic() < top
                    && expectedConstant(specimen, a.harmonic()) >= GAP_SIGNIFICANCE * median) {
                implausible.add(a.harmonic());
            }
        }
        if (implausible.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(String.format(Locale.ROOT, "the numbering leaves out harmonic(s) %s although the stated"
                + " forcing and sensor positions put no node there and expect them as strong as those found, so it is"
                + " likely wrong (f1 %.4g Hz, where the stated tension and mass per length give %.4g Hz); check the"
                + " stated values and the band, or choose the poles by hand", implausible, h.numberingFundamentalHz(),
                statedFundamentalHz(specimen)));
    }

    /**
     * A mode the numbering leaves out that is well determined and as strong as the numbered ones is not a stray
     * rig resonance (those are weak in a string's FRF): the numbering is more likely wrong.
     */
    private static Optional<String> strongUnnumbered(Specimen specimen, List<FittedMode> fitted,
                                                     HarmonicAssignment h) {
        double[] numbered = h.modes().stream().mapToDouble(a -> fitted.get(a.modeIndex()).mode().modalConstant().norm())
                .sorted().toArray();
        if (numbered.length == 0) {
            return Optional.empty();
        }
        double median = numbered[numbered.length / 2];
        List<String> strong = new ArrayList<>();
        for (int i : h.unnumberedModes()) {
            FittedMode m = fitted.get(i);
            double f = m.mode().frequencyHz();
            boolean determined = m.frequencyStdHz() > 0 && m.frequencyStdHz() < DETERMINED_FRACTION * f;
            if (determined && m.mode().modalConstant().norm() >= GAP_SIGNIFICANCE * median) {
                strong.add(String.format(Locale.ROOT, "%.4g Hz", f));
            }
        }
        if (strong.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(String.format(Locale.ROOT, "the numbering (f1 %.4g Hz) leaves out mode(s) at %s as strong as"
                + " those it numbers, so it is likely wrong; check the stated tension and mass per length (they put f1"
                + " near %.4g Hz) and the band, or choose the poles by hand", h.numberingFundamentalHz(),
                String.join(", ", strong), statedFundamentalHz(specimen)));
    }

    private static double expectedConstant(Specimen s, int n) {
        return Math.abs(StringPhysics.modeShape(n, s.forcingPositionM(), s.lengthM(), s.linearDensityKgPerM())
                * StringPhysics.modeShape(n, s.sensorPositionM(), s.lengthM(), s.linearDensityKgPerM()));
    }

    /** f1 of the stated specimen: Mersenne's fundamental with the stated bending stiffness, for its end condition. */
    static double statedFundamentalHz(Specimen specimen) {
        double f0 = StringPhysics.mersenneFundamentalHz(specimen.lengthM(), specimen.nominalTensionN(),
                specimen.linearDensityKgPerM());
        double b = specimen.bendingStiffnessNm2() > 0 ? StringPhysics.inharmonicity(specimen.bendingStiffnessNm2(),
                specimen.nominalTensionN(), specimen.lengthM()) : 0.0;
        return StringPhysics.stiffStringFrequencyHz(1, f0, b, specimen.ends());
    }

    private static Optional<Double> impliedTension(HarmonicAssigner assigner, Specimen specimen, List<FittedMode> fitted,
                                                   double bandLowHz, double bandHighHz) {
        try {
            HarmonicAssignment free = assigner.assign(specimen, fitted, Double.NaN, bandLowHz, bandHighHz);
            double f0 = free.numberingFundamentalHz();
            return Double.isFinite(f0) && f0 > 0 ? Optional.of(StringPhysics.mersenneTensionN(f0, 1, specimen.lengthM(),
                    specimen.linearDensityKgPerM())) : Optional.empty();
        } catch (AnalysisException e) {
            return Optional.empty();
        }
    }

    /** A numbering that numbers nothing: every one of the modes unnumbered. */
    private static HarmonicAssignment none(int modeCount) {
        List<Integer> all = new ArrayList<>();
        for (int i = 0; i < modeCount; i++) {
            all.add(i);
        }
        return new HarmonicAssignment(List.of(), all, List.of(), Double.NaN, Double.NaN);
    }
}
