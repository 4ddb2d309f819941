package org.tautline.app.ui.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;

/** Axis ticks, the FRF cursor's reading and SI prefixes, without a display. */
class ChartTextTest {
    private static List<String> labels(double low, double high) {
        return LogTicks.between(low, high).stream().filter(LogTicks.Tick::labelled).map(LogTicks.Tick::label).toList();
    }

    @Test
    void aBandWithinOneDecadeIsLabelledBetweenTheDecades() {
        // The demo band, 180 to 1500 Hz with a little room: every whole multiple of a power of ten, and 1.5.
        assertEquals(List.of("200", "300", "400", "500", "600", "700", "800", "900", "1000", "1500"), labels(175, 1545));
        // Two decades: 1, 2 and 5 labelled, the other multiples ticked without a label.
        assertEquals(List.of("20", "50", "100", "200", "500", "1000", "2000"), labels(15, 2500));
        assertEquals(19, LogTicks.between(15, 2500).size(), "ticks at every whole multiple from 20 to 2000");
        // Less than three to one: evenly spaced 1-2-5 steps.
        assertEquals(List.of("222", "224", "226", "228", "230", "232"), labels(221, 233));
        // Five decades of |H|: the powers of ten, written as powers.
        assertEquals(List.of("10⁻⁵", "10⁻⁴", "10⁻³", "10⁻²"), labels(3e-6, 0.05));
    }

    @Test
    void theCursorReadsTheNearestLineOnALogScaleAndSnapsToTheNearestModeWithinReach() {
        FrfLines lines = new FrfLines(new double[] {100, 200, 300, 400}, new double[] {1e-4, 2e-3, 3e-4, 4e-5},
                new double[] {-10, -90, -170, 175}, "m/N", Optional.of(new double[] {0.99, 0.98, 0.97, 0.5}),
                "coherence");
        // 141.4 Hz is the geometric middle of 100 and 200: 140 is nearer 100 on a log scale.
        assertEquals(0, lines.nearest(140));
        assertEquals(1, lines.nearest(143));
        List<FrfReading.ModeMark> modes = List.of(new FrfReading.ModeMark(205, "harmonic 1, single: 205.0 ± 0.1 Hz"));
        FrfReading free = FrfReading.at(lines, modes, 190, 1.0).orElseThrow();
        assertEquals("f 200 Hz   |H| 0.002000 m/N   phase -90.0°   coherence 0.980", free.text());
        assertEquals(200, free.cursorHz());
        FrfReading snapped = FrfReading.at(lines, modes, 201, 1.05).orElseThrow();
        assertEquals(205, snapped.cursorHz());
        assertTrue(snapped.text().startsWith("Mode harmonic 1, single: 205.0 ± 0.1 Hz   |   nearest line: f 200 Hz"),
                snapped.text());
        assertTrue(FrfReading.at(lines, modes, 260, 1.05).orElseThrow().mode().isEmpty(), "out of reach: no snap");
        assertEquals("f 400 Hz   |H| 4.000 × 10⁻⁵ m/N   phase 175.0°   coherence 0.5",
                FrfReading.at(lines, modes, 1000, 1.05).orElseThrow().text());
        assertTrue(FrfReading.at(FrfLines.none(), modes, 200, 1.05).isEmpty());
    }

    @Test
    void siPrefixesBringValuesBetweenOneAndAThousand() {
        assertEquals(new SiPrefix("µ", 1e6), SiPrefix.forLargest(1.4e-4));
        assertEquals(new SiPrefix("m", 1e3), SiPrefix.forLargest(0.022));
        assertEquals(new SiPrefix("", 1), SiPrefix.forLargest(2.5));
        assertEquals(new SiPrefix("", 1), SiPrefix.forLargest(0));
    }
}
