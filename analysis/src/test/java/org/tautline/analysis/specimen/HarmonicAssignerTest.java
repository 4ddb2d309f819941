package org.tautline.analysis.specimen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Mode;

class HarmonicAssignerTest {
    // Steel music wire d 1 mm, L 1 m; at 100 N Fletcher's B = pi^2 EI/(T L^2) = 9.7e-4 (a stiff case).
    private static final Specimen WIRE = Specimen.roundWire("w1", Material.MUSIC_WIRE, 1e-3, 1.0, EndCondition.PINNED,
            0.5, 0.13, 100);
    private final HarmonicAssigner assigner = new HarmonicAssigner();

    private static List<FittedMode> series(Specimen s, int[] harmonics, long seed) {
        Random random = new Random(seed);
        List<FittedMode> modes = new ArrayList<>();
        for (int n : harmonics) {
            modes.add(SyntheticModes.mode(s, n, SyntheticModes.pinnedHz(s, n), 2e-5, random));
        }
        return modes;
    }

    private static int[] numbers(HarmonicAssignment a, int count) {
        int[] n = new int[count];
        for (int i = 0; i < count; i++) {
            n[i] = a.harmonicOf(i);
        }
        return n;
    }

    @Test
    void midspanForcingRemovesEvenHarmonicsAndTheNumberingSaysWhy() {
        // Point force at x_f = L/2: sin(n pi/2) = 0 for even n, so even modes are absent (checks.md, point force).
        int[] odd = {1, 3, 5, 7, 9};
        double top = SyntheticModes.pinnedHz(WIRE, 10) * 1.01;
        HarmonicAssignment a = assigner.assign(WIRE, series(WIRE, odd, 1), Double.NaN, 10, top);
        assertEquals(List.of(1, 3, 5, 7, 9), a.modes().stream().map(AssignedMode::harmonic).toList(),
                "odd harmonics numbered as such, not as a series of their own");
        assertEquals(List.of(2, 4, 6, 8, 10), a.absent().stream().map(AbsentHarmonic::harmonic).toList());
        for (AbsentHarmonic h : a.absent()) {
            assertEquals(AbsenceReason.NODE_AT_FORCING_POINT, h.reason(), "harmonic " + h.harmonic());
            // |sin(n pi x_f/L)| = 0 at a node of the point-force mode shape (checks.md, "Point force" [seen])
            assertEquals("the stinger is at a node of this mode (the mode shape there is 0.000 of its largest)",
                    h.explanation());
        }
    }

    @Test
    void thirdSpanForcingRemovesThreeAndSix() {
        // x_f = L/3: sin(n pi/3) = 0 for n = 3, 6 (checks.md, point force).
        Specimen s = WIRE.withPositions(1.0 / 3.0, 0.21);
        int[] present = {1, 2, 4, 5, 7};
        HarmonicAssignment a = assigner.assign(s, series(s, present, 2), Double.NaN, 10,
                SyntheticModes.pinnedHz(s, 7) * 1.01);
        assertEquals(List.of(1, 2, 4, 5, 7), a.modes().stream().map(AssignedMode::harmonic).toList());
        assertEquals(List.of(3, 6), a.absent().stream().map(AbsentHarmonic::harmonic).toList());
        assertTrue(a.absent().stream().allMatch(h -> h.reason() == AbsenceReason.NODE_AT_FORCING_POINT),
                "both absences explained by the forcing node: " + a.absent());
    }

    @Test
    void numbersHighHarmonicsOfAStiffWireWithADoubletAndMissingModes() {
        // Fletcher 1964: f_n = n f0 sqrt(1 + B n^2); at B = 9.7e-4, f_25 is 27 % above 25 f0, far beyond
        // any fixed tolerance around n f1. Sensor at L/4 removes n = 4, 8, ...; n = 7 is left out as if lost in noise.
        Specimen s = WIRE.withPositions(0.37, 0.25);
        Random random = new Random(3);
        List<FittedMode> modes = new ArrayList<>();
        List<Integer> truth = new ArrayList<>();
        for (int n = 1; n <= 25; n++) {
            if (n % 4 == 0 || n == 7) {
                continue;
            }
            modes.add(SyntheticModes.mode(s, n, SyntheticModes.pinnedHz(s, n), 2e-5, random));
            truth.add(n);
            if (n == 2) {
                modes.add(SyntheticModes.mode(s, n, SyntheticModes.pinnedHz(s, n) * 1.001, 2e-5, random));
                truth.add(n);
            }
        }
        HarmonicAssignment a = assigner.assign(s, modes, Double.NaN, 10, SyntheticModes.pinnedHz(s, 25) * 1.005);
        int[] got = numbers(a, modes.size());
        for (int i = 0; i < got.length; i++) {
            assertEquals(truth.get(i), got[i], "mode " + i + " at " + modes.get(i).mode().frequencyHz() + " Hz");
        }
        assertEquals(1, a.modes().stream().filter(m -> m.harmonic() == 2 && m.polarisation() == 1).count(),
                "lower polarisation of the n = 2 doublet");
        assertEquals(1, a.modes().stream().filter(m -> m.harmonic() == 2 && m.polarisation() == 2).count(),
                "upper polarisation of the n = 2 doublet");
        assertEquals(List.of(4, 7, 8, 12, 16, 20, 24), a.absent().stream().map(AbsentHarmonic::harmonic).toList());
        AbsentHarmonic seven = a.absent().get(1);
        assertEquals(AbsenceReason.BELOW_NOISE, seven.reason());
        assertEquals(AbsenceReason.NODE_AT_SENSOR, a.absent().get(0).reason());
        assertEquals("the sensor is at a node of this mode (the mode shape there is 0.000 of its largest)",
                a.absent().get(0).explanation());
        double b = StringPhysics.inharmonicity(s.bendingStiffnessNm2(), 100, 1);
        assertEquals(b, a.inharmonicityB(), 0.01 * b, "numbering model's B (Fletcher 1964) near the truth");
    }

    @Test
    void aFundamentalBelowTheBandIsNotMistakenForAHigherSeries() {
        int[] present = {2, 3, 4, 5, 6};
        double f1 = SyntheticModes.pinnedHz(WIRE.withPositions(0.29, 0.13), 1);
        Specimen s = WIRE.withPositions(0.29, 0.13);
        HarmonicAssignment a = assigner.assign(s, series(s, present, 4), Double.NaN, 1.5 * f1,
                SyntheticModes.pinnedHz(s, 6) * 1.01);
        assertEquals(List.of(2, 3, 4, 5, 6), a.modes().stream().map(AssignedMode::harmonic).toList());
        assertEquals(1, a.absent().size());
        assertEquals(AbsenceReason.OUTSIDE_BAND, a.absent().get(0).reason());
    }

    @Test
    void anApproximateFirstFrequencyChoosesBetweenAmbiguousSeries() {
        // Harmonics 2, 4, 6 alone look like 1, 2, 3 of a string twice as fast; f1 given resolves it.
        Specimen s = WIRE.withPositions(0.29, 0.13);
        int[] even = {2, 4, 6};
        double f1 = SyntheticModes.pinnedHz(s, 1);
        HarmonicAssignment guessed = assigner.assign(s, series(s, even, 5), Double.NaN, 1, 1000);
        assertEquals(List.of(1, 2, 3), guessed.modes().stream().map(AssignedMode::harmonic).toList());
        HarmonicAssignment told = assigner.assign(s, series(s, even, 5), 1.05 * f1, 1, 1000);
        assertEquals(List.of(2, 4, 6), told.modes().stream().map(AssignedMode::harmonic).toList());
        assertEquals(AbsenceReason.BELOW_NOISE, told.absent().get(0).reason());
    }

    @Test
    void aRigModeOffTheSeriesStaysUnnumbered() {
        Specimen s = WIRE.withPositions(0.29, 0.13);
        List<FittedMode> modes = new ArrayList<>(series(s, new int[] {1, 2, 3, 4}, 6));
        double rig = 2.5 * SyntheticModes.pinnedHz(s, 1);
        modes.add(new FittedMode(new Mode(rig, 0.02, new Complex(1, 0)), 0.01, 0.001, new Complex(0.01, 0.01)));
        HarmonicAssignment a = assigner.assign(s, modes, Double.NaN, 1, 1000);
        assertEquals(List.of(4), a.unnumberedModes());
        assertEquals(List.of(1, 2, 3, 4), a.modes().stream().map(AssignedMode::harmonic).toList());
    }

    @Test
    void rejectsAnInvalidBand() {
        assertEquals("band must satisfy 0 <= low < high, got 200.0 .. 100.0 Hz",
                assertThrows(AnalysisException.class,
                        () -> assigner.assign(WIRE, series(WIRE, new int[] {1}, 7), Double.NaN, 200, 100)).getMessage());
    }
}
