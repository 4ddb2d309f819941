package org.tautline.app.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The modal suite's figures as text for people: a few lines per case, then the summary against the targets. */
public final class ModalSuiteText {
    private ModalSuiteText() {
    }

    /**
     * The figures as text.
     *
     * @param f the figures
     * @return the text, lines ending in a newline
     */
    public static String of(ModalSuiteBenchmark.Figures f) {
        StringBuilder b = new StringBuilder();
        b.append(String.format(Locale.ROOT, "modal benchmark suite: %d invented stiff-string cases, each from its own"
                + " seed; a mode is determinable when its Cramer-Rao bound on damping is below %.0f %% of it; fits timed"
                + " after %d warm-up fits (median of %d)%n", f.cases().size(),
                100 * ModalCaseScore.DETERMINABLE_DAMPING_FRACTION, ModalSuiteBenchmark.WARM_UP_FITS, f.repeats()));
        int i = 1;
        for (ModalSuiteBenchmark.CaseFigures c : f.cases()) {
            appendCase(b, i++, c);
        }
        b.append(String.format(Locale.ROOT, "summary over %d cases: %d true modes in the fit bands, %d determinable%n",
                f.cases().size(), f.modes(), f.determinable()));
        b.append(String.format(Locale.ROOT, "  determinable modes: %d missed, %d spurious (target 0 and 0); the others:"
                + " %d missed, %d spurious%n", f.missedDeterminable(), f.spuriousDeterminable(), f.missedOther(),
                f.spuriousOther()));
        b.append(String.format(Locale.ROOT, "  RMS error/bound over the %d determinable modes found: f %s (target <= %s),"
                + " zeta %s (target <= %s)%n", f.matchedDeterminable(), ratio(f.frequencyErrorPerBound()),
                ModalCaseSuite.number(ModalSuiteBenchmark.FREQUENCY_TARGET), ratio(f.dampingErrorPerBound()),
                ModalCaseSuite.number(ModalSuiteBenchmark.DAMPING_TARGET)));
        b.append(String.format(Locale.ROOT, "  fits with a warning or a failure: %d of %d; slowest fit of a 4000-line"
                + " uniform case %s of processor time (target < %.0f ms)%n", f.casesWithWarnings(), f.cases().size(),
                f.slowestUniformFitS() > 0 ? String.format(Locale.ROOT, "%.0f ms", 1e3 * f.slowestUniformFitS()) : "none run",
                1e3 * ModalSuiteBenchmark.TIME_TARGET_S));
        b.append(String.format(Locale.ROOT, "  cases meeting every target: %d of %d%n", f.casesMeetingTargets(),
                f.cases().size()));
        return b.toString();
    }

    private static void appendCase(StringBuilder b, int index, ModalSuiteBenchmark.CaseFigures c) {
        ModalCaseScore s = c.score();
        b.append(String.format(Locale.ROOT, "%2d. %s%n", index, c.name()));
        b.append("    ").append(c.description()).append(System.lineSeparator());
        b.append(String.format(Locale.ROOT, "    %d true modes, %d determinable; determinable: %d missed, %d spurious;"
                        + " the others: %d missed, %d spurious; %d modes fitted%n", s.modes(), s.determinable(),
                s.missedDeterminable(), s.spuriousDeterminable(), s.missedOther(), s.spuriousOther(), s.fitted()));
        b.append(String.format(Locale.ROOT, "    RMS error/bound over %d determinable modes found: f %s, zeta %s (worst %s,"
                        + " %s); fit warning: %s; fit %.0f ms on %d lines (processor time %.0f ms); %s%n",
                s.matchedDeterminable(),
                ratio(s.frequencyErrorPerBound()), ratio(s.dampingErrorPerBound()),
                worst(s.matchedDeterminable(), s.worstFrequencyErrorPerBound()),
                worst(s.matchedDeterminable(), s.worstDampingErrorPerBound()),
                c.fitFailure() != null ? "the fit failed" : c.warnings().isEmpty() ? "no" : "yes (" + c.warnings().size() + ")",
                1e3 * c.fitS(), c.linesInBand(), 1e3 * c.fitCpuS(), c.meetsTargets() ? "targets met" : "targets not met"));
        List<String> missed = new ArrayList<>();
        for (ModalCaseScore.TrueMode m : s.truth()) {
            if (!m.found()) {
                missed.add(String.format(Locale.ROOT, "%.5g Hz%s", m.frequencyHz(), m.determinable() ? "" : " (not determinable)"));
            }
        }
        if (!missed.isEmpty()) {
            b.append("    missed: ").append(String.join(", ", missed)).append(System.lineSeparator());
        }
        if (!s.spuriousHz().isEmpty()) {
            b.append("    spurious: ").append(String.join(", ", s.spuriousHz().stream()
                    .map(f -> String.format(Locale.ROOT, "%.5g Hz", f)).toList())).append(System.lineSeparator());
        }
        if (c.fitFailure() != null) {
            b.append("    the fit failed: ").append(c.fitFailure()).append(System.lineSeparator());
        }
        if (c.boundFailure() != null) {
            b.append("    no Cramer-Rao bound: ").append(c.boundFailure()).append(System.lineSeparator());
        }
        for (String w : c.warnings()) {
            b.append("    warning: ").append(w).append(System.lineSeparator());
        }
    }

    private static String ratio(double x) {
        return Double.isNaN(x) ? "-" : String.format(Locale.ROOT, "%.2f", x);
    }

    private static String worst(int count, double x) {
        return count == 0 ? "-" : String.format(Locale.ROOT, "%.1f", x);
    }
}
