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
        assertEquals("140.0 .. 160.0 N", rows.get(0)[1]);
        assertEquals("PASS", rows.get(0)[4]);
        assertTrue(PropertyLines.properties(wire).get(0)[1].endsWith(" N"));
    }

    @Test
    void figuresSayWhenTheUncertaintyIsUnknown() {
        assertEquals("228.41 ± 0.012 Hz", Figures.plusMinus(228.41, 0.0123, "Hz"));
        assertEquals("1.0000 (no std)", Figures.plusMinus(1.0, Double.NaN));
        assertEquals("not measured", Figures.plusMinus(Double.NaN, 1.0, "N"));
    }
}
