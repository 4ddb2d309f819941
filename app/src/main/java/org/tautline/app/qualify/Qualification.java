package org.tautline.app.qualify;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.modal.ModalSynthesis;
import org.tautline.analysis.modal.ModeSelection;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.specimen.AssignedMode;
import org.tautline.analysis.specimen.HarmonicAssignment;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.specimen.NumberedFrequency;
import org.tautline.analysis.specimen.ParticipationPattern;
import org.tautline.analysis.specimen.PatternFit;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.specimen.TensionEstimate;
import org.tautline.analysis.specimen.TensionEstimator;
import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.verdict.Measurement;
import org.tautline.analysis.verdict.Specification;
import org.tautline.analysis.verdict.Verdict;
import org.tautline.driver.sweep.SweepResult;

/**
 * The analysis half of a qualification: FRF to modes, harmonics, properties and verdict.
 *
 * <p>Modes come from the modal estimator (LSCF, LSFD, joint refinement); harmonics, doublets and
 * absent harmonics from the stiff-string numbering; tension and bending stiffness from the whole
 * harmonic series weighted by the modes' standard errors; forcing and sensor positions from the
 * pattern of modal constants. Every figure goes to the verdict with its standard uncertainty.
 * Figure keys: {@code f1Hz}, {@code tensionN}, {@code bendingStiffnessNm2}, {@code inharmonicityB},
 * {@code dampingRatio1}.. (per harmonic), {@code forcingPositionM}, {@code sensorPositionM},
 * {@code fitNormalisedResidual} and, when the FRF carries its variance, {@code resonanceFrfRelativeStdError}.
 */
public final class Qualification {
    /** Why an analysis of an FRF file alone has no level-check figure. */
    static final String LEVEL_CHECK_NEEDS_THE_RIG = "the level check needs the rig (it sweeps the fundamental at two"
            + " drive levels), so an FRF file alone cannot give it; the run's result.json holds it when the rig ran it";
    /** Doublets: two polarisations of one harmonic lie within this relative split (a few half-power bandwidths). */
    private static final double DOUBLET_SPLIT = 0.02;

    private Qualification() {
    }

    /**
     * Analyses a completed sweep.
     *
     * @param specimen what was stated about the specimen
     * @param sweep the sweep record
     * @param specification the limits to judge against
     * @param wallStartNs {@link System#nanoTime()} when the qualification started
     * @return the result
     */
    public static QualificationResult analyse(Specimen specimen, SweepResult sweep, Specification specification,
                                              long wallStartNs) {
        return analyse(specimen, sweep.toFrf(), Optional.of(sweep), ModalEstimator.defaults(), Optional.of(specification),
                wallStartNs);
    }

    /**
     * Analyses an FRF.
     *
     * @param specimen what was stated about the specimen
     * @param frf the measured FRF, any quantity
     * @param sweep the sweep it came from, if any
     * @param estimator the modal estimator (band, mode form)
     * @param specification the limits to judge against, if any
     * @param wallStartNs {@link System#nanoTime()} when the qualification started
     * @return the result
     */
    public static QualificationResult analyse(Specimen specimen, Frf frf, Optional<SweepResult> sweep,
                                              ModalEstimator estimator, Optional<Specification> specification,
                                              long wallStartNs) {
        Frf receptance = frf.toQuantity(FrfQuantity.RECEPTANCE);
        ModalEstimate modal = estimator.estimate(receptance);
        return fromModal(specimen, receptance, sweep, modal, specification, wallStartNs);
    }

    /**
     * Fits a result again with a pole choice edited by hand, and redoes everything downstream.
     *
     * <p>The poles go through the same LSFD and joint refinement as an automatic fit
     * ({@link ModalEstimator#refit}); harmonic numbering, tension, participation and verdict follow
     * as in {@link #analyse(Specimen, Frf, Optional, ModalEstimator, Optional, long)}. A level check
     * of the earlier result is kept and its shift judged again.
     *
     * @param previous the result whose FRF and stabilisation chart are refitted
     * @param selection the poles to fit
     * @param specification the limits to judge against, if any
     * @param wallStartNs {@link System#nanoTime()} when the refit started
     * @return the new result
     */
    public static QualificationResult refit(QualificationResult previous, ModeSelection selection,
                                            Optional<Specification> specification, long wallStartNs) {
        ModalEstimate modal = ModalEstimator.defaults().refit(previous.receptance(), selection, previous.modal().chart());
        QualificationResult fresh = fromModal(previous.specimen(), previous.receptance(), previous.sweep(), modal,
                specification, wallStartNs);
        return previous.linearity().map(l -> withLinearity(fresh, l, specification)).orElse(fresh);
    }

    private static QualificationResult fromModal(Specimen specimen, Frf receptance, Optional<SweepResult> sweep,
                                                 ModalEstimate modal, Optional<Specification> specification,
                                                 long wallStartNs) {
        List<FittedMode> fitted = modal.modes();
        Numbering.Outcome numbering = Numbering.number(specimen, fitted, modal.bandLowHz(), modal.bandHighHz(),
                DOUBLET_SPLIT);
        HarmonicAssignment harmonics = numbering.harmonics();
        List<String> cautions = new ArrayList<>();
        sweep.filter(s -> !s.completed()).ifPresent(s -> cautions.add("the sweep " + s.status().label()
                + " before its end (" + s.reason() + "), so its FRF lacks the steps not run"));
        numbering.refusal().ifPresent(cautions::add);
        List<QualifiedMode> modes = new ArrayList<>();
        for (int i = 0; i < fitted.size(); i++) {
            modes.add(new QualifiedMode(fitted.get(i), harmonics.harmonicOf(i), polarisationOf(harmonics, i)));
        }
        Optional<TensionEstimate> tension = Optional.empty();
        List<NumberedFrequency> series = dominantSeries(modes);
        if (!series.isEmpty()) {
            tension = Optional.of(new TensionEstimator().estimate(specimen, series));
        }
        Optional<PatternFit> participation;
        try {
            participation = fitted.isEmpty() ? Optional.empty()
                    : Optional.of(new ParticipationPattern().fit(specimen, harmonics, fitted));
        } catch (AnalysisException e) {
            participation = Optional.empty();
        }
        Map<String, Measurement> measured = measurements(modes, tension, participation, modal, receptance);
        Optional<Verdict> verdict = judge(specification, measured, cautions, sweep.isPresent());
        Frf synthesized = ModalSynthesis.synthesize(modal.plainModes(), receptance.frequenciesHz(), FrfQuantity.RECEPTANCE);
        double wallS = (System.nanoTime() - wallStartNs) * 1e-9;
        return new QualificationResult(specimen, sweep, receptance, synthesized, modal, modes, harmonics, tension,
                participation, Optional.empty(), measured, verdict, wallS, cautions);
    }

    /**
     * Adds a level check to a result: its relative shift of f1 ({@code linearityShift1}) joins the
     * figures and the verdict is judged again.
     *
     * @param result the qualification
     * @param linearity the comparison of two test levels
     * @param specification the limits, if any
     * @return the result with the level check
     */
    public static QualificationResult withLinearity(QualificationResult result, LinearityResult linearity,
                                                    Optional<Specification> specification) {
        Map<String, Measurement> measured = new LinkedHashMap<>(result.measurements());
        linearity.shifts().stream().filter(s -> s.harmonic() == 1).findFirst().ifPresent(s -> put(measured,
                Figure.LEVEL_SHIFT, s.relativeShift(), s.relativeShiftStd()));
        Optional<Verdict> verdict = judge(specification, measured, result.cautions(), true);
        return new QualificationResult(result.specimen(), result.sweep(), result.receptance(), result.synthesized(),
                result.modal(), result.modes(), result.harmonics(), result.tension(), result.participation(),
                Optional.of(linearity), measured, verdict, result.wallTimeS(), result.cautions());
    }

    /**
     * The verdict on the figures; NOT_DETERMINABLE whatever they say when the result carries cautions (a sweep that
     * stopped before its end lacks steps, so modes may be missing and the numbering wrong; modes that could not be
     * numbered; a fit that does not explain the data), each caution a reason, in order, before the limits' own.
     */
    private static Optional<Verdict> judge(Optional<Specification> specification, Map<String, Measurement> measured,
                                           List<String> cautions, boolean fromRig) {
        Map<String, String> whyNotMeasured = fromRig ? Map.of() : Map.of(Figure.LEVEL_SHIFT.key(), LEVEL_CHECK_NEEDS_THE_RIG);
        Optional<Verdict> verdict = specification.map(spec -> Verdict.evaluate(spec, measured, whyNotMeasured));
        for (int i = cautions.size() - 1; i >= 0; i--) {
            String why = "not determinable: " + cautions.get(i);
            verdict = verdict.map(v -> v.undetermined(why));
        }
        return verdict;
    }

    private static int polarisationOf(HarmonicAssignment harmonics, int modeIndex) {
        for (AssignedMode m : harmonics.modes()) {
            if (m.modeIndex() == modeIndex) {
                return m.polarisation();
            }
        }
        return 0;
    }

    /**
     * The harmonic series for the tension fit: one frequency per harmonic, that of its strongest mode.
     *
     * <p>The two polarisations of a doublet see slightly different end stiffness (that is what splits
     * them), so they do not lie on one stiff-string line; the polarisation the drive excites most
     * stands for the harmonic, as it does for f1. A harmonic whose frequency has no standard error (the
     * joint refinement could not give one, as after a hand-edited pole choice that leaves one member of a
     * doublet to stand for both) cannot be weighted and is left out of the fit.
     */
    private static List<NumberedFrequency> dominantSeries(List<QualifiedMode> modes) {
        List<NumberedFrequency> series = new ArrayList<>();
        int top = modes.stream().mapToInt(QualifiedMode::harmonic).max().orElse(0);
        for (int n = 1; n <= top; n++) {
            dominant(modes, n).filter(d -> d.fitted().frequencyStdHz() > 0 && Double.isFinite(d.fitted().frequencyStdHz()))
                    .ifPresent(d -> series.add(new NumberedFrequency(d.harmonic(), d.mode().frequencyHz(),
                            d.fitted().frequencyStdHz())));
        }
        return series;
    }

    /** The strongest mode of each harmonic stands for it (the dominant polarisation of a doublet). */
    static Optional<QualifiedMode> dominant(List<QualifiedMode> modes, int harmonic) {
        return modes.stream().filter(m -> m.harmonic() == harmonic)
                .max((a, b) -> Double.compare(a.mode().modalConstant().norm(), b.mode().modalConstant().norm()));
    }

    private static Map<String, Measurement> measurements(List<QualifiedMode> modes, Optional<TensionEstimate> tension,
                                                         Optional<PatternFit> participation, ModalEstimate modal,
                                                         Frf receptance) {
        Map<String, Measurement> m = new LinkedHashMap<>();
        dominant(modes, 1).ifPresent(f1 -> put(m, Figure.F1, f1.mode().frequencyHz(), f1.fitted().frequencyStdHz()));
        tension.ifPresent(t -> {
            put(m, Figure.TENSION, t.tensionN(), t.tensionStdN());
            put(m, Figure.BENDING_STIFFNESS, t.bendingStiffnessNm2(), t.bendingStiffnessStdNm2());
            double relB = Math.hypot(t.bendingStiffnessNm2() > 0 ? t.bendingStiffnessStdNm2() / t.bendingStiffnessNm2() : 0,
                    t.tensionStdN() / t.tensionN());
            put(m, Figure.INHARMONICITY, t.inharmonicityB(), Math.abs(t.inharmonicityB()) * relB);
        });
        int top = modes.stream().mapToInt(QualifiedMode::harmonic).max().orElse(0);
        for (int n = 1; n <= top; n++) {
            dominant(modes, n).filter(d -> d.harmonic() <= Figure.MAX_DAMPING_HARMONIC).ifPresent(d -> put(m,
                    Figure.damping(d.harmonic()), d.mode().dampingRatio(), d.fitted().dampingRatioStd()));
        }
        participation.ifPresent(p -> {
            put(m, Figure.FORCING_POSITION, p.forcingPositionM(), p.forcingPositionStdM());
            put(m, Figure.SENSOR_POSITION, p.sensorPositionM(), p.sensorPositionStdM());
        });
        modal.quality().ifPresent(q -> put(m, Figure.FIT_RESIDUAL, q.normalisedResidual(), 0));
        if (!modes.isEmpty() && receptance.variance().isPresent()) {
            put(m, Figure.RESONANCE_ERROR, worstStdErrorNear(receptance, modal.plainModes()), 0);
        }
        return m;
    }

    /**
     * Records a figure only when its value and its uncertainty are known: a figure without an uncertainty (a refinement
     * that failed, a stated uncertainty declared not evaluated) is left out, so the verdict calls its limit not
     * determinable rather than trusting it.
     */
    private static void put(Map<String, Measurement> m, Figure figure, double value, double std) {
        if (Double.isFinite(value) && Double.isFinite(std) && std >= 0) {
            m.put(figure.key(), new Measurement(value, std, figure.unit()));
        }
    }

    /**
     * The worst relative standard error of |H| among lines within a half-power bandwidth of a fitted
     * mode, where the modal estimate draws its information: sqrt(variance/2)/|H| (half of the complex
     * variance falls on the magnitude). At resonance the force drops (the specimen's drive-point
     * receptance is large), so this is where the force channel's noise matters most.
     */
    private static double worstStdErrorNear(Frf receptance, List<Mode> modes) {
        double[] variance = receptance.variance().orElseThrow();
        double worst = 0.0;
        for (int i = 0; i < receptance.size(); i++) {
            double f = receptance.frequencyHz(i);
            for (Mode mode : modes) {
                double halfPowerHz = 2 * mode.dampingRatio() * mode.frequencyHz();
                if (Math.abs(f - mode.frequencyHz()) <= Math.max(halfPowerHz, 1e-3 * mode.frequencyHz())) {
                    worst = Math.max(worst, Math.sqrt(variance[i] / 2) / receptance.magnitude(i));
                }
            }
        }
        return worst;
    }
}
