package org.tautline.analysis.qualify;

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
import org.tautline.analysis.modal.ModalSynthesis;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.modal.ModeSelection;
import org.tautline.analysis.specimen.AssignedMode;
import org.tautline.analysis.specimen.HarmonicAssignment;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.specimen.NumberedFrequency;
import org.tautline.analysis.specimen.ParticipationPattern;
import org.tautline.analysis.specimen.PatternFit;
import org.tautline.analysis.specimen.TensionEstimate;
import org.tautline.analysis.specimen.TensionEstimator;
import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.verdict.Measurement;
import org.tautline.analysis.verdict.Specification;
import org.tautline.analysis.verdict.Verdict;

/**
 * The qualification of one specimen, from its FRF to its verdict: a pure computation on a
 * {@link QualificationRequest}, the same whether the FRF came from a rig a moment ago or from a file.
 *
 * <p>Modes come from the modal estimator (LSCF, LSFD, joint refinement); harmonics, doublets and absent harmonics
 * from the stiff-string numbering, checked against the stated specimen ({@link Numbering}); tension and bending
 * stiffness from the whole harmonic series weighted by the modes' standard errors; forcing and sensor positions
 * from the pattern of modal constants. Every figure goes to the verdict with its standard uncertainty
 * ({@link Figure}); a figure whose uncertainty is not known is left out, so its limit is not determinable.
 */
public final class Qualifier {
    /** Doublets: two polarisations of one harmonic lie within this relative split (a few half-power bandwidths). */
    private static final double DOUBLET_SPLIT = 0.02;

    private Qualifier() {
    }

    /**
     * Qualifies: fits the FRF, numbers the modes, estimates the properties and judges them.
     *
     * @param request what to qualify
     * @return the assessment
     */
    public static Assessment qualify(QualificationRequest request) {
        Frf receptance = request.frf().toQuantity(FrfQuantity.RECEPTANCE);
        return assess(request, receptance, request.estimator().estimate(receptance));
    }

    /**
     * Qualifies a modal fit made earlier and recorded (a run folder's result), without fitting the FRF again:
     * numbering, tension, participation and verdict follow from its modes as in {@link #qualify}.
     *
     * @param request what to qualify; its FRF must be the one the fit was made from
     * @param modal the recorded fit
     * @return the assessment
     */
    public static Assessment ofFit(QualificationRequest request, ModalEstimate modal) {
        return assess(request, request.frf().toQuantity(FrfQuantity.RECEPTANCE), modal);
    }

    /**
     * Fits again with a pole choice edited by hand, and redoes everything downstream.
     *
     * <p>The poles go through the same LSFD and joint refinement as an automatic fit ({@code ModalEstimator.refit});
     * numbering, tension, participation and verdict follow as in {@link #qualify}; a level check of the earlier
     * assessment is kept and its shift judged again.
     *
     * @param previous the assessment whose FRF and stabilisation chart are refitted
     * @param selection the poles to fit
     * @param specification the limits to judge against now, if any
     * @return the new assessment
     */
    public static Assessment refit(Assessment previous, ModeSelection selection,
                                   Optional<Specification> specification) {
        QualificationRequest request = previous.request().withSpecification(specification);
        ModalEstimate modal = request.estimator().refit(previous.receptance(), selection, previous.modal().chart());
        return assess(request, previous.receptance(), modal);
    }

    /**
     * Adds a level check: its relative shift of f1 ({@link Figure#LEVEL_SHIFT}) joins the figures and the verdict is
     * judged again.
     *
     * @param previous the assessment
     * @param levelCheck the comparison of two test levels
     * @param specification the limits to judge against now, if any
     * @return the assessment with the level check
     */
    public static Assessment withLevelCheck(Assessment previous, LinearityResult levelCheck,
                                            Optional<Specification> specification) {
        QualificationRequest request = previous.request().withSpecification(specification).withLevelCheck(levelCheck);
        Map<String, Measurement> measured = new LinkedHashMap<>(previous.measurements());
        putLevelShift(measured, levelCheck);
        return new Assessment(request, previous.receptance(), previous.synthesized(), previous.modal(), previous.modes(),
                previous.harmonics(), previous.tension(), previous.participation(), measured,
                judge(request, measured, previous.cautions()), previous.cautions());
    }

    /**
     * The strongest mode of a harmonic, which stands for it (the dominant polarisation of a doublet).
     *
     * @param modes numbered modes
     * @param harmonic n
     * @return its strongest mode, if any is numbered n
     */
    public static Optional<QualifiedMode> dominant(List<QualifiedMode> modes, int harmonic) {
        return modes.stream().filter(m -> m.harmonic() == harmonic)
                .max((a, b) -> Double.compare(a.mode().modalConstant().norm(), b.mode().modalConstant().norm()));
    }

    private static Assessment assess(QualificationRequest request, Frf receptance, ModalEstimate modal) {
        List<FittedMode> fitted = modal.modes();
        Numbering.Outcome numbering = Numbering.number(request.specimen(), fitted, modal.bandLowHz(), modal.bandHighHz(),
                DOUBLET_SPLIT);
        HarmonicAssignment harmonics = numbering.harmonics();
        List<String> cautions = new ArrayList<>(request.recordCautions());
        modal.unexplained().ifPresent(cautions::add);
        numbering.refusal().ifPresent(cautions::add);
        List<QualifiedMode> modes = new ArrayList<>();
        for (int i = 0; i < fitted.size(); i++) {
            modes.add(new QualifiedMode(fitted.get(i), harmonics.harmonicOf(i), polarisationOf(harmonics, i)));
        }
        Optional<TensionEstimate> tension = Optional.empty();
        List<NumberedFrequency> series = dominantSeries(modes);
        if (!series.isEmpty()) {
            tension = Optional.of(new TensionEstimator().estimate(request.specimen(), series));
        }
        Optional<PatternFit> participation;
        try {
            participation = fitted.isEmpty() ? Optional.empty()
                    : Optional.of(new ParticipationPattern().fit(request.specimen(), harmonics, fitted));
        } catch (AnalysisException e) {
            participation = Optional.empty();
        }
        Map<String, Measurement> measured = measurements(modes, tension, participation, modal, receptance);
        request.levelCheck().ifPresent(l -> putLevelShift(measured, l));
        Frf synthesized = ModalSynthesis.synthesize(modal.plainModes(), receptance.frequenciesHz(), FrfQuantity.RECEPTANCE);
        return new Assessment(request, receptance, synthesized, modal, modes, harmonics, tension, participation, measured,
                judge(request, measured, cautions), cautions);
    }

    /**
     * The verdict on the figures; NOT_DETERMINABLE whatever they say when there are cautions (a sweep that stopped
     * before its end lacks steps, so modes may be missing and the numbering wrong; modes that could not be numbered;
     * a fit that does not explain the data), each caution a reason, in order, before the limits' own.
     */
    private static Optional<Verdict> judge(QualificationRequest request, Map<String, Measurement> measured,
                                           List<String> cautions) {
        Map<String, String> whyNotMeasured = request.whyNoLevelCheck().isEmpty() ? Map.of()
                : Map.of(Figure.LEVEL_SHIFT.key(), request.whyNoLevelCheck());
        Optional<Verdict> verdict = request.specification().map(spec -> Verdict.evaluate(spec, measured, whyNotMeasured));
        for (int i = cautions.size() - 1; i >= 0; i--) {
            String why = "not determinable: " + cautions.get(i);
            verdict = verdict.map(v -> v.undetermined(why));
        }
        return verdict;
    }

    private static void putLevelShift(Map<String, Measurement> measured, LinearityResult levelCheck) {
        levelCheck.shifts().stream().filter(s -> s.harmonic() == 1).findFirst().ifPresent(s -> put(measured,
                Figure.LEVEL_SHIFT, s.relativeShift(), s.relativeShiftStd()));
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
