package org.tautline.app.qualify;

import java.util.Locale;
import java.util.Optional;

import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.Verdict;
import org.tautline.driver.sim.SimulationTruth;
import org.tautline.driver.sim.TrueMode;

/** The demo result as a plain-text table, for the terminal and the window. */
public final class ResultText {
    private ResultText() {
    }

    /**
     * Formats a demo outcome.
     *
     * @param outcome result and truth
     * @return several lines of text
     */
    public static String format(DemoOutcome outcome) {
        QualificationResult r = outcome.result();
        SimulationTruth truth = outcome.truth();
        StringBuilder out = new StringBuilder();
        SpecimenDescription s = r.specimen();
        out.append(String.format(Locale.ROOT, "Specimen %s: %s%n", s.id(), s.description()));
        out.append(String.format(Locale.ROOT, "  span %.3f m, %s ends, mu %.4g kg/m, forced at %.3f m, sensor at %.3f m%n",
                s.lengthM(), s.ends().name().toLowerCase(Locale.ROOT), s.linearDensityKgPerM(), s.forcingPositionM(),
                s.sensorPositionM()));
        out.append(String.format(Locale.ROOT, "%nModes (estimate | simulated truth)%n"));
        out.append(String.format(Locale.ROOT, "%3s  %11s %11s %9s  %9s %9s  %12s %12s %12s%n", "n", "f (Hz)", "true f",
                "err %", "zeta", "true zeta", "A (1/kg)", "true A", "true A pair"));
        for (IdentifiedMode m : r.modes()) {
            Mode e = m.mode();
            Optional<TrueMode> t = TruthComparison.nearest(truth, e);
            String n = m.harmonic() > 0 ? Integer.toString(m.harmonic()) : "?";
            if (t.isPresent()) {
                Mode tm = t.get().mode();
                double pair = TruthComparison.doubletModalConstant(truth, t.get().harmonic()).getReal();
                out.append(String.format(Locale.ROOT, "%3s  %11.3f %11.3f %9.4f  %9.5f %9.5f  %12.4g %12.4g %12.4g%n", n,
                        e.frequencyHz(), tm.frequencyHz(), 100 * TruthComparison.frequencyError(e, t.get()),
                        e.dampingRatio(), tm.dampingRatio(), e.modalConstant().getReal(), tm.modalConstant().getReal(),
                        pair));
            } else {
                out.append(String.format(Locale.ROOT, "%3s  %11.3f %11s %9s  %9.5f %9s  %12.4g %12s%n", n, e.frequencyHz(),
                        "-", "-", e.dampingRatio(), "-", e.modalConstant().getReal(), "-"));
            }
        }
        double split = truth.config().specimen().polarisationSplit();
        if (split > 0) {
            out.append(String.format(Locale.ROOT,
                    "  Each harmonic is a doublet: two polarisations %.2f %% apart. The first estimator sees a pair as%n"
                            + "  one mode, so its f and zeta lean towards the weaker polarisation and its A is close to the%n"
                            + "  pair's sum; the truth columns show the stronger polarisation and the pair's sum.%n",
                    100 * split));
        }
        out.append(String.format(Locale.ROOT, "%nProperties%n"));
        if (r.tension().isPresent()) {
            TensionEstimate t = r.tension().get();
            out.append(String.format(Locale.ROOT, "  tension %.2f +/- %.2f N (%s); simulated truth %.2f N%n", t.tensionN(),
                    t.tensionStdN(), t.method(), truth.config().specimen().tensionN()));
        } else {
            out.append("  tension: not determined (no fundamental identified)\n");
        }
        Verdict v = r.verdict();
        out.append(String.format(Locale.ROOT, "%nVerdict (provisional): %s%n", v.outcome()));
        for (LimitResult limit : v.results()) {
            out.append("  ").append(limit.outcome()).append(": ").append(limit.reason()).append('\n');
        }
        out.append(String.format(Locale.ROOT, "%nRig time %.1f s, wall time %.1f s, %d steps%s%n", r.sweep().rigTimeS(),
                r.wallTimeS(), r.sweep().points().size(), r.sweep().completed() ? "" : " (stopped before the end)"));
        return out.toString();
    }
}
