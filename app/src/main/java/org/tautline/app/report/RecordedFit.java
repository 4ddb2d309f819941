package org.tautline.app.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.FitQuality;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.modal.ModeSelection;
import org.tautline.analysis.modal.Pole;
import org.tautline.analysis.modal.ResidualTerms;
import org.tautline.analysis.modal.StabilisationChart;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.Outcome;
import org.tautline.app.qualify.JsonFields;
import org.tautline.app.qualify.QualificationResult;

/**
 * The modal fit a run folder's {@value RunDirectory#RESULT} records ({@link ResultFile}), read back so that a report
 * states the result of the run (a fit from poles chosen by hand in the workbench, the demo's) instead of fitting the
 * FRF again, which could give other modes and another verdict.
 *
 * <p>A recorded fit is taken only when the file names the SHA-256 of the {@code frf.csv} it was made from and that is
 * the SHA-256 of the folder's {@code frf.csv}; a file naming another FRF is refused. Numbering, tension, participation
 * and verdict are judged again from the recorded modes; the harmonics and limit results the file records are compared
 * with them ({@link #disagreement}), so that a change in the judging since the run was recorded is said, not hidden.
 * The fit's stabilisation chart is not recorded: the chart of a recorded fit holds its own poles as one model order.
 *
 * @param modal the recorded fit: modes with standard errors, residual terms with the poles beyond the band, band,
 *        quality, warnings and what it left unexplained
 * @param recordCautions what the record said against trusting the result (a sweep stopped before its end)
 * @param whyNoLevelCheck why the run has no level check; empty when it has one or nothing was said
 * @param wallTimeS the recorded wall time of the qualification, s; NaN when not recorded
 * @param harmonics the harmonic number recorded for each mode, in order (0 for a mode not numbered)
 * @param limits the limit results recorded, in order; empty without a verdict
 */
public record RecordedFit(ModalEstimate modal, List<String> recordCautions, String whyNoLevelCheck, double wallTimeS,
                          List<Integer> harmonics, List<RecordedLimit> limits) {
    /** Why the FRF is fitted again when the folder has no result file. */
    static final String NO_RESULT_FILE = "the folder has no " + RunDirectory.RESULT;
    /** Half-width of the fit quality's band around each mode, in half-power bandwidths, as the modal fit uses. */
    private static final double QUALITY_BANDS = 3.0;

    /** Copies the lists. */
    public RecordedFit {
        recordCautions = List.copyOf(recordCautions);
        harmonics = List.copyOf(harmonics);
        limits = List.copyOf(limits);
    }

    /**
     * One limit's recorded result.
     *
     * @param name the limit's name
     * @param outcome what it was judged
     */
    public record RecordedLimit(String name, Outcome outcome) {
    }

    /**
     * What a result file gives a report: the recorded fit, or why the FRF must be fitted again.
     *
     * @param fit the recorded fit, empty when the file records none that can be taken
     * @param refitReason why the FRF is fitted again, a clause ("the folder has no result.json"); empty with a fit
     */
    public record Reading(Optional<RecordedFit> fit, String refitReason) {
        /** @return a reading without a recorded fit */
        static Reading refit(String why) {
            return new Reading(Optional.empty(), why);
        }
    }

    /**
     * Reads the recorded fit of a result file, strictly: every block it needs must be whole.
     *
     * @param root the result file's fields
     * @param frf the folder's FRF as read from {@code frf.csv}
     * @param frfSha256 the SHA-256 of the folder's {@code frf.csv} bytes
     * @return the fit, or why there is none to take
     * @throws AnalysisException when the file names another FRF, or a block it needs is not whole, naming the place
     */
    static Reading read(JsonFields root, Frf frf, String frfSha256) {
        String file = RunDirectory.RESULT;
        if (!root.has("modes")) {
            return Reading.refit("its " + file + " records no modes");
        }
        if (!root.has(ResultFile.FRF_SHA256)) {
            return Reading.refit("its " + file + " does not name the " + RunDirectory.FRF + " it was made from (it was"
                    + " written by an earlier version, or by hand)");
        }
        String madeFrom = root.text(ResultFile.FRF_SHA256);
        if (!madeFrom.equals(frfSha256)) {
            throw new AnalysisException(root.where() + ": the result was made from an " + RunDirectory.FRF
                    + " with SHA-256 " + madeFrom + ", but the folder's " + RunDirectory.FRF + " has SHA-256 " + frfSha256
                    + "; expected the two files of one run (put back the " + RunDirectory.FRF + " the result was made"
                    + " from, or remove " + file + " to have the FRF fitted again, without its level check)");
        }
        List<FittedMode> modes = new ArrayList<>();
        List<Pole> poles = new ArrayList<>();
        List<Integer> harmonics = new ArrayList<>();
        for (JsonFields m : root.objects("modes")) {
            Mode mode = mode(m);
            if (!(mode.dampingRatio() < 1)) {
                throw new AnalysisException(m.where() + ": damping ratio " + mode.dampingRatio() + "; expected less than"
                        + " 1, as for every mode the fit gives");
            }
            poles.add(Pole.of(mode.frequencyHz(), mode.dampingRatio()));
            JsonFields std = m.object("modalConstantStd");
            modes.add(new FittedMode(mode, orNaN(m, "frequencyStdHz"), orNaN(m, "dampingRatioStd"),
                    new Complex(orNaN(std, "re"), orNaN(std, "im"))));
            harmonics.add(m.wholeNumber("harmonic"));
        }
        JsonFields residuals = root.object("residuals");
        List<Mode> beyond = new ArrayList<>();
        for (JsonFields p : residuals.object("polesBeyondBand").objects("poles")) {
            beyond.add(mode(p));
        }
        ResidualTerms terms = new ResidualTerms(complex(residuals, "upper"), complex(residuals, "lower"), beyond);
        ResidualTerms termsStd = new ResidualTerms(complex(residuals, "upperStd"), complex(residuals, "lowerStd"));
        JsonFields quality = root.object("quality");
        double low = quality.number("bandLowHz");
        double high = quality.number("bandHighHz");
        if (!(low >= 0 && high > low)) {
            throw new AnalysisException(quality.where() + ": the band " + low + " to " + high + " Hz; expected"
                    + " 0 <= bandLowHz < bandHighHz");
        }
        Optional<FitQuality> fitQuality = Optional.empty();
        if (quality.has("normalisedResidual") || quality.holdsNull("normalisedResidual")) {
            fitQuality = Optional.of(new FitQuality(orNaN(quality, "normalisedResidual"), orNaN(quality, "correlation"),
                    bands(frf, modes, terms, low, high)));
        }
        StabilisationChart chart = StabilisationChart.classify(low, high,
                new TreeMap<>(Map.of(Math.max(1, 2 * poles.size()), poles)), null);
        Optional<String> unexplained = root.has("unexplained") ? Optional.of(root.text("unexplained")) : Optional.empty();
        ModalEstimate modal = new ModalEstimate(modes, terms, termsStd, fitQuality, chart, ModeSelection.of(poles), low,
                high, root.texts("warnings"), unexplained);
        List<RecordedLimit> limits = new ArrayList<>();
        if (root.has("verdict")) {
            for (JsonFields l : root.object("verdict").objects("limits")) {
                limits.add(new RecordedLimit(l.text("name"), outcome(l)));
            }
        }
        RecordedFit fit = new RecordedFit(modal, root.texts("recordCautions"),
                root.has("whyNoLevelCheck") ? root.text("whyNoLevelCheck") : "", root.number("wallTimeS", Double.NaN),
                harmonics, limits);
        return new Reading(Optional.of(fit), "");
    }

    /**
     * Compares what the file records with the same modes judged again now.
     *
     * @param again the qualification of the recorded modes, judged again
     * @return why the recorded result is not reproduced, one plain sentence; empty when harmonics and limit results
     *         agree
     */
    public Optional<String> disagreement(QualificationResult again) {
        List<Integer> numbered = again.modes().stream().map(QualifiedMode::harmonic).toList();
        if (!numbered.equals(harmonics)) {
            return Optional.of(RunDirectory.RESULT + " numbers its modes as harmonics " + harmonicList(harmonics)
                    + ", but numbered again by this version they are " + harmonicList(numbered) + "; the recorded result"
                    + " is not reproduced");
        }
        List<LimitResult> judged = again.verdict().map(v -> v.results()).orElse(List.of());
        if (judged.size() != limits.size()) {
            return Optional.of(String.format(Locale.ROOT, "%s records %d limit result(s), but %s judges %d; the"
                    + " recorded result is not reproduced", RunDirectory.RESULT, limits.size(),
                    judged.isEmpty() ? "without " + RunDirectory.SPECIFICATION + " this report" : RunDirectory.SPECIFICATION,
                    judged.size()));
        }
        for (int i = 0; i < judged.size(); i++) {
            LimitResult now = judged.get(i);
            RecordedLimit then = limits.get(i);
            if (!now.limit().name().equals(then.name()) || now.outcome() != then.outcome()) {
                return Optional.of(String.format(Locale.ROOT, "%s records the limit \"%s\" as %s, but judged again from"
                        + " its modes by this version the limit \"%s\" is %s; the recorded result is not reproduced",
                        RunDirectory.RESULT, then.name(), then.outcome().label(), now.limit().name(),
                        now.outcome().label()));
            }
        }
        return Optional.empty();
    }

    private static String harmonicList(List<Integer> harmonics) {
        return String.join(", ", harmonics.stream().map(n -> n > 0 ? Integer.toString(n) : "?").toList());
    }

    private static Mode mode(JsonFields m) {
        try {
            return new Mode(m.number("frequencyHz"), m.number("dampingRatio"), complex(m, "modalConstant"));
        } catch (AnalysisException e) {
            if (e.getMessage().startsWith(m.where())) {
                throw e;
            }
            throw new AnalysisException(m.where() + ": " + e.getMessage() + "; expected a mode as the fit records it", e);
        }
    }

    private static Outcome outcome(JsonFields limit) {
        String name = limit.text("outcome");
        for (Outcome o : Outcome.values()) {
            if (o.name().equals(name)) {
                return o;
            }
        }
        throw new AnalysisException(limit.where() + ": field \"outcome\" holds \"" + name + "\"; expected PASS, FAIL or"
                + " NOT_DETERMINABLE");
    }

    /** A complex field; a part written null (not finite) reads as NaN. */
    private static Complex complex(JsonFields parent, String field) {
        JsonFields c = parent.object(field);
        return new Complex(orNaN(c, "re"), orNaN(c, "im"));
    }

    /** A number that must be written, null standing for a figure that was not a finite number. */
    private static double orNaN(JsonFields fields, String field) {
        return fields.holdsNull(field) ? Double.NaN : fields.number(field);
    }

    /** The fit quality's per-mode bands, from the recorded model on the band's lines, as the modal fit measures them. */
    private static List<FitQuality.ModeBand> bands(Frf frf, List<FittedMode> modes, ResidualTerms terms, double low,
                                                   double high) {
        if (modes.isEmpty()) {
            return List.of();
        }
        Frf band;
        try {
            band = frf.toQuantity(FrfQuantity.RECEPTANCE).withinBand(low, high);
        } catch (AnalysisException e) {
            throw new AnalysisException(RunDirectory.RESULT + ": the fitted band " + low + " to " + high + " Hz holds no"
                    + " line of " + RunDirectory.FRF + "; expected the band the FRF was fitted in", e);
        }
        return FitQuality.of(band,
                modes.stream().map(FittedMode::mode).toList(), terms, QUALITY_BANDS).bands();
    }
}
