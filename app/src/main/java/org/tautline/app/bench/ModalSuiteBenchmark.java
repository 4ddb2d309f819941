package org.tautline.app.bench;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.ProgressListener;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.CramerRaoBound;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.LsfdOptions;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.ModalRefinementOptions;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.modal.ResidualTerms;

/**
 * Runs the automatic modal fit on every case of {@link ModalCaseSuite} and scores it against the truth and the
 * Cramer-Rao bound.
 *
 * <p>The bound of each case is computed by {@link CramerRaoBound} at the true in-band modes with the free parameters
 * the default fit has (real modal constants, upper and lower residual terms) over the fit band, with the FRF's own
 * noise variance read as receptance. Targets, wherever the bound calls a mode determinable: no mode missed and none
 * spurious, RMS error/bound at most 1.5 for f and 2 for zeta, and under 1 s per fit of a 4000-line case after
 * warm-up. The figures are printed, never asserted; the fit is timed after {@value #WARM_UP_FITS} untimed fits of the
 * first case, as the median of the asked repeats, both in wall time and in the processor time of the thread that fits
 * (the fit runs on one thread). The time target is judged on the processor time: on an idle machine the two agree,
 * and on a shared one (a build beside) the wall time grows with the others' load, not with the fit's work.
 */
public final class ModalSuiteBenchmark {
    /** Untimed fits before the cases, so the times are not those of the JIT compiler. */
    static final int WARM_UP_FITS = 3;
    /** Target: largest RMS error/bound of f. */
    static final double FREQUENCY_TARGET = 1.5;
    /** Target: largest RMS error/bound of zeta. */
    static final double DAMPING_TARGET = 2;
    /** Target: longest fit of a 4000-line case, s. */
    static final double TIME_TARGET_S = 1;

    /**
     * The figures of one case.
     *
     * @param name the case's name
     * @param description what the case holds
     * @param quantity receptance, mobility or accelerance
     * @param uniformLines true for a uniform grid
     * @param lines lines of the FRF
     * @param linesInBand lines in the fit band
     * @param score the missed, spurious and error figures, with each true mode's
     * @param frequencyErrorPerBound RMS over the determinable modes found of (f_fit - f_true)/bound_f, NaN for none
     * @param dampingErrorPerBound RMS over them of (zeta_fit - zeta_true)/bound_zeta, NaN for none
     * @param warnings the fit's warnings, as written
     * @param fitFailure why the fit threw, or null when it did not
     * @param boundFailure why the bound could not be computed, or null
     * @param fitS median wall time of the fit, s
     * @param fitCpuS median processor time of the fitting thread, s
     * @param meetsTargets whether the case meets every target
     */
    public record CaseFigures(String name, String description, String quantity, boolean uniformLines, int lines,
                              int linesInBand, ModalCaseScore score, double frequencyErrorPerBound,
                              double dampingErrorPerBound, List<String> warnings, String fitFailure,
                              String boundFailure, double fitS, double fitCpuS, boolean meetsTargets) {
        /** Copies the list. */
        public CaseFigures {
            warnings = List.copyOf(warnings);
        }
    }

    /**
     * What a suite run measured.
     *
     * @param cases the figures of each case, in suite order
     * @param modes true modes in the fit bands
     * @param determinable of which the bound calls determinable
     * @param missedDeterminable determinable modes missed (target 0)
     * @param spuriousDeterminable spurious modes not put down to an undeterminable one (target 0)
     * @param missedOther undeterminable modes not found
     * @param spuriousOther spurious modes near undeterminable ones
     * @param matchedDeterminable determinable modes found
     * @param frequencyErrorPerBound RMS over those of (f_fit - f_true)/bound_f (target at most 1.5)
     * @param dampingErrorPerBound RMS over those of (zeta_fit - zeta_true)/bound_zeta (target at most 2)
     * @param casesWithWarnings cases whose fit gave a warning or failed
     * @param slowestUniformFitS the longest fit of a 4000-line uniform case, s (target under 1 s)
     * @param casesMeetingTargets cases that meet every target
     * @param repeats timed fits per case
     */
    public record Figures(List<CaseFigures> cases, int modes, int determinable, int missedDeterminable,
                          int spuriousDeterminable, int missedOther, int spuriousOther, int matchedDeterminable,
                          double frequencyErrorPerBound, double dampingErrorPerBound, int casesWithWarnings,
                          double slowestUniformFitS, int casesMeetingTargets, int repeats) {
        /** Copies the list. */
        public Figures {
            cases = List.copyOf(cases);
        }
    }

    private ModalSuiteBenchmark() {
    }

    /**
     * Runs the suite.
     *
     * @param nameContains runs only the cases whose name contains this text (case-insensitive); null or empty for all
     * @param repeats timed fits per case, at least 1; the median is reported
     * @param progress told after each case (done, total)
     * @return the figures
     * @throws IllegalArgumentException when no case matches or repeats is below 1
     */
    public static Figures run(String nameContains, int repeats, ProgressListener progress) {
        if (repeats < 1) {
            throw new IllegalArgumentException("the modal suite needs at least 1 timed fit per case, got " + repeats);
        }
        ProgressListener listener = progress == null ? ProgressListener.NONE : progress;
        List<ModalCase> all = ModalCaseSuite.all();
        String wanted = nameContains == null ? "" : nameContains.toLowerCase(Locale.ROOT);
        List<ModalCase> cases = all.stream().filter(c -> c.name().toLowerCase(Locale.ROOT).contains(wanted)).toList();
        if (cases.isEmpty()) {
            throw new IllegalArgumentException("no case of the modal suite has '" + nameContains + "' in its name; the"
                    + " cases are: " + String.join("; ", all.stream().map(ModalCase::name).toList()));
        }
        for (int i = 0; i < WARM_UP_FITS; i++) {
            fitQuietly(all.get(0));
        }
        List<CaseFigures> out = new ArrayList<>();
        for (ModalCase c : cases) {
            out.add(runCase(c, repeats));
            listener.progress(out.size(), cases.size());
        }
        return summary(out, repeats);
    }

    private static CaseFigures runCase(ModalCase c, int repeats) {
        List<Mode> truth = c.modesInBand();
        List<FittedMode> bounds = null;
        String boundFailure = null;
        try {
            bounds = bounds(c);
        } catch (AnalysisException e) {
            boundFailure = e.getMessage();
        }
        double[] times = new double[repeats];
        double[] cpu = new double[repeats];
        java.lang.management.ThreadMXBean threads = java.lang.management.ManagementFactory.getThreadMXBean();
        ModalEstimate estimate = null;
        String fitFailure = null;
        for (int r = 0; r < repeats; r++) {
            long start = System.nanoTime();
            long startCpu = threads.getCurrentThreadCpuTime();
            try {
                ModalEstimate e = c.estimator().estimate(c.frf());
                estimate = estimate == null ? e : estimate;
            } catch (AnalysisException e) {
                fitFailure = e.getMessage();
            }
            times[r] = (System.nanoTime() - start) * 1e-9;
            cpu[r] = (threads.getCurrentThreadCpuTime() - startCpu) * 1e-9;
        }
        List<Mode> fitted = estimate == null ? List.of() : estimate.plainModes();
        ModalCaseScore score = ModalCaseScore.of(truth, bounds, fitted);
        List<String> warnings = estimate == null ? List.of() : estimate.warnings();
        double fitS = median(times);
        double fitCpuS = median(cpu);
        boolean meets = score.missedDeterminable() == 0 && score.spuriousDeterminable() == 0
                && (score.matchedDeterminable() == 0 || (score.frequencyErrorPerBound() <= FREQUENCY_TARGET
                && score.dampingErrorPerBound() <= DAMPING_TARGET))
                && (!c.grid().uniform() || fitCpuS < TIME_TARGET_S) && fitFailure == null && boundFailure == null;
        int inBand = (int) Arrays.stream(c.frf().frequenciesHz()).filter(f -> f >= c.fitLowHz() && f <= c.fitHighHz())
                .count();
        return new CaseFigures(c.name(), c.description(), c.quantity().label(), c.grid().uniform(), c.frf().size(), inBand,
                score, score.frequencyErrorPerBound(), score.dampingErrorPerBound(), warnings, fitFailure, boundFailure,
                fitS, fitCpuS, meets);
    }

    /**
     * The Cramer-Rao bounds of a case's in-band true modes, for the free parameters of the default fit.
     *
     * @param c the case
     * @return one bound per in-band true mode
     */
    static List<FittedMode> bounds(ModalCase c) {
        Frf receptance = c.frf().toQuantity(FrfQuantity.RECEPTANCE);
        ModalRefinementOptions free = ModalRefinementOptions.of(LsfdOptions.defaults().withRealModes(true)
                .withUpperResidual(true).withLowerResidual(true).withBandHz(c.fitLowHz(), c.fitHighHz()));
        return CramerRaoBound.of(c.modesInBand(), ResidualTerms.NONE, receptance.frequenciesHz(),
                receptance.variance().orElseThrow(), free);
    }

    private static void fitQuietly(ModalCase c) {
        try {
            c.estimator().estimate(c.frf());
        } catch (AnalysisException e) {
            // Warm-up only: the case's own run reports the failure.
        }
    }

    private static Figures summary(List<CaseFigures> cases, int repeats) {
        int modes = 0;
        int determinable = 0;
        int missed = 0;
        int spurious = 0;
        int missedOther = 0;
        int spuriousOther = 0;
        int matched = 0;
        double fSquares = 0;
        double zSquares = 0;
        int warned = 0;
        double slowest = 0;
        int meeting = 0;
        for (CaseFigures c : cases) {
            ModalCaseScore s = c.score();
            modes += s.modes();
            determinable += s.determinable();
            missed += s.missedDeterminable();
            spurious += s.spuriousDeterminable();
            missedOther += s.missedOther();
            spuriousOther += s.spuriousOther();
            matched += s.matchedDeterminable();
            fSquares += s.frequencySquares();
            zSquares += s.dampingSquares();
            warned += c.warnings().isEmpty() && c.fitFailure() == null ? 0 : 1;
            slowest = c.uniformLines() ? Math.max(slowest, c.fitCpuS()) : slowest;
            meeting += c.meetsTargets() ? 1 : 0;
        }
        return new Figures(cases, modes, determinable, missed, spurious, missedOther, spuriousOther, matched,
                matched == 0 ? Double.NaN : Math.sqrt(fSquares / matched),
                matched == 0 ? Double.NaN : Math.sqrt(zSquares / matched), warned, slowest, meeting, repeats);
    }

    static double median(double[] values) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        int n = sorted.length;
        return n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
    }
}
