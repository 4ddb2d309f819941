package org.tautline.app.lot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class FigureStatisticsTest {

    /**
     * Montgomery, Introduction to Statistical Quality Control, 6th ed., sec. 8.3 (from memory): USL 62, LSL 38,
     * mean 53, sigma 2 give Cpu = (62 - 53)/6 = 1.5, Cpl = (53 - 38)/6 = 2.5, Cpk = 1.5. The values 51, 53, 55
     * have mean 53 and sample standard deviation exactly 2 (hand-computed: sqrt((4 + 0 + 4)/2)).
     */
    @Test
    void cpkMatchesTheTextbookExample() {
        FigureStatistics s = FigureStatistics.of("strengthPsi", "psi", List.of(51.0, 53.0, 55.0), 38, 62);
        assertEquals(3, s.n());
        assertEquals(53.0, s.mean(), 1e-12);
        assertEquals(2.0, s.std(), 1e-12);
        assertEquals(51.0, s.min());
        assertEquals(55.0, s.max());
        assertEquals(1.5, s.cpk(), 1e-12);
        assertEquals(2.5, FigureStatistics.cpk(53, 2, 38, Double.NaN), 1e-12, "Cpl alone with only a lower limit");
        assertEquals(1.5, FigureStatistics.cpk(53, 2, Double.NaN, 62), 1e-12, "Cpu alone with only an upper limit");
    }

    /**
     * Individuals chart: limits mean +/- 3 MR-bar/d2, d2 = 1.128 (Montgomery, sec. 6.4 and appendix table VI,
     * from memory). For 51, 53, 55 the moving ranges are 2 and 2, so MR-bar = 2 and the limits are
     * 53 +/- 5.319149 (hand-computed 6/1.128).
     */
    @Test
    void individualsChartLimitsComeFromTheAverageMovingRange() {
        IndividualsChart chart = IndividualsChart.of(List.of(51.0, 53.0, 55.0));
        assertEquals(2.0, chart.averageMovingRange(), 1e-12);
        assertEquals(58.319149, chart.upperControlLimit(), 1e-6);
        assertEquals(47.680851, chart.lowerControlLimit(), 1e-6);
        assertTrue(chart.outOfControl().isEmpty());
        IndividualsChart jump = IndividualsChart.of(List.of(10.0, 10.1, 9.9, 10.0, 10.1, 9.9, 10.0, 13.0));
        assertEquals(List.of(7), jump.outOfControl(), "a step of 3 against moving ranges near 0.1 is out of control");
    }

    @Test
    void identicalValuesHaveNoSpreadAndNoFalseAlarm() {
        List<Double> same = List.of(225.56288538358473, 225.56288538358473, 225.56288538358473);
        FigureStatistics s = FigureStatistics.of("f1Hz", "Hz", same, 215, 245);
        assertEquals(225.56288538358473, s.mean());
        assertEquals(0.0, s.std());
        assertTrue(Double.isNaN(s.cpk()), "no spread, no capability index");
        assertEquals(List.of(), s.chart().outOfControl());
    }

    @Test
    void cpkIsUndefinedWithoutSpreadOrLimits() {
        assertTrue(Double.isNaN(FigureStatistics.of("x", "", List.of(1.0), 0, 2).cpk()), "one value has no spread");
        assertTrue(Double.isNaN(FigureStatistics.cpk(1, 0.1, Double.NaN, Double.NaN)), "no limit");
    }
}
