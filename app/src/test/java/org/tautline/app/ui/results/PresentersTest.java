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
    void windowValuesAreRoundedByTheSharedFormat() {
        // JCGM 100:2008 (GUM) 7.2.6 (from memory): u to two significant figures, the value to the same place; the
        // formatter's own tests hold the GUM's examples, here the window's use of it.
        assertEquals("(228.410 ± 0.012) Hz", PropertyLines.shown(228.41, 0.0123, "Hz"), "GUM 7.2.6");
        assertEquals("(530 ± 200) × 10⁻⁶ N m²", PropertyLines.shown(5.3211e-4, 2.0e-4, "N m^2"),
                "GUM 7.2.6 in engineering notation, the unit typographic");
        assertEquals("1.23 ± 0.10", PropertyLines.shown(1.234, 0.0996, ""), "GUM 7.2.6 with the carry");
    }

    @Test
    void windowValuesSayWhenTheUncertaintyIsUnknownAndShowNoneForAFigureJudgedAsItStands() {
        assertEquals("1, uncertainty not evaluated", PropertyLines.shown(1.0, Double.NaN, ""));
        assertEquals("0.5 m, uncertainty not evaluated", PropertyLines.shown(0.5, Double.NaN, "m"));
        assertEquals("0.017494", PropertyLines.shown(0.017494, 0.0, ""), "no \"± 0\" where no uncertainty was evaluated");
        assertEquals("not determined", PropertyLines.shown(Double.NaN, 1.0, "N"));
    }
}
