package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SortedMap;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;

class ModeSelectionTest {

    private static ModeSelection select(Frf h, double low, double high) {
        return ModeSelection.automatic(StabilisationChart.build(new Lscf(h, low, high, null, 64), 2, 64, 2, null));
    }

    /** Asserts a one-to-one match of selected poles and true modes within the given relative tolerances. */
    private static void assertExactlyTheModes(List<Mode> modes, ModeSelection chosen, double frequencyTolerance,
                                              double dampingTolerance, String what) {
        assertEquals(modes.size(), chosen.size(), what + ": number of selected modes, got " + chosen.poles());
        for (int i = 0; i < modes.size(); i++) {
            Mode m = modes.get(i);
            Pole p = chosen.poles().get(i);
            assertTrue(LscfTestData.frequencyError(p, m) <= frequencyTolerance,
                    what + ": mode " + i + " frequency " + p.frequencyHz() + " Hz vs " + m.frequencyHz() + " Hz");
            assertTrue(LscfTestData.dampingError(p, m) <= dampingTolerance,
                    what + ": mode " + i + " damping " + p.dampingRatio() + " vs " + m.dampingRatio());
        }
    }

    @Test
    void findsExactlyTheSynthesisedModesOnUniformAndLogLines() {
        // Truth: ModalSynthesis (Ewins 2000 modal sum, from memory). The 8-mode set holds a pair one
        // half-power bandwidth apart, f2 = f1 (1 + 2 zeta), which must come out as two modes.
        assertExactlyTheModes(LscfTestData.oneMode(), select(ModalSynthesis.receptance(LscfTestData.oneMode(),
                LscfTestData.uniformLines(20, 400, 500)), 20, 400), 1e-6, 1e-6, "one mode, uniform");
        assertExactlyTheModes(LscfTestData.oneMode(), select(ModalSynthesis.receptance(LscfTestData.oneMode(),
                LscfTestData.logLines(20, 400, 500)), 20, 400), 1e-6, 1e-6, "one mode, log");
        assertExactlyTheModes(LscfTestData.threeModes(), select(ModalSynthesis.receptance(LscfTestData.threeModes(),
                LscfTestData.uniformLines(20, 600, 1000)), 20, 600), 1e-6, 2e-6, "three modes, uniform");
        assertExactlyTheModes(LscfTestData.threeModes(), select(ModalSynthesis.receptance(LscfTestData.threeModes(),
                LscfTestData.logLines(20, 600, 1000)), 20, 600), 1e-6, 2e-6, "three modes, log");
        assertExactlyTheModes(LscfTestData.eightModes(), select(ModalSynthesis.receptance(LscfTestData.eightModes(),
                LscfTestData.uniformLines(20, 1000, 4000)), 20, 1000), 1e-6, 1e-4, "eight modes, uniform");
        assertExactlyTheModes(LscfTestData.eightModes(), select(ModalSynthesis.receptance(LscfTestData.eightModes(),
                LscfTestData.logLines(20, 1000, 4000)), 20, 1000), 1e-6, 1e-4, "eight modes, log");
    }

    @Test
    void pureNoiseAndAFlatResponseGiveNoModes() {
        // Circular complex Gaussian noise has no resonance; nor has a constant FRF.
        for (long seed = 1; seed <= 5; seed++) {
            ModeSelection chosen = select(LscfTestData.pureNoise(LscfTestData.uniformLines(20, 1000, 4000), seed), 20, 1000);
            assertEquals(List.of(), chosen.poles(), "pure noise, seed " + seed);
        }
        assertEquals(List.of(), select(LscfTestData.flat(LscfTestData.logLines(20, 1000, 2000), 1e-3), 20, 1000).poles(),
                "flat response");
    }

    @Test
    void noisyStiffStringGivesEveryModeAndNoOther() {
        // Truth: the stiff-string modes of LscfTestData (Fletcher 1964 frequencies, string point-force modal
        // constants, from memory), with a polarisation doublet three half-power bandwidths apart, on
        // stepped-sine lines with 1 % (40 dB) relative circular noise. LSCF is biased under noise (it is not
        // a maximum-likelihood estimator; Pintelon & Schoukens 2012, from memory): measured damping errors
        // reach 12 % on the 2 % mode near the top of the band, frequencies stay within 0.06 half-power bandwidths.
        List<Mode> modes = LscfTestData.stiffStringModes();
        Frf clean = ModalSynthesis.receptance(modes, LscfTestData.steppedSineLines(80, 1200, 2000, modes, 40));
        for (long seed = 1; seed <= 3; seed++) {
            ModeSelection chosen = select(LscfTestData.withRelativeNoise(clean, 0.01, seed), 80, 1200);
            assertEquals(modes.size(), chosen.size(), "seed " + seed + ": selected " + chosen.poles());
            for (int i = 0; i < modes.size(); i++) {
                Mode m = modes.get(i);
                Pole p = chosen.poles().get(i);
                double bandwidthHz = 2 * m.dampingRatio() * m.frequencyHz();
                assertTrue(Math.abs(p.frequencyHz() - m.frequencyHz()) <= 0.15 * bandwidthHz, "seed " + seed + ", mode "
                        + i + ": " + p.frequencyHz() + " Hz vs " + m.frequencyHz() + " Hz, half-power bandwidth " + bandwidthHz);
                assertTrue(LscfTestData.dampingError(p, m) <= 0.2, "seed " + seed + ", mode " + i + ": damping "
                        + p.dampingRatio() + " vs " + m.dampingRatio());
            }
        }
    }

    @Test
    void appliesEachRuleOnAHandBuiltChart() {
        // Ten orders 2..20; a column needs max(3, ceil(10/4)) = 3 supporting orders and a majority above its start.
        SortedMap<Integer, List<Pole>> poles = new TreeMap<>();
        for (int order = 2; order <= 20; order += 2) {
            List<Pole> at = new ArrayList<>();
            at.add(Pole.of(150, 0.01));                                     // kept: stable at every order
            at.add(new Pole(0.01 * 2 * Math.PI * 250, 2 * Math.PI * 250));  // unstable: zeta < 0
            at.add(Pole.of(101, 0.01));                                     // inside the 4 Hz edge guard of 100 Hz
            at.add(Pole.of(300, 0.005));                                    // a pair one half-power bandwidth apart:
            at.add(Pole.of(303, 0.005));                                    //   both kept
            at.add(Pole.of(330, 0.3));                                      // implausible damping
            if (order >= 16) {
                at.add(Pole.of(350, 0.01));                                 // stable at 18, 20 only: too few
            }
            if (order == 4 || order == 6) {
                at.add(Pole.of(400, 0.01));                                 // one stable order, then gone
            }
            poles.put(order, at);
        }
        ModeSelection chosen = ModeSelection.automatic(StabilisationChart.classify(100, 500, poles, null));
        assertEquals(List.of(Pole.of(150, 0.01), Pole.of(300, 0.005), Pole.of(303, 0.005)), chosen.poles(),
                "hand-checked choice");
        assertEquals(new ModeSelection.Entry(Pole.of(150, 0.01), 9, 9, false), chosen.entries().get(0),
                "support: stable at orders 4..20 of the 9 orders from 4 up");

        ModeSelection edited = chosen.withDropped(1).withAdded(Pole.of(200, 0.02));
        assertEquals(List.of(Pole.of(150, 0.01), Pole.of(200, 0.02), Pole.of(303, 0.005)), edited.poles(),
                "drop the 300 Hz pole, add 200 Hz by hand, kept in frequency order");
        assertTrue(edited.entries().get(1).addedByHand(), "the added pole is marked as added by hand");
        assertEquals(3, chosen.size(), "the original selection is unchanged");
        assertEquals("cannot drop pole 3 from a mode selection of 3 poles: the index must lie in 0 .. 2",
                assertThrows(AnalysisException.class, () -> chosen.withDropped(3)).getMessage());
        assertEquals("cannot drop pole 0 from an empty mode selection",
                assertThrows(AnalysisException.class, () -> ModeSelection.of(List.of()).withDropped(0)).getMessage());
    }
}
