package org.tautline.app.qualify;

import java.util.Locale;
import java.util.Optional;

import org.tautline.analysis.format.QuantityFormat;
import org.tautline.analysis.format.Rounded;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.specimen.AbsentHarmonic;
import org.tautline.analysis.specimen.PatternFit;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.specimen.TensionEstimate;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.LimitText;
import org.tautline.driver.sim.SimulationTruth;
import org.tautline.driver.sim.TrueMode;

/**
 * A qualification as plain text, for the terminal and the window; with the simulated truth when there is one. Values
 * are written with their standard uncertainties rounded to two significant digits (GUM 7.2.6, {@link QuantityFormat}),
 * in the symbols the output can show.
 */
public final class ResultText {
    private ResultText() {
    }

    /**
     * Formats a demo outcome for standard output: each estimate beside the simulated truth.
     *
     * @param outcome result and truth
     * @return several lines of text
     */
    public static String format(DemoOutcome outcome) {
        return format(outcome.result(), Optional.of(outcome.truth()), QuantityFormat.forStandardOutput());
    }

    /**
     * Formats a qualification for standard output.
     *
     * @param r the result
     * @param truth the simulated truth, when the data came from the simulated rig
     * @return several lines of text
     */
    public static String format(QualificationResult r, Optional<SimulationTruth> truth) {
        return format(r, truth, QuantityFormat.forStandardOutput());
    }

    /**
     * Formats a qualification.
     *
     * @param r the result
     * @param truth the simulated truth, when the data came from the simulated rig
     * @param f how numbers and units are written (Unicode or ASCII)
     * @return several lines of text
     */
    public static String format(QualificationResult r, Optional<SimulationTruth> truth, QuantityFormat f) {
        StringBuilder out = new StringBuilder();
        Specimen s = r.specimen();
        out.append(String.format(Locale.ROOT, "Specimen %s%n", s.id()));
        out.append(String.format(Locale.ROOT, "  span %s, %s ends, linear density %s, nominal tension %s, forced at %s,"
                        + " sensor at %s%n", f.value(s.lengthM(), "m"), s.ends().label(), f.value(s.linearDensityKgPerM(),
                "kg/m"), f.value(s.nominalTensionN(), "N"), f.value(s.forcingPositionM(), "m"),
                f.value(s.sensorPositionM(), "m")));
        appendModes(out, r, truth, f);
        for (AbsentHarmonic a : r.harmonics().absent()) {
            out.append(String.format(Locale.ROOT, "  harmonic %d (about %s) absent: %s%n", a.harmonic(),
                    f.value(a.expectedFrequencyHz(), "Hz"), f.inStyle(a.explanation())));
        }
        r.modal().warnings().forEach(w -> out.append("  note: ").append(f.inStyle(w)).append('\n'));
        appendProperties(out, r, truth, f);
        if (!r.cautions().isEmpty()) {
            out.append(String.format(Locale.ROOT, "%nCautions (the result cannot be trusted as a whole)%n"));
            r.cautions().forEach(c -> out.append("  ").append(f.inStyle(c)).append('\n'));
        }
        r.verdict().ifPresent(verdict -> {
            out.append(String.format(Locale.ROOT, "%nVerdict: %s%n", verdict.outcome().label().toUpperCase(Locale.ROOT)));
            for (LimitResult limit : verdict.results()) {
                out.append("  ").append(limit.outcome().label()).append(": ").append(LimitText.reason(limit, f))
                        .append('\n');
            }
        });
        r.sweep().ifPresent(sweep -> out.append(String.format(Locale.ROOT, "%nRig time %s, wall time %s, %d steps%s%n",
                f.value(round1(sweep.rigTimeS()), "s"), f.value(round1(r.wallTimeS()), "s"), sweep.points().size(),
                sweep.completed() ? "" : " (stopped before the end)")));
        return out.toString();
    }

    private static double round1(double seconds) {
        return Math.round(seconds * 10) / 10.0;
    }

    private static void appendModes(StringBuilder out, QualificationResult r, Optional<SimulationTruth> truth,
                                    QuantityFormat f) {
        String pm = f.style().plusMinus();
        out.append(String.format(Locale.ROOT, "%nModes (estimate %s standard error%s)%n", pm,
                truth.isPresent() ? " | simulated truth" : ""));
        out.append(String.format(Locale.ROOT, "%3s %4s  %12s %9s %10s %8s  %9s %9s %9s  %10s %10s%n", "n", "pol.", "f (Hz)",
                pm, "true f", "error %", "damping", pm, "true", "A (1/kg)", "true A"));
        for (QualifiedMode m : r.modes()) {
            FittedMode fm = m.fitted();
            Mode e = fm.mode();
            String n = m.harmonic() > 0 ? Integer.toString(m.harmonic()) : "?";
            String pol = m.polarisation() > 0 ? Integer.toString(m.polarisation()) : "-";
            Optional<TrueMode> t = truth.flatMap(tr -> TruthComparison.nearest(tr, e));
            String[] freq = cells(f, e.frequencyHz(), fm.frequencyStdHz());
            String[] zeta = cells(f, e.dampingRatio(), fm.dampingRatioStd());
            String trueF = t.map(x -> f.number(x.mode().frequencyHz())).orElse("-");
            String err = t.map(x -> String.format(Locale.ROOT, "%.4f", 100 * TruthComparison.frequencyError(e, x)))
                    .orElse("-");
            String trueZeta = t.map(x -> f.number(x.mode().dampingRatio())).orElse("-");
            String trueA = t.map(x -> String.format(Locale.ROOT, "%.4g", x.mode().modalConstant().getReal())).orElse("-");
            out.append(String.format(Locale.ROOT, "%3s %4s  %12s %9s %10s %8s  %9s %9s %9s  %10.4g %10s%n", n, pol,
                    freq[0], freq[1], trueF, err, zeta[0], zeta[1], trueZeta, e.modalConstant().getReal(), trueA));
        }
        if (r.modes().isEmpty()) {
            out.append("  no mode found in the band\n");
        }
    }

    /** A value and its standard error as two cells, rounded together (GUM 7.2.6). */
    private static String[] cells(QuantityFormat f, double value, double u) {
        if (!Double.isFinite(value) || !(u > 0) || Double.isInfinite(u)) {
            return new String[] {f.number(value), Double.isNaN(u) ? QuantityFormat.NOT_EVALUATED : f.number(u)};
        }
        Rounded r = f.round(value, u);
        return new String[] {f.valueCell(r), f.uncertaintyCell(r)};
    }

    private static void appendProperties(StringBuilder out, QualificationResult r, Optional<SimulationTruth> truth,
                                         QuantityFormat f) {
        out.append(String.format(Locale.ROOT, "%nProperties%n"));
        if (r.tension().isPresent()) {
            TensionEstimate t = r.tension().get();
            String trueT = truth.map(tr -> "; simulated truth " + f.value(tr.config().specimen().tensionN(), "N")).orElse("");
            out.append(String.format(Locale.ROOT, "  tension %s (%s)%s%n", f.withUncertainty(t.tensionN(), t.tensionStdN(),
                    "N"), t.method().label(), trueT));
            String trueEi = truth.map(tr -> "; simulated truth " + f.value(tr.config().specimen().bendingStiffnessNm2(),
                    "N m^2")).orElse("");
            out.append(String.format(Locale.ROOT, "  bending stiffness %s, inharmonicity B %s%s%n",
                    f.withUncertainty(t.bendingStiffnessNm2(), t.bendingStiffnessStdNm2(), "N m^2"),
                    f.number(t.inharmonicityB()), trueEi));
            t.crossChecks().forEach(c -> out.append(String.format(Locale.ROOT, "  cross-check, %s: %s%n", c.method(),
                    f.value(c.tensionN(), "N"))));
            t.warnings().forEach(w -> out.append("  note: ").append(f.inStyle(w)).append('\n'));
        } else {
            out.append("  tension: not determined (no harmonic numbered)\n");
        }
        if (r.participation().isPresent()) {
            PatternFit p = r.participation().get();
            out.append(String.format(Locale.ROOT, "  stinger at %s, sensor at %s (from the modal constants)%n",
                    f.withUncertainty(p.forcingPositionM(), p.forcingPositionStdM(), "m"),
                    f.withUncertainty(p.sensorPositionM(), p.sensorPositionStdM(), "m")));
            p.findings().forEach(x -> out.append("  ").append(f.inStyle(x)).append('\n'));
        }
        r.linearity().ifPresent(l -> {
            l.shifts().forEach(h -> out.append(String.format(Locale.ROOT,
                    "  level check, harmonic %d: %s -> %s, relative shift %s (Kirchhoff-Carrier predicts %s)%n",
                    h.harmonic(), f.value(h.firstFrequencyHz(), "Hz"), f.value(h.secondFrequencyHz(), "Hz"),
                    f.withUncertainty(h.relativeShift(), h.relativeShiftStd(), ""),
                    f.valueLike(h.predictedRelativeShift(), h.relativeShiftStd(), ""))));
            l.findings().forEach(x -> out.append("  ").append(f.inStyle(x)).append('\n'));
        });
    }
}
