package org.tautline.app.qualify;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.ModalSynthesis;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.specimen.HarmonicNumbering;
import org.tautline.analysis.specimen.StringPhysics;
import org.tautline.analysis.verdict.Measurement;
import org.tautline.analysis.verdict.Specification;
import org.tautline.analysis.verdict.Verdict;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepRecord;

/**
 * The analysis half of a qualification: sweep record to modes, tension and verdict.
 *
 * <p>Modes come from peak picking with half-power damping (the first estimator); harmonics are
 * numbered where obvious; the tension follows from the fundamental by Mersenne's law,
 * T = 4 mu L^2 f1^2, with a standard uncertainty propagated from the frequency resolution of the
 * sweep (half the local step spacing, taken as a rectangular distribution, GUM JCGM 100:2008
 * 4.3.7) and the stated uncertainty of mu.
 */
public final class Qualification {
    /** How far from n f1 a mode may lie and still be numbered (a nearly ideal string). */
    private static final double NUMBERING_TOLERANCE = 0.02;

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
    public static QualificationResult analyse(SpecimenDescription specimen, SweepRecord sweep,
                                              Specification specification, long wallStartNs) {
        Frf receptance = sweep.toFrf().toQuantity(FrfQuantity.RECEPTANCE);
        ModalEstimate estimate = ModalEstimator.defaults().estimate(receptance);
        List<Mode> fitted = estimate.plainModes();
        double[] frequencies = fitted.stream().mapToDouble(Mode::frequencyHz).toArray();
        int[] harmonics = HarmonicNumbering.number(frequencies, NUMBERING_TOLERANCE);
        List<IdentifiedMode> modes = new ArrayList<>();
        for (int i = 0; i < fitted.size(); i++) {
            modes.add(new IdentifiedMode(harmonics[i], fitted.get(i)));
        }
        Frf synthesized = ModalSynthesis.synthesize(fitted, receptance.frequenciesHz(), FrfQuantity.RECEPTANCE);
        Optional<IdentifiedMode> fundamental = modes.stream().filter(m -> m.harmonic() == 1)
                .max(Comparator.comparingDouble(m -> m.mode().modalConstant().norm()));
        Optional<TensionEstimate> tension = fundamental.map(m -> tensionFrom(m, specimen, receptance));

        Map<String, Measurement> measured = new HashMap<>();
        fundamental.ifPresent(m -> measured.put("f1Hz",
                new Measurement(m.mode().frequencyHz(), frequencyUncertaintyHz(receptance, m.mode().frequencyHz()), "Hz")));
        tension.ifPresent(t -> measured.put("tensionN", new Measurement(t.tensionN(), t.tensionStdN(), "N")));
        if (!fitted.isEmpty()) {
            measured.put("resonanceFrfRelativeStdError", new Measurement(worstStdErrorNear(sweep, fitted), 0.0, ""));
        }
        Verdict verdict = Verdict.evaluate(specification, measured);
        double wallS = (System.nanoTime() - wallStartNs) * 1e-9;
        return new QualificationResult(specimen, sweep, receptance, synthesized, modes, tension, verdict, wallS);
    }

    private static TensionEstimate tensionFrom(IdentifiedMode fundamental, SpecimenDescription specimen, Frf receptance) {
        double f1 = fundamental.mode().frequencyHz();
        double tensionN = StringPhysics.mersenneTensionN(f1, 1, specimen.lengthM(), specimen.linearDensityKgPerM());
        double relF = frequencyUncertaintyHz(receptance, f1) / f1;
        double relMu = specimen.linearDensityStdKgPerM() / specimen.linearDensityKgPerM();
        double stdN = tensionN * Math.hypot(2 * relF, relMu);
        return new TensionEstimate(tensionN, stdN, 1, "Mersenne's law from f1");
    }

    /** Half the local line spacing as a rectangular half-width: u = (spacing/2)/sqrt(3). */
    static double frequencyUncertaintyHz(Frf frf, double frequencyHz) {
        int n = frf.size();
        if (n < 2) {
            return 0.0;
        }
        int i = 1;
        while (i < n - 1 && frf.frequencyHz(i) < frequencyHz) {
            i++;
        }
        double spacing = frf.frequencyHz(i) - frf.frequencyHz(i - 1);
        return spacing / 2 / Math.sqrt(3);
    }

    /**
     * The worst relative standard error of |H| among steps within a half-power bandwidth of a
     * fitted mode, where the modal estimate draws its information. At resonance the force drops
     * (the specimen's drive-point receptance is large), so this is where the force channel's noise
     * matters most.
     */
    private static double worstStdErrorNear(SweepRecord sweep, List<Mode> modes) {
        double worst = 0.0;
        for (SweepPoint p : sweep.points()) {
            for (Mode m : modes) {
                double halfPowerHz = 2 * m.dampingRatio() * m.frequencyHz();
                if (Math.abs(p.frequencyHz() - m.frequencyHz()) <= Math.max(halfPowerHz, 1e-3 * m.frequencyHz())) {
                    worst = Math.max(worst, p.relativeStdError());
                }
            }
        }
        return worst;
    }
}
