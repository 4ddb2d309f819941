package org.tautline.app.ui.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.modal.Mode;
import org.tautline.app.qualify.QualificationResult;

/** The text and data the views show, checked on the invented stiff wire without a display. */
class PresentersTest {
    private static QualificationResult wire;

    @BeforeAll
    static void qualify() {
        wire = SyntheticWire.qualified();
    }

    @Test
    void nyquistCircleHasTheViscousMobilityDiameter() {
        // A viscous mode's mobility circle has diameter |A|/(2 zeta w_n) (Ewins, Modal Testing, 2nd ed. 2000,
        // section 4.3, from memory); the other modes only move its centre a little.
        Mode first = wire.modes().get(0).mode();
        NyquistData data = NyquistData.around(wire.receptance(), wire.modal().plainModes(), first);
        double expectedRadius = Math.abs(SyntheticWire.modalConstant(1))
                / (4 * SyntheticWire.DAMPING * 2 * Math.PI * SyntheticWire.frequencyHz(1));
        assertEquals(expectedRadius, data.circle().orElseThrow().radius(), 0.03 * expectedRadius);
        assertEquals(NyquistData.MODEL_POINTS, data.model().size());
        assertTrue(data.measured().size() >= 4, "lines in the band: " + data.measured().size());
    }

    @Test
    void modeRowsCarryHarmonicAndUncertainties() {
        List<ModeRows.Row> rows = ModeRows.of(wire);
        assertEquals(SyntheticWire.MODES_IN_BAND, rows.size());
        assertEquals("1", rows.get(0).harmonic());
        assertEquals("single", rows.get(0).polarisation());
        assertTrue(rows.get(0).frequency().contains(" ± "), rows.get(0).frequency());
    }

    @Test
    void verdictRowsListEveryLimit() {
        List<String[]> rows = PropertyLines.verdictRows(wire);
        assertEquals(2, rows.size());
        assertEquals("tension", rows.get(0)[0]);
        assertEquals("140 to 160 N", rows.get(0)[1]);
        assertEquals("pass", rows.get(0)[4]);
        assertTrue(PropertyLines.properties(wire).get(0)[1].endsWith(" N"));
    }

    @Test
    void noConstantOrKeyReachesTheScreen() {
        // Every line the properties tab, the verdict table, the reasons, the banner and the mode table show.
        List<String> shown = new java.util.ArrayList<>();
        PropertyLines.properties(wire).forEach(r -> shown.addAll(List.of(r)));
        PropertyLines.verdictRows(wire).forEach(r -> shown.addAll(List.of(r)));
        shown.addAll(PropertyLines.reasons(wire).subList(0, wire.verdict().orElseThrow().results().size()));
        VerdictSummary banner = VerdictSummary.of(wire);
        shown.add(banner.headline());
        shown.add(banner.firstReason());
        ModeRows.of(wire).forEach(r -> shown.addAll(List.of(r.harmonic(), r.polarisation(), r.frequency(), r.damping(),
                r.modalConstant())));
        java.util.regex.Pattern leak = java.util.regex.Pattern.compile(
                "[A-Z]{2,}_[A-Z_]+|\\b[a-z]+[A-Z][A-Za-z]*\\d*\\b|\\+/-|\\^2");
        for (String text : shown) {
            assertTrue(!leak.matcher(text).find(), "a constant, key or ASCII unit on screen: '" + text + "'");
        }
        assertEquals("PASS", banner.headline());
        assertEquals("All 2 limits are met with their expanded uncertainty (k = 2).", banner.firstReason());
        assertTrue(PropertyLines.reasons(wire).get(0).startsWith("tension "), PropertyLines.reasons(wire).get(0));
    }

    @Test
    void bannerColoursReadInBothLooksWithAContrastOfFourAndAHalfOrMore() {
        // WCAG 2.1 success criterion 1.4.3: text contrast at least 4.5:1; the banner carries its own background.
        for (VerdictColours c : List.of(VerdictColours.PASS, VerdictColours.FAIL, VerdictColours.UNDETERMINED,
                VerdictColours.NONE, VerdictColours.STALE)) {
            assertTrue(c.contrastRatio() >= 4.5, c + " has contrast " + c.contrastRatio());
        }
        // WCAG's own extremes: black on white is 21:1, and a colour on itself 1:1.
        assertEquals(21.0, new VerdictColours(java.awt.Color.WHITE, java.awt.Color.BLACK).contrastRatio(), 1e-9);
        assertEquals(1.0, new VerdictColours(java.awt.Color.GRAY, java.awt.Color.GRAY).contrastRatio(), 1e-9);
    }

    @Test
    void figuresRoundTheUncertaintyToTwoSignificantFiguresAndTheValueToMatch() {
        // JCGM 100:2008 (GUM) 7.2.6: u to at most two significant figures, the value to the same place.
        assertEquals("228.410 ± 0.012 Hz", Figures.plusMinus(228.41, 0.0123, "Hz"));
        assertEquals("225.565 ± 0.026 Hz", Figures.plusMinus(225.565, 0.0262257, "Hz"));
        assertEquals("146.5 ± 2.9 N", Figures.plusMinus(146.517, 2.93058, "N"));
        assertEquals("382.6 ± 5.0", Figures.plusMinus(382.57, 4.99));
        assertEquals("470 ± 190", Figures.plusMinus(466.6, 190.3));
        assertEquals("-874 ± 55", Figures.plusMinus(-874.11, 55.2));
        assertEquals("0.003488 ± 0.000032", Figures.plusMinus(0.0034875, 3.2e-5));
        // 0.0996 rounds up to 0.10: two significant figures still, the value to hundredths.
        assertEquals("1.23 ± 0.10", Figures.plusMinus(1.234, 0.0996));
        // Outside 0.001 .. 10^6 the value and its uncertainty share one power of ten.
        assertEquals("(1.00 ± 0.37) × 10⁻⁴", Figures.plusMinus(9.957e-5, 3.7e-5));
        assertEquals("(5.3 ± 2.0) × 10⁻⁴ N m²", Figures.plusMinus(5.3211e-4, 2.0e-4, "N m²"));
        assertEquals("(1.500 ± 0.020) × 10⁷", Figures.plusMinus(1.5e7, 2.0e5));
    }

    @Test
    void figuresSayWhenTheUncertaintyIsUnknownAndShowNoneForAFigureJudgedAsItStands() {
        assertEquals("1 (uncertainty not evaluated)", Figures.plusMinus(1.0, Double.NaN));
        assertEquals("0.5 m (uncertainty not evaluated)", Figures.plusMinus(0.5, Double.NaN, "m"));
        assertEquals("0.01749", Figures.plusMinus(0.017494, 0.0), "no \"± 0.0\" where no uncertainty was evaluated");
        assertEquals("not measured", Figures.plusMinus(Double.NaN, 1.0, "N"));
        assertEquals("9.957 × 10⁻⁵", Figures.plain(9.957e-5));
        assertEquals("215", Figures.plain(215.0));
        assertEquals("0.001", Figures.plain(0.001));
    }
}
