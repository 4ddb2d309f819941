package org.tautline.analysis.specimen;

import java.util.Random;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Mode;

/** Fitted modes of a known string for tests: frequencies with seeded noise, point-force modal constants. */
final class SyntheticModes {
    private SyntheticModes() {
    }

    /**
     * A fitted mode of harmonic n with the given true frequency.
     *
     * <p>Modal constant (2/(mu L)) sin(n pi x_f/L) sin(n pi x_s/L) (point force on a string with
     * mass-normalised modes, checks.md), frequency drawn from N(f, (relStd f)^2).
     */
    static FittedMode mode(Specimen s, int n, double trueFrequencyHz, double relStd, Random random) {
        double std = relStd * trueFrequencyHz;
        double f = trueFrequencyHz + std * random.nextGaussian();
        double a = 2 / (s.linearDensityKgPerM() * s.lengthM()) * s.forcingShape(n) * s.sensorShape(n);
        return new FittedMode(new Mode(f, 1e-3, new Complex(a, 0)), std, 1e-4, new Complex(1e-3 * Math.abs(a) + 1e-6, 1e-6));
    }

    /** Fletcher's pinned stiff-string frequency of harmonic n at the specimen's nominal tension and EI. */
    static double pinnedHz(Specimen s, int n) {
        double f0 = s.nominalFundamentalHz();
        double b = StringPhysics.inharmonicity(s.bendingStiffnessNm2(), s.nominalTensionN(), s.lengthM());
        return StringPhysics.stiffStringFrequencyHz(n, f0, b, EndCondition.PINNED);
    }
}
