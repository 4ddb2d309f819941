package org.tautline.analysis.specimen;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.format.QuantityFormat;
import org.tautline.analysis.format.TextStyle;

/**
 * Checks that natural frequencies do not depend on the test level, against the Kirchhoff-Carrier backbone.
 *
 * <p>The Kirchhoff-Carrier string, mu w_tt = [T0 + EA/(2L) int w_x^2 dx] w_xx (G. Kirchhoff, 1877;
 * G. F. Carrier, Q. Appl. Math. 3:157, 1945; from memory), reduced to one mode w = a sin(kx),
 * k = n pi/L, is a Duffing oscillator a'' + w0^2 a + (EA k^4/(4 mu)) a^3 = 0, whose first-order
 * backbone (Lindstedt-Poincare) is w/w0 = 1 + (3/32)(EA/T0)(k a)^2: a hardening shift. Two runs at
 * different levels (or an up and a down sweep at one level) are compared harmonic by harmonic; a
 * shift is significant when it exceeds k sigma of its uncertainty (default 3) and a stated relative
 * tolerance (default 1e-3, our choice: 0.2 % in tension). The backbone prediction is reported beside
 * it when EA is known. Agreement with the prediction says the shift is geometric stretching;
 * disagreement points to something else (a slipping clamp, a loose shaker, heating).
 */
public final class LinearityCheck {
    /** How findings write numbers: GUM 7.2.6 rounding, one ±. */
    private static final QuantityFormat WORDS = new QuantityFormat(TextStyle.UNICODE);
    private final double relativeTolerance;
    private final double sigmas;

    /** A check with a tolerance of 1e-3 and 3 sigma. */
    public LinearityCheck() {
        this(1e-3, 3);
    }

    private LinearityCheck(double tolerance, double sigmas) {
        this.relativeTolerance = tolerance;
        this.sigmas = sigmas;
    }

    /**
     * Sets the relative shift below which a harmonic is linear whatever its uncertainty.
     *
     * @param relative 0 or more, default 1e-3
     * @return a new check
     */
    public LinearityCheck withTolerance(double relative) {
        if (!(relative >= 0 && relative < 1)) {
            throw new AnalysisException("relative tolerance must lie in 0..1, got " + relative);
        }
        return new LinearityCheck(relative, sigmas);
    }

    /**
     * Sets how many standard errors a shift must exceed to count.
     *
     * @param k positive, default 3
     * @return a new check
     */
    public LinearityCheck withSigmas(double k) {
        if (!(k > 0) || Double.isInfinite(k)) {
            throw new AnalysisException("number of standard errors must be positive, got " + k);
        }
        return new LinearityCheck(relativeTolerance, k);
    }

    /**
     * Kirchhoff-Carrier one-mode backbone, w/w0 = 1 + (3/32)(EA/T0)(k a)^2.
     *
     * @param harmonic n
     * @param lengthM L, m
     * @param axialStiffnessN EA, N
     * @param tensionN T0, N
     * @param amplitudeM modal amplitude a, m
     * @return w/w0
     */
    public static double backboneRatio(int harmonic, double lengthM, double axialStiffnessN, double tensionN,
                                       double amplitudeM) {
        if (harmonic < 1 || !(lengthM > 0) || !(axialStiffnessN >= 0) || !(tensionN > 0) || !(amplitudeM >= 0)) {
            throw new AnalysisException("backbone needs n >= 1, L > 0, EA >= 0, T0 > 0 and a >= 0, got n = " + harmonic
                    + ", L = " + lengthM + " m, EA = " + axialStiffnessN + " N, T0 = " + tensionN + " N, a = "
                    + amplitudeM + " m");
        }
        double ka = harmonic * Math.PI / lengthM * amplitudeM;
        return 1 + 3.0 / 32.0 * axialStiffnessN / tensionN * ka * ka;
    }

    /**
     * Compares two runs.
     *
     * @param specimen the specimen (length, EA; EA 0 means no prediction)
     * @param tensionN the static tension T0, N (the estimate, or the nominal)
     * @param first modes of the first run (lower level, or the up sweep)
     * @param second modes of the second run (higher level, or the down sweep)
     * @return per-harmonic shifts and the verdict
     */
    public LinearityResult compare(Specimen specimen, double tensionN, List<LevelledMode> first,
                                   List<LevelledMode> second) {
        Map<Integer, LevelledMode> a = index(first, "first");
        Map<Integer, LevelledMode> b = index(second, "second");
        List<HarmonicShift> shifts = new ArrayList<>();
        List<String> findings = new ArrayList<>();
        double ea = specimen.axialStiffnessN();
        for (var e : a.entrySet()) {
            LevelledMode m2 = b.get(e.getKey());
            if (m2 == null) {
                continue;
            }
            LevelledMode m1 = e.getValue();
            int n = e.getKey();
            double f1 = m1.mode().mode().frequencyHz();
            double f2 = m2.mode().mode().frequencyHz();
            double shift = (f2 - f1) / f1;
            double std = Math.hypot(m1.mode().frequencyStdHz(), m2.mode().frequencyStdHz()) / f1;
            double predicted = ea > 0
                    ? backboneRatio(n, specimen.lengthM(), ea, tensionN, m2.modalAmplitudeM())
                    / backboneRatio(n, specimen.lengthM(), ea, tensionN, m1.modalAmplitudeM()) - 1
                    : Double.NaN;
            boolean significant = Math.abs(shift) > sigmas * std && Math.abs(shift) > relativeTolerance;
            shifts.add(new HarmonicShift(n, f1, f2, shift, std, predicted, significant));
            if (significant) {
                findings.add("harmonic " + n + " shifted by " + WORDS.withUncertainty(shift, std, "")
                        + " (relative) between the runs" + (Double.isNaN(predicted)
                        ? "; axial stiffness EA not stated, so the Kirchhoff-Carrier backbone gives no prediction"
                        : "; the Kirchhoff-Carrier backbone predicts " + WORDS.number(predicted)));
            }
        }
        if (shifts.isEmpty()) {
            throw new AnalysisException("the two runs share no harmonic: " + a.keySet() + " and " + b.keySet());
        }
        boolean linear = shifts.stream().noneMatch(HarmonicShift::significant);
        findings.add(0, linear ? "linear at the test level: no harmonic shifted by more than " + WORDS.number(
                relativeTolerance) + " (relative) and " + WORDS.number(sigmas) + " standard errors"
                : "not linear at the test level");
        return new LinearityResult(shifts, linear, findings);
    }

    private static Map<Integer, LevelledMode> index(List<LevelledMode> run, String name) {
        Map<Integer, LevelledMode> out = new TreeMap<>();
        for (LevelledMode m : run) {
            if (out.put(m.harmonic(), m) != null) {
                throw new AnalysisException("the " + name + " run has harmonic " + m.harmonic()
                        + " twice; give one mode per harmonic");
            }
        }
        return out;
    }
}
