package org.tautline.app.ui.lot;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tautline.app.lot.FigureStatistics;

/** The lot table's rows and the control-chart summary, without a display. */
class LotRowsTest {

    @Test
    void rowsCarryTheStatisticsAndShowMissingLimitsAsDashes() {
        // Cpk = min(USL - mean, mean - LSL) / (3 s) (Montgomery, Introduction to Statistical Quality Control,
        // sec. 8.3, from memory): values 1, 2, 3 have mean 2 and s 1, so with limits 0 .. 5 Cpk = 2 / 3 = 0.67.
        FigureStatistics withLimits = FigureStatistics.of("tensionN", "N", List.of(1.0, 2.0, 3.0), 0.0, 5.0);
        FigureStatistics noLimits = FigureStatistics.of("f1Hz", "Hz", List.of(10.0), Double.NaN, Double.NaN);
        List<String[]> rows = LotRows.of(List.of(withLimits, noLimits));
        assertArrayEquals(new String[] {"tension", "N", "3", "2", "1", "1", "3", "0", "5", "0.67"}, rows.get(0));
        assertArrayEquals(new String[] {"fundamental frequency", "Hz", "1", "10", "-", "10", "10", "-", "-", "-"},
                rows.get(1));
    }

    @Test
    void figuresAreNamedForPeopleWithTypographicUnits() {
        FigureStatistics stiffness = FigureStatistics.of("bendingStiffnessNm2", "N m^2", List.of(6e-4), Double.NaN,
                Double.NaN);
        FigureStatistics damping = FigureStatistics.of("dampingRatio1", "", List.of(3e-3), Double.NaN, Double.NaN);
        List<String[]> rows = LotRows.of(List.of(stiffness, damping));
        assertEquals("bending stiffness EI", rows.get(0)[0]);
        assertEquals("N m²", rows.get(0)[1]);
        assertEquals("damping ratio of harmonic 1", rows.get(1)[0]);
        assertEquals("no unit", rows.get(1)[1]);
        // Small values in powers of ten as people write them, never "6.00000e-04".
        assertEquals("600 × 10⁻⁶", rows.get(0)[3]);
    }

    @Test
    void chartSummaryNamesThePointsOutsideTheControlLimits() {
        // Individuals chart limits mean +/- 3 MR-bar / 1.128 (Montgomery sec. 6.4, from memory): for 10, 10, 10, 10, 14
        // the moving ranges are 0, 0, 0, 4, MR-bar = 1, mean 10.8, limits 10.8 +/- 2.6596 = 8.1404 .. 13.4596.
        FigureStatistics f = FigureStatistics.of("f1Hz", "Hz", List.of(10.0, 10.0, 10.0, 10.0, 14.0), Double.NaN,
                Double.NaN);
        assertEquals("fundamental frequency: centre 10.8, control limits 8.14043 .. 13.4596 (mean ± 3 MR-bar/1.128); 1 point(s)"
                + " outside: number 5", LotRows.chartSummary(f));
        assertEquals("fundamental frequency: one qualification so far; control limits need two or more",
                LotRows.chartSummary(FigureStatistics.of("f1Hz", "Hz", List.of(10.0), Double.NaN, Double.NaN)));
    }
}
