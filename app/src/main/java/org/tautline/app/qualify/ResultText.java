package org.tautline.app.qualify;

import java.util.Locale;
import java.util.Optional;

import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.specimen.AbsentHarmonic;
import org.tautline.analysis.specimen.PatternFit;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.specimen.TensionEstimate;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.driver.sim.SimulationTruth;
import org.tautline.driver.sim.TrueMode;

/** A qualification as plain text, for the terminal and the window; with the simulated truth when there is one. */
public final class ResultText {
    private ResultText() {
    }

    /**
     * Formats a demo outcome: each estimate beside the simulated truth.
     *
     * @param outcome result and truth
     * @return several lines of text
     */
    public static String format(DemoOutcome outcome) {
        return format(outcome.result(), Optional.of(outcome.truth()));
    }

    /**
     * Formats a qualification.
     *
     * @param r the result
     * @param truth the simulated truth, when the data came from the simulated rig
     * @return several lines of text
     */
    public static String format(QualificationResult r, Optional<SimulationTruth> truth) {
        StringBuilder out = new StringBuilder();
        Specimen s = r.specimen();
        out.append(String.format(Locale.ROOT, "Specimen %s%n", s.id()));
        out.append(String.format(Locale.ROOT,
                "  span %.3f m, %s ends, mu %.4g kg/m, nominal %.1f N, forced at %.3f m, sensor at %.3f m%n", s.lengthM(),
                s.ends().name().toLowerCase(Locale.ROOT), s.linearDensityKgPerM(), s.nominalTensionN(),
                s.forcingPositionM(), s.sensorPositionM()));
        appendModes(out, r, truth);
        for (AbsentHarmonic a : r.harmonics().absent()) {
            out.append(String.format(Locale.ROOT, "  harmonic %d (about %.1f Hz) absent: %s%n", a.harmonic(),
                    a.expectedFrequencyHz(), a.explanation()));
        }
        r.modal().warnings().forEach(w -> out.append("  note: ").append(w).append('\n'));
        appendProperties(out, r, truth);
        if (!r.cautions().isEmpty()) {
            out.append(String.format(Locale.ROOT, "%nCautions (the result cannot be trusted as a whole)%n"));
            r.cautions().forEach(c -> out.append("  ").append(c).append('\n'));
        }
        r.verdict().ifPresent(verdict -> {
            out.append(String.format(Locale.ROOT, "%nVerdict: %s%n", verdict.outcome()));
            for (LimitResult limit : verdict.results()) {
                out.append("  ").append(limit.outcome()).append(": ").append(limit.reason()).append('\n');
            }
        });
        r.sweep().ifPresent(sweep -> out.append(String.format(Locale.ROOT, "%nRig time %.1f s, wall time %.1f s, %d steps%s%n",
                sweep.rigTimeS(), r.wallTimeS(), sweep.points().size(), sweep.completed() ? "" : " (stopped before the end)")));
        return out.toString();
    }

    private static void appendModes(StringBuilder out, QualificationResult r, Optional<SimulationTruth> truth) {
        out.append(String.format(Locale.ROOT, "%nModes%s%n", truth.isPresent() ? " (estimate +/- standard error | simulated truth)" : ""));
        out.append(String.format(Locale.ROOT, "%3s %3s  %10s %8s %10s %8s  %8s %8s %8s  %10s %10s%n", "n", "pol", "f (Hz)", "+/-",
                "true f", "err %", "zeta", "+/-", "true", "A (1/kg)", "true A"));
        for (QualifiedMode m : r.modes()) {
            FittedMode f = m.fitted();
            Mode e = f.mode();
            String n = m.harmonic() > 0 ? Integer.toString(m.harmonic()) : "?";
            String pol = m.polarisation() > 0 ? Integer.toString(m.polarisation()) : "-";
            Optional<TrueMode> t = truth.flatMap(tr -> TruthComparison.nearest(tr, e));
            String trueF = t.map(x -> String.format(Locale.ROOT, "%10.3f", x.mode().frequencyHz())).orElse("         -");
            String err = t.map(x -> String.format(Locale.ROOT, "%8.4f", 100 * TruthComparison.frequencyError(e, x)))
                    .orElse("       -");
            String trueZeta = t.map(x -> String.format(Locale.ROOT, "%8.5f", x.mode().dampingRatio())).orElse("       -");
            String trueA = t.map(x -> String.format(Locale.ROOT, "%10.4g", x.mode().modalConstant().getReal()))
                    .orElse("         -");
            out.append(String.format(Locale.ROOT, "%3s %3s  %10.3f %8.3f %s %s  %8.5f %8.5f %s  %10.4g %s%n", n, pol,
                    e.frequencyHz(), f.frequencyStdHz(), trueF, err, e.dampingRatio(), f.dampingRatioStd(), trueZeta,
                    e.modalConstant().getReal(), trueA));
        }
        if (r.modes().isEmpty()) {
            out.append("  no mode found in the band\n");
        }
    }

    private static void appendProperties(StringBuilder out, QualificationResult r, Optional<SimulationTruth> truth) {
        out.append(String.format(Locale.ROOT, "%nProperties%n"));
        if (r.tension().isPresent()) {
            TensionEstimate t = r.tension().get();
            String trueT = truth.map(tr -> String.format(Locale.ROOT, "; simulated truth %.2f N", tr.config().specimen().tensionN()))
                    .orElse("");
            out.append(String.format(Locale.ROOT, "  tension %.2f +/- %.2f N (%s)%s%n", t.tensionN(), t.tensionStdN(),
                    t.method().name().toLowerCase(Locale.ROOT).replace('_', ' '), trueT));
            String trueEi = truth.map(tr -> String.format(Locale.ROOT, "; simulated truth %.4g N m^2",
                    tr.config().specimen().bendingStiffnessNm2())).orElse("");
            out.append(String.format(Locale.ROOT, "  bending stiffness %.4g +/- %.2g N m^2, inharmonicity B %.3g%s%n",
                    t.bendingStiffnessNm2(), t.bendingStiffnessStdNm2(), t.inharmonicityB(), trueEi));
            t.crossChecks().forEach(c -> out.append(String.format(Locale.ROOT, "  cross-check %s: %.2f N%n", c.method(),
                    c.tensionN())));
            t.warnings().forEach(w -> out.append("  note: ").append(w).append('\n'));
        } else {
            out.append("  tension: not determined (no harmonic numbered)\n");
        }
        if (r.participation().isPresent()) {
            PatternFit p = r.participation().get();
            out.append(String.format(Locale.ROOT, "  stinger at %.4f +/- %.4f m, sensor at %.4f +/- %.4f m (from the modal constants)%n",
                    p.forcingPositionM(), p.forcingPositionStdM(), p.sensorPositionM(), p.sensorPositionStdM()));
            p.findings().forEach(f -> out.append("  ").append(f).append('\n'));
        }
        r.linearity().ifPresent(l -> {
            l.shifts().forEach(h -> out.append(String.format(Locale.ROOT,
                    "  level check, harmonic %d: %.3f -> %.3f Hz, shift %.3g +/- %.2g (Kirchhoff-Carrier predicts %.3g)%n",
                    h.harmonic(), h.firstFrequencyHz(), h.secondFrequencyHz(), h.relativeShift(), h.relativeShiftStd(),
                    h.predictedRelativeShift())));
            l.findings().forEach(f -> out.append("  ").append(f).append('\n'));
        });
    }
}
